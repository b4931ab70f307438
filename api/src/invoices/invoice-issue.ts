import { BadRequestException, UnprocessableEntityException } from '@nestjs/common';
import { addDays, formatMoney, type InvoiceKind, localDate } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import { messageOf } from '../common/exception-message.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { takeNextNumber } from '../paperwork/document-numbers.js';
import { fingerprint } from '../paperwork/issued-pdf.js';
import { loadJobFile } from '../paperwork/job-file.js';
import { loadRateBook } from '../pricing/rate-book.js';
import type { FileStorage } from '../storage/file-storage.js';
import { documentKey } from '../storage/file-stores.js';
import { refuseBilledTwice } from './billed-work.js';
import { Invoice } from './entities/invoice.entity.js';
import { InvoiceLine } from './entities/invoice-line.entity.js';
import { type LineDraft, type PricedLine, priceLines } from './invoice-lines.js';
import { invoicePdf } from './pdf/invoice-pdf.js';

const PREFIX: Record<InvoiceKind, string> = { quote: 'QU', invoice: 'INV', 'credit-note': 'CN' };

/** Quotes and invoices ask for money; a credit note gives it back, so its quantities are negative. */
export const signOf = (kind: InvoiceKind): 1 | -1 => (kind === 'credit-note' ? -1 : 1);

export const draftOf = (l: InvoiceLine): LineDraft => ({
  kind: l.kind, description: l.description, quantity: l.quantity, unit: l.unit, unitPriceMinor: l.unitPriceMinor, vatRateCode: l.vatRateCode,
  visitId: l.visitId, priceItemId: l.priceItemId, labourRateId: l.labourRateId, partUseIds: l.partUseIds,
});

export function linesOf(em: EntityManager, invoiceId: string): Promise<InvoiceLine[]> {
  return em.find(InvoiceLine, { where: { invoiceId }, order: { position: 'ASC' } });
}

/** Replaces a draft's lines with these, in order, and its totals with theirs. */
export async function writeLines(em: EntityManager, invoice: Invoice, lines: PricedLine[]): Promise<InvoiceLine[]> {
  await em.delete(InvoiceLine, { invoiceId: invoice.id });
  Object.assign(invoice, {
    netMinor: lines.reduce((s, l) => s + l.netMinor, 0),
    vatMinor: lines.reduce((s, l) => s + l.vatMinor, 0),
    grossMinor: lines.reduce((s, l) => s + l.grossMinor, 0),
  });
  const rows = lines.map((l, position) =>
    em.create(InvoiceLine, {
      ...l,
      organisationId: invoice.organisationId,
      invoiceId: invoice.id,
      position,
      unit: l.unit ?? null,
      visitId: l.visitId ?? null,
      priceItemId: l.priceItemId ?? null,
      labourRateId: l.labourRateId ?? null,
      partUseIds: l.partUseIds?.length ? l.partUseIds : null,
    }),
  );
  return rows.length ? em.save(rows) : [];
}

/** A credit note's lines carry the VAT rates its invoice charged, by code; a code the invoice did not use is refused. */
export async function withCreditRates(em: EntityManager, invoice: Invoice, drafts: LineDraft[]): Promise<LineDraft[]> {
  if (invoice.kind !== 'credit-note' || !invoice.creditsInvoiceId) return drafts;
  const rates = new Map((await linesOf(em, invoice.creditsInvoiceId)).map((l) => [l.vatRateCode, l.vatBasisPoints]));
  const wrong = drafts.map((d, i) => (rates.has(d.vatRateCode) ? null : `lines[${i}].vatRateCode must be a rate the invoice charged: ${[...rates.keys()].join(', ')}.`));
  if (wrong.some(Boolean)) throw new BadRequestException(wrong.filter(Boolean));
  return drafts.map((d) => ({ ...d, vatBasisPoints: rates.get(d.vatRateCode)! }));
}

export interface NewDraft {
  organisationId: string;
  jobId: string;
  kind: InvoiceKind;
  createdById: string;
  drafts: LineDraft[];
  termDays: number;
  fromQuoteId?: string | null;
  creditsInvoiceId?: string | null;
}

/** A new draft with its lines priced at the organisation's rates (a credit note's at its invoice's). */
export async function saveDraft(em: EntityManager, d: NewDraft): Promise<Invoice> {
  const invoice = await em.save(
    em.create(Invoice, {
      organisationId: d.organisationId,
      jobId: d.jobId,
      kind: d.kind,
      status: 'draft',
      fromQuoteId: d.fromQuoteId ?? null,
      creditsInvoiceId: d.creditsInvoiceId ?? null,
      termDays: d.termDays,
      createdById: d.createdById,
    }),
  );
  const { lines } = priceLines(await withCreditRates(em, invoice, d.drafts), await loadRateBook(em, d.organisationId), signOf(d.kind));
  await writeLines(em, invoice, lines);
  return em.save(invoice);
}

export interface Issuing {
  invoice: Invoice;
  issuer: { id: string; name: string };
  now: Date;
  storage: FileStorage;
  /** Whether the customer's link offers card payment, which the PDF then mentions. */
  cardPayments: boolean;
}

/**
 * Issues a draft inside the caller's transaction: every refusal first (422, all reasons at once), then the next
 * number, the dates in the organisation's time zone, the lines re-priced at the VAT rates in force on the day of
 * issue (the tax point; a credit note keeps its invoice's), the organisation's VAT number and terms as they stand,
 * and the PDF, stored with its SHA-256. A refusal or a failure rolls the number back with everything else.
 */
export async function issueDraft(em: EntityManager, { invoice, issuer, now, storage, cardPayments }: Issuing): Promise<void> {
  const org = await em.findOneByOrFail(Organisation, { id: invoice.organisationId });
  const stored = await linesOf(em, invoice.id);
  if (!stored.length) throw new UnprocessableEntityException(['Add at least one line before issuing.']);
  await refuseBilledTwice(em, invoice, stored, org.timeZone);
  let priced: PricedLine[];
  try {
    priced = priceLines(await withCreditRates(em, invoice, stored.map(draftOf)), await loadRateBook(em, org.id), signOf(invoice.kind)).lines;
  } catch (err) {
    if (err instanceof BadRequestException) throw new UnprocessableEntityException(messageOf(err));
    throw err;
  }
  const gross = priced.reduce((s, l) => s + l.grossMinor, 0);
  const vat = priced.reduce((s, l) => s + l.vatMinor, 0);
  const problems: string[] = [];
  if (invoice.kind !== 'credit-note' && gross <= 0) problems.push('The total must be more than nothing.');
  if (!org.vatNumber && vat !== 0) {
    problems.push(`${org.name} has no VAT number, so it cannot charge VAT: put the lines at a 0 % rate, or add the VAT number under Price list, Terms.`);
  }
  const credits = invoice.creditsInvoiceId ? await em.findOneByOrFail(Invoice, { id: invoice.creditsInvoiceId, organisationId: org.id }) : null;
  if (credits) {
    const before = await em.find(Invoice, { where: { creditsInvoiceId: credits.id, kind: 'credit-note', status: 'issued' } });
    const left = credits.grossMinor + before.reduce((s, c) => s + c.grossMinor, 0);
    if (-gross > left) problems.push(`This credit note would take back ${formatMoney(-gross)}, more than the ${formatMoney(left)} of ${credits.number} left to credit.`);
  }
  if (problems.length) throw new UnprocessableEntityException(problems);

  const issueDate = localDate(now, org.timeZone);
  const number = await takeNextNumber(em, org.id, invoice.kind, PREFIX[invoice.kind]);
  Object.assign(invoice, {
    status: 'issued',
    number,
    issueDate,
    dueDate: addDays(issueDate, invoice.kind === 'credit-note' ? 0 : invoice.termDays),
    issuedAt: now,
    issuedById: issuer.id,
    vatNumber: org.vatNumber,
    terms: org.paymentTerms,
    paymentInstructions: invoice.kind === 'invoice' ? org.paymentInstructions : null,
  });
  const lines = await writeLines(em, invoice, priced);
  const pdf = await invoicePdf({
    issue: { number, issuedAt: now, issuedBy: issuer.name },
    file: await loadJobFile(em, org.id, invoice.jobId),
    invoice,
    lines,
    credits,
    cardPayments,
  });
  await storage.put(documentKey(org.id, invoice.id), pdf, 'application/pdf');
  Object.assign(invoice, { pdfSha256: fingerprint(pdf), pdfBytes: pdf.length });
  await em.save(invoice);
}
