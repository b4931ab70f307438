import type { CircuitReadings, CircuitTestAssessment, ReadingField } from '@wiretrail/core';
import { assessCircuitTest, circuitUnderTest, readingsOf } from '@wiretrail/core';
import type { CircuitRow } from '@/lib/db';
import { instrumentReading, usableReading } from '@/lib/readings';

/** The readings a form holds, as typed. */
export interface TypedReadings {
  r1Ohm: string;
  rnOhm: string;
  r2Ohm: string;
  r1r2Ohm: string;
  irLiveLiveMOhm: string;
  irLiveEarthMOhm: string;
  irTestVoltageV: '' | '250' | '500' | '1000';
  polarity: '' | 'correct' | 'incorrect';
  zsOhm: string;
  rcdTripMs: string;
  rcdTripMs5x: string;
  rcdButton: '' | 'operates' | 'fails';
  r2LeadOhm: string;
  afddButton: '' | 'operates' | 'fails';
}

/** The readings typed as figures; the test voltage and the answers are chosen. */
export const NUMERIC_READINGS = ['r1Ohm', 'rnOhm', 'r2Ohm', 'r1r2Ohm', 'irLiveLiveMOhm', 'irLiveEarthMOhm', 'zsOhm', 'rcdTripMs', 'rcdTripMs5x', 'r2LeadOhm'] as const satisfies readonly ReadingField[];

/** The typed readings as a test result stores them: blank and malformed figures are not recorded. */
export function storedReadings(t: TypedReadings) {
  const liveLive = instrumentReading(t.irLiveLiveMOhm);
  const liveEarth = instrumentReading(t.irLiveEarthMOhm);
  return {
    ...Object.fromEntries(NUMERIC_READINGS.map((f) => [f, usableReading(t[f])])),
    // ">299" typed off the tester: its range's top, marked over range.
    irLiveLiveMOhm: liveLive.value,
    irLiveLiveOverRange: liveLive.value === null ? null : liveLive.overRange,
    irLiveEarthMOhm: liveEarth.value,
    irLiveEarthOverRange: liveEarth.value === null ? null : liveEarth.overRange,
    irTestVoltageV: t.irTestVoltageV ? Number(t.irTestVoltageV) : null,
    polarity: t.polarity || null,
    rcdButton: t.rcdButton || null,
    afddButton: t.afddButton || null,
  };
}

/** What the typed readings are judged as: the same mapping the server applies to the stored row. */
export function fromTyped(t: TypedReadings): CircuitReadings {
  return readingsOf({ id: '', ...storedReadings(t) });
}

export function assess(circuit: CircuitRow, readings: CircuitReadings, earthing: string | null | undefined): CircuitTestAssessment {
  return assessCircuitTest({ circuit: circuitUnderTest(circuit), readings, earthing });
}

/** What is kept beside the readings: the verdicts the phone showed, with the rule set that gave them. */
export function verdictSummary(a: CircuitTestAssessment) {
  return {
    ruleSetId: a.ruleSetId,
    verdict: a.verdict,
    lines: Object.fromEntries(a.lines.map((l) => [l.key, l.result.verdict])),
    missing: a.missing.map((l) => l.key),
  };
}
