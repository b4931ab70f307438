import { describe, expect, it } from 'vitest';
import { invoiceStanding, refundProblems, toRefundMinor } from './invoice-standing.js';

// What is owed is what the invoice asked for, less credit notes against it and payments received: plain
// arithmetic of our own; an invoice is overdue from the day after its due date.

const base = { grossMinor: 36_000, creditedMinor: 0, paidMinor: 0, dueDate: '2026-04-07', asOf: '2026-04-01' };

describe('invoiceStanding', () => {
  it('awaits payment until anything is paid, and is overdue the day after its due date', () => {
    expect(invoiceStanding(base)).toEqual({ owedMinor: 36_000, state: 'awaiting', overdueDays: 0 });
    expect(invoiceStanding({ ...base, asOf: '2026-04-07' }).overdueDays).toBe(0);
    expect(invoiceStanding({ ...base, asOf: '2026-04-08' }).overdueDays).toBe(1);
  });

  it('is part paid, then paid, as payments come in', () => {
    expect(invoiceStanding({ ...base, paidMinor: 10_000, asOf: '2026-04-20' })).toEqual({ owedMinor: 26_000, state: 'part-paid', overdueDays: 13 });
    expect(invoiceStanding({ ...base, paidMinor: 36_000, asOf: '2026-04-20' })).toEqual({ owedMinor: 0, state: 'paid', overdueDays: 0 });
  });

  it('owes less after a credit note, nothing once credited in full, and shows a refund due when paid as well', () => {
    expect(invoiceStanding({ ...base, creditedMinor: 6_000 }).owedMinor).toBe(30_000);
    expect(invoiceStanding({ ...base, creditedMinor: 6_000, paidMinor: 30_000 }).state).toBe('paid');
    expect(invoiceStanding({ ...base, creditedMinor: 36_000 })).toEqual({ owedMinor: 0, state: 'credited', overdueDays: 0 });
    expect(invoiceStanding({ ...base, creditedMinor: 6_000, paidMinor: 36_000 })).toEqual({ owedMinor: -6_000, state: 'overpaid', overdueDays: 0 });
  });

  it('is refunded once what came in above what it asks for has gone back, and still to refund until then', () => {
    // Part paid, then credited in full: all that was paid is owed back.
    const credited = { ...base, creditedMinor: 36_000, paidMinor: 5_000 };
    expect(invoiceStanding(credited)).toEqual({ owedMinor: -5_000, state: 'overpaid', overdueDays: 0 });
    expect(toRefundMinor(invoiceStanding(credited))).toBe(5_000);
    expect(invoiceStanding({ ...credited, refundedMinor: 2_000 })).toEqual({ owedMinor: -3_000, state: 'overpaid', overdueDays: 0 });
    expect(invoiceStanding({ ...credited, refundedMinor: 5_000 })).toEqual({ owedMinor: 0, state: 'refunded', overdueDays: 0 });
    expect(toRefundMinor(invoiceStanding({ ...credited, refundedMinor: 5_000 }))).toBe(0);
    // Paid in full, then part credited and the difference given back.
    expect(invoiceStanding({ ...base, paidMinor: 36_000, creditedMinor: 6_000, refundedMinor: 6_000 }).state).toBe('refunded');
  });

  it('refuses a refund of nothing, of more than is owed back, and of more than a card payment has left', () => {
    const r = { toRefundMinor: 5_000, invoiceNumber: 'INV-0007' };
    expect(refundProblems({ ...r, amountMinor: 5_000 })).toEqual([]);
    expect(refundProblems({ ...r, amountMinor: 0 })).toEqual(['amountMinor: a refund must be a whole number of pence, more than nothing.']);
    expect(refundProblems({ ...r, amountMinor: 5_001 })).toEqual(['amountMinor: £50.01 is more than the £50.00 owed back to the customer on INV-0007.']);
    expect(refundProblems({ ...r, toRefundMinor: 0, amountMinor: 100 })).toEqual(['amountMinor: nothing is owed back to the customer on INV-0007.']);
    expect(refundProblems({ ...r, amountMinor: 4_000, cardLeftMinor: 3_000 })).toEqual(['amountMinor: £40.00 is more than the £30.00 left of that card payment to give back.']);
  });

  it('refuses amounts that are not whole pence', () => {
    expect(() => invoiceStanding({ ...base, paidMinor: 0.5 })).toThrow(/paidMinor must be a whole number of pence/);
  });
});
