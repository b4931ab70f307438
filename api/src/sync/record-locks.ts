import { type EntitySpec, FINISHED_VISIT_STATUS, type Role, type SyncEntityName } from '@wiretrail/core';
import type { SyncRecord } from './entities/sync-schemas.js';

/**
 * A feature's rule that keeps records from changing, registered with SyncEngine.lockRule for the entity whose rows
 * do the locking. An attempted change to a locked row is not applied: it goes to the office as a conflict with the
 * rule's reason.
 */
export interface LockRule {
  reason: string;
  /** Whether a stored row of the registering entity refuses a change of these fields (an issued certificate's own fields). */
  locksRow?(row: SyncRecord, fields: string[]): boolean;
  /** Whether a row of the registering entity, not deleted, locks every record of its job's visits. */
  locksJob?(row: SyncRecord): boolean;
}

/** A technician may not change the records of a visit finished and signed on site; the office may still put things right. */
export const SIGN_OFF_REASON = 'locked-by-sign-off';

/** What the locks read through: the batch, so that a visit or a waiting row is not read twice. */
export interface LockReads {
  has(entity: SyncEntityName, id: string): boolean;
  rowOf(entity: SyncEntityName, id: string): Promise<SyncRecord | null>;
  load(entity: SyncEntityName, ids: readonly string[]): Promise<SyncRecord[]>;
  select(entity: SyncEntityName, column: string, values: readonly unknown[], where?: Record<string, unknown>): Promise<SyncRecord[]>;
  waiting(entity: SyncEntityName): readonly SyncRecord[];
}

/**
 * Why a row may not change under a writer, for the length of one batch. New rows are never locked: a photo taken
 * after signing still reaches the office. Which jobs are locked is read once per batch for the rows it names, and
 * read again only after a locking row was written.
 */
export class RecordLocks {
  /** Per locking entity: whether a job is locked, as read from the database in this batch. */
  private readonly lockedJobs = new Map<SyncEntityName, Map<string, boolean>>();

  constructor(
    private readonly rules: ReadonlyMap<SyncEntityName, LockRule>,
    private readonly reads: LockReads,
  ) {}

  /**
   * The visits of the existing rows a batch names, and which of their jobs are locked: what lockOf asks about every
   * change to a visit's records, read in one query per entity instead of one per mutation.
   */
  async preload(existing: ReadonlyArray<[SyncEntityName, SyncRecord]>, specs: Record<SyncEntityName, EntitySpec>): Promise<void> {
    const visits: SyncRecord[] = [];
    const visitIds = new Set<string>();
    for (const [entity, row] of existing) {
      if (entity === 'visit') visits.push(row);
      else if (specs[entity].visitField === 'visitId' && typeof row.visitId === 'string' && !this.reads.has('visit', row.visitId)) visitIds.add(row.visitId);
    }
    if (visitIds.size) visits.push(...(await this.reads.load('visit', [...visitIds])));
    const jobIds = new Set<string>();
    for (const visit of visits) if (typeof visit.jobId === 'string') jobIds.add(visit.jobId);
    if (!jobIds.size) return;
    for (const [entity, rule] of this.jobRules()) {
      const rows = await this.reads.select(entity, 'jobId', [...jobIds], { deletedAt: null });
      const known = this.jobsOf(entity);
      for (const jobId of jobIds) known.set(jobId, false);
      for (const row of rows) if (rule.locksJob!(row) && typeof row.jobId === 'string') known.set(row.jobId, true);
    }
  }

  /** The reason a stored row may not take this change from this writer, or null. */
  async lockOf(role: Role, spec: EntitySpec, row: SyncRecord, fields: string[]): Promise<string | null> {
    // A row with a rule of its own is judged by that rule alone.
    const own = this.rules.get(spec.name);
    if (own?.locksRow) return own.locksRow(row, fields) ? own.reason : null;
    if (!spec.visitField) return null;
    const visitId = spec.visitField === 'id' ? row.id : typeof row.visitId === 'string' ? row.visitId : null;
    if (!visitId) return null;
    const visit = spec.visitField === 'id' ? row : await this.reads.rowOf('visit', visitId);
    const jobId = visit?.jobId;
    if (typeof jobId !== 'string' || !jobId) return null;
    for (const [entity, rule] of this.jobRules()) if (await this.jobLocked(entity, rule, jobId)) return rule.reason;
    if (role === 'technician' && visit.status === FINISHED_VISIT_STATUS) return SIGN_OFF_REASON;
    return null;
  }

  /** A row of this entity was written: which jobs it locks may have changed. */
  changed(entity: SyncEntityName): void {
    if (this.rules.get(entity)?.locksJob) this.lockedJobs.delete(entity);
  }

  /** Something outside the batch's sight wrote to the database (a feature's hook, say). */
  forget(): void {
    this.lockedJobs.clear();
  }

  private async jobLocked(entity: SyncEntityName, rule: LockRule, jobId: string): Promise<boolean> {
    if (this.reads.waiting(entity).some((r) => r.jobId === jobId && r.deletedAt == null && rule.locksJob!(r))) return true;
    const known = this.jobsOf(entity);
    const cached = known.get(jobId);
    if (cached !== undefined) return cached;
    const locked = (await this.reads.select(entity, 'jobId', [jobId], { deletedAt: null })).some((r) => rule.locksJob!(r));
    known.set(jobId, locked);
    return locked;
  }

  private jobsOf(entity: SyncEntityName): Map<string, boolean> {
    let known = this.lockedJobs.get(entity);
    if (!known) this.lockedJobs.set(entity, (known = new Map()));
    return known;
  }

  private *jobRules(): Generator<[SyncEntityName, LockRule]> {
    for (const [entity, rule] of this.rules) if (rule.locksJob) yield [entity, rule];
  }
}
