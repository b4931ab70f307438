import { Injectable } from '@nestjs/common';
import {
  decideField,
  type FieldStamp,
  formatHlc,
  isSyncEntity,
  isUuid,
  type FieldValue,
  type Mutation,
  type MutationResult,
  type Role,
  sameDevice,
  sameValue,
  SYNC_ENTITIES,
  type SyncEntityName,
} from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { AppliedMutation } from './entities/sync-bookkeeping.entity.js';
import { type SyncRecord, textOrNull } from './entities/sync-schemas.js';
import { selectMany } from './bulk-write.js';
import { type CheckedMutation, checkDeviceClaims, checkMutation, checkNewRow, checkRecordRules, checkTechnicianWrite, isMutationId, MutationRefused } from './mutation-checks.js';
import { type Lock, type LockRule, RecordLocks } from './record-locks.js';
import { checkReferences, preloadReferences, referencedIds } from './reference-checks.js';
import { ScopeService, type TechnicianScope } from './scope.service.js';
import { SyncBatch } from './sync-batch.js';

export { MutationRefused } from './mutation-checks.js';
export type { LockRule, RecordKey } from './record-locks.js';

export interface Actor {
  userId: string;
  organisationId: string;
  role: Role;
  deviceId: string;
}

/** The device ids the server's own writers stamp their clocks with; no phone may push as one of them. */
export const SERVER_DEVICE_IDS: ReadonlySet<string> = new Set(['office', 'server', 'seed', 'mail-outbox']);

/**
 * What the server knows of a pushing device, against which its claims are checked: the highest change it has
 * been sent. The office's REST writes and the server's own have no such claims to check.
 */
export interface DeviceClaims {
  pulledUpTo: number;
}

/** Work a feature does inside the same transaction right after a row is created; see SyncEngine.afterCreate. */
export type CreateHook = (em: EntityManager, actor: Actor, row: SyncRecord) => Promise<void>;

/** Why a checked mutation is refused, or null; made by a feature's WriteJudge for one batch. */
export type Verdict = (checked: CheckedMutation, existing: SyncRecord | null) => string | null;
export type WriteJudge = (em: EntityManager, actor: Actor, scope: TechnicianScope | null, mutations: Mutation[]) => Promise<Verdict>;

/**
 * Work a feature does once a batch has moved rows it watches (created, deleted, or one of the watched fields
 * changed), in the same transaction before it commits: each row id with the actor who moved it last.
 */
export type MoveHook = (em: EntityManager, moved: ReadonlyMap<string, Actor>) => Promise<void>;

/** One value of a field, as a conflict row records it. */
interface ConflictSide {
  value: unknown;
  by: string | null;
  hlc: string | null;
  deviceId: string | null;
}

/** The engine's work in one transaction: the batch's bookkeeping, what it knows of locks, and the watched rows it moved. */
interface Run {
  batch: SyncBatch;
  locks: RecordLocks;
  moved: Map<SyncEntityName, Map<string, Actor>>;
}

/**
 * Applies changes to synced rows: exactly once, field by field, with core's merge rules, the technician's write
 * scope, and the locks features register. Pushes from devices, the office's REST writes and the server's own
 * writes all come through here, in a batch (sync-batch.ts), so every change is numbered, stamped per field and
 * pulled the same way. Checks, references and locks live beside it (mutation-checks.ts, reference-checks.ts,
 * record-locks.ts); this file decides and records.
 */
@Injectable()
export class SyncEngine {
  private readonly createHooks = new Map<SyncEntityName, CreateHook>();
  private readonly lockRules = new Map<SyncEntityName, LockRule>();
  private readonly runs = new WeakMap<EntityManager, Run>();
  private readonly writeJudges = new Map<SyncEntityName, WriteJudge>();
  private readonly moveHooks = new Map<SyncEntityName, { fields: ReadonlySet<string>; hook: MoveHook }>();

  constructor(private readonly scopes: ScopeService) {}

  /**
   * Lets a feature finish a newly created row in the same transaction. Photos use it: a photo row whose bytes
   * reached the server before the row did is marked ready at once (photos.service.ts).
   */
  afterCreate(entity: SyncEntityName, hook: CreateHook): void {
    this.createHooks.set(entity, hook);
  }

  /**
   * Lets a feature refuse what the registry cannot know is wrong (a photo naming bytes its author may not see).
   * The judge is made once per batch, from every mutation of the entity, so it reads what it needs in one go.
   */
  judgeWrites(entity: SyncEntityName, judge: WriteJudge): void {
    this.writeJudges.set(entity, judge);
  }

  private async judgesFor(em: EntityManager, actor: Actor, scope: TechnicianScope | null, mutations: Mutation[]): Promise<Map<SyncEntityName, Verdict>> {
    const out = new Map<SyncEntityName, Verdict>();
    for (const [entity, judge] of this.writeJudges) {
      const mine = mutations.filter((m) => m?.entity === entity && m.set && typeof m.set === 'object');
      if (mine.length) out.set(entity, await judge(em, actor, scope, mine));
    }
    return out;
  }

  /**
   * Lets a feature follow rows of an entity as they move: the hook runs before the batch commits, once for every
   * row created, deleted or changed in one of `fields`, whoever changed it (a push, the office, the server).
   * Jobs use it: a visit booked, arrived at or signed off moves its job's status (jobs/job-progress.ts).
   */
  onMove(entity: SyncEntityName, fields: readonly string[], hook: MoveHook): void {
    this.moveHooks.set(entity, { fields: new Set(fields), hook });
  }

  private noteMove(run: Run, actor: Actor, entity: SyncEntityName, id: string, fields?: readonly string[]): void {
    const watch = this.moveHooks.get(entity);
    if (!watch || (fields && !fields.some((f) => watch.fields.has(f)))) return;
    if (!run.moved.has(entity)) run.moved.set(entity, new Map());
    run.moved.get(entity)!.set(id, actor);
  }

  /** Lets a feature keep records from changing while its rows say so (an issued certificate, say); see record-locks.ts. */
  lockRule(entity: SyncEntityName, rule: LockRule): void {
    this.lockRules.set(entity, rule);
  }

  /** Applies a device's mutations in order inside the caller's transaction. */
  async applyAll(em: EntityManager, actor: Actor, mutations: Mutation[], device?: DeviceClaims): Promise<MutationResult[]> {
    return this.inBatch(em, async (run) => {
      const scope = actor.role === 'technician' ? await this.scopes.technicianScope(em, actor.organisationId, actor.userId) : null;
      await this.preload(run, actor, mutations);
      const judges = await this.judgesFor(em, actor, scope, mutations);
      const results: MutationResult[] = [];
      for (const m of mutations) results.push(await this.applyOnce(run, actor, scope, m, device, judges));
      return results;
    });
  }

  /**
   * The server's own change of existing rows (a photo's bytes arrived, a conflict settled): numbered, stamped per
   * field with the actor and a clock of the server's, and logged for pulls, as any change. No lock applies: these
   * are the server's word on rows it owns or fields no device sets.
   */
  async serverWrite(em: EntityManager, actor: Actor, entity: SyncEntityName, writes: ReadonlyArray<{ row: SyncRecord; changes: Record<string, unknown> }>): Promise<void> {
    if (!writes.length) return;
    const spec = SYNC_ENTITIES[entity];
    await this.inBatch(em, async (run) => {
      const { batch, locks } = run;
      for (const { row, changes } of writes) {
        this.noteMove(run, actor, entity, row.id, Object.keys(changes));
        const seq = await batch.nextSeq();
        const hlc = formatHlc({ ms: Date.now(), counter: 0, deviceId: actor.deviceId });
        const fieldMeta = { ...row.fieldMeta };
        // Stamped like a device's write, so a device still holding the old value cannot overwrite it unseen by the merge.
        for (const field of Object.keys(changes)) if (Object.hasOwn(spec.fields, field)) fieldMeta[field] = { v: seq, hlc, by: actor.userId, role: actor.role };
        await batch.write(entity, row, { ...changes, fieldMeta, version: seq, updatedById: actor.userId });
        locks.changed(entity);
        batch.recordChange(entity, row, seq);
      }
    });
  }

  /**
   * The server's own new row (an issued document): numbered, stamped and logged like a device's, for the rows that
   * no push may make. The fields are checked against the registry as a push's would be.
   */
  async serverCreate(em: EntityManager, actor: Actor, entity: SyncEntityName, id: string, set: Record<string, FieldValue>): Promise<SyncRecord> {
    const checked = checkMutation({ mutationId: uuidv7(), entity, id, baseVersion: 0, set, hlc: formatHlc({ ms: Date.now(), counter: 0, deviceId: actor.deviceId }) }, { server: true });
    return this.inBatch(em, async (run) => {
      await checkReferences(run.batch.em, actor.organisationId, entity, checked.spec, checked.set, run.batch.known);
      await this.create(run, actor, checked);
      run.locks.changed(entity);
      return (await run.batch.rowOf(entity, id))!;
    });
  }

  /**
   * Runs work in the transaction's batch, opening one if none is open (and closing it after): a feature's hook
   * that writes through the engine joins the batch that called it.
   */
  private async inBatch<T>(em: EntityManager, work: (run: Run) => Promise<T>): Promise<T> {
    const open = this.runs.get(em);
    if (open) return work(open);
    const batch = new SyncBatch(em);
    const run: Run = { batch, locks: new RecordLocks(this.lockRules, batch), moved: new Map() };
    this.runs.set(em, run);
    try {
      const result = await work(run);
      // A hook's own writes join this batch; rows they move in turn are followed until nothing more moves.
      while (run.moved.size) {
        const moved = [...run.moved];
        run.moved.clear();
        await batch.flush();
        for (const [entity, rows] of moved) await this.moveHooks.get(entity)!.hook(batch.em, rows);
      }
      await batch.close();
      return result;
    } finally {
      this.runs.delete(em);
    }
  }

  /**
   * Reads, in one query per entity, the batch's replays, every row it names and every row its references point
   * at, so that applying a mutation touches no table that the batch already knows.
   */
  private async preload({ batch, locks }: Run, actor: Actor, mutations: Mutation[]): Promise<void> {
    const ids = mutations.map((m) => m?.mutationId).filter(isMutationId);
    for (const a of await selectMany(batch.em, AppliedMutation, 'mutationId', ids)) batch.applied.set(a.mutationId, a);
    const rowIds = new Map<SyncEntityName, Set<string>>();
    for (const m of mutations) {
      if (!m || !isSyncEntity(m.entity) || SYNC_ENTITIES[m.entity].serverOnly || !isUuid(m.id)) continue;
      if (!rowIds.has(m.entity)) rowIds.set(m.entity, new Set());
      rowIds.get(m.entity)!.add(m.id);
    }
    const existing: Array<[SyncEntityName, SyncRecord]> = [];
    for (const [entity, ids] of rowIds) for (const row of await batch.load(entity, [...ids])) existing.push([entity, row]);
    await locks.preload(existing, SYNC_ENTITIES);
    await preloadReferences(batch.em, actor.organisationId, referencedIds(mutations), batch.known, batch.sites);
  }

  private async applyOnce(
    run: Run, actor: Actor, scope: TechnicianScope | null, m: Mutation, device: DeviceClaims | undefined, judges: Map<SyncEntityName, Verdict>,
  ): Promise<MutationResult> {
    // An id that could never be stored is refused without being looked up or kept.
    const mutationId = isMutationId(m?.mutationId) ? m.mutationId : '';
    const done = mutationId ? run.batch.applied.get(mutationId) : undefined;
    if (done) {
      if (done.organisationId !== actor.organisationId) return { mutationId, status: 'rejected', error: 'mutationId was already used.' };
      return done.result;
    }
    let result: MutationResult;
    try {
      const checked = checkMutation(m);
      result = await this.apply(run, actor, scope, checked, judges, device);
    } catch (err) {
      if (!(err instanceof MutationRefused)) throw err;
      result = { mutationId, status: 'rejected', error: err.message };
    }
    // The same id twice in one batch is a replay too.
    if (mutationId) run.batch.recordApplied({ mutationId, organisationId: actor.organisationId, userId: actor.userId, deviceId: actor.deviceId, result });
    return result;
  }

  private async apply(
    run: Run, actor: Actor, scope: TechnicianScope | null, checked: CheckedMutation, judges: Map<SyncEntityName, Verdict>, device: DeviceClaims | undefined,
  ): Promise<MutationResult> {
    const { mutation: m, spec, set, isDelete } = checked;
    const existing = await run.batch.rowOf(m.entity, m.id);
    if (existing && existing.organisationId !== actor.organisationId) throw new MutationRefused(`No ${m.entity} with that id.`);
    // A base above the row's version claims to have seen changes that never happened, and would win every merge.
    if (existing && m.baseVersion > existing.version) throw new MutationRefused(`baseVersion ${m.baseVersion} is newer than the ${m.entity} itself (version ${existing.version}).`);
    if (device) checkDeviceClaims(actor, device, checked);

    checkTechnicianWrite(scope, checked, existing);
    checkRecordRules(checked, existing);
    const refusal = judges.get(m.entity)?.(checked, existing);
    if (refusal) throw new MutationRefused(refusal);
    const rowSite = spec.siteField === 'siteId' ? textOrNull(set.siteId ?? existing?.siteId) : spec.siteField === 'id' ? m.id : null;
    await checkReferences(run.batch.em, actor.organisationId, m.entity, spec, set, run.batch.known, run.batch.sites, rowSite);

    if (!existing) {
      if (isDelete) return { mutationId: m.mutationId, status: 'applied', version: 0, fieldVersions: {} };
      return this.create(run, actor, checked);
    }
    const lock = await run.locks.lockOf(actor.role, spec, existing, Object.keys(set));
    if (lock) return this.lockedToConflicts(run, actor, checked, existing, lock);
    if (isDelete) return this.remove(run, actor, m, existing);
    return this.update(run, actor, checked, existing);
  }

  private async create(run: Run, actor: Actor, { mutation: m, spec, set }: CheckedMutation): Promise<MutationResult> {
    const { batch, locks } = run;
    checkNewRow(m.entity, set);
    const seq = await batch.nextSeq();
    const fieldMeta: Record<string, FieldStamp> = {};
    for (const field of Object.keys(set)) fieldMeta[field] = { v: seq, hlc: m.hlc, by: actor.userId, role: actor.role };
    const row: SyncRecord = {
      id: m.id, organisationId: actor.organisationId, version: seq, fieldMeta, deletedAt: null, createdById: actor.userId, updatedById: actor.userId,
      createdAt: batch.now, updatedAt: batch.now, ...set,
    };
    batch.insert(m.entity, row);
    batch.recordChange(m.entity, row, seq);
    this.noteMove(run, actor, m.entity, m.id);
    if (spec.siteField === 'siteId') batch.sites.set(`${m.entity}:${m.id}`, textOrNull(row.siteId));
    const hook = this.createHooks.get(m.entity);
    if (hook) {
      // A feature's hook reads and writes the database: give it the row, and everything before it, written.
      await batch.flush();
      await hook(batch.em, actor, row);
      batch.forget(m.entity, row.id);
      locks.forget();
    }
    return { mutationId: m.mutationId, status: 'applied', version: seq, fieldVersions: versionsOf(fieldMeta) };
  }

  private async update(run: Run, actor: Actor, { mutation: m, spec, set }: CheckedMutation, row: SyncRecord): Promise<MutationResult> {
    const { batch, locks } = run;
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
    const seq = await batch.nextSeq();
    const conflictIds: string[] = [];
    for (const l of lost) {
      const incoming = { value: set[l.field], by: actor.userId, hlc: m.hlc, deviceId: actor.deviceId };
      const current = { value: row[l.field], by: row.fieldMeta[l.field]?.by ?? null, hlc: row.fieldMeta[l.field]?.hlc ?? null, deviceId: null };
      conflictIds.push(await this.writeConflict(batch, actor, m.entity, row.id, l.field, l.reason, m.baseVersion, l.keptIncoming ? incoming : current, l.keptIncoming ? current : incoming));
    }
    const fieldMeta = { ...row.fieldMeta };
    for (const field of Object.keys(changes)) fieldMeta[field] = { v: seq, hlc: m.hlc, by: actor.userId, role: actor.role };
    const next = { ...changes, fieldMeta, version: seq, updatedById: actor.userId, ...(revived ? { deletedAt: null } : {}) };
    await batch.write(m.entity, row, next);
    locks.changed(m.entity);
    if (typeof changes.siteId === 'string') batch.sites.set(`${m.entity}:${row.id}`, changes.siteId);
    if (revived) batch.known.add(`${m.entity}:${row.id}`);
    batch.recordChange(m.entity, row, seq);
    this.noteMove(run, actor, m.entity, row.id, revived ? undefined : Object.keys(changes));
    return {
      mutationId: m.mutationId,
      status: lost.some((l) => !l.keptIncoming) ? 'merged' : 'applied',
      version: seq,
      fieldVersions: versionsOf(fieldMeta),
      ...(conflictIds.length ? { conflictIds } : {}),
    };
  }

  private async remove(run: Run, actor: Actor, m: Mutation, row: SyncRecord): Promise<MutationResult> {
    const { batch, locks } = run;
    if (row.deletedAt) return { mutationId: m.mutationId, status: 'applied', version: row.version, fieldVersions: versionsOf(row.fieldMeta) };
    const editedSince = Object.entries(row.fieldMeta).filter(([, meta]) => meta.v > m.baseVersion && !sameDevice(meta.hlc, m.hlc));
    if (editedSince.length > 0) {
      // Someone edited the row after this device last saw it: the edit wins and the delete is kept for review.
      const seq = await batch.nextSeq();
      const id = await this.writeConflict(batch, actor, m.entity, row.id, '*', 'edit-beats-delete', m.baseVersion,
        { value: 'kept', by: editedSince[0]![1].by, hlc: editedSince[0]![1].hlc, deviceId: null },
        { value: 'deleted', by: actor.userId, hlc: m.hlc, deviceId: actor.deviceId });
      await batch.write(m.entity, row, { version: seq });
      locks.changed(m.entity);
      batch.recordChange(m.entity, row, seq);
      return { mutationId: m.mutationId, status: 'merged', version: seq, fieldVersions: versionsOf(row.fieldMeta), conflictIds: [id] };
    }
    const seq = await batch.nextSeq();
    await batch.write(m.entity, row, { deletedAt: new Date(), version: seq, updatedById: actor.userId });
    locks.changed(m.entity);
    batch.known.delete(`${m.entity}:${row.id}`);
    batch.recordChange(m.entity, row, seq, true);
    this.noteMove(run, actor, m.entity, row.id);
    return { mutationId: m.mutationId, status: 'applied', version: seq, fieldVersions: versionsOf(row.fieldMeta) };
  }

  /** A locked record does not change under anyone: every attempted change goes to the office as a conflict. */
  private async lockedToConflicts(run: Run, actor: Actor, { mutation: m, set, isDelete }: CheckedMutation, row: SyncRecord, { reason, heldBy }: Lock): Promise<MutationResult> {
    const conflictIds: string[] = [];
    const entries: Array<[string, unknown]> = isDelete ? [['*', 'deleted']] : Object.entries(set).filter(([f, v]) => !sameValue(row[f], v));
    for (const [field, value] of entries) {
      const current = { value: field === '*' ? 'kept' : row[field], by: row.fieldMeta[field]?.by ?? null, hlc: row.fieldMeta[field]?.hlc ?? null, deviceId: null };
      conflictIds.push(await this.writeConflict(run.batch, actor, m.entity, row.id, field, reason, m.baseVersion, current, { value, by: actor.userId, hlc: m.hlc, deviceId: actor.deviceId }));
    }
    return {
      mutationId: m.mutationId, status: conflictIds.length ? 'merged' : 'applied', version: row.version, fieldVersions: versionsOf(row.fieldMeta),
      ...(conflictIds.length ? { conflictIds, ...(heldBy ? { heldBy } : {}) } : {}),
    };
  }

  /** The value not kept, as a conflict row of its own: numbered and pulled by office devices like any row. */
  private async writeConflict(
    batch: SyncBatch, actor: Actor, entity: SyncEntityName, rowId: string, field: string, reason: string, baseVersion: number, kept: ConflictSide, discarded: ConflictSide,
  ): Promise<string> {
    const seq = await batch.nextSeq();
    const id = uuidv7();
    const row: SyncRecord = {
      id, organisationId: actor.organisationId, version: seq, fieldMeta: {}, deletedAt: null, createdById: actor.userId, updatedById: actor.userId,
      createdAt: batch.now, updatedAt: batch.now,
      entity, rowId, field, reason, baseVersion,
      keptValue: kept.value ?? null, keptById: kept.by, keptHlc: kept.hlc,
      discardedValue: discarded.value ?? null, discardedById: discarded.by, discardedHlc: discarded.hlc, discardedDeviceId: discarded.deviceId,
      resolvedAt: null, resolvedById: null, resolution: null,
    };
    batch.insert('conflict', row);
    batch.recordChange('conflict', row, seq);
    return id;
  }
}

export function versionsOf(meta: Record<string, FieldStamp>): Record<string, number> {
  return Object.fromEntries(Object.entries(meta).map(([f, m]) => [f, m.v]));
}
