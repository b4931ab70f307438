import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { r1r2Expected } from './expected-r1r2.js';
import { predictZs } from './predicted-zs.js';

describe('predictZs', () => {
  it('corrects a cold R1+R2 to 70 °C with ×1.20 and adds Ze', () => {
    // 20 m of 2.5/1.5: R1+R2 0.390 Ω at 20 °C, 0.468 Ω after ×1.20 (trade reference §1b test vector, D from IEC 60228:2004
    // Tables 1–2 and the OSG/GN3 70 °C multiplier 1.20, C2). Ze 0.35 Ω is the TN-C-S figure suppliers quote (M, from memory).
    const zs = predictZs({ zeOhm: 0.35, r1r2Ohm: 0.3902 });
    expect(zs.temperatureMultiplier).toBeCloseTo(1.2, 10);
    expect(zs.r1r2HotOhm).toBeCloseTo(0.46824, 5);
    expect(zs.zsOhm).toBeCloseTo(0.81824, 5);
    expect(zs.verdict).toBe('check');
  });

  it('judges against the full Table 41.3 value, as the prediction is already at operating temperature', () => {
    // B32 maximum Zs 1.37 Ω, BS 7671:2018+A2:2022 Table 41.3 (C1)
    const ok = predictZs({ zeOhm: 0.35, r1r2Ohm: 0.85, device: 'B', ratingA: 32 }); // 0.35 + 1.02 = 1.37
    expect(ok.zsOhm).toBeCloseTo(1.37, 10);
    expect(ok.verdict).toBe('pass');
    expect(ok.limit).toBe(1.37);
    expect(ok.source).toContain('Table 41.3');
    const over = predictZs({ zeOhm: 0.35, r1r2Ohm: 0.86, device: 'B', ratingA: 32 });
    expect(over.verdict).toBe('fail');
    expect(over.note).toMatch(/above the 1\.37 Ω maximum/);
  });

  it('C16 at 0.4 s is 1.37 Ω and D16 is 0.68 Ω', () => {
    // BS 7671:2018+A2:2022 Table 41.3, D from 0.95 × 230 / (10 × 16) and 0.95 × 230 / (20 × 16)
    expect(predictZs({ zeOhm: 0.8, r1r2Ohm: 0.4, device: 'C', ratingA: 16 }).verdict).toBe('pass'); // 1.28
    expect(predictZs({ zeOhm: 0.8, r1r2Ohm: 0.4, device: 'D', ratingA: 16 }).verdict).toBe('fail');
  });

  it('adds the Table 41.5 verdict where an RCD gives fault protection (a TT supply)', () => {
    // 30 mA: 1667 Ω, BS 7671:2018+A2:2022 Table 41.5 (50 V / IΔn, C1)
    const tt = predictZs({ zeOhm: 95, r1r2Ohm: 0.5, device: 'B', ratingA: 32, rcdRatedMa: 30 });
    expect(tt.findings.map((f) => [f.name, f.verdict])).toEqual([
      ['device', 'fail'],
      ['rcd', 'pass'],
    ]);
    expect(tt.findings[1]?.limit).toBe(1667);
    expect(tt.findings[1]?.source).toContain('Table 41.5');
    expect(tt.verdict).toBe('pass');
    expect(tt.note).toMatch(/rests on the RCD/);
    // 100 mA: 500 Ω (Table 41.5, C1)
    expect(predictZs({ zeOhm: 600, r1r2Ohm: 0.5, rcdRatedMa: 100 }).verdict).toBe('fail');
  });

  it('refuses nonsense', () => {
    expect(() => predictZs({ zeOhm: -1, r1r2Ohm: 0.4 })).toThrow(InvalidInputError);
    expect(() => predictZs({ zeOhm: Number.NaN, r1r2Ohm: 0.4 })).toThrow(/zeOhm/);
    expect(() => predictZs({ zeOhm: 0.35, r1r2Ohm: 0.4, conductorTempC: 10 })).toThrow(/conductorTempC/);
    expect(() => predictZs({ zeOhm: 0.35, r1r2Ohm: 0.4, device: 'B' })).toThrow(/ratingA/);
    expect(() => predictZs({ zeOhm: 0.35, r1r2Ohm: 0.4, device: 'B', ratingA: 33 })).toThrow(/Table 41.3/);
    expect(() => predictZs({ zeOhm: 0, r1r2Ohm: 0 })).toThrow(InvalidInputError);
  });

  it('rises with the length of the run and with the conductor temperature (property)', () => {
    const sizes = [
      [1.5, 1],
      [2.5, 1.5],
      [4, 1.5],
      [6, 2.5],
      [10, 4],
    ] as const;
    fc.assert(
      fc.property(
        fc.constantFrom(...sizes),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.integer({ min: 20, max: 89 }),
        fc.integer({ min: 1, max: 30 }),
        ([live, cpc], ze, length, extra, temp, warmer) => {
          const r1r2 = (lengthM: number) => r1r2Expected({ liveCsaMm2: live, cpcCsaMm2: cpc, lengthM }).expectedOhm;
          const short = predictZs({ zeOhm: ze, r1r2Ohm: r1r2(length), conductorTempC: temp }).zsOhm;
          const long = predictZs({ zeOhm: ze, r1r2Ohm: r1r2(length + extra), conductorTempC: temp }).zsOhm;
          const hot = predictZs({ zeOhm: ze, r1r2Ohm: r1r2(length), conductorTempC: temp + warmer }).zsOhm;
          expect(long).toBeGreaterThan(short);
          expect(hot).toBeGreaterThan(short);
        },
      ),
    );
  });
});
