import { describe, expect, it } from 'vitest';
import { adiabaticCpc } from './adiabatic-cpc.js';
import { sizeCable } from './cable-sizing.js';
import { r1r2Expected } from './expected-r1r2.js';
import { predictZs } from './predicted-zs.js';
import { rcdRequired } from './rcd-required.js';
import { extendRing } from './ring-final-circuit.js';

// Worked examples: the checks together, as a technician would make them before breaking into a circuit.
describe('before breaking into a circuit: worked examples', () => {
  it('a ring extension through an insulated stud wall', () => {
    // 50 m ring in 2.5/1.5, r1 = rn = 0.3705 Ω, r2 = 0.6050 Ω (trade reference §2a test vector, D); 8 m added out and back.
    const ring = extendRing({ r1: 0.3705, rn: 0.3705, r2: 0.605, liveCsaMm2: 2.5, cpcCsaMm2: 1.5, addedRouteM: 8 });
    // 8 m × 7.41 mΩ/m = 0.0593 Ω on r1, 8 m × 12.10 = 0.0968 Ω on r2 (IEC 60228:2004, C1): (0.4298 + 0.7018) / 4 = 0.2829 Ω (D)
    expect(ring.expectedR1R2).toBeCloseTo(0.28290, 4);
    // Ze 0.35 Ω (TN-C-S, M), B32: 0.35 + 0.2829 × 1.20 = 0.689 Ω ≤ 1.37 Ω (Table 41.3, C1)
    const zs = predictZs({ zeOhm: 0.35, r1r2Ohm: ring.expectedR1R2, device: 'B', ratingA: 32 });
    expect(zs.zsOhm).toBeCloseTo(0.68948, 4);
    expect(zs.verdict).toBe('pass');
    // Touching the board (method 102) 2.5 mm² carries 21 A ≥ 20 A (Table 4D5 C2; Reg 433.1.204, M); pushed into the middle
    // of the insulation (method 103) only 13.5 A
    const touching = sizeCable({ designCurrentA: 20, device: 'B', ratingA: 32, csaMm2: 2.5, installationMethod: '102', lengthM: 30, use: 'other', ring: true });
    expect(touching.izA).toBe(21);
    expect(touching.findings.find((f) => f.name === 'current-carrying-capacity')?.verdict).toBe('pass');
    const buried = sizeCable({ designCurrentA: 20, device: 'B', ratingA: 32, csaMm2: 2.5, installationMethod: '103', lengthM: 30, use: 'other', ring: true });
    expect(buried.verdict).toBe('fail');
    expect(buried.limitingFactor).toBe('current-carrying-capacity');
    // Sockets up to 32 A need 30 mA RCD protection (Reg 411.3.3, C1); the stud wall has metal parts (Reg 522.6.203, C1)
    const rcd = rcdRequired({ circuitKind: 'sockets', socketRatingA: 13, location: 'indoors', concealedDepthMm: 30, wallHasMetalParts: true, dwelling: true, hasRcdMa: 30 });
    expect(rcd.reasons).toHaveLength(3);
    expect(rcd.verdict).toBe('pass');
    // Fault current 230 / 0.689 = 334 A, which a B32 clears magnetically (≥ 5 In = 160 A) within 0.1 s (time/current curve,
    // BS 7671 Appendix 3; M): √(334² × 0.1) / 115 = 0.92 mm² ≤ 1.5 mm² (Table 54.3 k = 115, C2)
    const cpc = adiabaticCpc({ faultCurrentA: 230 / zs.zsOhm, disconnectionS: 0.1, k: { arrangement: 'in-cable', insulation: '70C-thermoplastic' }, cpcCsaMm2: 1.5 });
    expect(cpc.minimumMm2).toBeCloseTo(0.9173, 3);
    expect(cpc.verdict).toBe('pass');
  });

  it('a 9.5 kW shower radial', () => {
    // Ib = 9500 / 230 = 41.30 A (230 V nominal, ESQCR 2002, C1); B45 device
    const ib = 9500 / 230;
    // 10 mm² clipped direct (method C) 64 A (Table 4D5, M), 15 m: 4.4 mV/A/m × 41.30 × 15 = 2.73 V (1.19 %) (Table 4D5 C2; D)
    const clipped = sizeCable({ designCurrentA: ib, device: 'B', ratingA: 45, csaMm2: 10, installationMethod: 'C', lengthM: 15, use: 'other' });
    expect(clipped.verdict).toBe('pass');
    expect(clipped.voltageDrop.volts).toBeCloseTo(2.7261, 3);
    // 6 mm² across a loft under more than 100 mm of insulation (method 101) carries only 27 A (Table 4D5, M): fails
    const loft = sizeCable({ designCurrentA: ib, device: 'B', ratingA: 45, csaMm2: 6, installationMethod: '101', lengthM: 15, use: 'other' });
    expect(loft.verdict).toBe('fail');
    expect(loft.limitingFactor).toBe('current-carrying-capacity');
    // 16 mm² in the same loft carries 46 A ≥ 45 A (Table 4D5, M)
    expect(sizeCable({ designCurrentA: ib, device: 'B', ratingA: 45, csaMm2: 16, installationMethod: '101', lengthM: 15, use: 'other' }).verdict).toBe('pass');
    // In a bathroom every circuit needs 30 mA (Section 701, M number); without an RCD that is a fail
    const rcd = rcdRequired({ circuitKind: 'shower', location: 'bathroom', dwelling: true, hasRcdMa: 0 });
    expect(rcd.verdict).toBe('fail');
    expect(rcd.source).toContain('Section 701');
  });

  it('a garden-office radial in buried cable', () => {
    // 32 A radial, 30 m, 6 mm². Inside the house the twin-and-earth is clipped direct: 47 A (Table 4D5, M).
    const inside = sizeCable({ designCurrentA: 25, device: 'B', ratingA: 32, csaMm2: 6, installationMethod: 'C', lengthM: 30, use: 'other' });
    // 7.3 mV/A/m × 25 A × 30 m = 5.475 V, 2.38 % (Table 4D5, C2; D)
    expect(inside.voltageDrop.volts).toBeCloseTo(5.475, 10);
    expect(inside.verdict).toBe('pass');
    // Buried cable is not a Table 4D5 method: its capacity is in another table (armoured cable), which this rule set does
    // not carry, so the check refuses rather than guessing.
    expect(() => sizeCable({ designCurrentA: 25, device: 'B', ratingA: 32, csaMm2: 6, installationMethod: 'D' as never, lengthM: 30, use: 'other' })).toThrow(/installationMethod/);
    // The cable's R1+R2 over 30 m of 6/2.5: (3.08 + 7.41) × 30 = 0.3147 Ω (IEC 60228:2004, C1; D)
    const r1r2 = r1r2Expected({ liveCsaMm2: 6, cpcCsaMm2: 2.5, lengthM: 30 }).expectedOhm;
    expect(r1r2).toBeCloseTo(0.3147, 10);
    // On a TT supply with Ze 21 Ω (M: a typical rod), the B32 cannot disconnect; a 30 mA RCD (1667 Ω, Table 41.5, C1) can.
    const zs = predictZs({ zeOhm: 21, r1r2Ohm: r1r2, device: 'B', ratingA: 32, rcdRatedMa: 30 });
    expect(zs.findings.map((f) => f.verdict)).toEqual(['fail', 'pass']);
    expect(zs.verdict).toBe('pass');
    // The armour of a 90 °C thermosetting SWA cable as cpc: k = 46 (Table 54.4, C2). The fault current 230 / 21.38 = 10.8 A
    // is more than 5 IΔn, at which a general-type RCD operates within 40 ms (BS EN 61008-1 / 61009-1, C1):
    // S = √(10.8² × 0.04) / 46 = 0.047 mm² (D), far below the armour's cross-section
    const faultA = 230 / zs.zsOhm;
    const armour = adiabaticCpc({ faultCurrentA: faultA, disconnectionS: 0.04, k: { arrangement: 'armour', insulation: '90C-thermosetting' }, cpcCsaMm2: 4 });
    expect(armour.verdict).toBe('pass');
    // Sockets in the garden office: 30 mA for sockets up to 32 A and for mobile equipment outdoors (Reg 411.3.3, C1)
    const rcd = rcdRequired({ circuitKind: 'sockets', socketRatingA: 13, location: 'outdoors', dwelling: true, hasRcdMa: 30 });
    expect(rcd.reasons).toHaveLength(2);
    expect(rcd.verdict).toBe('pass');
    expect(armour.minimumMm2).toBeCloseTo(0.0469, 3);
  });
});
