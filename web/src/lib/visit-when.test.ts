import { describe, expect, it } from 'vitest';
import { visitWhen } from './visit-when';

describe('visitWhen', () => {
  it('gives the day, date and time of a visit as the office reads them', () => {
    expect(visitWhen(new Date(2026, 11, 3, 9, 0).toISOString())).toBe('Thu 3 Dec, 09:00');
  });

  it('shows a dash for a visit with no time yet', () => {
    expect(visitWhen(null)).toBe('—');
    expect(visitWhen(undefined)).toBe('—');
  });
});
