import { daysOverdue } from './aged-debt.js';
import { formatMoney } from './vat.js';

/**
 * Where an issued invoice stands: what it asked for, less what credit notes took off and what has been paid, plus
 * what the office has given back. Amounts are pence. A credit note's total is given as the (positive) amount it
 * takes off. `refunded` is an invoice settled by giving money back (paid, then credited, then refunded).
 */
export type InvoiceState = 'awaiting' | 'part-paid' | 'paid' | 'credited' | 'overpaid' | 'refunded';

export interface InvoiceStandingInput {
  readonly grossMinor: number;
  readonly creditedMinor: number;
  readonly paidMinor: number;
  /** Given back to the customer by the office (cash, transfer, cheque or to the card); none when left out. */
  readonly refundedMinor?: number;
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

export function invoiceStanding({ grossMinor, creditedMinor, paidMinor, refundedMinor = 0, dueDate, asOf }: InvoiceStandingInput): InvoiceStanding {
  for (const [field, v] of Object.entries({ grossMinor, creditedMinor, paidMinor, refundedMinor })) {
    if (!Number.isSafeInteger(v)) throw new RangeError(`${field} must be a whole number of pence, got ${String(v)}`);
  }
  const payable = grossMinor - creditedMinor;
  const kept = paidMinor - refundedMinor;
  const owedMinor = payable - kept;
  const state: InvoiceState =
    owedMinor < 0
      ? 'overpaid'
      : owedMinor === 0
        ? refundedMinor > 0
          ? 'refunded'
          : paidMinor === 0 && creditedMinor > 0
            ? 'credited'
            : 'paid'
        : kept > 0
          ? 'part-paid'
          : 'awaiting';
  return { owedMinor, state, overdueDays: owedMinor > 0 ? daysOverdue(dueDate, asOf) : 0 };
}

/** What the customer is owed back on an invoice: what came in above what it now asks for. */
export function toRefundMinor(standing: Pick<InvoiceStanding, 'owedMinor'>): number {
  return Math.max(0, -standing.owedMinor);
}

/**
 * Why a refund cannot be recorded as asked, in the office's words (empty when it can): more than nothing, never more
 * than the customer is owed on the invoice, and back to a card never more than that card payment has left to give.
 * The office's form and the server ask the same question.
 */
export function refundProblems(r: { amountMinor: number; toRefundMinor: number; invoiceNumber: string; cardLeftMinor?: number }): string[] {
  if (!Number.isSafeInteger(r.amountMinor) || r.amountMinor <= 0) return ['amountMinor: a refund must be a whole number of pence, more than nothing.'];
  if (r.toRefundMinor <= 0) return [`amountMinor: nothing is owed back to the customer on ${r.invoiceNumber}.`];
  const problems: string[] = [];
  if (r.amountMinor > r.toRefundMinor) {
    problems.push(`amountMinor: ${formatMoney(r.amountMinor)} is more than the ${formatMoney(r.toRefundMinor)} owed back to the customer on ${r.invoiceNumber}.`);
  }
  if (r.cardLeftMinor !== undefined && r.amountMinor > r.cardLeftMinor) {
    problems.push(`amountMinor: ${formatMoney(r.amountMinor)} is more than the ${formatMoney(Math.max(0, r.cardLeftMinor))} left of that card payment to give back.`);
  }
  return problems;
}
