/**
 * The readings a circuit test records, each once: how the phone's form and its messages name it, how a sentence
 * names it, its unit, the tests that judge it, where its limit comes from and the bounds a typed figure must keep.
 * The phone's form, the sign-off, the certificate and the server's issue check all read this list.
 */
import type { RuleSet } from '../rules/rule-set.js';
import { SYNC_ENTITIES } from '../sync/entities.js';
import { OVER_RANGE_FLAGS, type CircuitTestKey, type OverRangeReading, type ReadingField } from './circuit-test.js';

export interface CircuitReadingSpec {
  readonly field: ReadingField;
  /** As the phone's form names it, and its messages about a typed figure. */
  readonly label: string;
  /** Inside a sentence: "… has no reading (live–earth insulation resistance)". */
  readonly words: string;
  /** Beside another reading of the same test, as in "r1 0.52 Ω · rn 0.53 Ω". */
  readonly short: string;
  /** Empty for an answer (polarity, the RCD's button) rather than a figure. */
  readonly unit: string;
  /** The lines of the circuit test that judge it. */
  readonly judgedBy: readonly CircuitTestKey[];
  /** The published source of the limit it is judged against. */
  readonly source: (rules: RuleSet) => string;
}

export const CIRCUIT_READINGS = [
  { field: 'r1Ohm', label: 'r1', words: 'r1', short: 'r1', unit: 'Ω', judgedBy: ['ring-r1-rn', 'ring-r2'], source: (r) => r.ring.endToEndTolerance.source },
  { field: 'rnOhm', label: 'rn', words: 'rn', short: 'rn', unit: 'Ω', judgedBy: ['ring-r1-rn'], source: (r) => r.ring.endToEndTolerance.source },
  { field: 'r2Ohm', label: 'r2', words: 'r2', short: 'r2', unit: 'Ω', judgedBy: ['ring-r2'], source: (r) => r.ring.r2RatioTolerance.source },
  { field: 'r1r2Ohm', label: 'R1+R2', words: 'R1+R2', short: 'R1+R2', unit: 'Ω', judgedBy: ['r1r2'], source: (r) => r.circuitTests.protectiveConductorSource },
  {
    field: 'irLiveLiveMOhm', label: 'Insulation live to live', words: 'live–live insulation resistance', short: 'L–L', unit: 'MΩ',
    judgedBy: ['ir-live-live'], source: (r) => r.insulation.source,
  },
  {
    field: 'irLiveEarthMOhm', label: 'Insulation live to earth', words: 'live–earth insulation resistance', short: 'L–E', unit: 'MΩ',
    judgedBy: ['ir-live-earth'], source: (r) => r.insulation.source,
  },
  {
    field: 'irTestVoltageV', label: 'Insulation test voltage', words: 'insulation test voltage', short: 'at', unit: 'V',
    judgedBy: ['ir-live-live', 'ir-live-earth'], source: (r) => r.insulation.source,
  },
  { field: 'polarity', label: 'Polarity', words: 'polarity', short: 'polarity', unit: '', judgedBy: ['polarity'], source: (r) => r.circuitTests.polaritySource },
  { field: 'zsOhm', label: 'Zs', words: 'Zs', short: 'Zs', unit: 'Ω', judgedBy: ['zs'], source: (r) => r.earthFaultLoop.circuitBreakers.B.source },
  { field: 'rcdTripMs', label: 'The RCD time', words: 'RCD operating time', short: '1×', unit: 'ms', judgedBy: ['rcd-1x'], source: (r) => r.rcd.times.general[1].max.source },
  {
    field: 'rcdTripMs5x', label: 'The RCD time at 5 ×', words: 'RCD operating time at 5 IΔn', short: '5×', unit: 'ms',
    judgedBy: ['rcd-5x'], source: (r) => r.rcd.times.general[5].max.source,
  },
  { field: 'rcdButton', label: 'RCD test button', words: 'RCD test button', short: 'button', unit: '', judgedBy: ['rcd-button'], source: (r) => r.circuitTests.rcdButtonSource },
  { field: 'r2LeadOhm', label: 'R2 (long lead)', words: 'R2', short: 'R2', unit: 'Ω', judgedBy: ['r1r2'], source: (r) => r.circuitTests.protectiveConductorSource },
  {
    field: 'afddButton', label: 'AFDD test button', words: 'AFDD test button', short: 'button', unit: '', judgedBy: ['afdd-button'],
    source: (r) => `${r.edition} Appendix 6 (AFDD test button operation)`,
  },
] as const satisfies readonly CircuitReadingSpec[];

export const CIRCUIT_READING_FIELDS: readonly ReadingField[] = CIRCUIT_READINGS.map((r) => r.field);

const BY_FIELD = new Map<ReadingField, CircuitReadingSpec>(CIRCUIT_READINGS.map((r) => [r.field, r]));

export function circuitReading(field: ReadingField): CircuitReadingSpec {
  const spec = BY_FIELD.get(field);
  if (!spec) throw new Error(`${field} is not a circuit reading.`);
  return spec;
}

/** The figures a typed reading must keep to be stored at all: the field registry's, which the server enforces. */
export function readingBounds(field: ReadingField): { readonly min?: number; readonly max?: number; readonly whole: boolean } | null {
  const type = SYNC_ENTITIES.testResult.fields[field]?.type;
  if (!type || (type.kind !== 'number' && type.kind !== 'integer')) return null;
  return { min: type.min, max: type.max, whole: type.kind === 'integer' };
}

/** Whether a reading may be recorded as over the instrument's range (insulation resistance). */
export function mayBeOverRange(field: ReadingField): field is OverRangeReading {
  return Object.prototype.hasOwnProperty.call(OVER_RANGE_FLAGS, field);
}

/**
 * What a technician types for an instrument showing over-range: ">299", "> 999", "≥299" or ">=299". Gives the
 * instrument's limit, or null when the text is not of that form.
 */
export function overRangeLimit(text: string): number | null {
  const m = /^\s*(?:>=?|≥)\s*(\d+(?:[.,]\d+)?)\s*(?:MΩ|M|Mohm)?\s*$/iu.exec(text);
  return m ? Number(m[1]!.replace(',', '.')) : null;
}

/** A reading as the instrument showed it and a certificate prints it: "0.45 Ω", ">299 MΩ"; empty when not recorded. */
export function readingWords(row: { readonly [field: string]: unknown }, field: ReadingField): string {
  const value = row[field];
  if (value === null || value === undefined || value === '') return '';
  const { unit } = circuitReading(field);
  const over = mayBeOverRange(field) && row[OVER_RANGE_FLAGS[field]] === true ? '>' : '';
  return typeof value === 'number' ? `${over}${value}${unit ? ` ${unit}` : ''}` : String(value);
}
