import { describe, expect, it } from 'vitest';
import { CONDUCTOR_COLOURS, SIGNAL_PAIRS, T568A, T568B, twistedPairOf } from './pin-schemes.js';

describe('pin assignments', () => {
  // ANSI/TIA-568 T568A and T568B pin assignments (C1)
  it.each([
    [1, 'white-green', 'white-orange'],
    [2, 'green', 'orange'],
    [3, 'white-orange', 'white-green'],
    [4, 'blue', 'blue'],
    [5, 'white-blue', 'white-blue'],
    [6, 'orange', 'green'],
    [7, 'white-brown', 'white-brown'],
    [8, 'brown', 'brown'],
  ])('pin %s: T568A %s, T568B %s (ANSI/TIA-568, C1)', (pin, a, b) => {
    expect(T568A[pin - 1]).toBe(a);
    expect(T568B[pin - 1]).toBe(b);
  });

  it('uses every colour once in each scheme', () => {
    expect([...T568A].sort()).toEqual([...CONDUCTOR_COLOURS].sort());
    expect([...T568B].sort()).toEqual([...CONDUCTOR_COLOURS].sort());
  });

  it('differ only by swapping the orange and green pairs', () => {
    // ANSI/TIA-568: A and B swap pairs 2 (orange) and 3 (green) (C1)
    const swap = (c: string) => c.replace('orange', '§').replace('green', 'orange').replace('§', 'green');
    expect(T568A.map(swap)).toEqual([...T568B]);
  });

  it('carry each signal pair on one twisted pair', () => {
    // ANSI/TIA-568 signal pairs on pins 1-2, 3-6, 4-5, 7-8 (C1)
    for (const scheme of [T568A, T568B]) {
      for (const [p, q] of SIGNAL_PAIRS) {
        expect(twistedPairOf(scheme[p - 1]!)).toBe(twistedPairOf(scheme[q - 1]!));
      }
    }
  });

  it('numbers the pairs 1 blue, 2 orange, 3 green, 4 brown', () => {
    // ANSI/TIA-568 pair numbering (C1)
    expect(twistedPairOf('blue')).toBe(1);
    expect(twistedPairOf('white-orange')).toBe(2);
    expect(twistedPairOf('green')).toBe(3);
    expect(twistedPairOf('white-brown')).toBe(4);
  });

  it('cannot be changed at run time', () => {
    expect(Object.isFrozen(T568A)).toBe(true);
    expect(Object.isFrozen(T568B)).toBe(true);
  });
});
