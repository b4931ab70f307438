import { describe, expect, it } from 'vitest';
import { durationWords, timeOnSite } from './time-on-site.js';
import { MoneyError } from './vat.js';

// Billing time on site in quarter hours, to the nearest quarter with at least one, is our own rule (common
// practice in the trade, not a published source). Figures worked by hand.

describe('timeOnSite', () => {
  it('bills arrival to departure to the nearest quarter hour: 09:10–10:50 is 1 h 40 min, billed as 1.75 h', () => {
    expect(timeOnSite('2026-03-08T09:10:00Z', '2026-03-08T10:50:00Z')).toEqual({ minutes: 100, billedMinutes: 105, quantity: '1.75' });
  });

  it('rounds 7 minutes down and 8 minutes up (7.5 is the half-way point of a quarter)', () => {
    expect(timeOnSite('2026-03-08T09:00:00Z', '2026-03-08T10:07:00Z').quantity).toBe('1');
    expect(timeOnSite('2026-03-08T09:00:00Z', '2026-03-08T10:08:00Z').quantity).toBe('1.25');
  });

  it('bills at least a quarter hour, and multiplies by the people on the visit', () => {
    expect(timeOnSite('2026-03-08T09:00:00Z', '2026-03-08T09:03:00Z')).toMatchObject({ minutes: 3, billedMinutes: 15, quantity: '0.25' });
    expect(timeOnSite('2026-03-08T08:30:00Z', '2026-03-08T12:20:00Z', 2)).toMatchObject({ minutes: 230, billedMinutes: 225, quantity: '7.5' });
  });

  it('refuses a departure before the arrival, naming the field', () => {
    expect(() => timeOnSite('2026-03-08T10:00:00Z', '2026-03-08T09:00:00Z')).toThrow(MoneyError);
    expect(() => timeOnSite('2026-03-08T10:00:00Z', '2026-03-08T09:00:00Z')).toThrow(/^actualEnd: must be after the arrival/);
    expect(() => timeOnSite('soon', '2026-03-08T09:00:00Z')).toThrow(/^actualStart/);
    expect(() => timeOnSite('2026-03-08T08:00:00Z', '2026-03-08T09:00:00Z', 0)).toThrow(/^people/);
  });

  it('says how long in words', () => {
    expect(durationWords(100)).toBe('1 h 40 min');
    expect(durationWords(60)).toBe('1 h');
    expect(durationWords(45)).toBe('45 min');
  });
});
