import { assessCircuitTest } from '@wiretrail/core';
import { describe, expect, it } from 'vitest';
import { overallResult } from '../overall-result';

// The demo's ground-floor ring, a 32 A type B with a 30 mA RCD. Zs 1.25 Ω is above 0.8 × 1.37 = 1.10 Ω
// (BS 7671:2018+A2:2022 Table 41.3, B32; Appendix 3, 80 % rule for readings taken cold).
const ring = assessCircuitTest({
  circuit: { kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 },
  readings: { zsOhm: 1.25 },
});

describe("a circuit's overall result", () => {
  it('sums up a circuit: what fails and what is still to record', () => {
    const overall = overallResult(ring);
    expect(overall.verdict).toBe('fail');
    expect(overall.note).toMatch(/^Failing: Earth fault loop impedance Zs\. Still to record: /);
    expect(overall.note).toContain('Insulation resistance, live to earth');
  });
});
