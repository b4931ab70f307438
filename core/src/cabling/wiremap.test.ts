import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { CONDUCTOR_COLOURS, T568A, T568B, type ConductorColour, type PinScheme } from './pin-schemes.js';
import { classifyWiremap, type EndColours } from './wiremap.js';

// Fault kinds follow the ANSI/TIA-568 field test wiremap (C1); pin assignments ANSI/TIA-568 T568A/T568B (C1).

const STRAIGHT = [1, 2, 3, 4, 5, 6, 7, 8];

function withPins(end: EndColours, changes: Record<number, ConductorColour | null>): EndColours {
  return end.map((colour, i) => (i + 1 in changes ? (changes[i + 1] ?? null) : colour));
}

describe('classifyWiremap', () => {
  it.each(['T568A', 'T568B'] as const)('passes a cable terminated %s at both ends', (scheme) => {
    const end = scheme === 'T568A' ? T568A : T568B;
    const result = classifyWiremap({ scheme, nearEnd: end, farEnd: end });
    expect(result).toMatchObject({ verdict: 'pass', faults: [], map: STRAIGHT });
    expect(result.source).toMatch(/TIA-568/);
  });

  it('finds crossed pairs 1,2 ↔ 3,6 when a T568A end meets a T568B end, and says which end is wrong', () => {
    // ANSI/TIA-568: A at one end and B at the other crosses 1,2 ↔ 3,6 (C1)
    const onB = classifyWiremap({ scheme: 'T568B', nearEnd: T568A, farEnd: T568B });
    expect(onB.verdict).toBe('fail');
    expect(onB.map).toEqual([3, 6, 1, 4, 5, 2, 7, 8]);
    expect(onB.faults).toEqual([expect.objectContaining({ kind: 'crossed', pins: [1, 2, 3, 6], end: 'near' })]);
    const onA = classifyWiremap({ scheme: 'T568A', nearEnd: T568A, farEnd: T568B });
    expect(onA.faults).toEqual([expect.objectContaining({ kind: 'crossed', pins: [1, 2, 3, 6], end: 'far' })]);
  });

  it('finds a reversed pair: the two wires of the orange pair swapped at the far end', () => {
    // ANSI/TIA-568 wiremap: reversed pair 1→2, 2→1 (C1)
    const farEnd = withPins(T568B, { 1: 'orange', 2: 'white-orange' });
    const result = classifyWiremap({ scheme: 'T568B', nearEnd: T568B, farEnd });
    expect(result.map).toEqual([2, 1, 3, 4, 5, 6, 7, 8]);
    expect(result.faults).toEqual([expect.objectContaining({ kind: 'reversed', pins: [1, 2], end: 'far' })]);
  });

  it('finds split pairs where pins connect through but a signal pair uses two twisted pairs', () => {
    // ANSI/TIA-568 wiremap: split pair, pin-to-pin continuity correct (C1); the colours at the pins show it
    const colourOrder: EndColours = ['white-orange', 'orange', 'white-green', 'green', 'white-blue', 'blue', 'white-brown', 'brown'];
    const result = classifyWiremap({ scheme: 'T568B', nearEnd: colourOrder, farEnd: colourOrder });
    expect(result.verdict).toBe('fail');
    expect(result.map).toEqual(STRAIGHT);
    expect(result.faults.map((f) => [f.kind, f.pins, f.end])).toEqual([
      ['split', [3, 6], undefined],
      ['split', [4, 5], undefined],
    ]);
  });

  it('finds opens: a conductor missing at either end, or broken along the cable', () => {
    // ANSI/TIA-568 wiremap: open (C1)
    const result = classifyWiremap({
      scheme: 'T568B',
      nearEnd: withPins(T568B, { 8: null }),
      farEnd: withPins(T568B, { 7: null }),
      opens: [4],
    });
    expect(result.map).toEqual([1, 2, 3, null, 5, 6, null, null]);
    expect(result.faults).toEqual([
      expect.objectContaining({ kind: 'open', pins: [4] }),
      expect.objectContaining({ kind: 'open', pins: [7], end: 'far' }),
      expect.objectContaining({ kind: 'open', pins: [8], end: 'near' }),
    ]);
    expect(result.faults[0]).not.toHaveProperty('end');
  });

  it('reports shorts found by the tester', () => {
    // ANSI/TIA-568 wiremap: short (C1)
    const result = classifyWiremap({ scheme: 'T568B', nearEnd: T568B, farEnd: T568B, shorts: [[5, 4], [4, 5]] });
    expect(result.verdict).toBe('fail');
    expect(result.map).toEqual(STRAIGHT);
    expect(result.faults).toEqual([expect.objectContaining({ kind: 'short', pins: [4, 5] })]);
  });

  it('calls two wires of different pairs traded at one end one crossed fault, not two miswires', () => {
    // ANSI/TIA-568 wiremap: a conductor of one pair landing on a pin of another is a cross (C1); one swap is one fault
    // far end: white-orange and blue swapped between pins 1 and 4
    const farEnd = withPins(T568B, { 1: 'blue', 4: 'white-orange' });
    const result = classifyWiremap({ scheme: 'T568B', nearEnd: T568B, farEnd });
    expect(result.verdict).toBe('fail');
    expect(result.map).toEqual([4, 2, 3, 1, 5, 6, 7, 8]);
    expect(result.faults.map((f) => [f.kind, f.pins, f.end])).toEqual([['crossed', [1, 4], 'far']]);
    expect(result.faults[0]?.note).toBe('The wires on pins 1 and 4 have traded places, crossing pair 1,2 with pair 4,5.');
    // the same swap at the near end is found at the near end
    const near = classifyWiremap({ scheme: 'T568B', nearEnd: farEnd, farEnd: T568B });
    expect(near.faults.map((f) => [f.kind, f.pins, f.end])).toEqual([['crossed', [1, 4], 'near']]);
  });

  it('calls other cross-connections miswired', () => {
    // far end: three wires rotated between pins 1, 4 and 7: no two simply traded places (ANSI/TIA-568 wiremap, C1)
    const farEnd = withPins(T568B, { 1: 'white-brown', 4: 'white-orange', 7: 'blue' });
    const result = classifyWiremap({ scheme: 'T568B', nearEnd: T568B, farEnd });
    expect(result.map).toEqual([4, 2, 3, 7, 5, 6, 1, 8]);
    expect(result.faults.map((f) => [f.kind, f.pins, f.end])).toEqual([
      ['miswired', [1], 'far'],
      ['miswired', [4], 'far'],
      ['miswired', [7], 'far'],
    ]);
  });

  it('fails both ends when they match each other but not the scheme', () => {
    // blue and brown pairs swapped identically at both ends: works pin to pin, but is not T568B
    const custom = withPins(T568B, { 4: 'brown', 5: 'white-brown', 7: 'white-blue', 8: 'blue' });
    const result = classifyWiremap({ scheme: 'T568B', nearEnd: custom, farEnd: custom });
    expect(result.map).toEqual(STRAIGHT);
    expect(result.faults.map((f) => [f.kind, f.pins, f.end])).toEqual([
      ['miswired', [4, 5, 7, 8], 'near'],
      ['miswired', [4, 5, 7, 8], 'far'],
    ]);
  });

  it('asks for a check when nothing is recorded', () => {
    const empty: EndColours = Array(8).fill(null);
    expect(classifyWiremap({ scheme: 'T568B', nearEnd: empty, farEnd: empty }).verdict).toBe('check');
  });

  it('rejects impossible terminations', () => {
    const ok = { scheme: 'T568B', nearEnd: T568B, farEnd: T568B } as const;
    expect(() => classifyWiremap({ ...ok, nearEnd: T568B.slice(0, 7) })).toThrow(InvalidInputError);
    expect(() => classifyWiremap({ ...ok, nearEnd: withPins(T568B, { 2: 'white-orange' }) })).toThrow(/nearEnd\[1\]: white-orange appears on more than one pin/);
    expect(() => classifyWiremap({ ...ok, farEnd: withPins(T568B, { 3: 'pink' as ConductorColour }) })).toThrow(/farEnd\[2\]/);
    expect(() => classifyWiremap({ ...ok, scheme: 'T568C' as PinScheme })).toThrow(/scheme/);
    expect(() => classifyWiremap({ ...ok, shorts: [[4, 9]] })).toThrow(/shorts\[0\]/);
    expect(() => classifyWiremap({ ...ok, shorts: [[4, 4]] })).toThrow(/shorts\[0\]/);
    expect(() => classifyWiremap({ ...ok, opens: [0] })).toThrow(/opens\[0\]/);
  });
});

describe('wiremap properties', () => {
  const colours = fc.shuffledSubarray([...CONDUCTOR_COLOURS], { minLength: 8, maxLength: 8 });
  const end = fc
    .tuple(colours, fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }))
    .map(([order, missing]) => order.map((c, i) => (missing[i] ? null : c)));
  const scheme = fc.constantFrom<PinScheme>('T568A', 'T568B');

  it('a correctly terminated cable passes for both schemes', () => {
    fc.assert(
      fc.property(scheme, (s) => {
        const pins = s === 'T568A' ? T568A : T568B;
        const result = classifyWiremap({ scheme: s, nearEnd: pins, farEnd: pins });
        expect(result.verdict).toBe('pass');
        expect(result.map).toEqual(STRAIGHT);
      }),
    );
  });

  it('swapping the two ends mirrors the wiremap (the map becomes its inverse)', () => {
    fc.assert(
      fc.property(scheme, end, end, (s, near, far) => {
        const forward = classifyWiremap({ scheme: s, nearEnd: near, farEnd: far }).map;
        const backward = classifyWiremap({ scheme: s, nearEnd: far, farEnd: near }).map;
        const inverse: (number | null)[] = Array(8).fill(null);
        forward.forEach((to, i) => {
          if (to !== null) inverse[to - 1] = i + 1;
        });
        expect(backward).toEqual(inverse);
      }),
    );
  });

  it('swapping the ends keeps the verdict', () => {
    fc.assert(
      fc.property(scheme, end, end, (s, near, far) => {
        const forward = classifyWiremap({ scheme: s, nearEnd: near, farEnd: far });
        const backward = classifyWiremap({ scheme: s, nearEnd: far, farEnd: near });
        expect(backward.verdict).toBe(forward.verdict);
      }),
    );
  });

  it('the same order at both ends connects straight through, and passes only if it is the scheme', () => {
    fc.assert(
      fc.property(scheme, colours, (s, order) => {
        const result = classifyWiremap({ scheme: s, nearEnd: order, farEnd: order });
        expect(result.map).toEqual(STRAIGHT);
        const expected = s === 'T568A' ? T568A : T568B;
        expect(result.verdict === 'pass').toBe(order.every((c, i) => c === expected[i]));
      }),
    );
  });

  it('never sends two near-end pins to the same far-end pin', () => {
    fc.assert(
      fc.property(scheme, end, end, (s, near, far) => {
        const reached = classifyWiremap({ scheme: s, nearEnd: near, farEnd: far }).map.filter((p) => p !== null);
        expect(new Set(reached).size).toBe(reached.length);
      }),
    );
  });
});
