import { circuitReading, mayBeOverRange, overRangeLimit, type ReadingField, SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
import { z } from 'zod';

/** What a technician types: digits with a point or a comma; blank means not measured yet. */
export function parseReading(text: string | null | undefined): number | null {
  const t = (text ?? '').trim().replace(',', '.');
  if (t === '') return null;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(t) ? Number(t) : Number.NaN;
}

export function readingText(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}

/** A figure of the unit as an instrument or a datasheet shows it, for the example in a message. */
const EXAMPLES: Record<string, string> = {
  Ω: '0.45', MΩ: '200', ms: '18', V: '500', m: '25', ns: '250', A: '32', mA: '30', 'mm²': '2.5', s: '0.4', W: '3000',
};
export function readingExample(unit: string): string {
  return EXAMPLES[unit] ?? '2';
}

/**
 * The plain reason a typed figure cannot be stored, using the limits of the field registry so the phone refuses
 * exactly what the server would; null when it is fine (or blank). Where the instrument may show over-range
 * (insulation resistance), ">299" is the reading at the limit of its range.
 */
export function readingProblem(entity: SyncEntityName, field: string, text: string, label: string, unit = '', overRange = false): string | null {
  const limit = overRange ? overRangeLimit(text) : null;
  const value = limit ?? parseReading(text);
  if (value === null) return null;
  if (Number.isNaN(value)) {
    const u = unit ? ` ${unit}` : '';
    return overRange
      ? `${label} must be a number, like ${readingExample(unit)}${u}, or the tester's over-range display, like >299.`
      : `${label} must be a number, like ${readingExample(unit)}${u}.`;
  }
  const type = SYNC_ENTITIES[entity].fields[field]?.type;
  if (!type || (type.kind !== 'number' && type.kind !== 'integer')) return null;
  const u = unit ? ` ${unit}` : '';
  if (type.kind === 'integer' && !Number.isInteger(value)) return `${label} must be a whole number.`;
  if (type.min !== undefined && value < type.min) return type.min === 0 ? `${label} cannot be negative.` : `${label} must be at least ${type.min}${u}.`;
  if (type.max !== undefined && value > type.max) return `${label} above ${type.max}${u} is not a real reading; check the figure.`;
  return null;
}

/** A zod field for one typed reading, checked against the registry's limits. */
export function readingField(entity: SyncEntityName, field: string, label: string, unit = '', required = false, overRange = false) {
  return z.string().superRefine((text, ctx) => {
    if (required && text.trim() === '') {
      ctx.addIssue({ code: 'custom', message: `Enter ${label.charAt(0).toLowerCase()}${label.slice(1)}.` });
      return;
    }
    const problem = readingProblem(entity, field, text, label, unit, overRange);
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });
}

/** A zod field for one circuit test reading, named and measured as core's catalogue of readings says. */
export function circuitReadingField(field: ReadingField, required = false) {
  const { label, unit } = circuitReading(field);
  return readingField('testResult', field, label, unit, required, mayBeOverRange(field));
}

/** A typed reading that may be the instrument's over-range display: ">299" is 299 over range. */
export function instrumentReading(text: string | null | undefined): { value: number | null; overRange: boolean } {
  const limit = overRangeLimit(text ?? '');
  return limit !== null ? { value: limit, overRange: true } : { value: usableReading(text), overRange: false };
}

/** Only figures that can be judged: blank and malformed readings count as not entered. */
export function usableReading(text: string | null | undefined): number | null {
  const value = parseReading(text);
  return value === null || Number.isNaN(value) || value < 0 ? null : value;
}
