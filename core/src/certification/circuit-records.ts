/**
 * A circuit row and a test-result row, as the phone's local tables and the server's database both hold them, made
 * into what the circuit test judges. Fields of the wrong kind count as not recorded, as a blank would.
 */
import type { PolarityResult } from '../electrical/protective-conductor.js';
import { POLARITY_RESULTS, RCD_BUTTON_RESULTS } from '../sync/entities.js';
import { CIRCUIT_READING_FIELDS } from './circuit-readings.js';
import type { CircuitReadings, CircuitTestInput, CircuitUnderTest } from './circuit-test.js';

/** A synced row: its id and its fields by name. */
export interface RecordRow {
  readonly id: string;
  readonly [field: string]: unknown;
}

export const textOf = (v: unknown): string => (typeof v === 'string' ? v.trim() : '');
const numberOf = (v: unknown): number | null => (typeof v === 'number' ? v : null);
const stringOf = (v: unknown): string | null => (typeof v === 'string' ? v : null);
const oneOf = <T extends string>(values: readonly T[], v: unknown): T | null => (values.find((x) => x === v) ?? null);

export function circuitUnderTest(circuit: RecordRow): CircuitUnderTest {
  return {
    kind: stringOf(circuit.kind),
    deviceType: stringOf(circuit.deviceType),
    deviceRatingA: numberOf(circuit.deviceRatingA),
    rcdRatingMa: numberOf(circuit.rcdRatingMa),
    rcdType: stringOf(circuit.rcdType),
    liveCsaMm2: numberOf(circuit.liveCsaMm2),
    cpcCsaMm2: numberOf(circuit.cpcCsaMm2),
  };
}

export function readingsOf(test: RecordRow): CircuitReadings {
  const figures = Object.fromEntries(CIRCUIT_READING_FIELDS.map((f) => [f, numberOf(test[f])]));
  return {
    ...figures,
    polarity: oneOf<PolarityResult>(POLARITY_RESULTS, test.polarity),
    rcdButton: oneOf(RCD_BUTTON_RESULTS, test.rcdButton),
  };
}

/** One test of one circuit, ready for assessCircuitTest. */
export function circuitTestInput(circuit: RecordRow, test: RecordRow, earthing: string | null | undefined): CircuitTestInput {
  return { circuit: circuitUnderTest(circuit), readings: readingsOf(test), earthing: earthing ?? null };
}

/** "Circuit 2 (Sockets, first floor)", as every list and refusal names a circuit. */
export function circuitName(circuit: RecordRow): string {
  const description = textOf(circuit.description);
  return `Circuit ${textOf(circuit.number) || '?'}${description ? ` (${description})` : ''}`;
}
