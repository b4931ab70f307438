import { describe, expect, it } from 'vitest';
import { addDays, dayKey, timeOf, toInstant, weekStart } from '../components/week';

describe('schedule weeks', () => {
  it('starts weeks on Monday', () => {
    expect(dayKey(weekStart(new Date('2026-12-02T15:00:00Z')))).toBe('2026-11-30');
    expect(dayKey(weekStart(new Date('2026-12-06T23:59:00Z')))).toBe('2026-11-30');
    expect(dayKey(weekStart(new Date('2026-12-07T00:00:00Z')))).toBe('2026-12-07');
  });

  it('moves by days and reads times', () => {
    expect(dayKey(addDays(new Date('2026-12-30T00:00:00Z'), 3))).toBe('2027-01-02');
    expect(toInstant('2026-12-03', '08:30')).toBe('2026-12-03T08:30:00.000Z');
    expect(timeOf('2026-12-03T08:30:00.000Z')).toBe('08:30');
    expect(timeOf(null)).toBe('');
  });
});
