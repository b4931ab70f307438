import { describe, expect, it } from '@jest/globals';
import { nextReference } from './jobs.service.js';

describe('the next job reference', () => {
  it('follows the newest numbered series, one past its highest number, padded as it is', () => {
    expect(nextReference(['LED-0045', 'LED-0044', 'LED-0042'])).toBe('LED-0046');
    expect(nextReference(['LED-0041', 'LED-0045', 'Old job'])).toBe('LED-0046');
    expect(nextReference(['2026/099', '2026/100'])).toBe('2026/101');
    expect(nextReference(['LED-9999'])).toBe('LED-10000');
    // One reference typed by hand does not start a series of its own
    expect(nextReference(['EV-SURVEY-1', 'LED-0046', 'LED-0045'])).toBe('LED-0047');
  });

  it('starts a series where there is none', () => {
    expect(nextReference([])).toBe('J-0001');
    expect(nextReference(['Smith kitchen'])).toBe('J-0001');
  });
});
