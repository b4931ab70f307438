import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { checkAgainstExtension, checkRing, crossConnectedReading, extendRing } from './ring-final-circuit.js';

// The 50 m ring of 2.5/1.5 mm² twin and earth: D, derived by 50 m × 7.41 and 12.10 mΩ/m (IEC 60228:2004 Tables 1–2)
const RING_50M = { r1: 0.3705, rn: 0.3705, r2: 0.605, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 } as const;

describe('checkRing', () => {
  it('passes the 50 m 2.5/1.5 ring and predicts the cross-connected readings', () => {
    const result = checkRing(RING_50M);
    expect(result.verdict).toBe('pass');
    expect(result.findings.map((f) => [f.name, f.verdict])).toEqual([
      ['r1-rn', 'pass'],
      ['r2-ratio', 'pass'],
    ]);
    // step 2 ≈ (r1 + rn)/4 = 0.1853 Ω: GN3 ring continuity step 2 (C1); value D, derived from the 50 m ring above
    expect(result.expectedR1Rn).toBeCloseTo(0.1853, 4);
    // step 3 mid-point (r1 + r2)/4 = 0.2439 Ω: GN3 9th ed. 2022 step 3 (C1); value D
    expect(result.expectedR1R2).toBeCloseTo(0.2439, 4);
    // next to the board r1·r2/(r1 + r2) = 0.2298 Ω: IET Wiring Matters 89 (March 2022) (C1); value D
    expect(result.expectedR1R2NearBoard).toBeCloseTo(0.2298, 4);
  });

  it('expects r2/r1 = 1.633 for 2.5/1.5 and 2.62 for 4/1.5 from the conductor resistances', () => {
    // D: derived by 12.10 / 7.41 and 12.10 / 4.61 from IEC 60228:2004 Tables 1–2
    expect(checkRing({ ...RING_50M }).expectedR2Ratio).toBeCloseTo(1.633, 3);
    expect(checkRing({ r1: 0.2, rn: 0.2, r2: 0.52, liveCsaMm2: 4, cpcCsaMm2: 1.5 }).expectedR2Ratio).toBeCloseTo(2.62, 2);
  });

  it('accepts the trade figure r2 = 1.67 × r1 as well (3 % band, common trade practice, no published source)', () => {
    // 1.67 by cross-section (2.5/1.5) vs 1.633 by IEC 60228:2004 resistances; IET Guidance Note 3 ring continuity method (C1 for both figures)
    const r1 = 1.8;
    const result = checkRing({ r1, rn: r1, r2: r1 * 1.67, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 });
    expect(result.findings[1]?.verdict).toBe('pass');
  });

  it('passes r1 and rn 0.05 Ω apart and fails them 0.06 Ω apart', () => {
    // 0.05 Ω end-to-end tolerance: IET Guidance Note 3 ring continuity step 1 (C1; one forum source says 0.02 Ω, not followed)
    expect(checkRing({ ...RING_50M, rn: 0.4205 }).findings[0]?.verdict).toBe('pass');
    const apart = checkRing({ ...RING_50M, rn: 0.4305 });
    expect(apart.verdict).toBe('fail');
    expect(apart.findings[0]).toMatchObject({ verdict: 'fail', limit: 0.05, unit: 'Ω' });
    expect(apart.findings[0]?.value).toBeCloseTo(0.06, 10);
    expect(apart.findings[0]?.source).toMatch(/Guidance Note 3/);
  });

  it('fails an r2 well above the cable ratio (a loose cpc joint or a smaller cpc)', () => {
    const result = checkRing({ ...RING_50M, r2: 0.7 });
    expect(result.verdict).toBe('fail');
    expect(result.findings[1]?.note).toMatch(/high r2/);
  });

  it('asks for a check when r2 is well below the ratio (parallel paths through metalwork)', () => {
    const result = checkRing({ ...RING_50M, r2: 0.5 });
    expect(result.verdict).toBe('check');
    expect(result.findings[1]?.note).toMatch(/parallel/);
  });

  it('asks for a check when a 2.5/2.5 ring is recorded as 2.5/1.5 (low r2)', () => {
    // same-size cpc: r2 = r1, against 1.633 × r1 expected
    expect(checkRing({ ...RING_50M, r2: 0.3705 }).findings[1]?.verdict).toBe('check');
    expect(checkRing({ r1: 0.3705, rn: 0.3705, r2: 0.3705, liveCsaMm2: 2.5, cpcCsaMm2: 2.5 }).verdict).toBe('pass');
  });

  it('asks for a check while a reading is missing, and for a 0 Ω reading', () => {
    const missing = checkRing({ ...RING_50M, r2: null });
    expect(missing.verdict).toBe('check');
    expect(missing.findings[0]?.verdict).toBe('pass');
    expect(missing.findings[1]).toMatchObject({ verdict: 'check', value: null });
    expect(missing.expectedR1R2).toBeNull();
    expect(missing.expectedR1Rn).toBeCloseTo(0.1853, 4);
    expect(checkRing({ ...RING_50M, rn: 0 }).findings[0]?.verdict).toBe('check');
  });

  it('rejects readings and sizes outside physical sense', () => {
    expect(() => checkRing({ ...RING_50M, r1: -0.1 })).toThrow(InvalidInputError);
    expect(() => checkRing({ ...RING_50M, r2: Number.NaN })).toThrow(/r2/);
    expect(() => checkRing({ ...RING_50M, liveCsaMm2: 0 })).toThrow(/csaMm2/);
    expect(() => checkRing({ ...RING_50M, cpcCsaMm2: 2 })).toThrow(/csaMm2/);
  });
});

describe('crossConnectedReading', () => {
  it('follows the step 3 profile round the 50 m ring', () => {
    // IET Wiring Matters 89 (March 2022) profile formula (C1); values D, derived from the 50 m ring
    const reading = (fraction: number) => crossConnectedReading({ endToEndA: 0.3705, endToEndB: 0.605, fraction });
    expect(reading(0)).toBeCloseTo(0.2298, 4);
    expect(reading(0.5)).toBeCloseTo(0.2439, 4);
    expect(reading(1)).toBeCloseTo(0.2298, 4);
    expect(reading(0.25)).toBeGreaterThan(reading(0));
    expect(reading(0.25)).toBeLessThan(reading(0.5));
  });

  it('is flat at (a + b)/4 when the conductors match (step 2)', () => {
    for (const fraction of [0, 0.2, 0.5, 0.9]) {
      expect(crossConnectedReading({ endToEndA: 0.3705, endToEndB: 0.3705, fraction })).toBeCloseTo(0.18525, 10);
    }
  });

  it('rejects a position off the ring', () => {
    expect(() => crossConnectedReading({ endToEndA: 0.37, endToEndB: 0.6, fraction: 1.2 })).toThrow(/fraction/);
    expect(() => crossConnectedReading({ endToEndA: 0, endToEndB: 0, fraction: 0.5 })).toThrow(InvalidInputError);
  });
});

describe('extendRing', () => {
  it('adds 10 m of route to the 50 m ring: the same readings as a 60 m ring', () => {
    // D: derived by 10 m × 7.41 and 12.10 mΩ/m (IEC 60228:2004 Tables 1–2) added to the 50 m ring
    const after = extendRing({ ...RING_50M, addedRouteM: 10 });
    expect(after.addedLiveOhm).toBeCloseTo(0.0741, 10);
    expect(after.addedCpcOhm).toBeCloseTo(0.121, 10);
    expect(after.r1).toBeCloseTo(0.4446, 10);
    expect(after.rn).toBeCloseTo(0.4446, 10);
    expect(after.r2).toBeCloseTo(0.726, 10);
    expect(after.expectedR1R2).toBeCloseTo(0.29265, 10);
    expect(after.expectedR1Rn).toBeCloseTo(0.2223, 10);
  });

  it('worked example: a ring tested before and after an extension', () => {
    // Before: the 50 m ring passes step 1 (GN3 ring continuity, 0.05 Ω tolerance, C1).
    const before = checkRing(RING_50M);
    expect(before.verdict).toBe('pass');
    // The ring is broken at one socket and carried through a new outlet: 4 m out and 4 m back.
    const predicted = extendRing({ ...RING_50M, addedRouteM: 8 });
    // After: the technician's readings, within instrument resolution of the prediction.
    const measured = { r1: 0.43, rn: 0.44, r2: 0.70, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
    const after = checkRing(measured);
    expect(after.verdict).toBe('pass');
    expect(Math.abs(measured.r1 - predicted.r1)).toBeLessThan(0.01);
    expect(Math.abs(measured.r2 - predicted.r2)).toBeLessThan(0.01);
    // The circuit's R1+R2 rises from 0.24 Ω to 0.28 Ω, which goes on the certificate and into Zs.
    expect(before.expectedR1R2).toBeCloseTo(0.2439, 4);
    expect(predicted.expectedR1R2).toBeCloseTo((0.3705 + 0.05928 + 0.605 + 0.0968) / 4, 10);
    expect(after.expectedR1R2).toBeCloseTo(0.2825, 10);
  });

  it('changes nothing when no route is added', () => {
    const same = extendRing({ ...RING_50M, addedRouteM: 0 });
    expect(same.r1).toBe(0.3705);
    expect(same.r2).toBe(0.605);
  });

  it('rejects negative lengths, missing readings and unknown sizes', () => {
    expect(() => extendRing({ ...RING_50M, addedRouteM: -5 })).toThrow(/addedRouteM/);
    expect(() => extendRing({ ...RING_50M, addedRouteM: Number.POSITIVE_INFINITY })).toThrow(/addedRouteM/);
    expect(() => extendRing({ ...RING_50M, r1: null as unknown as number, addedRouteM: 5 })).toThrow(/r1/);
    expect(() => extendRing({ ...RING_50M, liveCsaMm2: 0, addedRouteM: 5 })).toThrow(InvalidInputError);
  });
});

describe('checkAgainstExtension (common trade practice: an extension only adds resistance)', () => {
  // Predicted after adding 10 m to the 50 m ring: r1 = rn = 0.4446 Ω, r2 = 0.726 Ω (IEC 60228:2004 Tables 1–2, D).
  const predicted = extendRing({ ...RING_50M, addedRouteM: 10 });

  it('passes readings at or a little above the prediction', () => {
    expect(checkAgainstExtension({ r1: 0.44, rn: 0.45, r2: 0.73 }, predicted)).toMatchObject({ verdict: 'pass' });
  });

  it('asks for a check when a reading is lower than predicted by more than 0.05 Ω', () => {
    // 0.05 Ω: the end-to-end tolerance of GN3 ring continuity step 1 (C1), used as the margin (common trade practice).
    // r2 0.61 Ω is the ring's reading from before the extension: 0.116 Ω below the 0.726 Ω predicted.
    const result = checkAgainstExtension({ r1: 0.44, rn: 0.44, r2: 0.61 }, predicted);
    expect(result).toMatchObject({ verdict: 'check', value: 0.61, limit: 0.73, unit: 'Ω' });
    expect(result.note).toMatch(/^r2 0\.61 Ω is lower than the 0\.73 Ω predicted after the extension/);
    expect(result.note).toMatch(/check that the leads were nulled/);
    expect(result.source).toMatch(/^Common trade practice/);
    expect(result.source).toMatch(/Guidance Note 3/);
    // 0.04 Ω below is within the margin (D)
    expect(checkAgainstExtension({ r1: 0.41, rn: 0.41, r2: 0.69 }, predicted).verdict).toBe('pass');
  });

  it('waits for all three readings and refuses negative ones', () => {
    expect(checkAgainstExtension({ r1: 0.44, rn: null, r2: 0.73 }, predicted)).toMatchObject({ verdict: 'check', value: null });
    expect(() => checkAgainstExtension({ r1: -0.44, rn: 0.44, r2: 0.73 }, predicted)).toThrow(/r1/);
  });
});
