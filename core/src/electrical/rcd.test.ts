import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { checkRcd, maxZsForRcd } from './rcd.js';

describe('checkRcd, general type', () => {
  it('allows 300 ms at IΔn', () => {
    // BS 7671:2018+A2:2022 Reg 643.8 (IET Wiring Matters 91, July 2022) and BS EN 61008-1/61009-1: 300 ms at IΔn (C1)
    const result = checkRcd({ tripMs: 300, multiple: 1 });
    expect(result).toMatchObject({ verdict: 'pass', value: 300, limit: 300, unit: 'ms', minimumMs: null });
    expect(result.source).toMatch(/Reg 643\.8/);
    expect(checkRcd({ tripMs: 18.4, multiple: 1 }).verdict).toBe('pass');
    expect(checkRcd({ tripMs: 301, multiple: 1 }).verdict).toBe('fail');
  });

  it('allows 40 ms at 5 IΔn', () => {
    // BS EN 61008-1 / BS EN 61009-1 general type: 40 ms at 5 IΔn (C1); no longer a required field test after A2:2022
    const result = checkRcd({ tripMs: 40, multiple: 5 });
    expect(result).toMatchObject({ verdict: 'pass', limit: 40 });
    expect(result.source).toMatch(/61008-1/);
    expect(checkRcd({ tripMs: 41, multiple: 5 }).verdict).toBe('fail');
  });

  it('names the test current in the note', () => {
    expect(checkRcd({ tripMs: 22, multiple: 1, ratedMa: 30 }).note).toMatch(/30 mA/);
    expect(checkRcd({ tripMs: 22, multiple: 5, ratedMa: 30 }).note).toMatch(/5 × 30 mA/);
  });

  it('asks for a check while no time is entered, or for 0 ms', () => {
    expect(checkRcd({ tripMs: null, multiple: 1 })).toMatchObject({ verdict: 'check', value: null });
    expect(checkRcd({ tripMs: 0, multiple: 1 }).verdict).toBe('check');
  });
});

describe('checkRcd, type S (time-delayed)', () => {
  it('allows 130–500 ms at IΔn', () => {
    // BS EN 61008-1 / 61009-1 type S: max 500 ms at IΔn (C1), minimum 130 ms (C2, one source)
    expect(checkRcd({ tripMs: 200, multiple: 1, rcdType: 'S' })).toMatchObject({ verdict: 'pass', limit: 500, minimumMs: 130 });
    expect(checkRcd({ tripMs: 510, multiple: 1, rcdType: 'S' }).verdict).toBe('fail');
    expect(checkRcd({ tripMs: 100, multiple: 1, rcdType: 'S' }).verdict).toBe('check');
  });

  it('allows 50–150 ms at 5 IΔn', () => {
    // BS EN 61008-1 / 61009-1 type S: max 150 ms at 5 IΔn (C1), minimum 50 ms (C2, one source)
    expect(checkRcd({ tripMs: 120, multiple: 5, rcdType: 'S' }).verdict).toBe('pass');
    expect(checkRcd({ tripMs: 160, multiple: 5, rcdType: 'S' }).verdict).toBe('fail');
    expect(checkRcd({ tripMs: 30, multiple: 5, rcdType: 'S' }).verdict).toBe('check');
  });
});

describe('maxZsForRcd', () => {
  // BS 7671:2018+A2:2022 Table 41.5 (Reg 411.5.3), 50 V / IΔn as printed (C1)
  it.each([
    [30, 1667],
    [100, 500],
    [300, 167],
    [500, 100],
  ])('%s mA allows %s Ω (BS 7671:2018+A2:2022 Table 41.5, C1)', (ratedMa, ohms) => {
    expect(maxZsForRcd({ ratedMa })).toBe(ohms);
  });

  it('refuses a rating the table does not list', () => {
    expect(() => maxZsForRcd({ ratedMa: 10 })).toThrow(/ratedMa/);
  });
});

describe('bad RCD inputs', () => {
  it('throw, never return a number', () => {
    expect(() => checkRcd({ tripMs: -5, multiple: 1 })).toThrow(InvalidInputError);
    expect(() => checkRcd({ tripMs: Number.NaN, multiple: 1 })).toThrow(/tripMs/);
    expect(() => checkRcd({ tripMs: 20, multiple: 2 as 1 })).toThrow(/multiple/);
    expect(() => checkRcd({ tripMs: 20, multiple: 1, ratedMa: 0 })).toThrow(/ratedMa/);
    expect(() => checkRcd({ tripMs: 20, multiple: 1, rcdType: 'AC' as 'general' })).toThrow(/rcdType/);
  });
});
