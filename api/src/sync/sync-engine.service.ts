import { Injectable } from '@nestjs/common';
import {
  decideField,
  type EntitySpec,
  fieldError,
  FINISHED_VISIT_STATUS,
  type FieldValue,
  isHlc,
  isSyncEntity,
  isUuid,
  type Mutation,
  type MutationResult,
  type RefTarget,
  sameDevice,
  sameValue,
  SYNC_ENTITIES,
  type SyncEntityName,
} from '@wiretrail/core';
import { type EntityManager, In, IsNull, Not } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import type { Role } from '../users/entities/user.entity.js';
import { User } from '../users/entities/user.entity.js';
import { AppliedMutation, SyncChange, SyncCounter } from './entities/sync-bookkeeping.entity.js';
import { type FieldMeta, SYNC_SCHEMAS, type SyncRecord } from './entities/sync-schemas.js';
import { insertMany, selectMany, updateWhere } from './bulk-write.js';
import { ScopeService, type TechnicianScope } from './scope.service.js';

export interface Actor {
  userId: string;
  organisationId: string;
  role: Role;
  deviceId: string;
}

/** A mutation that can never succeed; it is refused alone and the batch goes on. */
export class MutationRefused extends Error {}

/** Work a feature does inside the same transaction right after a row is created; see SyncEngine.afterCreate. */
export type CreateHook = (em: EntityManager, actor: Actor, row: SyncRecord) => Promise<void>;

const BOOKKEEPING = new Set(['id', 'organisationId', 'version', 'fieldMeta', 'deletedAt', 'createdById', 'updatedById', 'createdAt', 'updatedAt']);

/**
 * Applies mutations to synced rows: exactly once, field by field, with the merge rules of merge.ts,
 * the technician's write scope, and the lock on records behind an issued document.
 * Pushes from devices and the office's own REST writes both come through here, so every change is
 * numbered, tracked per field and pulled the same way.
 */
@Injectable()
export class SyncEngine {
  private readonly createHooks = new Map<SyncEntityName, CreateHook>();

  constructor(private readonly scopes: ScopeService) {}

  /**
   * Lets a feature finish a newly created row in the same transaction. Photos use it: a photo row whose bytes
   * reached the server before the row did is marked ready at once (photos.service.ts).
   */
  afterCreate(entity: SyncEntityName, hook: CreateHook): void {
    this.createHooks.set(entity, hook);
  }

  /** Applies a device's mutations in order inside the caller's transaction. */
  async applyAll(em: EntityManager, actor: Actor, mutations: Mutation[]): Promise<MutationResult[]> {
    const scope = actor.role === 'technician' ? await this.scopes.technicianScope(em, actor.organisationId, actor.userId) : null;
    // One look-up for the whole batch's replays, one counter read and write, and remembered reference checks:
    // per-mutation round trips dominate the cost of a push.
    const ids = mutations.map((m) => m?.mutationId).filter(isMutationId);
    const applied = await selectMany(em, AppliedMutation, 'mutationId', ids);
    const batch: Batch = {
      applied: new Map(applied.map((a) => [a.mutationId, a])),
      known: new Set(),
      seq: null,
      rows: new Map(),
      inserts: new Map(),
      pending: new Set(),
      changes: new Map(),
      appliedRows: [],
      issuedJobs: new Map(),
      now: new Date(),
    };
    this.batches.set(em, batch);
    try {
      await this.preload(em, actor, batch, mutations);
      const results: MutationResult[] = [];
      for (const m of mutations) results.push(await this.applyOnce(em, actor, scope, m));
      await this.flush(em, batch);
      if (batch.seq) await updateWhere(em, SyncCounter, { name: 'global' }, { value: batch.seq.value });
      return results;
    } finally {
      this.batches.delete(em);
    }
  }

  private readonly batches = new WeakMap<EntityManager, Batch>();

  /**
   * Reads, in one query per entity, every row the batch names and every row its references point at, so that
   * applying a mutation touches no table that the batch already knows.
   */
  private async preload(em: EntityManager, actor: Actor, batch: Batch, mutations: Mutation[]): Promise<void> {
    const rowIds = new Map<SyncEntityName, Set<string>>();
    const refIds = new Map<RefTarget, Set<string>>();
    const add = <K>(map: Map<K, Set<string>>, key: K, id: unknown) => {
      if (!isUuid(id)) return;
      if (!map.has(key)) map.set(key, new Set());
      map.get(key)!.add(id);
    };
    for (const m of mutations) {
      if (!m || !isSyncEntity(m.entity) || SYNC_ENTITIES[m.entity].serverOnly) continue;
      add(rowIds, m.entity, m.id);
      const fields = SYNC_ENTITIES[m.entity].fields;
      for (const [field, value] of Object.entries(m.set && typeof m.set === 'object' ? m.set : {})) {
        const type = Object.hasOwn(fields, field) ? fields[field]!.type : undefined;
        if (type?.kind === 'ref') add(refIds, type.entity, value);
        if (type?.kind === 'refs' && Array.isArray(value)) for (const id of value) add(refIds, type.entity, id);
      }
    }
    const existing: Array<[SyncEntityName, SyncRecord]> = [];
    for (const [entity, ids] of rowIds) {
      const found = await selectMany<SyncRecord>(em, SYNC_SCHEMAS[entity], 'id', [...ids]);
      for (const id of ids) batch.rows.set(`${entity}:${id}`, null);
      for (const row of found) {
        batch.rows.set(`${entity}:${row.id}`, row);
        existing.push([entity, row]);
      }
    }
    await this.preloadLocks(em, batch, existing);
    for (const [entity, ids] of refIds) {
      const list = [...ids];
      const found =
        entity === 'user'
          ? await selectMany(em, User, 'id', list, { organisationId: actor.organisationId })
          : await selectMany<SyncRecord>(em, SYNC_SCHEMAS[entity], 'id', list, { organisationId: actor.organisationId, deletedAt: null });
      for (const row of found) batch.known.add(`${entity}:${row.id}`);
    }
  }

  /**
   * The visits of the existing rows the batch names, and which of their jobs have an issued document: what lockOf
   * asks about every change to a visit's records, read in two queries instead of two per mutation.
   */
  private async preloadLocks(em: EntityManager, batch: Batch, existing: Array<[SyncEntityName, SyncRecord]>): Promise<void> {
    const visits: SyncRecord[] = [];
    const visitIds = new Set<string>();
    for (const [entity, row] of existing) {
      if (entity === 'visit') visits.push(row);
      else if (SYNC_ENTITIES[entity].visitField === 'visitId' && typeof row.visitId === 'string' && !batch.rows.has(`visit:${row.visitId}`)) visitIds.add(row.visitId);
    }
    if (visitIds.size) {
      const found = await selectMany<SyncRecord>(em, SYNC_SCHEMAS.visit, 'id', [...visitIds]);
      for (const id of visitIds) batch.rows.set(`visit:${id}`, null);
      for (const row of found) batch.rows.set(`visit:${row.id}`, row);
      visits.push(...found);
    }
    const jobIds = new Set<string>();
    for (const visit of visits) if (typeof visit.jobId === 'string') jobIds.add(visit.jobId);
    if (!jobIds.size) return;
    const documents = await selectMany<SyncRecord>(em, SYNC_SCHEMAS.document, 'jobId', [...jobIds], { deletedAt: null });
    for (const jobId of jobIds) batch.issuedJobs.set(jobId, false);
    for (const d of documents) if (d.issuedAt != null) batch.issuedJobs.set(d.jobId as string, true);
  }

  /** A row as the batch has it (read at its start, or written since), else as the database has it. */
  private async rowOf(em: EntityManager, entity: SyncEntityName, id: string): Promise<SyncRecord | null> {
    const batch = this.batches.get(em);
    const key = `${entity}:${id}`;
    if (batch?.rows.has(key)) return batch.rows.get(key)!;
    const row = await em.getRepository<SyncRecord>(entity).findOne({ where: { id }, withDeleted: true });
    batch?.rows.set(key, row);
    return row;
  }

  /** Writes a row's changes: to the row itself while it waits to be inserted, else to the database at once. */
  private async write(em: EntityManager, entity: SyncEntityName, row: SyncRecord, changes: Record<string, unknown>): Promise<void> {
    const batch = this.batches.get(em);
    if (!batch?.pending.has(`${entity}:${row.id}`)) await updateWhere(em, SYNC_SCHEMAS[entity], { id: row.id }, changes);
    Object.assign(row, changes);
    if (entity === 'document' && batch) batch.issuedJobs.clear();
  }

  /** Inserts what the batch has kept back: new rows in the order they were made, then applied mutations and the change log. */
  private async flush(em: EntityManager, batch: Batch): Promise<void> {
    for (const [entity, rows] of batch.inserts) {
      for (let i = 0; i < rows.length; i += INSERT_CHUNK) await insertMany(em, entity, rows.slice(i, i + INSERT_CHUNK));
    }
    batch.inserts.clear();
    batch.pending.clear();
    batch.issuedJobs.clear();
    for (let i = 0; i < batch.appliedRows.length; i += INSERT_CHUNK) await insertMany(em, AppliedMutation, batch.appliedRows.slice(i, i + INSERT_CHUNK));
    batch.appliedRows = [];
    const changes = [...batch.changes.values()];
    for (let i = 0; i < changes.length; i += INSERT_CHUNK) await insertMany(em, SyncChange, changes.slice(i, i + INSERT_CHUNK), { columns: ['entity', 'rowId'] });
    batch.changes.clear();
  }


  private async applyOnce(em: EntityManager, actor: Actor, scope: TechnicianScope | null, m: Mutation): Promise<MutationResult> {
    // An id that could never be stored is refused without being looked up or kept.
    const mutationId = isMutationId(m?.mutationId) ? m.mutationId : '';
    const batch = this.batches.get(em);
    const done = mutationId ? (batch ? batch.applied.get(mutationId) : await em.findOneBy(AppliedMutation, { mutationId })) : null;
    if (done) {
      if (done.organisationId !== actor.organisationId) return { mutationId, status: 'rejected', error: 'mutationId was already used.' };
      return done.result as unknown as MutationResult;
    }
    let result: MutationResult;
    try {
      result = await this.apply(em, actor, scope, m);
    } catch (err) {
      if (!(err instanceof MutationRefused)) throw err;
      result = { mutationId, status: 'rejected', error: err.message };
    }
    if (mutationId) {
      const record = { mutationId, organisationId: actor.organisationId, userId: actor.userId, deviceId: actor.deviceId, result: result as never };
      if (batch) batch.appliedRows.push(record);
      else await em.insert(AppliedMutation, record);
      // The same id twice in one batch is a replay too.
      batch?.applied.set(mutationId, record as unknown as AppliedMutation);
    }
    return result;
  }

  private async apply(em: EntityManager, actor: Actor, scope: TechnicianScope | null, m: Mutation): Promise<MutationResult> {
    // A batch is a list of anything until checked: null or a number in it is refused alone, like any bad mutation.
    if (typeof m !== 'object' || m === null || Array.isArray(m)) throw new MutationRefused('A mutation must be an object: { mutationId, entity, id, baseVersion, set or delete, hlc }.');
    const { mutationId } = m;
    if (!isMutationId(mutationId)) throw new MutationRefused('mutationId must be a unique id of 8 to 64 characters, none of them control characters.');
    if (!isSyncEntity(m.entity)) throw new MutationRefused(`entity must be one of the synced entities; got ${JSON.stringify(m.entity)}.`);
    const spec = SYNC_ENTITIES[m.entity];
    if (spec.serverOnly) throw new MutationRefused(`${m.entity} rows are made by the server only.`);
    if (!isUuid(m.id)) throw new MutationRefused('id must be a UUID.');
    if (!isHlc(m.hlc)) throw new MutationRefused('hlc must look like 2026-03-14T09:26:53.589Z-0001-<deviceId>.');
    if (!Number.isInteger(m.baseVersion) || m.baseVersion < 0) throw new MutationRefused('baseVersion must be a whole number, 0 for a new row.');
    const isDelete = m.delete === true;
    const set = m.set ?? {};
    if (!isDelete && (typeof set !== 'object' || Array.isArray(set) || Object.keys(set).length === 0)) {
      throw new MutationRefused('A mutation needs set with at least one field, or delete: true.');
    }
    if (isDelete && m.set && Object.keys(m.set).length > 0) throw new MutationRefused('A mutation either sets fields or deletes, not both.');
    for (const [field, value] of Object.entries(set)) {
      if (BOOKKEEPING.has(field)) throw new MutationRefused(`${m.entity}.${field} is kept by the server and cannot be set.`);
      const problem = fieldError(m.entity, field, value);
      if (problem) throw new MutationRefused(problem);
    }

    const existing = await this.rowOf(em, m.entity, m.id);
    if (existing && existing.organisationId !== actor.organisationId) throw new MutationRefused(`No ${m.entity} with that id.`);

    this.checkTechnician(actor, scope, spec, m, existing, set, isDelete);
    await this.checkReferences(em, actor, spec, m.entity, set);

    if (!existing) {
      if (isDelete) return { mutationId, status: 'applied', version: 0, fieldVersions: {} };
      return this.create(em, actor, spec, m, set);
    }
    const lock = await this.lockOf(em, actor, spec, m.entity, existing, set);
    if (lock) return this.lockedToConflicts(em, actor, m, existing, set, isDelete, lock);
    if (isDelete) return this.remove(em, actor, m, existing);
    return this.update(em, actor, spec, m, existing, set);
  }

  private async create(em: EntityManager, actor: Actor, spec: EntitySpec, m: Mutation, set: Record<string, FieldValue>): Promise<MutationResult> {
    const missing = requiredFields(m.entity).filter((f) => set[f] === undefined || set[f] === null).map((f) => `${m.entity}.${f}`);
    if (missing.length) throw new MutationRefused(`A new ${m.entity} needs ${missing.join(', ')}.`);
    const seq = await this.nextSeq(em);
    const fieldMeta: Record<string, FieldMeta> = {};
    for (const field of Object.keys(set)) fieldMeta[field] = { v: seq, hlc: m.hlc, by: actor.userId, role: actor.role };
    const row = { id: m.id, organisationId: actor.organisationId, version: seq, fieldMeta, deletedAt: null, createdById: actor.userId, updatedById: actor.userId, ...set } as SyncRecord;
    await this.insertRow(em, m.entity, row);
    await this.recordChange(em, m.entity, row, seq);
    const hook = this.createHooks.get(m.entity);
    if (hook) {
      // A feature's hook reads and writes the database: give it the row, and everything before it, written.
      const batch = this.batches.get(em);
      if (batch) await this.flush(em, batch);
      await hook(em, actor, row);
      batch?.rows.delete(`${m.entity}:${row.id}`);
      batch?.issuedJobs.clear();
    }
    return { mutationId: m.mutationId, status: 'applied', version: seq, fieldVersions: versionsOf(fieldMeta) };
  }

  private async update(em: EntityManager, actor: Actor, spec: EntitySpec, m: Mutation, row: SyncRecord, set: Record<string, FieldValue>): Promise<MutationResult> {
    const changes: Record<string, unknown> = {};
    const lost: Array<{ field: string; keptIncoming: boolean; reason: string }> = [];
    for (const [field, value] of Object.entries(set)) {
      const outcome = decideField(spec.fields[field]!, row[field], row.fieldMeta[field], {
        value, hlc: m.hlc, userId: actor.userId, role: actor.role, baseVersion: m.baseVersion,
      });
      if (outcome.apply && !sameValue(row[field], value)) changes[field] = value;
      else if (outcome.apply && !row.fieldMeta[field]) changes[field] = value;
      if (outcome.conflict) lost.push({ field, keptIncoming: outcome.conflict.kept === 'incoming', reason: outcome.conflict.reason });
    }
    // A concurrent delete loses to an edit: the row comes back.
    const revived = row.deletedAt !== null && Object.keys(changes).length > 0;
    if (Object.keys(changes).length === 0 && lost.length === 0) {
      return { mutationId: m.mutationId, status: 'applied', version: row.version, fieldVersions: versionsOf(row.fieldMeta) };
    }
    const seq = await this.nextSeq(em);
    const conflictIds: string[] = [];
    for (const l of lost) {
      const incoming = { value: set[l.field], by: actor.userId, hlc: m.hlc, deviceId: actor.deviceId };
      const current = { value: row[l.field], by: row.fieldMeta[l.field]?.by ?? null, hlc: row.fieldMeta[l.field]?.hlc ?? null, deviceId: null };
      conflictIds.push(await this.writeConflict(em, actor, m.entity, row.id, l.field, l.reason, m.baseVersion, l.keptIncoming ? incoming : current, l.keptIncoming ? current : incoming));
    }
    const fieldMeta = { ...row.fieldMeta };
    for (const field of Object.keys(changes)) fieldMeta[field] = { v: seq, hlc: m.hlc, by: actor.userId, role: actor.role };
    const next = { ...changes, fieldMeta, version: seq, updatedById: actor.userId, ...(revived ? { deletedAt: null } : {}) };
    await this.write(em, m.entity, row, next);
    if (revived) this.batches.get(em)?.known.add(`${m.entity}:${row.id}`);
    await this.recordChange(em, m.entity, row, seq);
    return {
      mutationId: m.mutationId,
      status: lost.some((l) => !l.keptIncoming) ? 'merged' : 'applied',
      version: seq,
      fieldVersions: versionsOf(fieldMeta),
      ...(conflictIds.length ? { conflictIds } : {}),
    };
  }

  private async remove(em: EntityManager, actor: Actor, m: Mutation, row: SyncRecord): Promise<MutationResult> {
    if (row.deletedAt) return { mutationId: m.mutationId, status: 'applied', version: row.version, fieldVersions: versionsOf(row.fieldMeta) };
    const editedSince = Object.entries(row.fieldMeta).filter(([, meta]) => meta.v > m.baseVersion && !sameDevice(meta.hlc, m.hlc));
    if (editedSince.length > 0) {
      // Someone edited the row after this device last saw it: the edit wins and the delete is kept for review.
      const seq = await this.nextSeq(em);
      const id = await this.writeConflict(em, actor, m.entity, row.id, '*', 'edit-beats-delete', m.baseVersion,
        { value: 'kept', by: editedSince[0]![1].by, hlc: editedSince[0]![1].hlc, deviceId: null },
        { value: 'deleted', by: actor.userId, hlc: m.hlc, deviceId: actor.deviceId });
      await this.write(em, m.entity, row, { version: seq });
      await this.recordChange(em, m.entity, row, seq);
      return { mutationId: m.mutationId, status: 'merged', version: seq, fieldVersions: versionsOf(row.fieldMeta), conflictIds: [id] };
    }
    const seq = await this.nextSeq(em);
    await this.write(em, m.entity, row, { deletedAt: new Date(), version: seq, updatedById: actor.userId });
    this.batches.get(em)?.known.delete(`${m.entity}:${row.id}`);
    await this.recordChange(em, m.entity, row, seq, true);
    return { mutationId: m.mutationId, status: 'applied', version: seq, fieldVersions: versionsOf(row.fieldMeta) };
  }

  /** A signed certificate's records do not change under it: every attempted change goes to the office as a conflict. */
  private async lockedToConflicts(em: EntityManager, actor: Actor, m: Mutation, row: SyncRecord, set: Record<string, FieldValue>, isDelete: boolean, reason: LockReason): Promise<MutationResult> {
    const conflictIds: string[] = [];
    const entries: Array<[string, unknown]> = isDelete ? [['*', 'deleted']] : Object.entries(set).filter(([f, v]) => !sameValue(row[f], v));
    for (const [field, value] of entries) {
      const current = { value: field === '*' ? 'kept' : row[field], by: row.fieldMeta[field]?.by ?? null, hlc: row.fieldMeta[field]?.hlc ?? null, deviceId: null };
      conflictIds.push(await this.writeConflict(em, actor, m.entity, row.id, field, reason, m.baseVersion, current, { value, by: actor.userId, hlc: m.hlc, deviceId: actor.deviceId }));
    }
    return { mutationId: m.mutationId, status: conflictIds.length ? 'merged' : 'applied', version: row.version, fieldVersions: versionsOf(row.fieldMeta), ...(conflictIds.length ? { conflictIds } : {}) };
  }

  private async writeConflict(
    em: EntityManager, actor: Actor, entity: SyncEntityName, rowId: string, field: string, reason: string, baseVersion: number,
    kept: { value: unknown; by: string | null; hlc: string | null; deviceId: string | null },
    discarded: { value: unknown; by: string | null; hlc: string | null; deviceId: string | null },
  ): Promise<string> {
    const seq = await this.nextSeq(em);
    const id = uuidv7();
    const row = {
      id, organisationId: actor.organisationId, version: seq, fieldMeta: {}, deletedAt: null, createdById: actor.userId, updatedById: actor.userId,
      entity, rowId, field, reason, baseVersion,
      keptValue: kept.value ?? null, keptById: kept.by, keptHlc: kept.hlc,
      discardedValue: discarded.value ?? null, discardedById: discarded.by, discardedHlc: discarded.hlc, discardedDeviceId: discarded.deviceId,
      resolvedAt: null, resolvedById: null, resolution: null,
    };
    await this.insertRow(em, 'conflict', row as unknown as SyncRecord);
    await this.recordChange(em, 'conflict', row as unknown as SyncRecord, seq);
    return id;
  }

  private checkTechnician(actor: Actor, scope: TechnicianScope | null, spec: EntitySpec, m: Mutation, existing: SyncRecord | null, set: Record<string, FieldValue>, isDelete: boolean): void {
    if (!scope) return;
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
        const visitId = (existing?.visitId ?? set.visitId) as string | undefined;
        if (existing && set.visitId !== undefined && set.visitId !== existing.visitId) refuse(`A ${m.entity} cannot move to another visit.`);
        if (!visitId || !scope.visitIds.has(visitId)) refuse('That visit is not assigned to you.');
        const siteId = (set.siteId ?? existing?.siteId) as string | undefined;
        if (siteId !== scope.visitSite.get(visitId!)) refuse(`${m.entity}.siteId must be the site of its visit.`);
        return;
      }
      case 'site': {
        const siteId = (existing?.siteId ?? set.siteId) as string | undefined;
        if (existing && set.siteId !== undefined && set.siteId !== existing.siteId) refuse(`A ${m.entity} cannot move to another site.`);
        if (!siteId || !scope.siteIds.has(siteId)) refuse('That site is not one of your visits.');
        return;
      }
    }
  }

  /** Every id a row points at must be a row of the same organisation. */
  private async checkReferences(em: EntityManager, actor: Actor, spec: EntitySpec, entity: SyncEntityName, set: Record<string, FieldValue>): Promise<void> {
    for (const [field, value] of Object.entries(set)) {
      const type = spec.fields[field]!.type;
      if (value === null || (type.kind !== 'ref' && type.kind !== 'refs')) continue;
      const batch = this.batches.get(em);
      const ids = (type.kind === 'ref' ? [value as string] : (value as string[])).filter((id) => !batch?.known.has(`${type.entity}:${id}`));
      if (ids.length === 0) continue;
      const found =
        type.entity === 'user'
          ? await em.countBy(User, { id: In(ids), organisationId: actor.organisationId })
          : await em.getRepository<SyncRecord>(type.entity).countBy({ id: In(ids), organisationId: actor.organisationId, deletedAt: IsNull() });
      if (found !== new Set(ids).size) throw new MutationRefused(`${entity}.${field} points at ${type.entity === 'area' ? 'an' : 'a'} ${type.entity} that does not exist.`);
      for (const id of ids) batch?.known.add(`${type.entity}:${id}`);
    }
  }

  /**
   * Why a row may not change under this writer, or null:
   * - `locked-by-document`: it is behind an issued certificate or report (the rows of that job's visits, and the
   *   issued document itself), for everyone;
   * - `locked-by-sign-off`: its visit was finished and signed on site, for technicians (the office may still put
   *   things right, and reopening the visit unlocks it).
   * New rows are never locked: a photo taken after signing still reaches the office.
   */
  private async lockOf(em: EntityManager, actor: Actor, spec: EntitySpec, entity: SyncEntityName, row: SyncRecord, set: Record<string, FieldValue>): Promise<LockReason | null> {
    if (entity === 'document') return row.issuedAt != null && Object.keys(set).some((f) => !DOCUMENT_FIELDS_AFTER_ISSUE.has(f)) ? 'locked-by-document' : null;
    if (!spec.visitField) return null;
    const visitId = (spec.visitField === 'id' ? row.id : row.visitId) as string | null;
    if (!visitId) return null;
    const visit = spec.visitField === 'id' ? row : await this.rowOf(em, 'visit', visitId);
    if (!visit?.jobId) return null;
    const waiting = this.batches.get(em)?.inserts.get('document') ?? [];
    const issued = waiting.some((d) => d.jobId === visit.jobId && d.issuedAt != null && d.deletedAt == null) || (await this.hasIssuedDocument(em, visit.jobId as string));
    if (issued) return 'locked-by-document';
    if (actor.role === 'technician' && visit.status === FINISHED_VISIT_STATUS) return 'locked-by-sign-off';
    return null;
  }

  /** Whether the database holds an issued, undeleted document of the job; remembered for the rest of a batch. */
  private async hasIssuedDocument(em: EntityManager, jobId: string): Promise<boolean> {
    const batch = this.batches.get(em);
    const known = batch?.issuedJobs.get(jobId);
    if (known !== undefined) return known;
    const issued = (await em.getRepository<SyncRecord>('document').countBy({ jobId, issuedAt: Not(IsNull()), deletedAt: IsNull() })) > 0;
    batch?.issuedJobs.set(jobId, issued);
    return issued;
  }

  /** Changes a row the server owns (a conflict's resolution) and numbers the change so devices pull it. */
  async updateServerRow(em: EntityManager, entity: SyncEntityName, row: SyncRecord, changes: Record<string, unknown>, actor: Actor): Promise<number> {
    const seq = await this.nextSeq(em);
    const next = { ...changes, version: seq, updatedById: actor.userId };
    await updateWhere(em, SYNC_SCHEMAS[entity], { id: row.id }, next);
    await this.recordChange(em, entity, { ...row, ...next } as SyncRecord, seq);
    this.batches.get(em)?.rows.delete(`${entity}:${row.id}`);
    if (entity === 'document') this.batches.get(em)?.issuedJobs.clear();
    return seq;
  }

  async nextSeq(em: EntityManager): Promise<number> {
    const batch = this.batches.get(em);
    if (batch?.seq) return ++batch.seq.value;
    if (batch) {
      // Read once per batch; applyAll writes the final value back before the transaction commits.
      const [current] = await selectMany(em, SyncCounter, 'name', ['global']);
      if (!current) await em.insert(SyncCounter, { name: 'global', value: 0 });
      batch.seq = { value: (current?.value ?? 0) + 1 };
      return batch.seq.value;
    }
    const updated = await em.update(SyncCounter, { name: 'global' }, { value: () => 'value + 1' });
    if (!updated.affected) await em.insert(SyncCounter, { name: 'global', value: 1 });
    return (await em.findOneByOrFail(SyncCounter, { name: 'global' })).value;
  }

  private async recordChange(em: EntityManager, entity: SyncEntityName, row: SyncRecord, seq: number, deleted = false): Promise<void> {
    const spec = SYNC_ENTITIES[entity];
    const siteId = spec.siteField === 'id' ? row.id : spec.siteField === 'siteId' ? ((row.siteId as string) ?? null) : null;
    const change = { entity, rowId: row.id, organisationId: row.organisationId, seq, siteId, deleted };
    const batch = this.batches.get(em);
    // The change log keeps one entry per row, its latest; in a batch only the last one is written.
    if (batch) batch.changes.set(`${entity}:${row.id}`, change);
    else await em.upsert(SyncChange, change, ['entity', 'rowId']);
  }

  /** A new row: kept back in a batch (and visible to the rest of it), inserted at once outside one. */
  private async insertRow(em: EntityManager, entity: SyncEntityName, row: SyncRecord): Promise<void> {
    const batch = this.batches.get(em);
    if (!batch) {
      await em.getRepository<SyncRecord>(entity).insert(row as never);
      return;
    }
    // Every row of one multi-row insert names the same columns, and gets its times here rather than from column defaults.
    for (const column of columnsOf(entity)) if (row[column] === undefined) row[column] = null;
    row.createdAt ??= batch.now;
    row.updatedAt ??= batch.now;
    if (!batch.inserts.has(entity)) batch.inserts.set(entity, []);
    batch.inserts.get(entity)!.push(row);
    batch.pending.add(`${entity}:${row.id}`);
    batch.rows.set(`${entity}:${row.id}`, row);
    batch.known.add(`${entity}:${row.id}`);
  }
}

type LockReason = 'locked-by-document' | 'locked-by-sign-off';

/** What applied_mutation can keep: PostgreSQL holds varchar(64) to its length and refuses NUL in text. */
function isMutationId(id: unknown): id is string {
  return typeof id === 'string' && id.length >= 8 && id.length <= 64 && !/\p{Cc}/u.test(id);
}

/** An issued document's own fields that still change: how its e-mail is getting on. */
const DOCUMENT_FIELDS_AFTER_ISSUE = new Set(['emailState', 'emailedTo', 'emailedAt', 'emailError']);

/** Rows per multi-row insert: well inside SQLite's and PostgreSQL's limits on bound parameters. */
const INSERT_CHUNK = 100;

interface Batch {
  applied: Map<string, AppliedMutation>;
  /** Referenced rows already found to exist in this batch. */
  known: Set<string>;
  seq: { value: number } | null;
  /** Rows read or written by this batch, by `entity:id`; null when read and not there. */
  rows: Map<string, SyncRecord | null>;
  /** New rows not yet inserted, per entity, in the order they were made. */
  inserts: Map<SyncEntityName, SyncRecord[]>;
  /** `entity:id` of the rows in `inserts`. */
  pending: Set<string>;
  /** When the batch began: the creation time of the rows it makes. */
  now: Date;
  /** Whether a job has an issued document, as read from the database in this batch; see lockOf. */
  issuedJobs: Map<string, boolean>;
  /** The change log's entry per `entity:rowId`, the latest. */
  changes: Map<string, { entity: SyncEntityName; rowId: string; organisationId: string; seq: number; siteId: string | null; deleted: boolean }>;
  appliedRows: Array<Pick<AppliedMutation, 'mutationId' | 'organisationId' | 'userId' | 'deviceId' | 'result'>>;
}

const COLUMNS = new Map<SyncEntityName, string[]>();
/** Every column of an entity's table, read once from its schema. */
function columnsOf(entity: SyncEntityName): string[] {
  let columns = COLUMNS.get(entity);
  if (!columns) COLUMNS.set(entity, (columns = Object.keys(SYNC_SCHEMAS[entity].options.columns)));
  return columns;
}

const REQUIRED = new Map<SyncEntityName, string[]>();
/** The fields a new row of an entity must have. */
function requiredFields(entity: SyncEntityName): string[] {
  let fields = REQUIRED.get(entity);
  if (!fields) REQUIRED.set(entity, (fields = Object.entries(SYNC_ENTITIES[entity].fields).filter(([, f]) => f.required).map(([name]) => name)));
  return fields;
}

export function versionsOf(meta: Record<string, FieldMeta>): Record<string, number> {
  return Object.fromEntries(Object.entries(meta).map(([f, m]) => [f, m.v]));
}
