import { describe, expect, it } from 'vitest';
import { InvalidInputError, VERDICT_DISCLAIMER, optionalReading, requirePositive, roundTo, tableRow, worstVerdict } from './check.js';

describe('worstVerdict', () => {
  it('fails when any finding fails, else asks for a check, else passes', () => {
    expect(worstVerdict([])).toBe('pass');
    expect(worstVerdict(['pass', 'pass'])).toBe('pass');
    expect(worstVerdict(['pass', 'check'])).toBe('check');
    expect(worstVerdict(['check', 'fail', 'pass'])).toBe('fail');
  });
});

describe('roundTo', () => {
  it('rounds half away from zero without binary noise', () => {
    expect(roundTo(1.096, 2)).toBe(1.1);
    expect(roundTo(1.005, 2)).toBe(1.01);
    expect(roundTo(2.184, 2)).toBe(2.18);
    expect(roundTo(-1.005, 2)).toBe(-1.01);
  });
});

describe('input guards', () => {
  it('name the field in the error', () => {
    expect(() => requirePositive('csaMm2', 0)).toThrow(InvalidInputError);
    expect(() => requirePositive('csaMm2', 0)).toThrow(/csaMm2/);
    expect(() => requirePositive('lengthM', Number.NaN)).toThrow(/lengthM: must be a finite number/);
    expect(() => requirePositive('lengthM', '12' as unknown as number)).toThrow(/lengthM/);
  });

  it('keep the field on the error object', () => {
    try {
      requirePositive('ratingA', -1);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(InvalidInputError);
      expect((error as InvalidInputError).field).toBe('ratingA');
    }
  });

  it('let a missing reading through as null but reject a negative one', () => {
    expect(optionalReading('r1', null)).toBeNull();
    expect(optionalReading('r1', undefined)).toBeNull();
    expect(optionalReading('r1', 0.37)).toBe(0.37);
    expect(() => optionalReading('r1', -0.1)).toThrow(/r1/);
    expect(() => optionalReading('r1', Number.POSITIVE_INFINITY)).toThrow(/r1/);
  });

  it('reject a key a table does not list', () => {
    const table = { source: 'test table', rows: { 1: 10, 2.5: 4 } };
    expect(tableRow('csaMm2', 2.5, table)).toBe(4);
    expect(() => tableRow('csaMm2', 3, table)).toThrow(/csaMm2: 3 is not listed in test table \(listed: 1, 2.5\)/);
  });
});

describe('VERDICT_DISCLAIMER', () => {
  it('says a verdict is an aid and the regulations, local codes and a competent person decide', () => {
    expect(VERDICT_DISCLAIMER).toMatch(/aid/);
    expect(VERDICT_DISCLAIMER).toMatch(/regulations in force/);
    expect(VERDICT_DISCLAIMER).toMatch(/local codes/);
    expect(VERDICT_DISCLAIMER).toMatch(/a competent person decide/);
    // The UK does not license electricians: licensing is named only where local law requires it.
    expect(VERDICT_DISCLAIMER).toMatch(/licensed electrician only where local law requires one/);
  });
});
