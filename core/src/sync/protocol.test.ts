import { describe, expect, it } from 'vitest';
import { isFieldValue } from './protocol.js';

describe('isFieldValue', () => {
  it('takes what JSON carries unchanged', () => {
    for (const v of [null, 'text', '', 0, -1.5, true, false, [], [1, 'a', null], {}, { a: { b: [1, { c: null }] } }]) expect(isFieldValue(v)).toBe(true);
    expect(isFieldValue(Object.create(null))).toBe(true);
  });

  it('refuses what JSON would change or drop', () => {
    for (const v of [undefined, NaN, Infinity, new Date(0), new Map(), () => 1, Symbol('s'), 1n, [undefined], { a: undefined }, { a: new Date(0) }, [NaN]]) {
      expect(isFieldValue(v)).toBe(false);
    }
    class Reading { ohms = 0.5; }
    expect(isFieldValue(new Reading())).toBe(false);
  });
});
