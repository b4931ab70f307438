import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { checkLink, readTdr, tdrLengthM } from './link-length.js';

describe('tdrLengthM', () => {
  it('turns a round trip into a one-way length with c = 299 792 458 m/s', () => {
    // L = NVP × c × t / 2 (TDR method, C1); D: derived with NVP 0.69 and c = 299 792 458 m/s
    expect(tdrLengthM({ nanoseconds: 1000, nvp: 0.69 })).toBeCloseTo(103.43, 2);
    expect(tdrLengthM({ nanoseconds: 870, nvp: 0.69 })).toBeCloseTo(89.98, 2);
    expect(tdrLengthM({ nanoseconds: 0, nvp: 0.69 })).toBe(0);
  });

  it('reads short when the NVP entered is lower than the cable’s', () => {
    // D: derived by L = NVP × c × t / 2 (TDR method, C1): 0.77 entered for a 0.78 cable on a 90 m link reads 88.85 m
    const nanoseconds = (2 * 90) / (0.78 * 299_792_458) * 1e9;
    expect(tdrLengthM({ nanoseconds, nvp: 0.78 })).toBeCloseTo(90, 9);
    expect(tdrLengthM({ nanoseconds, nvp: 0.77 })).toBeCloseTo(88.85, 2);
  });

  it('rejects an NVP outside (0, 1] and a negative or missing time', () => {
    expect(() => tdrLengthM({ nanoseconds: 500, nvp: 0 })).toThrow(InvalidInputError);
    expect(() => tdrLengthM({ nanoseconds: 500, nvp: 1.2 })).toThrow(/nvp/);
    expect(() => tdrLengthM({ nanoseconds: 500, nvp: -0.7 })).toThrow(/nvp/);
    expect(() => tdrLengthM({ nanoseconds: 500, nvp: Number.NaN })).toThrow(/nvp/);
    expect(() => tdrLengthM({ nanoseconds: -1, nvp: 0.69 })).toThrow(/nanoseconds/);
    expect(() => tdrLengthM({ nanoseconds: Number.POSITIVE_INFINITY, nvp: 0.69 })).toThrow(/nanoseconds/);
    expect(tdrLengthM({ nanoseconds: 500, nvp: 1 })).toBeCloseTo(74.948, 3);
  });
});

describe('checkLink', () => {
  it('allows a channel up to 100 m', () => {
    // ANSI/TIA-568 and ISO/IEC 11801: channel ≤ 100 m (C1)
    expect(checkLink({ lengthM: 100, kind: 'channel' })).toMatchObject({ verdict: 'pass', limit: 100, unit: 'm' });
    expect(checkLink({ lengthM: 100.5, kind: 'channel' }).verdict).toBe('fail');
    expect(checkLink({ lengthM: 100, kind: 'channel' }).source).toMatch(/TIA-568/);
  });

  it('allows a permanent link up to 90 m', () => {
    // ANSI/TIA-568 and ISO/IEC 11801: permanent link ≤ 90 m (C1)
    expect(checkLink({ lengthM: 90, kind: 'permanent-link' }).verdict).toBe('pass');
    expect(checkLink({ lengthM: 95, kind: 'permanent-link' })).toMatchObject({ verdict: 'fail', value: 95, limit: 90 });
  });

  it('judges a TDR reading: 89.98 m passes as a permanent link, 103.43 m fails as a channel', () => {
    // D: TDR lengths derived by NVP × c × t / 2, judged against ANSI/TIA-568 / ISO/IEC 11801 limits (C1)
    expect(checkLink({ lengthM: tdrLengthM({ nanoseconds: 870, nvp: 0.69 }), kind: 'permanent-link' }).verdict).toBe('pass');
    expect(checkLink({ lengthM: tdrLengthM({ nanoseconds: 1000, nvp: 0.69 }), kind: 'channel' }).verdict).toBe('fail');
  });

  it('rejects lengths outside physical sense and unknown kinds', () => {
    expect(() => checkLink({ lengthM: -1, kind: 'channel' })).toThrow(InvalidInputError);
    expect(() => checkLink({ lengthM: Number.NaN, kind: 'channel' })).toThrow(/lengthM/);
    expect(() => checkLink({ lengthM: 10, kind: 'patch' as 'channel' })).toThrow(/kind/);
  });
});

describe('readTdr', () => {
  it('works out the length from the round trip and the NVP', () => {
    // L = NVP × c × t / 2 (c = 299 792 458 m/s, SI definition of the metre): 0.69 × c × 400 ns / 2 = 41.37 m (D)
    expect(readTdr({ nanoseconds: 400, nvp: 0.69 }).lengthM).toBeCloseTo(41.37, 2);
    expect(readTdr({ nanoseconds: null, nvp: 0.69 })).toEqual({ lengthM: null, field: null, problem: null });
  });

  it('asks for the figure to be checked when no building holds such a cable', () => {
    // 0.69 × c × 9 999 999 ns / 2 = 1 034 284 m (D), beyond the 1 000 m plausibility bound (common trade practice, M)
    const r = readTdr({ nanoseconds: 9_999_999, nvp: 0.69 });
    expect(r).toMatchObject({ lengthM: null, field: 'nanoseconds' });
    expect(r.problem).toBe('A round trip of 9,999,999 ns at NVP 0.69 gives 1,034 km, longer than any cable in a building: check the figure.');
    expect(readTdr({ nanoseconds: -5, nvp: 0.69 }).field).toBe('nanoseconds');
  });

  it('names the NVP as what is wrong when it is not above 0 and at most 1', () => {
    // NVP is a fraction of c (ANSI/TIA-568 test parameters; physics: no cable carries a signal faster than light)
    for (const nvp of [1.5, 0, -0.7]) {
      const r = readTdr({ nanoseconds: 400, nvp });
      expect(r).toMatchObject({ lengthM: null, field: 'nvp' });
      expect(r.problem).toMatch(new RegExp(`^An NVP of ${nvp} is wrong: .*above 0 and at most 1`));
    }
    expect(readTdr({ nanoseconds: 400, nvp: 1 }).problem).toBeNull();
  });
});
