import { describe, expect, it } from 'vitest';
import { refundWords } from '../invoice-words';

describe('refundWords', () => {
  it('says nothing of a payment with nothing to give back', () => {
    expect(refundWords({ refundMinor: 0, refundedAt: null })).toBe('');
  });

  it('says what goes back to the card, and whether it has gone', () => {
    expect(refundWords({ refundMinor: 10_000, refundedAt: null })).toBe('£100.00 above what was owed to go back to the card');
    expect(refundWords({ refundMinor: 10_000, refundedAt: '2026-12-05T12:00:00.000Z' })).toBe('£100.00 above what was owed refunded to the card');
  });
});
