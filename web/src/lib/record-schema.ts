import { checkPhone, checkPostcode, type FieldSpec, SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
import { z } from 'zod';

/**
 * Zod fields for the office's forms, with their limits read from the field registry in @wiretrail/core, the same
 * limits the server and the phones apply. Form inputs hold text; each field turns it into the value the API takes
 * (a number, a choice, or null for an empty optional field), and every message names the field and what is wrong.
 */

function spec(entity: SyncEntityName, field: string): FieldSpec {
  const found = SYNC_ENTITIES[entity].fields[field];
  if (!found) throw new Error(`${entity}.${field} is not in the field registry`);
  return found;
}

function maxLength(entity: SyncEntityName, field: string): number {
  const t = spec(entity, field).type;
  if (t.kind !== 'string') throw new Error(`${entity}.${field} is not text`);
  return t.max;
}

const tooLong = (label: string, max: number) => `${label} must be at most ${max.toLocaleString('en-GB')} characters.`;

/** Text that must be given, such as a customer's name. */
export function requiredText(entity: SyncEntityName, field: string, label: string) {
  const max = maxLength(entity, field);
  return z.string().trim().min(1, `${label} must not be empty.`).max(max, tooLong(label, max));
}

/** Text that may be left empty, which clears it. */
export function optionalText(entity: SyncEntityName, field: string, label: string) {
  const max = maxLength(entity, field);
  return z
    .string()
    .trim()
    .max(max, tooLong(label, max))
    .transform((v) => (v === '' ? null : v));
}

/** An e-mail address that may be left empty. */
export function optionalEmail(entity: SyncEntityName, field: string, label: string) {
  return optionalText(entity, field, label).refine((v) => v === null || /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(v), `${label} must be an e-mail address, like name@example.com.`);
}

function checkedText(entity: SyncEntityName, field: string, label: string, check: (text: string) => { value: string } | { problem: string }) {
  return optionalText(entity, field, label).transform((v, ctx) => {
    if (v === null) return null;
    const checked = check(v);
    if ('value' in checked) return checked.value;
    ctx.addIssue({ code: 'custom', message: `${label} ${checked.problem}.` });
    return z.NEVER;
  });
}

/** A UK postcode that may be left empty, written as Royal Mail writes it; the server checks it the same way. */
export function optionalPostcode(entity: SyncEntityName, field: string, label: string) {
  return checkedText(entity, field, label, checkPostcode);
}

/** A phone number that may be left empty, written as it is dialled; the server checks it the same way. */
export function optionalPhone(entity: SyncEntityName, field: string, label: string) {
  return checkedText(entity, field, label, checkPhone);
}

/** A plain decimal as people type it: digits with a point or a comma, perhaps a sign. */
const DECIMAL = /^[-+]?(\d+([.,]\d*)?|[.,]\d+)$/;

/** A figure that may be left empty, within the registry's range; a decimal comma is read as a point. */
export function optionalNumber(entity: SyncEntityName, field: string, label: string, { unit = '', example }: { unit?: string; example?: number } = {}) {
  const t = spec(entity, field).type;
  if (t.kind !== 'number' && t.kind !== 'integer') throw new Error(`${entity}.${field} is not a number`);
  const { min, max } = t;
  const withUnit = (n: number) => (unit ? `${n} ${unit}` : String(n));
  const problemWith = (text: string): string | null => {
    if (!DECIMAL.test(text)) return `${label} must be a number, like ${withUnit(example ?? (min !== undefined && min > 0 ? min : 1))}.`;
    const n = Number(text.replace(',', '.'));
    if (t.kind === 'integer' && !Number.isInteger(n)) return `${label} must be a whole number.`;
    if (min !== undefined && n < min) return `${label} must be at least ${withUnit(min)}.`;
    if (max !== undefined && n > max) return `${label} must be at most ${withUnit(max)}.`;
    return null;
  };
  return z
    .string()
    .trim()
    .transform((text, ctx) => {
      if (text === '') return null;
      const problem = problemWith(text);
      if (problem) {
        ctx.addIssue({ code: 'custom', message: problem });
        return z.NEVER;
      }
      return Number(text.replace(',', '.'));
    });
}

/** The registry's choices for a field. */
export function choicesOf(entity: SyncEntityName, field: string): readonly string[] {
  const t = spec(entity, field).type;
  if (t.kind !== 'enum') throw new Error(`${entity}.${field} is not a choice`);
  return t.values;
}

/** One of the registry's choices, or none. */
export function optionalChoice(entity: SyncEntityName, field: string, label: string) {
  const values = choicesOf(entity, field);
  return z
    .string()
    .refine((v) => v === '' || values.includes(v), `${label} must be one of: ${values.join(', ')}.`)
    .transform((v) => (v === '' ? null : v));
}

/** The id of a record chosen from a list; `what` says what to choose, as in "Choose the board." */
export function requiredId(what: string) {
  return z.string().min(1, `Choose ${what}.`);
}

export function optionalId() {
  return z.string().transform((v) => (v === '' ? null : v));
}

/** A stored value as the text a form input holds. */
export const asText = (v: unknown): string => (v === null || v === undefined ? '' : String(v));

/** What a form's inputs hold when it opens: every field of its schema, from the record being changed, or empty. */
export function startingTexts<K extends string>(schema: { shape: Record<K, unknown> }, record?: object | null): Record<K, string> {
  const values = (record ?? {}) as Record<string, unknown>;
  return Object.fromEntries(Object.keys(schema.shape).map((k) => [k, asText(values[k])])) as Record<K, string>;
}

/**
 * The fields to send: all of them for a new record, and for an existing one only those the user changed, so that
 * a field someone else changed meanwhile (on a phone, say) is not overwritten with the value the form was opened with.
 */
export function fieldsToSend<T extends Record<string, unknown>>(values: T, dirty: Partial<Record<keyof T, unknown>> | undefined, isNew: boolean): Partial<T> {
  if (isNew) return Object.fromEntries(Object.entries(values).filter(([, v]) => v !== null)) as Partial<T>;
  return Object.fromEntries(Object.entries(values).filter(([k]) => dirty?.[k as keyof T])) as Partial<T>;
}
