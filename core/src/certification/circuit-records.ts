/**
 * A circuit row and a test-result row, as the phone's local tables and the server's database both hold them, made
 * into what the circuit test judges. Fields of the wrong kind count as not recorded, as a blank would.
 */
import type { PolarityResult } from '../electrical/protective-conductor.js';
import { POLARITY_RESULTS, RCD_BUTTON_RESULTS, type RowOf, TEST_BUTTON_RESULTS, type SyncEntityName } from '../sync/entities.js';
import { CIRCUIT_READING_FIELDS } from './circuit-readings.js';
import type { CircuitReadings, CircuitTestInput, CircuitUnderTest } from './circuit-test.js';

/**
 * A row of a synced entity as either side holds it: the registry's field names, with values not yet trusted (the
 * phone's tables and the server's loose rows type them differently, and both may hold what an old version wrote).
 */
export type LooseRowOf<E extends SyncEntityName> = { readonly id: string } & { readonly [K in Exclude<keyof RowOf<E>, 'id'>]?: unknown };
/** A test result, with the time its row was made to stand in for a test time never entered. */
export type TestResultRecord = LooseRowOf<'testResult'> & { readonly createdAt?: unknown };

export const textOf = (v: unknown): string => (typeof v === 'string' ? v.trim() : '');
const numberOf = (v: unknown): number | null => (typeof v === 'number' ? v : null);
const stringOf = (v: unknown): string | null => (typeof v === 'string' ? v : null);
const oneOf = <T extends string>(values: readonly T[], v: unknown): T | null => (values.find((x) => x === v) ?? null);

export function circuitUnderTest(circuit: LooseRowOf<'circuit'>): CircuitUnderTest {
  return {
    kind: stringOf(circuit.kind),
    deviceType: stringOf(circuit.deviceType),
    deviceRatingA: numberOf(circuit.deviceRatingA),
    rcdRatingMa: numberOf(circuit.rcdRatingMa),
    rcdType: stringOf(circuit.rcdType),
    liveCsaMm2: numberOf(circuit.liveCsaMm2),
    cpcCsaMm2: numberOf(circuit.cpcCsaMm2),
    lengthM: numberOf(circuit.lengthM),
    faultProtection: stringOf(circuit.faultProtection),
  };
}

export function readingsOf(test: LooseRowOf<'testResult'>): CircuitReadings {
  const figures = Object.fromEntries(CIRCUIT_READING_FIELDS.map((f) => [f, numberOf(test[f])]));
  return {
    ...figures,
    irLiveLiveOverRange: test.irLiveLiveOverRange === true,
    irLiveEarthOverRange: test.irLiveEarthOverRange === true,
    polarity: oneOf<PolarityResult>(POLARITY_RESULTS, test.polarity),
    rcdButton: oneOf(RCD_BUTTON_RESULTS, test.rcdButton),
    afddButton: oneOf(TEST_BUTTON_RESULTS, test.afddButton),
  };
}

/** One test of one circuit, ready for assessCircuitTest. */
export function circuitTestInput(circuit: LooseRowOf<'circuit'>, test: LooseRowOf<'testResult'>, earthing: string | null | undefined): CircuitTestInput {
  return { circuit: circuitUnderTest(circuit), readings: readingsOf(test), earthing: earthing ?? null };
}

/** "Circuit 2 (Sockets, first floor)", as every list and refusal names a circuit. */
export function circuitName(circuit: LooseRowOf<'circuit'>): string {
  const description = textOf(circuit.description);
  return `Circuit ${textOf(circuit.number) || '?'}${description ? ` (${description})` : ''}`;
}
