import { describe, expect, it } from '@jest/globals';
import { assessCircuitTest, type CircuitTestLine } from '@wiretrail/core';
import { limitWords } from './document-words.js';

// A type B 32 A ring on a 30 mA RCD; only its Zs line is read here.
const B32 = { kind: 'ring', deviceType: 'B', deviceRatingA: 32, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
const zsLine = (zsOhm: number): CircuitTestLine => assessCircuitTest({ circuit: B32, readings: { zsOhm } }).lines.find((l) => l.key === 'zs')!;

describe('the printed limit of a Zs', () => {
  it('names the 80 % of the table a reading is held to', () => {
    // BS 7671:2018+A2:2022 Table 41.3, B32 1.37 Ω (C1); × 0.8, Appendix 3 (trade practice): 1.10 Ω
    expect(limitWords(zsLine(1.25))).toBe('≤ 1.10 Ω (80 % of 1.37 Ω)');
  });

  it('prints the table maximum alone for a reading above the table itself', () => {
    // BS 7671:2018+A2:2022 Table 41.3, B32 1.37 Ω (C1): 1.45 Ω is above the table, not only its 80 %
    expect(limitWords(zsLine(1.45))).toBe('≤ 1.37 Ω');
  });
});
