import { describe, expect, it } from 'vitest';
import { addDays, agedDebtBucket, agedDebtTotals, DateError, daysBetween, daysOverdue, isCalendarDate, localDate } from './aged-debt.js';

// The buckets (not yet due, 1–30, 31–60, 61–90, over 90 days overdue) are common bookkeeping practice, not a
// published rule. The dates below are worked by hand from the calendar.

describe('calendar dates', () => {
  it('adds days across month and leap-year ends (Gregorian calendar: 2028 is a leap year, 2026 is not)', () => {
    expect(addDays('2026-01-31', 30)).toBe('2026-03-02');
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addDays('2026-02-28', 1)).toBe('2026-03-01');
    expect(addDays('2026-12-15', 30)).toBe('2027-01-14');
    expect(daysBetween('2026-03-01', '2026-02-01')).toBe(-28);
  });

  it('refuses dates that do not exist, naming the field', () => {
    expect(() => addDays('2026-02-30', 1, 'issueDate')).toThrow(DateError);
    expect(() => addDays('2026-02-30', 1, 'issueDate')).toThrow(/^issueDate: must be a date written YYYY-MM-DD/);
    expect(() => addDays('14/03/2026', 1)).toThrow(/YYYY-MM-DD/);
    expect(() => addDays('2026-03-14', 1.5)).toThrow(/whole number/);
    expect(isCalendarDate('2026-04-31')).toBe(false);
    expect(isCalendarDate('2026-04-30')).toBe(true);
  });

  it('takes the date where the contractor is: London is UTC+1 from the last Sunday of March (Summer Time Order 2002; from memory)', () => {
    expect(localDate('2026-03-31T23:30:00Z', 'Europe/London')).toBe('2026-04-01');
    expect(localDate('2026-01-31T23:30:00Z', 'Europe/London')).toBe('2026-01-31');
    expect(() => localDate('yesterday', 'Europe/London')).toThrow(DateError);
  });
});

describe('aged debt', () => {
  it('puts each day in the right bucket at every edge', () => {
    const due = '2026-03-14';
    const cases: Array<[asOf: string, bucket: string, late: number]> = [
      ['2026-02-01', 'not-due', 0],
      ['2026-03-14', 'not-due', 0], // due today: not late yet
      ['2026-03-15', '1-30', 1],
      ['2026-04-13', '1-30', 30],
      ['2026-04-14', '31-60', 31],
      ['2026-05-13', '31-60', 60],
      ['2026-05-14', '61-90', 61],
      ['2026-06-12', '61-90', 90],
      ['2026-06-13', 'over-90', 91],
      ['2027-03-14', 'over-90', 365],
    ];
    for (const [asOf, bucket, late] of cases) {
      expect([asOf, agedDebtBucket(due, asOf), daysOverdue(due, asOf)]).toEqual([asOf, bucket, late]);
    }
  });

  it('adds what is owed per bucket and leaves out what is paid or overpaid', () => {
    const asOf = '2026-06-30';
    const totals = agedDebtTotals(
      [
        { owedMinor: 12_000, dueDate: '2026-07-10' }, // not yet due
        { owedMinor: 30_050, dueDate: '2026-06-20' }, // 10 days
        { owedMinor: 4_500, dueDate: '2026-05-01' }, // 60 days
        { owedMinor: 1, dueDate: '2026-03-31' }, // 91 days
        { owedMinor: 0, dueDate: '2026-01-01' }, // paid
        { owedMinor: -2_000, dueDate: '2026-01-01' }, // paid twice: a refund, not a debt
      ],
      asOf,
    );
    expect(totals).toEqual({ 'not-due': 12_000, '1-30': 30_050, '31-60': 4_500, '61-90': 0, 'over-90': 1, total: 46_551 });
    expect(() => agedDebtTotals([{ owedMinor: 10.5, dueDate: '2026-01-01' }], asOf)).toThrow(/whole number of pence/);
  });
});
