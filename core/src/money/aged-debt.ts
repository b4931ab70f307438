/**
 * Dates on invoices and how long money has been owed. Dates are calendar dates ("2026-03-14") in the contractor's
 * own time zone, so an invoice due on the 14th is overdue from the 15th wherever the server runs.
 *
 * The aged-debt buckets (not yet due, 1–30, 31–60, 61–90 and over 90 days past the due date) are common
 * bookkeeping practice, not a published rule; the default of 30 days to pay is the period the Late Payment of
 * Commercial Debts (Interest) Act 1998, section 4, applies where no other is agreed (from memory).
 */

export class DateError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
    this.name = 'DateError';
  }
}

const DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const DAY_MS = 86_400_000;

/** The day number of a calendar date (days since 1970-01-01), refusing dates that do not exist. */
function dayNumber(date: string, field: string): number {
  const m = DATE.exec(date);
  const ms = m ? Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])) : NaN;
  if (!m || Number.isNaN(ms) || new Date(ms).toISOString().slice(0, 10) !== date) {
    throw new DateError(field, `must be a date written YYYY-MM-DD, got ${JSON.stringify(date)}`);
  }
  return ms / DAY_MS;
}

export function isCalendarDate(date: unknown): date is string {
  try {
    return typeof date === 'string' && Number.isFinite(dayNumber(date, 'date'));
  } catch {
    return false;
  }
}

/** The calendar date `days` after `date`: 2026-01-31 + 30 is 2026-03-02. */
export function addDays(date: string, days: number, field = 'date'): string {
  if (!Number.isInteger(days)) throw new DateError('days', `must be a whole number, got ${String(days)}`);
  return new Date((dayNumber(date, field) + days) * DAY_MS).toISOString().slice(0, 10);
}

/** Whole days from `from` to `to`; negative when `to` is earlier. */
export function daysBetween(from: string, to: string): number {
  return dayNumber(to, 'to') - dayNumber(from, 'from');
}

/** The calendar date an instant falls on in a time zone: 23:30 UTC on 31 March is 1 April in London's summer time. */
export function localDate(instant: Date | string, timeZone: string): string {
  const d = typeof instant === 'string' ? new Date(instant) : instant;
  if (Number.isNaN(d.getTime())) throw new DateError('instant', `must be a date and time, got ${JSON.stringify(instant)}`);
  // en-CA writes dates as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(d);
}

export const AGED_DEBT_BUCKETS = [
  { key: 'not-due', label: 'Not yet due', fromDays: Number.NEGATIVE_INFINITY, toDays: 0 },
  { key: '1-30', label: '1–30 days overdue', fromDays: 1, toDays: 30 },
  { key: '31-60', label: '31–60 days overdue', fromDays: 31, toDays: 60 },
  { key: '61-90', label: '61–90 days overdue', fromDays: 61, toDays: 90 },
  { key: 'over-90', label: 'Over 90 days overdue', fromDays: 91, toDays: Number.POSITIVE_INFINITY },
] as const;

export type AgedDebtBucket = (typeof AGED_DEBT_BUCKETS)[number]['key'];

/** Days past the due date on `asOf`: 0 on the due date itself and before it (nothing is late yet). */
export function daysOverdue(dueDate: string, asOf: string): number {
  return Math.max(0, daysBetween(dueDate, asOf));
}

/** Which bucket an amount due on `dueDate` falls in on `asOf`. */
export function agedDebtBucket(dueDate: string, asOf: string): AgedDebtBucket {
  const late = daysBetween(dueDate, asOf);
  return AGED_DEBT_BUCKETS.find((b) => late >= b.fromDays && late <= b.toDays)!.key;
}

export interface Debt {
  readonly owedMinor: number;
  readonly dueDate: string;
}

export type AgedDebtTotals = Record<AgedDebtBucket, number> & { total: number };

/** Adds up what is owed per bucket, in pence; debts of nothing or less (paid, or paid too much) are left out. */
export function agedDebtTotals(debts: readonly Debt[], asOf: string): AgedDebtTotals {
  const totals = Object.fromEntries(AGED_DEBT_BUCKETS.map((b) => [b.key, 0])) as Record<AgedDebtBucket, number>;
  let total = 0;
  for (const d of debts) {
    if (!Number.isSafeInteger(d.owedMinor)) throw new DateError('owedMinor', `must be a whole number of pence, got ${String(d.owedMinor)}`);
    if (d.owedMinor <= 0) continue;
    totals[agedDebtBucket(d.dueDate, asOf)] += d.owedMinor;
    total += d.owedMinor;
  }
  return { ...totals, total };
}
