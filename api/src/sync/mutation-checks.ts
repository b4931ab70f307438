import {
  type CircuitDetailField,
  circuitDetailProblems,
  type EntitySpec,
  fieldError,
  type FieldValue,
  isHlc,
  isSyncEntity,
  parseHlc,
  isUuid,
  type Mutation,
  normaliseText,
  type LinkTestFacts,
  linkTestProblems,
  SYNC_ENTITIES,
  type SyncEntityName,
} from '@wiretrail/core';
import type { SyncRecord } from './entities/sync-schemas.js';
import type { TechnicianScope } from './scope.service.js';

/** A mutation that can never succeed; it is refused alone and the batch goes on. */
export class MutationRefused extends Error {}

/** What the server keeps on every synced row; no mutation may set it. */
const BOOKKEEPING = new Set(['id', 'organisationId', 'version', 'fieldMeta', 'deletedAt', 'createdById', 'updatedById', 'createdAt', 'updatedAt']);

/** A mutation whose shape and fields are known good: what the rest of the engine may trust. */
export interface CheckedMutation {
  mutation: Mutation;
  spec: EntitySpec;
  set: Record<string, FieldValue>;
  isDelete: boolean;
}

/** What applied_mutation can keep: PostgreSQL holds varchar(64) to its length and refuses NUL in text. */
export function isMutationId(id: unknown): id is string {
  return typeof id === 'string' && id.length >= 8 && id.length <= 64 && !/\p{Cc}/u.test(id);
}

/**
 * Judges one mutation of a push on its own: its shape, its entity, and every field it sets against the registry.
 * A batch is a list of anything until checked, so null or a number in it is refused alone, like any bad mutation.
 */
export function checkMutation(mutation: Mutation, { server = false } = {}): CheckedMutation {
  if (typeof mutation !== 'object' || mutation === null || Array.isArray(mutation)) {
    throw new MutationRefused('A mutation must be an object: { mutationId, entity, id, baseVersion, set or delete, hlc }.');
  }
  if (!isMutationId(mutation.mutationId)) throw new MutationRefused('mutationId must be a unique id of 8 to 64 characters, none of them control characters.');
  if (!isSyncEntity(mutation.entity)) throw new MutationRefused(`entity must be one of the synced entities; got ${JSON.stringify(mutation.entity)}.`);
  const spec = SYNC_ENTITIES[mutation.entity];
  if (spec.serverOnly && !server) throw new MutationRefused(`${mutation.entity} rows are written by the server only; no push may create, change or delete one.`);
  if (!isUuid(mutation.id)) throw new MutationRefused('id must be a UUID.');
  if (!isHlc(mutation.hlc)) throw new MutationRefused('hlc must look like 2026-03-14T09:26:53.589Z-0001-<deviceId>, with a real date from 2020 on.');
  if (!Number.isInteger(mutation.baseVersion) || mutation.baseVersion < 0) throw new MutationRefused('baseVersion must be a whole number, 0 for a new row.');
  const isDelete = mutation.delete === true;
  const set = mutation.set ?? {};
  if (!isDelete && (typeof set !== 'object' || Array.isArray(set) || Object.keys(set).length === 0)) {
    throw new MutationRefused('A mutation needs set with at least one field, or delete: true.');
  }
  if (isDelete && mutation.set && Object.keys(mutation.set).length > 0) throw new MutationRefused('A mutation either sets fields or deletes, not both.');
  for (const [field, value] of Object.entries(set)) {
    if (BOOKKEEPING.has(field)) throw new MutationRefused(`${mutation.entity}.${field} is kept by the server and cannot be set.`);
    const problem = fieldError(mutation.entity, field, value);
    if (problem) throw new MutationRefused(problem);
  }
  // One spelling of what looks the same, as the office's forms keep it, so that searches find it either way.
  const normalised = Object.fromEntries(Object.entries(set).map(([f, v]) => [f, typeof v === 'string' ? normaliseText(v) : v])) as Record<string, FieldValue>;
  return { mutation, spec, set: normalised, isDelete };
}

/**
 * What a pushing device claims about itself: its clock must carry its own id (the merge takes one device's changes
 * as already in order, so a borrowed id would pass as another device's later edit), and its base no newer than
 * what it has been sent.
 */
export function checkDeviceClaims(actor: { deviceId: string }, device: { pulledUpTo: number }, { mutation: m }: CheckedMutation): void {
  if (parseHlc(m.hlc)!.deviceId !== actor.deviceId) throw new MutationRefused(`hlc must end with this device's id (${actor.deviceId}).`);
  if (m.baseVersion > device.pulledUpTo) {
    throw new MutationRefused(`baseVersion ${m.baseVersion} is newer than anything this device has pulled (${device.pulledUpTo}); pull, then make the change again.`);
  }
}

/** A new row must bring every field the registry calls required. */
export function checkNewRow(entity: SyncEntityName, set: Record<string, FieldValue>): void {
  const missing = requiredFields(entity).filter((f) => set[f] === undefined || set[f] === null).map((f) => `${entity}.${f}`);
  if (missing.length) throw new MutationRefused(`A new ${entity} needs ${missing.join(', ')}.`);
}

/**
 * What a technician may write: only technician fields, only rows of their assigned visits and those visits' sites,
 * and never moved to another visit or site. The office (scope null) may write anything of its organisation.
 */
export function checkTechnicianWrite(scope: TechnicianScope | null, checked: CheckedMutation, existing: SyncRecord | null): void {
  if (!scope) return;
  const { mutation: m, spec, set, isDelete } = checked;
  const refuse = (why: string) => {
    throw new MutationRefused(why);
  };
  if (spec.technicianWrite === 'none') refuse(`A technician cannot change ${m.entity} records; the office can.`);
  const officeFields = Object.keys(set).filter((f) => !spec.fields[f]?.technician);
  if (officeFields.length) refuse(`${officeFields.map((f) => `${m.entity}.${f}`).join(', ')} can be changed by the office only.`);
  if (isDelete && (spec.technicianWrite === 'assigned-visit' || spec.technicianWrite === 'site-row')) refuse(`A technician cannot delete a ${m.entity}.`);
  switch (spec.technicianWrite) {
    case 'assigned-visit':
      if (!existing || !scope.visitIds.has(m.id)) refuse('That visit is not assigned to you.');
      return;
    case 'site-row':
      if (!existing || !scope.siteIds.has(m.id)) refuse('That site is not one of your visits.');
      return;
    case 'visit': {
      const visitId = idOf(existing?.visitId ?? set.visitId);
      if (existing && set.visitId !== undefined && set.visitId !== existing.visitId) refuse(`A ${m.entity} cannot move to another visit.`);
      if (!visitId || !scope.visitIds.has(visitId)) refuse('That visit is not assigned to you.');
      const siteId = idOf(set.siteId ?? existing?.siteId);
      if (siteId !== scope.visitSite.get(visitId!)) refuse(`${m.entity}.siteId must be the site of its visit.`);
      return;
    }
    case 'site': {
      const siteId = idOf(existing?.siteId ?? set.siteId);
      if (existing && set.siteId !== undefined && set.siteId !== existing.siteId) refuse(`A ${m.entity} cannot move to another site.`);
      if (!siteId || !scope.siteIds.has(siteId)) refuse('That site is not one of your visits.');
      return;
    }
  }
}

/** Which fields each of core's circuit-detail problems is about: a change to any of them asks the question again. */
const CIRCUIT_DETAIL_INPUTS: Record<CircuitDetailField, readonly string[]> = {
  deviceRatingA: ['deviceType', 'deviceRatingA'],
  rcdType: ['rcdType'],
  liveCsaMm2: ['liveCsaMm2'],
  cpcCsaMm2: ['cpcCsaMm2', 'liveCsaMm2'],
};

/**
 * What a record cannot be, by core's rules, whoever writes it (a phone's push or an office form): the same checks the
 * forms make, on the row as it would be after the change. Only what the change touches is judged, so a row recorded
 * before a rule existed can still be edited elsewhere.
 */
export function checkRecordRules({ mutation: m, set, isDelete }: CheckedMutation, existing: SyncRecord | null): void {
  if (isDelete) return;
  if (m.entity === 'linkTest') {
    // A new test is judged whole; a change only on what it touches, so an old row's gap never blocks an unrelated edit.
    const wrong = linkTestProblems({ ...existing, ...set } as LinkTestFacts).filter((p) => !existing || p.field in set || (p.field === 'firstLossDb' && 'firstWavelengthNm' in set));
    if (wrong.length) throw new MutationRefused(wrong.map((p) => p.message).join(' '));
    return;
  }
  if (m.entity !== 'circuit') return;
  const after = { ...existing, ...set };
  const num = (v: unknown) => (typeof v === 'number' ? v : null);
  const text = (v: unknown) => (typeof v === 'string' ? v : null);
  const problems = circuitDetailProblems({
    deviceType: text(after.deviceType),
    deviceRatingA: num(after.deviceRatingA),
    rcdType: text(after.rcdType),
    liveCsaMm2: num(after.liveCsaMm2),
    cpcCsaMm2: num(after.cpcCsaMm2),
  });
  const touched = (Object.entries(problems) as [CircuitDetailField, string][]).filter(([field]) => CIRCUIT_DETAIL_INPUTS[field].some((f) => f in set));
  if (touched.length) throw new MutationRefused(touched.map(([, message]) => message).join(' '));
}

const REQUIRED = new Map<SyncEntityName, string[]>();
/** The fields a new row of an entity must have. */
function requiredFields(entity: SyncEntityName): string[] {
  let fields = REQUIRED.get(entity);
  if (!fields) REQUIRED.set(entity, (fields = Object.entries(SYNC_ENTITIES[entity].fields).filter(([, f]) => f.required).map(([name]) => name)));
  return fields;
}

/** A reference field's id: fieldError has already refused anything but text or null. */
const idOf = (value: unknown) => (typeof value === 'string' ? value : undefined);
