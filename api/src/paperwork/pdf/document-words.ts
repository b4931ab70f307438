import type { CheckResult, CircuitTestLine, Verdict } from '@wiretrail/core';
import { INK } from './document-layout.js';

const STYLES = {
  date: { day: 'numeric', month: 'long', year: 'numeric' },
  shortDate: { day: 'numeric', month: 'short', year: 'numeric' },
  dateTime: { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' },
} as const satisfies Record<string, Intl.DateTimeFormatOptions>;

/** Dates on a document are the contractor's local dates: a sign-off at 00:30 belongs to that day where it happened. */
function when(style: keyof typeof STYLES) {
  return (iso: unknown, timeZone: string): string => {
    if (typeof iso !== 'string' && !(iso instanceof Date)) return '';
    const d = new Date(iso);
    return Number.isNaN(d.getTime()) ? '' : new Intl.DateTimeFormat('en-GB', { timeZone, ...STYLES[style] }).format(d);
  };
}

export const dateWords = when('date');
export const shortDateWords = when('shortDate');
export const dateTimeWords = when('dateTime');

export const VERDICT_WORDS: Record<Verdict, string> = { pass: 'Pass', fail: 'Fail', check: 'Check' };
export const VERDICT_INK: Record<Verdict, string> = { pass: INK.pass, fail: INK.fail, check: INK.check };

/** The given parts that are not empty, joined: an address from its lines, a name with its description. */
export const joined = (parts: unknown[], by = ', ') =>
  parts
    .map((p) => (typeof p === 'string' ? p.trim() : p === null || p === undefined ? '' : String(p)))
    .filter(Boolean)
    .join(by);

/** A figure as printed: to the precision the trade reads it to. */
export function figure(value: number, unit: string): string {
  const digits = unit === 'Ω' ? (value >= 100 ? 0 : 2) : unit === 'MΩ' ? (value >= 10 ? 0 : 1) : unit === 'ms' ? 0 : unit === 'm' ? 1 : 2;
  return `${value.toFixed(digits)}${unit ? ` ${unit}` : ''}`;
}

/** A reading as the technician entered it, with its unit. */
export function reading(value: unknown, unit: string): string {
  if (value === null || value === undefined || value === '') return '';
  return typeof value === 'number' ? `${value}${unit ? ` ${unit}` : ''}` : String(value);
}

/** What a test line's limit means, in words: most are maxima, insulation is a minimum, a ring compares readings. */
export function limitWords(line: CircuitTestLine): string {
  const r = line.result as CheckResult & { testVoltageV?: number; tabulatedMaxOhm?: number; minimumMs?: number | null };
  switch (line.key) {
    case 'ring-r1-rn':
      return r.limit === null ? '' : `r1 and rn within ${figure(r.limit, r.unit)}`;
    case 'ring-r2':
      return r.limit === null ? '' : `within ${figure(r.limit, r.unit)} of r1 × cpc/line ratio`;
    case 'r1r2':
      return r.limit === null ? 'a continuous reading' : `about ${figure(r.limit, r.unit)}, (r1 + r2) / 4`;
    case 'ir-live-live':
    case 'ir-live-earth':
      return r.limit === null ? '' : `≥ ${figure(r.limit, r.unit)}${r.testVoltageV ? ` at ${r.testVoltageV} V DC` : ''}`;
    case 'polarity':
      return 'correct';
    case 'zs':
      if (r.limit === null) return '';
      // A reading above the table itself is judged against the table, not its 80 %.
      return r.tabulatedMaxOhm && r.limit !== r.tabulatedMaxOhm ? `≤ ${figure(r.limit, r.unit)} (80 % of ${figure(r.tabulatedMaxOhm, r.unit)})` : `≤ ${figure(r.limit, r.unit)}`;
    case 'rcd-1x':
    case 'rcd-5x':
      if (r.limit === null) return '';
      return r.minimumMs ? `${r.minimumMs}–${figure(r.limit, r.unit)}` : `≤ ${figure(r.limit, r.unit)}`;
    case 'rcd-button':
    case 'afdd-button':
      return 'trips';
  }
}
