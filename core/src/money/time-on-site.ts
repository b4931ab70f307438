import { MoneyError } from './vat.js';

/**
 * Labour on an invoice from the times on site the technician recorded at sign-off: arrival to departure, rounded
 * to the nearest quarter of an hour (at least one quarter), times the people on the visit. Billing in quarter
 * hours is our own rule, common in the trade rather than published; the office can still edit the line.
 */
export const LABOUR_ROUNDING_MINUTES = 15;

export interface TimeOnSite {
  /** As recorded, in whole minutes. */
  readonly minutes: number;
  /** Rounded to the quarter hour, in minutes. */
  readonly billedMinutes: number;
  /** Hours to bill, people included, as an exact decimal quantity: "1.75". */
  readonly quantity: string;
}

export function timeOnSite(arrival: string, departure: string, people = 1): TimeOnSite {
  const start = Date.parse(arrival);
  const end = Date.parse(departure);
  if (Number.isNaN(start)) throw new MoneyError('actualStart', `must be a date and time, got ${JSON.stringify(arrival)}`);
  if (Number.isNaN(end)) throw new MoneyError('actualEnd', `must be a date and time, got ${JSON.stringify(departure)}`);
  if (end <= start) throw new MoneyError('actualEnd', 'must be after the arrival');
  if (!Number.isInteger(people) || people < 1 || people > 50) throw new MoneyError('people', `must be a whole number from 1 to 50, got ${String(people)}`);
  const minutes = Math.round((end - start) / 60_000);
  const quarters = Math.max(1, Math.round(minutes / LABOUR_ROUNDING_MINUTES));
  const billedMinutes = quarters * LABOUR_ROUNDING_MINUTES;
  // Quarters of an hour × people, written with two decimals exactly (25 hundredths a quarter).
  const hundredths = quarters * people * 25;
  const quantity = `${Math.trunc(hundredths / 100)}.${String(hundredths % 100).padStart(2, '0')}`.replace(/\.00$/, '').replace(/(\.\d)0$/, '$1');
  return { minutes, billedMinutes, quantity };
}

/** "1 h 40 min" for a line's description. */
export function durationWords(minutes: number): string {
  const h = Math.trunc(minutes / 60);
  const m = minutes % 60;
  return [h ? `${h} h` : '', m ? `${m} min` : ''].filter(Boolean).join(' ') || '0 min';
}
