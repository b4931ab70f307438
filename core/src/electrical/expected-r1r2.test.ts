import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { r1r2Expected } from './expected-r1r2.js';

describe('r1r2Expected', () => {
  it('gives 0.390 Ω for 20 m of 2.5/1.5 mm² at 20 °C', () => {
    // 19.51 mΩ/m (7.41 + 12.10, IEC 60228:2004 Tables 1–2, C1) × 20 m = 0.3902 Ω (trade reference §1b test vector, D)
    const e = r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20 });
    expect(e.perMetreMohm).toBeCloseTo(19.51, 10);
    expect(e.expectedOhm).toBeCloseTo(0.3902, 10);
    expect(e.verdict).toBe('check');
    expect(e.note).toMatch(/Expect about 0\.39 Ω/);
    expect(e.source).toContain('IEC 60228');
  });

  it('gives 0.468 Ω for the same run at 70 °C', () => {
    // ×1.20 from 20 °C to 70 °C (OSG / GN3 multiplier, C2): 0.468 Ω (trade reference §1b test vector, D)
    expect(r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, tempC: 70 }).expectedOhm).toBeCloseTo(0.46824, 5);
  });

  it('asks for a look at 5 Ω on 20 m of 2.5/1.5 mm², showing the expected figure', () => {
    const far = r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, measured: 5 });
    expect(far.verdict).toBe('check');
    expect(far.limit).toBe(0.39);
    expect(far.note).toMatch(/well above 0\.39 Ω expected for 20 m of 2\.5\/1\.5 mm²/);
    expect(far.source).toMatch(/common trade practice/);
  });

  it('passes a reading close to the cable’s own resistance', () => {
    // Band ±25 %, at least ±0.05 Ω: common trade practice, our own choice, no published tolerance
    expect(r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, measured: 0.42 }).verdict).toBe('pass');
    expect(r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, measured: 0.49 }).verdict).toBe('pass');
    expect(r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, measured: 0.5 }).verdict).toBe('check');
    expect(r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, measured: 0.2 }).note).toMatch(/well below/);
    // 2 m of 1.5/1.0: 30.20 mΩ/m (trade reference §1b, C1) → 0.06 Ω; the 0.05 Ω floor covers instrument resolution
    expect(r1r2Expected({ liveCsaMm2: 1.5, cpcCsaMm2: 1, lengthM: 2, measured: 0.1 }).verdict).toBe('pass');
  });

  it('refuses sizes and lengths that make no sense', () => {
    expect(() => r1r2Expected({ liveCsaMm2: 2.4, cpcCsaMm2: 1.5, lengthM: 20 })).toThrow(/IEC 60228/);
    expect(() => r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: -1 })).toThrow(InvalidInputError);
    expect(() => r1r2Expected({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, measured: -0.2 })).toThrow(/measured/);
  });
});
