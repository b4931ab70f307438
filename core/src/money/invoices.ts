import type { AgedDebtBucket, AgedDebtTotals } from './aged-debt.js';
import type { InvoiceState } from './invoice-standing.js';

/**
 * Quotes, invoices and credit notes as the API gives them and the app shows them: one description for both sides.
 * Amounts are pence; dates are calendar dates (YYYY-MM-DD) in the contractor's time zone.
 */
export const INVOICE_KINDS = ['quote', 'invoice', 'credit-note'] as const;
export type InvoiceKind = (typeof INVOICE_KINDS)[number];
export const INVOICE_NAMES: Readonly<Record<InvoiceKind, string>> = Object.freeze({ quote: 'Quote', invoice: 'Invoice', 'credit-note': 'Credit note' });

export const INVOICE_STATUSES = ['draft', 'issued'] as const;
export type InvoiceStatus = (typeof INVOICE_STATUSES)[number];

export const LINE_KINDS = ['labour', 'material', 'fixed'] as const;
export type LineKind = (typeof LINE_KINDS)[number];

/** Card payments come from the payment provider; the office records the others. */
export const PAYMENT_METHODS = ['card', 'cash', 'bank-transfer', 'cheque'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];
export const OFFICE_PAYMENT_METHODS = ['cash', 'bank-transfer', 'cheque'] as const satisfies readonly PaymentMethod[];
export type OfficePaymentMethod = (typeof OFFICE_PAYMENT_METHODS)[number];

/** How money goes back to a customer: by hand (cash, transfer, cheque), or to a card payment through the provider. */
export const REFUND_METHODS = ['cash', 'bank-transfer', 'cheque', 'card'] as const satisfies readonly PaymentMethod[];
export type RefundMethod = (typeof REFUND_METHODS)[number];

export type InvoiceEmailState = 'queued' | 'sent' | 'failed';

/** What every new quote and invoice starts with: the VAT number, days to pay, days a quote stands, and the wording. */
export interface BillingTerms {
  vatNumber: string | null;
  paymentTermsDays: number;
  quoteValidDays: number;
  paymentTerms: string | null;
  paymentInstructions: string | null;
}

/** A line as the office sends it: quantity an exact decimal, price before VAT. */
export interface InvoiceLineInput {
  kind: LineKind;
  description: string;
  quantity: string;
  unit: string | null;
  unitPriceMinor: number;
  vatRateCode: string;
  visitId?: string | null;
  priceItemId?: string | null;
  labourRateId?: string | null;
  /** The part uses (the visits' parts lists) a part line adds up: the same part use is invoiced once. */
  partUseIds?: string[] | null;
}

/** An issued invoice's money today: paid, credited, still owed. */
export interface InvoiceAccount {
  paidMinor: number;
  creditedMinor: number;
  /** Given back to the customer by the office (refunds made or being made); taken off what was paid. */
  refundedMinor: number;
  owedMinor: number;
  state: InvoiceState;
  overdueDays: number;
}

export interface InvoiceSummary {
  id: string;
  jobId: string;
  kind: InvoiceKind;
  status: InvoiceStatus;
  number: string | null;
  issueDate: string | null;
  dueDate: string | null;
  issuedAt: string | null;
  netMinor: number;
  vatMinor: number;
  grossMinor: number;
  creditsInvoiceId: string | null;
  /** The number of the invoice a credit note corrects. */
  creditsNumber: string | null;
  fromQuoteId: string | null;
  emailState: InvoiceEmailState | null;
  emailedTo: string | null;
  emailedAt: string | null;
  emailError: string | null;
  createdAt: string;
  job: { reference: string | null; title: string };
  /** Who it is for; their e-mail address is where it goes unless the office types another. */
  customer: { id: string; name: string; email: string | null } | null;
  /** An issued invoice's money; null for drafts, quotes and credit notes. */
  account: InvoiceAccount | null;
  /** A quote past the day it stood until. */
  lapsed: boolean;
}

export interface InvoiceLineView extends Required<InvoiceLineInput> {
  id: string;
  position: number;
  /** The rate as it was when the line was priced, in hundredths of a per cent. */
  vatBasisPoints: number;
  netMinor: number;
  vatMinor: number;
  grossMinor: number;
}

export interface PaymentView {
  id: string;
  amountMinor: number;
  method: PaymentMethod;
  receivedOn: string;
  reference: string | null;
  note: string | null;
  recordedById: string | null;
  createdAt: string;
  /** The part of a card payment going back to the card (it came for more than was owed by then); 0 otherwise. */
  refundMinor: number;
  /** When the provider confirmed that refund; null while it is still to be made. */
  refundedAt: string | null;
}

/** Money given back to the customer on an invoice. */
export interface RefundView {
  id: string;
  amountMinor: number;
  method: RefundMethod;
  /** The card payment it went back to. */
  paymentId: string | null;
  refundedOn: string;
  reference: string | null;
  note: string | null;
  /** A card refund is `pending` until the provider has made it; one the provider refused is `failed` and counts for nothing. */
  state: 'made' | 'pending' | 'failed';
  failure: string | null;
  recordedById: string | null;
  createdAt: string;
}

export interface InvoiceDetail extends InvoiceSummary {
  termDays: number;
  notes: string | null;
  vatNumber: string | null;
  terms: string | null;
  paymentInstructions: string | null;
  pdfSha256: string | null;
  pdfBytes: number | null;
  lines: InvoiceLineView[];
  byRate: Array<{ basisPoints: number; netMinor: number; vatMinor: number }>;
  payments: PaymentView[];
  refunds: RefundView[];
  credits: Array<{ id: string; number: string | null; status: InvoiceStatus; grossMinor: number; issueDate: string | null }>;
}

/** What a customer's link shows of the job's money. */
export interface SharedInvoiceList {
  cardPayments: boolean;
  items: Array<{
    id: string;
    kind: InvoiceKind;
    number: string;
    issueDate: string;
    dueDate: string;
    grossMinor: number;
    creditsNumber: string | null;
    owedMinor: number | null;
    state: InvoiceState | null;
    overdueDays: number;
    lapsed: boolean;
    payByCard: boolean;
    pdfUrl: string;
  }>;
}

export interface AgedDebtInvoice {
  id: string;
  number: string;
  jobId: string;
  jobReference: string | null;
  issueDate: string;
  dueDate: string;
  grossMinor: number;
  owedMinor: number;
  overdueDays: number;
  bucket: AgedDebtBucket;
  state: InvoiceState;
}

/** Who owes what on a day, and for how long. */
export interface AgedDebtReport {
  asOf: string;
  buckets: Array<{ key: AgedDebtBucket; label: string }>;
  totals: AgedDebtTotals;
  customers: Array<{ customerId: string | null; name: string; totals: AgedDebtTotals; oldestDays: number; invoices: AgedDebtInvoice[] }>;
  /** Money the contractor owes customers: invoices paid above what they now ask for (credited after payment), still to refund. */
  owedToCustomers: {
    totalMinor: number;
    customers: Array<{ customerId: string | null; name: string; totalMinor: number; invoices: OwedBackInvoice[] }>;
  };
}

/** An invoice with money to give back. */
export interface OwedBackInvoice {
  id: string;
  number: string;
  jobId: string;
  jobReference: string | null;
  grossMinor: number;
  paidMinor: number;
  creditedMinor: number;
  refundedMinor: number;
  toRefundMinor: number;
}
