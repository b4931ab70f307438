import type { Response } from 'supertest';
import { asBytes, bearer } from './document-helpers.js';
import type { Session } from './sync-helpers.js';
import type { TestApp } from './test-app.js';

/** An invoice as the API gives it (the fields the tests read). */
export interface InvoiceBody {
  id: string;
  jobId: string;
  kind: 'quote' | 'invoice' | 'credit-note';
  status: 'draft' | 'issued';
  number: string | null;
  issueDate: string | null;
  dueDate: string | null;
  termDays: number;
  netMinor: number;
  vatMinor: number;
  grossMinor: number;
  pdfSha256: string | null;
  creditsInvoiceId: string | null;
  fromQuoteId: string | null;
  lines: Array<{ kind: string; description: string; quantity: string; unit: string | null; unitPriceMinor: number; vatRateCode: string; vatBasisPoints: number; netMinor: number; vatMinor: number; grossMinor: number; visitId: string | null; priceItemId: string | null; partUseIds: string[] }>;
  byRate: Array<{ basisPoints: number; netMinor: number; vatMinor: number }>;
  payments: Array<{ amountMinor: number; method: string; receivedOn: string; reference: string | null; refundMinor: number; refundedAt: string | null }>;
  account: { paidMinor: number; creditedMinor: number; refundedMinor: number; owedMinor: number; state: string; overdueDays: number } | null;
  warnings?: string[];
  leftOut?: string[];
  emailState: string | null;
}

/** A line as the office sends it. */
export const fixedLine = (description: string, unitPriceMinor: number, quantity: string | number = 1, vatRateCode = 'standard') => ({
  kind: 'fixed',
  description,
  quantity,
  unit: 'each',
  unitPriceMinor,
  vatRateCode,
});

/** A line as read back, in the shape the office sends it again. */
export const editable = ({ kind, description, quantity, unit, unitPriceMinor, vatRateCode, visitId, priceItemId }: InvoiceBody['lines'][number]) => ({
  kind, description, quantity, unit, unitPriceMinor, vatRateCode, visitId, priceItemId,
});

export async function draft(t: TestApp, s: Session, jobId: string, body: object): Promise<InvoiceBody> {
  return (await t.http.post(`/api/jobs/${jobId}/invoices`).set(bearer(s)).send(body).expect(201)).body;
}

/** A draft with these lines, issued. */
export async function issuedInvoice(t: TestApp, s: Session, jobId: string, lines: object[], kind: 'quote' | 'invoice' = 'invoice'): Promise<InvoiceBody> {
  const d = await draft(t, s, jobId, { kind, from: 'blank' });
  await t.http.patch(`/api/invoices/${d.id}`).set(bearer(s)).send({ lines }).expect(200);
  return (await t.http.post(`/api/invoices/${d.id}/issue`).set(bearer(s)).expect(200)).body;
}

export async function invoice(t: TestApp, s: Session, id: string): Promise<InvoiceBody> {
  return (await t.http.get(`/api/invoices/${id}`).set(bearer(s)).expect(200)).body;
}

export async function invoicePdf(t: TestApp, s: Session, id: string): Promise<{ bytes: Buffer; res: Response }> {
  const res = await t.http.get(`/api/invoices/${id}/pdf`).set(bearer(s)).buffer(true).parse(asBytes).expect(200);
  return { bytes: res.body as Buffer, res };
}
