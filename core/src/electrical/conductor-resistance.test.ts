import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { r1r2ForRun, r1r2PerMetre, resistancePerMetre, temperatureMultiplier } from './conductor-resistance.js';

const SIZES = [1, 1.5, 2.5, 4, 6, 10, 16];

describe('resistancePerMetre at 20 °C', () => {
  // IEC 60228:2004 Tables 1 and 2, plain copper class 1/2 maxima at 20 °C (C1), used by the IET On-Site Guide and GN3
  it.each([
    [1.0, 18.1],
    [1.5, 12.1],
    [2.5, 7.41],
    [4, 4.61],
    [6, 3.08],
    [10, 1.83],
    [16, 1.15],
  ])('%s mm² is %s mΩ/m (IEC 60228:2004 Tables 1–2, C1)', (csa, expected) => {
    expect(resistancePerMetre(csa)).toBeCloseTo(expected, 10);
    expect(resistancePerMetre(csa, 20)).toBeCloseTo(expected, 10);
  });
});

describe('temperature correction (α = 0.004 /K)', () => {
  it('multiplies by 1.20 from 20 °C to 70 °C', () => {
    // IET On-Site Guide / GN3 multiplier for 70 °C thermoplastic (C2); derived by 1 + 0.004 × 50
    expect(temperatureMultiplier(70)).toBeCloseTo(1.2, 12);
    // IEC 60228:2004 Table 1 2.5 mm² 7.41 mΩ/m × 1.20; derived
    expect(resistancePerMetre(2.5, 70)).toBeCloseTo(8.892, 10);
  });

  it('multiplies by 1.28 from 20 °C to 90 °C', () => {
    // IET On-Site Guide / GN3 multiplier for 90 °C thermosetting (C2); derived by 1 + 0.004 × 70
    expect(temperatureMultiplier(90)).toBeCloseTo(1.28, 12);
  });

  it('matches the IEC 60228 correction factor 250 / (230 + t)', () => {
    // IEC 60228 correction factors (C2): R20 = Rt × 250 / (230 + t), so Rt / R20 = (230 + t) / 250 = 1 + 0.004 (t − 20)
    for (const t of [0, 10, 25, 30, 40]) {
      expect(temperatureMultiplier(t)).toBeCloseTo((230 + t) / 250, 12);
    }
  });

  it('rises with temperature for every size (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...SIZES),
        // Tenths of a degree: readings are never finer, and it keeps the two temperatures distinguishable.
        fc.integer({ min: -400, max: 2500 }),
        fc.integer({ min: -400, max: 2500 }),
        (csa, d1, d2) => {
          fc.pre(d1 !== d2);
          const [low, high] = d1 < d2 ? [d1 / 10, d2 / 10] : [d2 / 10, d1 / 10];
          expect(resistancePerMetre(csa, high)).toBeGreaterThan(resistancePerMetre(csa, low));
        },
      ),
    );
  });
});

describe('r1r2PerMetre', () => {
  // Sums of IEC 60228:2004 Tables 1–2 values: C1 where seen published as R1+R2 per metre, D (derived by adding the two) where marked
  it.each([
    [1.0, 1.0, 36.2, 'C1'],
    [1.5, 1.0, 30.2, 'C1'],
    [1.5, 1.5, 24.2, 'D: derived by 12.10 + 12.10'],
    [2.5, 1.0, 25.51, 'D: derived by 7.41 + 18.10'],
    [2.5, 1.5, 19.51, 'C1'],
    [2.5, 2.5, 14.82, 'D: derived by 7.41 + 7.41'],
    [4, 1.5, 16.71, 'C1'],
    [4, 2.5, 12.02, 'D: derived by 4.61 + 7.41'],
    [6, 2.5, 10.49, 'C1'],
    [6, 4, 7.69, 'D: derived by 3.08 + 4.61'],
    [10, 4, 6.44, 'C1'],
    [16, 6, 4.23, 'C1'],
  ])('%s/%s mm² is %s mΩ/m at 20 °C (IEC 60228:2004, %s)', (live, cpc, expected) => {
    expect(r1r2PerMetre(live, cpc)).toBeCloseTo(expected, 10);
  });

  // IEC 60228:2004 sums × 1.20 (IET On-Site Guide / GN3 70 °C multiplier, C2), rounded to 0.01 as published
  it.each([
    [1.0, 1.0, 43.44],
    [1.5, 1.0, 36.24],
    [1.5, 1.5, 29.04],
    [2.5, 1.0, 30.61],
    [2.5, 1.5, 23.41],
    [2.5, 2.5, 17.78],
    [4, 1.5, 20.05],
    [4, 2.5, 14.42],
    [6, 2.5, 12.59],
    [6, 4, 9.23],
    [10, 4, 7.73],
    [16, 6, 5.08],
  ])('%s/%s mm² is %s mΩ/m at 70 °C (×1.20, OSG/GN3 multiplier)', (live, cpc, expected) => {
    expect(r1r2PerMetre(live, cpc, 70)).toBeCloseTo(expected, 2);
  });
});

describe('r1r2ForRun', () => {
  it('gives 0.390 Ω for 20 m of 2.5/1.5 at 20 °C and 0.468 Ω at 70 °C', () => {
    // D: derived by 19.51 mΩ/m (IEC 60228:2004) × 20 m, then × 1.20 (OSG/GN3 multiplier)
    expect(r1r2ForRun({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20 })).toBeCloseTo(0.3902, 10);
    expect(r1r2ForRun({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20, tempC: 70 })).toBeCloseTo(0.468, 3);
  });
});

describe('bad inputs throw, never return a number', () => {
  it.each([
    ['0 mm²', () => resistancePerMetre(0), /csaMm2/],
    ['negative cross-section', () => resistancePerMetre(-2.5), /csaMm2/],
    ['NaN cross-section', () => resistancePerMetre(Number.NaN), /csaMm2/],
    ['infinite cross-section', () => resistancePerMetre(Number.POSITIVE_INFINITY), /csaMm2/],
    ['a size not in the table', () => resistancePerMetre(3), /csaMm2: 3 is not listed/],
    ['NaN temperature', () => resistancePerMetre(2.5, Number.NaN), /tempC/],
    ['below absolute zero', () => resistancePerMetre(2.5, -300), /tempC/],
    ['an unknown cpc size', () => r1r2PerMetre(2.5, 1.25), /csaMm2/],
    ['a negative run length', () => r1r2ForRun({ liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: -1 }), /lengthM/],
  ])('%s', (_label, call, message) => {
    expect(call).toThrow(InvalidInputError);
    expect(call).toThrow(message);
  });
});
