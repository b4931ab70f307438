import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { checkPolarity, checkR1R2 } from './protective-conductor.js';

describe('checkR1R2', () => {
  // Test vector (D): a 50 m ring in 2.5/1.5 has r1 = 0.3705 Ω and r2 = 0.6050 Ω (IEC 60228:2004 7.41 and 12.10 mΩ/m);
  // step 3 mid-point (r1 + r2) / 4 = 0.2439 Ω (IET Guidance Note 3, 9th ed. 2022, ring test step 3; IET Wiring Matters 89).
  const expectedForRing = (0.3705 + 0.605) / 4;

  it('passes a ring reading within 0.05 Ω of (r1 + r2) / 4 (tolerance: common trade practice, no published source)', () => {
    const result = checkR1R2({ measured: 0.25, expectedForRing });
    expect(result.verdict).toBe('pass');
    expect(result.limit).toBe(0.24);
    expect(result.source).toMatch(/Reg 643\.2\.1/);
    expect(result.source).toMatch(/common trade practice/);
  });

  it('asks for a look, not a fail, when a ring reads well above (r1 + r2) / 4: a spur reads higher (GN3 step 3)', () => {
    const result = checkR1R2({ measured: 0.32, expectedForRing });
    expect(result.verdict).toBe('check');
    expect(result.note).toMatch(/spur/);
  });

  it('asks for a look when a ring reads well below: parallel paths (GN3 step 3; common trade practice)', () => {
    expect(checkR1R2({ measured: 0.18, expectedForRing }).note).toMatch(/parallel/);
  });

  it('passes a radial reading as continuity shown (BS 7671:2018+A2:2022 Reg 643.2.1)', () => {
    // 20 m of 2.5/1.5 reads 0.390 Ω at 20 °C (D from IEC 60228:2004: 19.51 mΩ/m × 20 m)
    const result = checkR1R2({ measured: 0.39 });
    expect(result).toMatchObject({ verdict: 'pass', value: 0.39, limit: null, unit: 'Ω' });
  });

  it('asks for the reading while it is missing, and never accepts 0 Ω', () => {
    expect(checkR1R2({ measured: null }).verdict).toBe('check');
    expect(checkR1R2({ measured: 0 }).verdict).toBe('check');
  });

  it('refuses readings outside physical sense', () => {
    expect(() => checkR1R2({ measured: -0.2 })).toThrow(InvalidInputError);
    expect(() => checkR1R2({ measured: Number.NaN })).toThrow(InvalidInputError);
  });
});

describe('checkPolarity', () => {
  it('passes correct polarity and fails incorrect (BS 7671:2018+A2:2022 Reg 643.6)', () => {
    expect(checkPolarity({ result: 'correct' })).toMatchObject({ verdict: 'pass', source: 'BS 7671:2018+A2:2022 Reg 643.6' });
    expect(checkPolarity({ result: 'incorrect' }).verdict).toBe('fail');
    expect(checkPolarity({ result: null }).verdict).toBe('check');
  });

  it('refuses anything but the two results', () => {
    expect(() => checkPolarity({ result: 'maybe' as never })).toThrow(InvalidInputError);
  });
});
