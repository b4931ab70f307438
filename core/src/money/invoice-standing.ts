import { daysOverdue } from './aged-debt.js';

/**
 * Where an issued invoice stands: what it asked for, less what credit notes took off and what has been paid.
 * Amounts are pence. A credit note's total is given as the (positive) amount it takes off.
 */
export type InvoiceState = 'awaiting' | 'part-paid' | 'paid' | 'credited' | 'overpaid';

export interface InvoiceStandingInput {
  readonly grossMinor: number;
  readonly creditedMinor: number;
  readonly paidMinor: number;
  readonly dueDate: string;
  readonly asOf: string;
}

export interface InvoiceStanding {
  /** Still to pay; negative when more came in than is owed (a refund is due). */
  readonly owedMinor: number;
  readonly state: InvoiceState;
  /** Days past the due date while something is owed; 0 otherwise. */
  readonly overdueDays: number;
}

export function invoiceStanding({ grossMinor, creditedMinor, paidMinor, dueDate, asOf }: InvoiceStandingInput): InvoiceStanding {
  for (const [field, v] of Object.entries({ grossMinor, creditedMinor, paidMinor })) {
    if (!Number.isSafeInteger(v)) throw new RangeError(`${field} must be a whole number of pence, got ${String(v)}`);
  }
  const payable = grossMinor - creditedMinor;
  const owedMinor = payable - paidMinor;
  const state: InvoiceState =
    owedMinor < 0 ? 'overpaid' : owedMinor === 0 ? (paidMinor === 0 && creditedMinor > 0 ? 'credited' : 'paid') : paidMinor > 0 ? 'part-paid' : 'awaiting';
  return { owedMinor, state, overdueDays: owedMinor > 0 ? daysOverdue(dueDate, asOf) : 0 };
}
