import type { CircuitReadings, CircuitTestAssessment, CircuitUnderTest } from '@wiretrail/core';
import { assessCircuitTest } from '@wiretrail/core';
import type { CircuitRow, TestResultRow } from '@/lib/db';
import { usableReading } from '@/lib/readings';

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
}

export const NUMERIC_READINGS = ['r1Ohm', 'rnOhm', 'r2Ohm', 'r1r2Ohm', 'irLiveLiveMOhm', 'irLiveEarthMOhm', 'zsOhm', 'rcdTripMs', 'rcdTripMs5x'] as const;

export function circuitUnderTest(c: CircuitRow): CircuitUnderTest {
  return { kind: c.kind, deviceType: c.deviceType, deviceRatingA: c.deviceRatingA, rcdRatingMa: c.rcdRatingMa, rcdType: c.rcdType, liveCsaMm2: c.liveCsaMm2, cpcCsaMm2: c.cpcCsaMm2, lengthM: c.lengthM };
}

export function fromTyped(t: TypedReadings): CircuitReadings {
  const out: Record<string, unknown> = {};
  for (const f of NUMERIC_READINGS) out[f] = usableReading(t[f]);
  out.irTestVoltageV = t.irTestVoltageV ? Number(t.irTestVoltageV) : null;
  out.polarity = t.polarity || null;
  out.rcdButton = t.rcdButton || null;
  return out as CircuitReadings;
}

export function fromStored(r: TestResultRow | undefined): CircuitReadings {
  return {
    r1Ohm: r?.r1Ohm, rnOhm: r?.rnOhm, r2Ohm: r?.r2Ohm, r1r2Ohm: r?.r1r2Ohm, irLiveLiveMOhm: r?.irLiveLiveMOhm, irLiveEarthMOhm: r?.irLiveEarthMOhm,
    irTestVoltageV: r?.irTestVoltageV, polarity: r?.polarity, zsOhm: r?.zsOhm, rcdTripMs: r?.rcdTripMs, rcdTripMs5x: r?.rcdTripMs5x, rcdButton: r?.rcdButton,
  };
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
