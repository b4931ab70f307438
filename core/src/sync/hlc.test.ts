import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clockProblem, compareHlc, EARLIEST_HLC_MS, formatHlc, MAX_CLOCK_AHEAD_MS, MAX_CLOCK_DRIFT_MS, parseHlc, receiveHlc, tickHlc } from './hlc.js';

describe('hybrid logical clock', () => {
  it('formats as time-counter-device and parses back', () => {
    const s = formatHlc({ ms: Date.parse('2026-03-14T09:26:53.589Z'), counter: 1, deviceId: 'd7f3' });
    expect(s).toBe('2026-03-14T09:26:53.589Z-0001-d7f3');
    expect(parseHlc(s)).toEqual({ ms: Date.parse('2026-03-14T09:26:53.589Z'), counter: 1, deviceId: 'd7f3' });
    expect(parseHlc('yesterday')).toBeNull();
    expect(parseHlc('2026-03-14T09:26:53.589Z-1-d7f3')).toBeNull();
  });

  it('never goes backwards when the wall clock steps back', () => {
    const a = tickHlc(null, 1_000_000, 'a');
    const b = tickHlc(a, 999_000, 'a');
    expect(compareHlc(formatHlc(b), formatHlc(a))).toBe(1);
  });

  it('orders a received event after everything the receiver had seen (clocks within a day of each other)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1e12, max: 2e12 }), fc.integer({ min: -86_000_000, max: 86_000_000 }), fc.integer({ min: 0, max: 500 }), (localMs, offset, c) => {
        const remoteMs = localMs + offset;
        const local = { ms: localMs, counter: c, deviceId: 'a' };
        const remote = { ms: remoteMs, counter: c, deviceId: 'b' };
        const next = receiveHlc(local, remote, Math.min(localMs, remoteMs), 'a');
        expect(compareHlc(formatHlc(next), formatHlc(local))).toBe(1);
        expect(next.ms > remote.ms || (next.ms === remote.ms && next.counter > remote.counter)).toBe(true);
      }),
    );
  });

  it('does not believe a device clock more than a day ahead', () => {
    const now = Date.parse('2026-12-02T10:00:00.000Z');
    const next = receiveHlc(null, { ms: now + 10 * MAX_CLOCK_DRIFT_MS, counter: 0, deviceId: 'b' }, now, 'a');
    expect(next.ms).toBe(now + MAX_CLOCK_DRIFT_MS + 0);
  });

  it('sorts clocks as strings in time order, ties broken by device id', () => {
    const t = Date.parse('2026-01-01T00:00:00.000Z');
    const list = [
      formatHlc({ ms: t + 1, counter: 0, deviceId: 'a' }),
      formatHlc({ ms: t, counter: 2, deviceId: 'a' }),
      formatHlc({ ms: t, counter: 2, deviceId: 'b' }),
      formatHlc({ ms: t, counter: 10, deviceId: 'a' }),
    ];
    expect([...list].sort(compareHlc)).toEqual([list[1], list[2], list[3], list[0]]);
  });

  it('takes only real dates from 2020 on', () => {
    expect(parseHlc('2026-02-31T10:00:00.000Z-0000-d7f3')).toBeNull();
    expect(parseHlc('2026-13-01T10:00:00.000Z-0000-d7f3')).toBeNull();
    expect(parseHlc('0000-01-01T00:00:00.000Z-0000-d7f3')).toBeNull();
    expect(parseHlc('2019-12-31T23:59:59.999Z-0000-d7f3')).toBeNull();
    expect(parseHlc(formatHlc({ ms: EARLIEST_HLC_MS, counter: 0, deviceId: 'd7f3' }))?.ms).toBe(EARLIEST_HLC_MS);
    expect(parseHlc('2028-02-29T10:00:00.000Z-0000-d7f3')).not.toBeNull();
  });

  it('tells a phone whose clock runs ahead of the receiver to set it, and lets a few seconds pass', () => {
    const now = Date.parse('2026-12-05T12:00:00.000Z');
    const at = (ms: number) => formatHlc({ ms, counter: 0, deviceId: 'd7f3' });
    expect(clockProblem(at(now + 5_000), now, MAX_CLOCK_AHEAD_MS)).toBeNull();
    expect(clockProblem(at(now - 30 * 86_400_000), now, MAX_CLOCK_AHEAD_MS)).toBeNull();
    expect(clockProblem(at(now + MAX_CLOCK_AHEAD_MS + 1), now, MAX_CLOCK_AHEAD_MS)).toMatch(/clock is ahead .* Set the phone's date and time to automatic/);
    expect(clockProblem('9999-12-31T23:59:59.999Z-0000-d7f3', now, MAX_CLOCK_AHEAD_MS)).toMatch(/clock is ahead/);
    expect(clockProblem('2026-02-31T10:00:00.000Z-0000-d7f3', now, MAX_CLOCK_AHEAD_MS)).toMatch(/real date/);
  });
});
