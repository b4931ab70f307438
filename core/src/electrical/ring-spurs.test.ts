import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { checkSpurs } from './ring-spurs.js';

// IET On-Site Guide (BS 7671:2018+A2:2022 edition) §7.2.2, as quoted on public pages (C2; the edition number of the
// guide was not confirmed, M): unfused spurs no more than the socket-outlets and stationary equipment connected directly
// in the circuit; one unfused spur feeds one single or twin socket-outlet or one permanently connected item (also
// BS 7671 Appendix 15, C1). No spur from a spur: common trade practice.
describe('checkSpurs', () => {
  it('passes one spur to one twin socket-outlet from a ring of eight points', () => {
    const r = checkSpurs({ socketsAndFcusOnRing: 8, unfusedSpurs: 1, spurFeeds: [1], spurFromSpur: false });
    expect(r.verdict).toBe('pass');
    expect(r.source).toContain('On-Site Guide');
  });

  it('allows as many spurs as points, and fails one more', () => {
    expect(checkSpurs({ socketsAndFcusOnRing: 4, unfusedSpurs: 4, spurFeeds: [1], spurFromSpur: false }).verdict).toBe('pass');
    const over = checkSpurs({ socketsAndFcusOnRing: 4, unfusedSpurs: 5, spurFeeds: [1], spurFromSpur: false });
    expect(over.verdict).toBe('fail');
    expect(over.findings.find((f) => f.name === 'spur-count')).toMatchObject({ verdict: 'fail', value: 5, limit: 4 });
  });

  it('fails a spur feeding two accessories, and a spur from a spur', () => {
    const two = checkSpurs({ socketsAndFcusOnRing: 8, unfusedSpurs: 1, spurFeeds: [2], spurFromSpur: false });
    expect(two.verdict).toBe('fail');
    expect(two.note).toMatch(/fused connection unit/);
    const chained = checkSpurs({ socketsAndFcusOnRing: 8, unfusedSpurs: 2, spurFeeds: [1, 1], spurFromSpur: true });
    expect(chained.verdict).toBe('fail');
    expect(chained.source).toMatch(/common trade practice/);
  });

  it('refuses nonsense', () => {
    expect(() => checkSpurs({ socketsAndFcusOnRing: 2.5, unfusedSpurs: 1, spurFeeds: [1], spurFromSpur: false })).toThrow(InvalidInputError);
    expect(() => checkSpurs({ socketsAndFcusOnRing: 3, unfusedSpurs: -1, spurFeeds: [], spurFromSpur: false })).toThrow(/unfusedSpurs/);
    expect(() => checkSpurs({ socketsAndFcusOnRing: 3, unfusedSpurs: 1, spurFeeds: [1, 1], spurFromSpur: false })).toThrow(/spurFeeds/);
    expect(() => checkSpurs({ socketsAndFcusOnRing: 3, unfusedSpurs: 1, spurFeeds: 1 as never, spurFromSpur: false })).toThrow(/spurFeeds/);
  });

  it('never passes more spurs than points (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 40 }), (points, spurs) => {
        const r = checkSpurs({ socketsAndFcusOnRing: points, unfusedSpurs: spurs, spurFeeds: [], spurFromSpur: false });
        expect(r.verdict === 'pass').toBe(spurs <= points);
      }),
    );
  });
});
