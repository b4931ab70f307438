import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { fuseForLoad } from './fused-connection-unit.js';

describe('fuseForLoad', () => {
  // Currents: D, derived by I = P / 230 V (ESQCR 2002 nominal, C1). Fuse ratings: BS 1362 (3 A, 13 A preferred; 5 A exists), C1.
  it.each([
    [500, 2.17, 3],
    [700, 3.04, 5],
    [1000, 4.35, 5],
    [2000, 8.7, 13],
    [2400, 10.43, 13],
  ])('%s W draws %s A: %s A fuse', (watts, amps, fuse) => {
    const result = fuseForLoad({ watts });
    expect(result.currentA).toBeCloseTo(amps, 2);
    expect(result).toMatchObject({ verdict: 'pass', fuseRatingA: fuse, limit: fuse, unit: 'A' });
    expect(result.source).toMatch(/BS 1362/);
  });

  it('worked example: a fused connection unit for a 2 kW electric fire takes a 13 A fuse', () => {
    // 2000 W / 230 V = 8.70 A (D); next BS 1362 rating up is 13 A (C1)
    const fire = fuseForLoad({ watts: 2000, nominalV: 230 });
    expect(fire.currentA).toBeCloseTo(8.7, 2);
    expect(fire.fuseRatingA).toBe(13);
    expect(fire.note).toBe('2 kW at 230 V draws 8.70 A, so fit a 13 A fuse.');
  });

  it('gives a 3 kW appliance a 13 A fuse with a check, not a fail', () => {
    // 3000 W / 230 V = 13.04 A (D); 13 A for a 3 kW appliance: common trade practice, no published source
    const result = fuseForLoad({ watts: 3000 });
    expect(result.currentA).toBeCloseTo(13.04, 2);
    expect(result).toMatchObject({ verdict: 'check', fuseRatingA: 13, limit: 13 });
    expect(result.note).toMatch(/normal practice up to 3 kW/);
    expect(result.source).toMatch(/common trade practice/);
  });

  it('passes 3 kW outright when the supply is taken as 240 V', () => {
    // 3000 W / 240 V = 12.5 A, within 13 A (BS 1362, C1)
    expect(fuseForLoad({ watts: 3000, nominalV: 240 })).toMatchObject({ verdict: 'pass', fuseRatingA: 13 });
  });

  it('fails a load no plug or connection-unit fuse can carry', () => {
    const result = fuseForLoad({ watts: 3100 });
    expect(result).toMatchObject({ verdict: 'fail', fuseRatingA: null, limit: 13 });
    expect(fuseForLoad({ watts: 7000 }).verdict).toBe('fail');
    // the 3 kW allowance is a current, so a low nominal voltage cannot stretch it
    expect(fuseForLoad({ watts: 3000, nominalV: 220 }).verdict).toBe('fail');
  });

  it('rejects loads outside physical sense', () => {
    expect(() => fuseForLoad({ watts: 0 })).toThrow(InvalidInputError);
    expect(() => fuseForLoad({ watts: -100 })).toThrow(/watts/);
    expect(() => fuseForLoad({ watts: Number.NaN })).toThrow(/watts/);
    expect(() => fuseForLoad({ watts: 1000, nominalV: -230 })).toThrow(/nominalV/);
  });
});
