import type { InvoiceDetail } from '../api/get-invoice';

export const JOB = '01900000-0000-7000-8000-000000000010';

/** A draft invoice as the API gives it, built from the demo job LED-0033: labour and one part. */
export const DRAFT: InvoiceDetail = {
  id: '01900000-0000-7000-8000-000000000030',
  jobId: JOB,
  kind: 'invoice',
  status: 'draft',
  number: null,
  issueDate: null,
  dueDate: null,
  issuedAt: null,
  netMinor: 9_750,
  vatMinor: 1_950,
  grossMinor: 11_700,
  creditsInvoiceId: null,
  creditsNumber: null,
  fromQuoteId: null,
  emailState: null,
  emailedTo: null,
  emailedAt: null,
  emailError: null,
  createdAt: '2026-03-14T10:00:00.000Z',
  job: { reference: 'LED-0033', title: 'Extra double socket in the front bedroom' },
  customer: { id: 'c1', name: 'Hannah Greaves', email: 'hannah.greaves@example.com' },
  account: null,
  lapsed: false,
  termDays: 30,
  notes: null,
  vatNumber: null,
  terms: null,
  paymentInstructions: null,
  pdfSha256: null,
  pdfBytes: null,
  lines: [
    {
      id: 'l1', position: 0, kind: 'labour', description: 'Labour on 8 Mar 2026: 1 h 40 min on site', quantity: '1.75', unit: 'h', unitPriceMinor: 5_200, vatRateCode: 'standard', vatBasisPoints: 2000,
      netMinor: 9_100, vatMinor: 1_820, grossMinor: 10_920, visitId: '01900000-0000-7000-8000-000000000040', priceItemId: null, labourRateId: null, partUseIds: [],
    },
    {
      id: 'l2', position: 1, kind: 'material', description: 'Twin switched socket-outlet, white', quantity: '1', unit: 'each', unitPriceMinor: 650, vatRateCode: 'standard', vatBasisPoints: 2000,
      netMinor: 650, vatMinor: 130, grossMinor: 780, visitId: null, priceItemId: 'p1', labourRateId: null, partUseIds: ['01900000-0000-7000-8000-000000000051'],
    },
  ],
  byRate: [{ basisPoints: 2000, netMinor: 9_750, vatMinor: 1_950 }],
  payments: [],
  refunds: [],
  credits: [],
};

export const VAT_RATES = {
  items: [
    { id: 'v1', code: 'standard', name: 'Standard rate', basisPoints: 2000, active: true },
    { id: 'v2', code: 'reduced', name: 'Reduced rate', basisPoints: 500, active: true },
    { id: 'v3', code: 'zero', name: 'Zero rate', basisPoints: 0, active: true },
  ],
};

export const PRICE_ITEMS = {
  items: [{ id: 'p9', name: 'Cat6 keystone jack', unit: 'each', category: 'Data', sellMinor: 420, vatRateCode: 'standard', active: true }],
};

export const LABOUR_RATES = { items: [{ id: 'r1', name: 'Electrician', hourlyMinor: 5_200, vatRateCode: 'standard', active: true, isDefault: true }] };
