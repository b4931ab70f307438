import { circuitReading, type ReadingField, SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
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

/**
 * The plain reason a typed figure cannot be stored, using the limits of the field registry so the phone refuses
 * exactly what the server would; null when it is fine (or blank).
 */
export function readingProblem(entity: SyncEntityName, field: string, text: string, label: string, unit = ''): string | null {
  const value = parseReading(text);
  if (value === null) return null;
  if (Number.isNaN(value)) return `${label} must be a number, like 0.45.`;
  const type = SYNC_ENTITIES[entity].fields[field]?.type;
  if (!type || (type.kind !== 'number' && type.kind !== 'integer')) return null;
  const u = unit ? ` ${unit}` : '';
  if (type.kind === 'integer' && !Number.isInteger(value)) return `${label} must be a whole number.`;
  if (type.min !== undefined && value < type.min) return type.min === 0 ? `${label} cannot be negative.` : `${label} must be at least ${type.min}${u}.`;
  if (type.max !== undefined && value > type.max) return `${label} above ${type.max}${u} is not a real reading; check the figure.`;
  return null;
}

/** A zod field for one typed reading, checked against the registry's limits. */
export function readingField(entity: SyncEntityName, field: string, label: string, unit = '', required = false) {
  return z.string().superRefine((text, ctx) => {
    if (required && text.trim() === '') {
      ctx.addIssue({ code: 'custom', message: `Enter ${label.charAt(0).toLowerCase()}${label.slice(1)}.` });
      return;
    }
    const problem = readingProblem(entity, field, text, label, unit);
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });
}

/** A zod field for one circuit test reading, named and measured as core's catalogue of readings says. */
export function circuitReadingField(field: ReadingField, required = false) {
  const { label, unit } = circuitReading(field);
  return readingField('testResult', field, label, unit, required);
}

/** Only figures that can be judged: blank and malformed readings count as not entered. */
export function usableReading(text: string | null | undefined): number | null {
  const value = parseReading(text);
  return value === null || Number.isNaN(value) || value < 0 ? null : value;
}
