import { type FieldSpec, formatHlc, SYNC_ENTITIES, SYNC_ENTITY_NAMES } from '@wiretrail/core';
import { getMetadataStorage } from 'class-validator';
import type { ValidationMetadata } from 'class-validator/types/metadata/ValidationMetadata.js';
import fc from 'fast-check';

/**
 * fast-check arbitraries for hostile requests, built from what the app itself declares: a DTO's class-validator
 * constraints and the field registry of synced entities. Each value is mostly near what the field accepts (so that
 * requests get past validation and into the services), sometimes anything JSON can say.
 */

/** Ids worth aiming at: rows that exist, in this organisation and another. */
export interface IdPool {
  own: string[];
  foreign: string[];
  /** Own rows by entity, for synced references. */
  byEntity: Map<string, string[]>;
}

/** Names a hostile client tries on any object. */
const SPECIAL_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'id', 'organisationId', ''];
/** Strings that have broken parsers, paths and SQL before. */
export const NASTY_STRINGS = [
  '../../etc/passwd', '..%2f..%2fetc%2fpasswd', '%2e%2e%2f', '..\\..\\windows', '/etc/passwd', '\u0000', 'a\u0000b', "'; DROP TABLE job; --",
  '" OR 1=1 --', '%', '%%', '_', '\\', '{}', '[]', 'null', 'NaN', 'Infinity', '-0', '1e309', ' ', '\u202e', '😀'.repeat(50), 'x'.repeat(10_001),
];

const anyJson = fc.jsonValue({ maxDepth: 3 });
const nasty = fc.constantFrom(...NASTY_STRINGS);
const textOf = (max: number) =>
  fc.oneof(
    { arbitrary: fc.string({ maxLength: Math.min(max, 60) }), weight: 5 },
    { arbitrary: fc.string({ unit: 'grapheme', maxLength: 20 }), weight: 2 },
    { arbitrary: fc.constant('x'.repeat(max)), weight: 1 },
    { arbitrary: fc.constant('y'.repeat(max + 1)), weight: 1 },
    { arbitrary: nasty, weight: 2 },
  );
const isoTime = fc.date({ min: new Date('1900-01-01T00:00:00Z'), max: new Date('2200-01-01T00:00:00Z'), noInvalidDate: true }).map((d) => d.toISOString());
const timeish = fc.oneof(isoTime, fc.constantFrom('2026-02-30T10:00:00Z', '2026-13-01T00:00:00Z', '2026-12-02', '2026-12-02T25:61:00Z', '0000-00-00T00:00:00Z', '+275760-09-13T00:00:00.000Z'), nasty);
const numberAround = (min = -1e6, max = 1e6, integer = false) =>
  fc.oneof(
    { arbitrary: integer ? fc.integer({ min: Math.max(min, -(2 ** 31)), max: Math.min(max, 2 ** 31) }) : fc.double({ min, max, noNaN: true }), weight: 5 },
    { arbitrary: fc.constantFrom(min - 1, max + 1, 0, -0, 0.5, Number.MAX_SAFE_INTEGER + 2, -1e308, 1e308), weight: 2 },
    { arbitrary: fc.string({ maxLength: 8 }), weight: 1 },
  );

function idOf(pool: IdPool, entity?: string): fc.Arbitrary<string> {
  const own = (entity && pool.byEntity.get(entity)) || pool.own;
  return fc.oneof(
    { arbitrary: fc.constantFrom(...own), weight: 5 },
    { arbitrary: fc.constantFrom(...pool.own), weight: 1 },
    { arbitrary: fc.constantFrom(...pool.foreign), weight: 1 },
    { arbitrary: fc.uuid(), weight: 2 },
    { arbitrary: fc.oneof(nasty, fc.string({ maxLength: 40 })), weight: 1 },
  );
}

/** A value near what one class-validator-checked property accepts. */
function plausible(rules: ValidationMetadata[], pool: IdPool): fc.Arbitrary<unknown> {
  const rule = (name: string) => rules.find((r) => r.name === name);
  const min = rule('min')?.constraints[0] as number | undefined;
  const max = rule('max')?.constraints[0] as number | undefined;
  if (rule('isIn')) return fc.oneof({ arbitrary: fc.constantFrom(...(rule('isIn')!.constraints[0] as unknown[])), weight: 5 }, { arbitrary: fc.string({ maxLength: 12 }), weight: 1 });
  if (rule('isUuid')) return idOf(pool);
  if (rule('isIso8601') || rule('isDateString')) return timeish;
  if (rule('isBoolean')) return fc.oneof({ arbitrary: fc.boolean(), weight: 5 }, { arbitrary: fc.constantFrom('true', 1, 0, 'yes'), weight: 1 });
  if (rule('isInt')) return numberAround(min, max, true);
  if (rule('isNumber')) return numberAround(min, max);
  if (rule('isEmail')) return fc.oneof(fc.emailAddress(), textOf(80));
  if (rule('matches')) return fc.oneof({ arbitrary: fc.stringMatching(caseSensitive(rule('matches')!.constraints[0] as RegExp)), weight: 4 }, { arbitrary: textOf(80), weight: 1 });
  if (rule('isString')) return textOf((rule('maxLength')?.constraints[0] as number | undefined) ?? 200);
  return anyJson;
}

/** fast-check cannot generate from an /i pattern; without the flag it matches a subset, so every string it makes still passes. */
function caseSensitive(pattern: RegExp): RegExp {
  return pattern.flags.includes('i') ? new RegExp(pattern.source, pattern.flags.replace('i', '')) : pattern;
}

/** The constraints of each property of a DTO, as the ValidationPipe reads them (inherited ones included). */
export function dtoProperties(dto: new (...args: never[]) => unknown): Map<string, ValidationMetadata[]> {
  const props = new Map<string, ValidationMetadata[]>();
  for (const m of getMetadataStorage().getTargetValidationMetadatas(dto, '', true, false)) props.set(m.propertyName, [...(props.get(m.propertyName) ?? []), m]);
  return props;
}

function propertyValue(rules: ValidationMetadata[], pool: IdPool): fc.Arbitrary<unknown> {
  const each = rules.filter((r) => r.each);
  const whole = rules.filter((r) => !r.each);
  const value = whole.some((r) => r.name === 'isArray' || r.name === 'arrayUnique' || r.name === 'arrayMaxSize')
    ? fc.array(plausible(each, pool), { maxLength: 6 })
    : plausible(whole, pool);
  return fc.oneof(
    { arbitrary: value, weight: 8 },
    { arbitrary: fc.constant(null), weight: 1 },
    { arbitrary: anyJson, weight: 1 },
  );
}

/** An object for a DTO: any of its properties, near-valid values, now and then keys it does not know. */
export function dtoObject(dto: new (...args: never[]) => unknown, pool: IdPool): fc.Arbitrary<Record<string, unknown>> {
  const shape = Object.fromEntries([...dtoProperties(dto)].map(([name, rules]) => [name, propertyValue(rules, pool)]));
  return fc
    .tuple(
      fc.record(shape, { requiredKeys: [] }),
      fc.oneof({ arbitrary: fc.constant({}), weight: 6 }, { arbitrary: fc.dictionary(fc.oneof(fc.constantFrom(...SPECIAL_KEYS), fc.string({ maxLength: 10 })), anyJson, { maxKeys: 3 }), weight: 1 }),
    )
    .map(([known, extra]) => ({ ...extra, ...known }));
}

/** Anything at all as a JSON body: objects, arrays, strings, numbers, null. */
export const anyBody = fc.oneof(anyJson, fc.array(anyJson, { maxLength: 5 }), fc.dictionary(fc.oneof(fc.constantFrom(...SPECIAL_KEYS), fc.string()), anyJson));

/** A query string for a DTO: its properties as text (lists as repeated keys), sometimes keys of its own. */
export function queryString(dto: (new (...args: never[]) => unknown) | null, pool: IdPool): fc.Arbitrary<string> {
  const object = dto ? dtoObject(dto, pool) : fc.dictionary(fc.string({ maxLength: 10 }), anyJson, { maxKeys: 3 });
  return object.map((o) => {
    const q = new URLSearchParams();
    for (const [k, v] of Object.entries(o)) {
      // Capped so the request line stays within Node's header limit: past it Node answers 431 before our code runs.
      for (const one of Array.isArray(v) ? v : [v]) q.append(k, (one === null ? '' : typeof one === 'object' ? JSON.stringify(one) : String(one)).slice(0, 1000));
    }
    return q.toString();
  });
}

/** A path parameter: a real id, somebody else's, a made-up one, or text that has no business in a path. */
export const pathValue = (pool: IdPool) =>
  fc.oneof(
    { arbitrary: idOf(pool), weight: 6 },
    { arbitrary: fc.string({ minLength: 1, maxLength: 60 }), weight: 2 },
    { arbitrary: fc.stringMatching(/^[A-Za-z0-9_-]{43}$/), weight: 1 },
  );

function syncValue(spec: FieldSpec | undefined, pool: IdPool): fc.Arbitrary<unknown> {
  if (!spec) return anyJson;
  const t = spec.type;
  switch (t.kind) {
    case 'string':
      return textOf(t.max);
    case 'number':
    case 'integer':
      return numberAround(t.min, t.max, t.kind === 'integer');
    case 'boolean':
      return fc.boolean();
    case 'datetime':
      return timeish;
    case 'ref':
      return idOf(pool, t.entity);
    case 'refs':
      return fc.array(idOf(pool, t.entity), { maxLength: 4 });
    case 'enum':
      return fc.oneof({ arbitrary: fc.constantFrom(...t.values), weight: 4 }, { arbitrary: fc.string({ maxLength: 10 }), weight: 1 });
    case 'json':
      return anyJson;
  }
}

const BOOKKEEPING = ['id', 'organisationId', 'version', 'fieldMeta', 'deletedAt', 'createdById', 'updatedById', 'createdAt', 'updatedAt'];

/** The `set` of a mutation to an entity: its own fields with near-valid values, the server's own, and nonsense. */
function syncSet(entity: string, pool: IdPool): fc.Arbitrary<unknown> {
  const spec = Object.prototype.hasOwnProperty.call(SYNC_ENTITIES, entity) ? SYNC_ENTITIES[entity as keyof typeof SYNC_ENTITIES] : null;
  const own = spec ? Object.keys(spec.fields) : [];
  const field = fc.oneof(
    { arbitrary: own.length ? fc.constantFrom(...own) : fc.string(), weight: 8 },
    { arbitrary: fc.constantFrom(...BOOKKEEPING, ...SPECIAL_KEYS), weight: 1 },
    { arbitrary: fc.string({ maxLength: 12 }), weight: 1 },
  );
  const specOf = (f: string) => (spec && Object.prototype.hasOwnProperty.call(spec.fields, f) ? spec.fields[f] : undefined);
  const entry = field.chain((f) => fc.tuple(fc.constant(f), fc.oneof({ arbitrary: syncValue(specOf(f), pool), weight: 8 }, { arbitrary: fc.constant(null), weight: 1 }, { arbitrary: anyJson, weight: 1 })));
  return fc.oneof(
    { arbitrary: fc.array(entry, { maxLength: 8 }).map((entries) => Object.fromEntries(entries)), weight: 10 },
    { arbitrary: anyJson, weight: 1 },
  );
}

/** One mutation as a phone might send it, or as anything might. */
export function syncMutation(pool: IdPool, usedMutationIds: string[]): fc.Arbitrary<unknown> {
  const entity = fc.oneof(
    { arbitrary: fc.constantFrom(...SYNC_ENTITY_NAMES), weight: 10 },
    { arbitrary: fc.oneof(fc.constantFrom(...SPECIAL_KEYS), fc.string({ maxLength: 10 }), anyJson), weight: 1 },
  );
  const hlc = fc.oneof(
    { arbitrary: fc.tuple(fc.date({ min: new Date('2020-01-01T00:00:00Z'), max: new Date('2035-01-01T00:00:00Z'), noInvalidDate: true }), fc.nat(0xffff), fc.stringMatching(/^[A-Za-z0-9_-]{1,64}$/)).map(([d, counter, deviceId]) => formatHlc({ ms: d.getTime(), counter, deviceId })), weight: 8 },
    { arbitrary: fc.oneof(fc.string(), anyJson), weight: 1 },
  );
  const mutation = entity.chain((e) =>
    fc.record(
      {
        mutationId: fc.oneof({ arbitrary: fc.uuid(), weight: 8 }, { arbitrary: fc.constantFrom('reused-id', ...usedMutationIds.slice(0, 20), 'short'), weight: 1 }, { arbitrary: anyJson, weight: 1 }),
        entity: fc.constant(e),
        id: fc.oneof({ arbitrary: idOf(pool, typeof e === 'string' ? e : undefined), weight: 9 }, { arbitrary: anyJson, weight: 1 }),
        baseVersion: fc.oneof({ arbitrary: fc.nat(10_000), weight: 6 }, { arbitrary: fc.constantFrom(-1, 0.5, 2 ** 53, '3', null), weight: 1 }, { arbitrary: anyJson, weight: 1 }),
        set: typeof e === 'string' ? syncSet(e, pool) : anyJson,
        delete: fc.oneof({ arbitrary: fc.constant(true), weight: 2 }, { arbitrary: fc.constant(false), weight: 1 }, { arbitrary: anyJson, weight: 1 }),
        hlc,
      },
      { requiredKeys: ['mutationId', 'entity', 'id', 'hlc'] },
    ),
  );
  return fc.oneof({ arbitrary: mutation, weight: 12 }, { arbitrary: anyJson, weight: 1 });
}

/** A push: mostly well-formed batches of hostile mutations, sometimes a hostile envelope. */
export function syncPush(pool: IdPool, usedMutationIds: string[]): fc.Arbitrary<unknown> {
  const deviceId = fc.oneof({ arbitrary: fc.stringMatching(/^[A-Za-z0-9_-]{4,64}$/), weight: 8 }, { arbitrary: anyJson, weight: 1 });
  return fc.oneof(
    { arbitrary: fc.record({ deviceId, mutations: fc.array(syncMutation(pool, usedMutationIds), { maxLength: 12 }) }), weight: 12 },
    { arbitrary: fc.record({ deviceId, mutations: anyJson }, { requiredKeys: [] }), weight: 1 },
    { arbitrary: anyBody, weight: 1 },
  );
}
