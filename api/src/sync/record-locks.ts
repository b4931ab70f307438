import { type EntitySpec, FINISHED_VISIT_STATUS, type Role, type SyncEntityName } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import type { SyncRecord } from './entities/sync-schemas.js';

/** A stored record, named as a lock rule is asked about it. */
export interface RecordKey {
  entity: SyncEntityName;
  id: string;
}

/**
 * A feature's rule that keeps records from changing, registered with SyncEngine.lockRule for the entity whose rows
 * do the locking. An attempted change to a locked row is not applied: it goes to the office as a conflict with the
 * rule's reason.
 */
export interface LockRule {
  reason: string;
  /** Whether a stored row of the registering entity refuses a change of these fields (an issued certificate's own fields). */
  locksRow?(row: SyncRecord, fields: string[]): boolean;
  /**
   * Which of these records a row of the registering entity holds, by `entity:id`, with the name of what holds it
   * (a document's number). Asked once per batch for every existing row the batch names, so it should be one query.
   */
  holds?(em: EntityManager, records: readonly RecordKey[]): Promise<Map<string, string>>;
  /** Fields of a held record that the holder does not print, and which may still change (a site's access notes). */
  unheldFields?: Partial<Record<SyncEntityName, readonly string[]>>;
}

/** Why a change was kept back, and what holds the record when a rule names it. */
export interface Lock {
  reason: string;
  heldBy?: string;
}

/** A technician may not change the records of a visit finished and signed on site; the office may still put things right. */
export const SIGN_OFF_REASON = 'locked-by-sign-off';

/** What the locks read through: the batch, so that a visit is not read twice. */
export interface LockReads {
  readonly em: EntityManager;
  has(entity: SyncEntityName, id: string): boolean;
  rowOf(entity: SyncEntityName, id: string): Promise<SyncRecord | null>;
  load(entity: SyncEntityName, ids: readonly string[]): Promise<SyncRecord[]>;
}

const keyOf = (entity: SyncEntityName, id: string) => `${entity}:${id}`;

/**
 * Why a row may not change under a writer, for the length of one batch. New rows are never locked: a photo taken
 * after signing still reaches the office. Which records are held is read once per batch for the rows it names, and
 * read again only after a holding row (a document) was written.
 */
export class RecordLocks {
  /** Per `entity:id`: the lock holding the record, or null when none does, as read in this batch. */
  private readonly held = new Map<string, Lock | null>();

  constructor(
    private readonly rules: ReadonlyMap<SyncEntityName, LockRule>,
    private readonly reads: LockReads,
  ) {}

  /**
   * What holds the existing rows a batch names, and the visits of the ones recorded on a visit: what lockOf asks
   * about every change, read in one query per rule and one for the visits instead of one per mutation.
   */
  async preload(existing: ReadonlyArray<[SyncEntityName, SyncRecord]>, specs: Record<SyncEntityName, EntitySpec>): Promise<void> {
    const visitIds = new Set<string>();
    for (const [entity, row] of existing) {
      if (specs[entity].visitField === 'visitId' && typeof row.visitId === 'string' && !this.reads.has('visit', row.visitId)) visitIds.add(row.visitId);
    }
    if (visitIds.size) await this.reads.load('visit', [...visitIds]);
    await this.readHolds(existing.filter(([entity]) => !this.rules.get(entity)?.locksRow).map(([entity, row]) => ({ entity, id: row.id })));
  }

  /** The lock a stored row is under for this change from this writer, or null. */
  async lockOf(role: Role, spec: EntitySpec, row: SyncRecord, fields: string[]): Promise<Lock | null> {
    // A row with a rule of its own is judged by that rule alone.
    const own = this.rules.get(spec.name);
    if (own?.locksRow) return own.locksRow(row, fields) ? { reason: own.reason } : null;
    const key = keyOf(spec.name, row.id);
    if (!this.held.has(key)) await this.readHolds([{ entity: spec.name, id: row.id }]);
    const hold = this.held.get(key);
    // A delete changes no field, and is held like any change.
    if (hold && (fields.length === 0 || fields.some((f) => !this.unheld(hold, spec.name).has(f)))) return hold;
    if (role !== 'technician' || !spec.visitField) return null;
    const visitId = spec.visitField === 'id' ? row.id : typeof row.visitId === 'string' ? row.visitId : null;
    const visit = !visitId ? null : spec.visitField === 'id' ? row : await this.reads.rowOf('visit', visitId);
    return visit?.status === FINISHED_VISIT_STATUS ? { reason: SIGN_OFF_REASON } : null;
  }

  /** A row of this entity was written: which records it holds may have changed. */
  changed(entity: SyncEntityName): void {
    if (this.rules.get(entity)?.holds) this.held.clear();
  }

  /** Something outside the batch's sight wrote to the database (a feature's hook, say). */
  forget(): void {
    this.held.clear();
  }

  private async readHolds(records: RecordKey[]): Promise<void> {
    const unknown = records.filter((r) => !this.held.has(keyOf(r.entity, r.id)));
    if (!unknown.length) return;
    for (const r of unknown) this.held.set(keyOf(r.entity, r.id), null);
    for (const rule of this.rules.values()) {
      if (!rule.holds) continue;
      for (const [key, by] of await rule.holds(this.reads.em, unknown)) if (!this.held.get(key)) this.held.set(key, { reason: rule.reason, heldBy: by });
    }
  }

  private unheld(hold: Lock, entity: SyncEntityName): ReadonlySet<string> {
    const rule = [...this.rules.values()].find((r) => r.reason === hold.reason);
    return new Set(rule?.unheldFields?.[entity] ?? []);
  }
}
