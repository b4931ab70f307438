import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { voltageDrop } from './voltage-drop.js';

describe('voltageDrop: tabulated mV/A/m', () => {
  // BS 7671:2018+A2:2022 Appendix 4 Table 4D5, 70 °C thermoplastic flat twin and earth (C2; 2.5 mm² = 18 is C1)
  it.each([
    [1.0, 44],
    [1.5, 29],
    [2.5, 18],
    [4, 11],
    [6, 7.3],
    [10, 4.4],
    [16, 2.8],
  ])('%s mm² is %s mV/A/m (BS 7671:2018+A2:2022 Table 4D5)', (csaMm2, mv) => {
    expect(voltageDrop({ csaMm2, currentA: 1, lengthM: 1, use: 'other' }).mvPerAPerM).toBe(mv);
  });

  it('uses the printed 7.3 mV/A/m for 6 mm², not the 7.39 a resistance calculation gives', () => {
    // BS 7671:2018+A2:2022 Table 4D5 prints 7.3; 2 × 3.08 × 1.2 = 7.39 would be derived, and is not used
    expect(voltageDrop({ csaMm2: 6, currentA: 10, lengthM: 10, use: 'other' }).volts).toBeCloseTo(0.73, 10);
  });
});

describe('voltageDrop: worked runs of flat twin and earth', () => {
  it('6 A on 1.5 mm² over 30 m drops 5.22 V (2.27 %): within 3 % for lighting', () => {
    // D: derived by 29 mV/A/m (Table 4D5) × 6 A × 30 m / 1000; 3 % lighting limit, BS 7671:2018+A2:2022 Appendix 4 §6.4 Table 4Ab (C1)
    const result = voltageDrop({ csaMm2: 1.5, currentA: 6, lengthM: 30, use: 'lighting' });
    expect(result.volts).toBeCloseTo(5.22, 10);
    expect(result.percent).toBeCloseTo(2.27, 2);
    expect(result).toMatchObject({ verdict: 'pass', limit: 3, unit: '%' });
    expect(result.limitVolts).toBeCloseTo(6.9, 10);
    expect(result.source).toMatch(/Table 4D5/);
    expect(result.source).toMatch(/Table 4Ab/);
  });

  it('13.04 A on 2.5 mm² over 25 m drops 5.87 V (2.55 %): within 5 % for other uses', () => {
    // D: derived by 18 mV/A/m (Table 4D5) × 13.04 A × 25 m / 1000; 5 % limit, Appendix 4 §6.4 Table 4Ab (C1)
    const result = voltageDrop({ csaMm2: 2.5, currentA: 13.04, lengthM: 25, use: 'other' });
    expect(result.volts).toBeCloseTo(5.868, 10);
    expect(result.percent).toBeCloseTo(2.55, 2);
    expect(result.verdict).toBe('pass');
  });

  it('32 A on 4 mm² over 30 m drops 10.56 V (4.59 %): passes for other uses, fails for lighting', () => {
    // D: derived by 11 mV/A/m (Table 4D5) × 32 A × 30 m / 1000; 3 % / 5 % limits, Appendix 4 §6.4 Table 4Ab (C1)
    const other = voltageDrop({ csaMm2: 4, currentA: 32, lengthM: 30, use: 'other' });
    expect(other.volts).toBeCloseTo(10.56, 10);
    expect(other.percent).toBeCloseTo(4.59, 2);
    expect(other.verdict).toBe('pass');
    expect(other.limitVolts).toBeCloseTo(11.5, 10);
    expect(voltageDrop({ csaMm2: 4, currentA: 32, lengthM: 30, use: 'lighting' }).verdict).toBe('fail');
  });

  it('passes a run sized exactly to the limit', () => {
    // 5 % of 230 V = 11.5 V (Appendix 4 §6.4 Table 4Ab, C1): 18 mV/A/m (Table 4D5) × 20 A × L = 11.5 V gives L = 31.944 m (D)
    expect(voltageDrop({ csaMm2: 2.5, currentA: 20, lengthM: 11500 / 360, use: 'other' }).verdict).toBe('pass');
  });

  it('grows in proportion to length and current (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(1, 1.5, 2.5, 4, 6, 10, 16),
        fc.double({ min: 0.1, max: 63, noNaN: true }),
        fc.double({ min: 0.1, max: 200, noNaN: true }),
        (csaMm2, currentA, lengthM) => {
          const once = voltageDrop({ csaMm2, currentA, lengthM, use: 'other' }).volts;
          const twice = voltageDrop({ csaMm2, currentA, lengthM: lengthM * 2, use: 'other' }).volts;
          expect(twice).toBeCloseTo(once * 2, 9);
        },
      ),
    );
  });
});

describe('bad voltage-drop inputs', () => {
  it('throw, never return a number', () => {
    const ok = { csaMm2: 2.5, currentA: 10, lengthM: 10, use: 'other' } as const;
    expect(() => voltageDrop({ ...ok, lengthM: -1 })).toThrow(InvalidInputError);
    expect(() => voltageDrop({ ...ok, lengthM: Number.NaN })).toThrow(/lengthM/);
    expect(() => voltageDrop({ ...ok, currentA: Number.POSITIVE_INFINITY })).toThrow(/currentA/);
    expect(() => voltageDrop({ ...ok, csaMm2: 0 })).toThrow(/csaMm2/);
    expect(() => voltageDrop({ ...ok, csaMm2: 25 })).toThrow(/csaMm2: 25 is not listed/);
    expect(() => voltageDrop({ ...ok, nominalV: 0 })).toThrow(/nominalV/);
    expect(() => voltageDrop({ ...ok, use: 'heating' as 'other' })).toThrow(/use/);
  });
});
