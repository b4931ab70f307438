import { describe, expect, it } from 'vitest';
import { invoiceStanding } from './invoice-standing.js';

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

  it('refuses amounts that are not whole pence', () => {
    expect(() => invoiceStanding({ ...base, paidMinor: 0.5 })).toThrow(/paidMinor must be a whole number of pence/);
  });
});
