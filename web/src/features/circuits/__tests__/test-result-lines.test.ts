import { assessCircuitTest, circuitReading, circuitTestInput, type CircuitTestKey } from '@wiretrail/core';
import { describe, expect, it } from 'vitest';
import { lineReadings, shortName } from '../desk/test-result-lines';

// The demo's ground-floor ring: a type B 32 A circuit-breaker with a 30 mA RCD, 2.5/1.5 mm² twin and earth.
const RING = { id: 'c1', kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
const RESULT = {
  id: 't1', r1Ohm: 0.37, rnOhm: 0.37, r2Ohm: 0.61, r1r2Ohm: 0.25, irLiveLiveMOhm: 200, irLiveEarthMOhm: 200, irTestVoltageV: 500,
  polarity: 'correct', zsOhm: 0.52, rcdTripMs: 24, rcdTripMs5x: 12, rcdButton: 'operates',
} as const;
const lines = assessCircuitTest(circuitTestInput(RING, RESULT, 'TN-C-S')).lines;
const line = (key: CircuitTestKey) => lines.find((l) => l.key === key)!;

describe("the office's test-results lines", () => {
  it('names each line by the short names in the catalogue of readings', () => {
    expect(shortName(line('ring-r1-rn'))).toBe('r1, rn');
    // The r2 line judges r1 as well, which the line above already shows.
    expect(shortName(line('ring-r2'))).toBe('r2');
    expect(shortName(line('ir-live-earth'))).toBe(circuitReading('irLiveEarthMOhm').short);
    expect(shortName(line('rcd-5x'))).toBe('5×');
  });

  it("shows each figure with the catalogue's unit and each answer in words", () => {
    expect(lineReadings(line('ring-r1-rn'), RESULT)).toBe('0.37 Ω');
    expect(lineReadings(line('ring-r2'), RESULT)).toBe('0.61 Ω');
    expect(lineReadings(line('ir-live-live'), RESULT)).toBe(`200 ${circuitReading('irLiveLiveMOhm').unit}`);
    expect(lineReadings(line('zs'), RESULT)).toBe('0.52 Ω');
    expect(lineReadings(line('rcd-1x'), RESULT)).toBe('24 ms');
    expect(lineReadings(line('polarity'), RESULT)).toBe('correct');
    expect(lineReadings(line('rcd-button'), RESULT)).toBe('trips');
  });

  it('shows a dash for a reading not recorded', () => {
    expect(lineReadings(line('zs'), { ...RESULT, zsOhm: null })).toBe('—');
  });
});
