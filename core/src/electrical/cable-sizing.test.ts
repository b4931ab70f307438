import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { INSTALLATION_METHODS, sizeCable } from './cable-sizing.js';

// BS 7671:2018+A2:2022 Appendix 4 Table 4D5, 70 °C thermoplastic flat twin and earth, current-carrying capacity (A).
// Methods 102 and 103: C2 (one public source). Methods A, C, 100 and 101: M (from memory, not confirmed); the
// trade reference's own memory of 1.5 mm² (C 20 A, 100 16 A, 103 10 A) agrees.
const TABLE_4D5: Record<string, readonly number[]> = {
  A: [11.5, 14.5, 20, 26, 32, 44, 57],
  C: [16, 20, 27, 37, 47, 64, 85],
  '100': [13, 16, 21, 27, 34, 45, 57],
  '101': [10.5, 13, 17, 22, 27, 36, 46],
  '102': [13, 16, 21, 27, 35, 47, 63],
  '103': [8, 10, 13.5, 17.5, 23.5, 32, 42.5],
};
const SIZES = [1, 1.5, 2.5, 4, 6, 10, 16];

describe('sizeCable', () => {
  for (const [method, values] of Object.entries(TABLE_4D5)) {
    it.each(SIZES.map((s, i) => [s, values[i]]))(`method ${method}, %s mm²: It = %s A (Table 4D5)`, (csa, it) => {
      const r = sizeCable({ designCurrentA: 1, device: 'B', ratingA: 1, csaMm2: csa as number, installationMethod: method as never, lengthM: 1, use: 'other' });
      expect(r.tabulatedA).toBe(it);
    });
  }

  it('derates a BS 3036 fuse by 0.725', () => {
    // Cf = 0.725 for a semi-enclosed fuse, BS 7671:2018+A2:2022 Appendix 4 §5.1.1 (M)
    const r = sizeCable({ designCurrentA: 10, device: 'BS 3036', ratingA: 20, csaMm2: 2.5, installationMethod: 'C', lengthM: 10, use: 'other' });
    expect(r.izA).toBeCloseTo(27 * 0.725, 10); // 19.575 A < 20 A
    expect(r.verdict).toBe('fail');
    expect(r.limitingFactor).toBe('current-carrying-capacity');
    expect(r.smallestFactor).toEqual({ name: 'BS 3036 fuse', value: 0.725 });
    expect(r.source).toContain('Appendix 4 §5.1.1');
  });

  it('names the design current when Ib is more than In', () => {
    const r = sizeCable({ designCurrentA: 25, device: 'B', ratingA: 20, csaMm2: 4, installationMethod: 'C', lengthM: 5, use: 'other' });
    expect(r.limitingFactor).toBe('design-current');
    expect(r.verdict).toBe('fail');
  });

  it('names the voltage drop on a long run', () => {
    // 32 A on 4 mm² over 30 m → 10.56 V (4.59 %), within 5 %; over 35 m → 12.32 V (5.36 %): trade reference §4a test vector
    // (D from Table 4D5 11 mV/A/m, C2; 5 % limit Appendix 4 §6.4, C1)
    const ok = sizeCable({ designCurrentA: 32, device: 'B', ratingA: 32, csaMm2: 4, installationMethod: 'C', lengthM: 30, use: 'other' });
    expect(ok.voltageDrop.volts).toBeCloseTo(10.56, 10);
    expect(ok.verdict).toBe('pass');
    const long = sizeCable({ designCurrentA: 32, device: 'B', ratingA: 32, csaMm2: 4, installationMethod: 'C', lengthM: 35, use: 'other' });
    expect(long.verdict).toBe('fail');
    expect(long.limitingFactor).toBe('voltage-drop');
  });

  it('refuses nonsense', () => {
    const base = { designCurrentA: 10, device: 'B', ratingA: 16, csaMm2: 2.5, installationMethod: 'C', lengthM: 10, use: 'other' } as const;
    expect(() => sizeCable({ ...base, installationMethod: 'D' as never })).toThrow(/installationMethod/);
    expect(() => sizeCable({ ...base, csaMm2: 25 })).toThrow(/Table 4D5/);
    expect(() => sizeCable({ ...base, ci: 0 })).toThrow(/ci/);
    expect(() => sizeCable({ ...base, cg: 1.2 })).toThrow(/cg/);
    expect(() => sizeCable({ ...base, designCurrentA: -1 })).toThrow(InvalidInputError);
    expect(() => sizeCable({ ...base, device: 'Z' as never })).toThrow(/device/);
  });

  it('Iz falls as any rating factor falls (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...INSTALLATION_METHODS),
        fc.constantFrom(...SIZES),
        fc.constantFrom('ca', 'cg', 'ci'),
        fc.double({ min: 0.3, max: 1, noNaN: true }),
        fc.double({ min: 0.05, max: 0.25, noNaN: true }),
        (installationMethod, csaMm2, which, factor, drop) => {
          const base = { designCurrentA: 1, device: 'B', ratingA: 1, csaMm2, installationMethod, lengthM: 1, use: 'other' } as const;
          const higher = sizeCable({ ...base, [which]: factor }).izA;
          const lower = sizeCable({ ...base, [which]: factor - drop }).izA;
          expect(lower).toBeLessThan(higher);
        },
      ),
    );
  });
});
