import { SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import { AppliedMutation, SyncChange, SyncCounter } from './entities/sync-bookkeeping.entity.js';
import { SYNC_SCHEMAS, type SyncRecord } from './entities/sync-schemas.js';
import { insertMany, selectMany, updateWhere } from './bulk-write.js';
import type { KnownRows, RowSites } from './reference-checks.js';

export type AppliedRecord = Pick<AppliedMutation, 'mutationId' | 'organisationId' | 'userId' | 'deviceId' | 'result'>;

/**
 * One run of the engine inside a transaction, and the bookkeeping it owes: rows read or made, the numbers it takes,
 * the change log and the applied mutations. Per-row round trips dominate the cost of a push, so the counter is read
 * once and written once, new rows and the log are inserted many at a time at the end, and every row read is kept.
 * Device pushes and the server's own writes both run in one, so there is one way a change is recorded.
 */
export class SyncBatch {
  /** Mutations already applied, by id: read once for the whole batch, and added to as it applies them. */
  readonly applied = new Map<string, AppliedRecord>();
  /** Referenced rows already found to exist in this batch. */
  readonly known: KnownRows = new Set();
  /** The site of each referenced or written row that belongs to one, by `entity:id`, for the same-site rule. */
  readonly sites: RowSites = new Map();
  /** When the batch began: the creation time of the rows it makes. */
  readonly now = new Date();
  /** Rows read or written by this batch, by `entity:id`; null when read and not there. */
  private readonly rows = new Map<string, SyncRecord | null>();
  /** New rows not yet inserted, per entity, in the order they were made. */
  private readonly inserts = new Map<SyncEntityName, SyncRecord[]>();
  /** `entity:id` of the rows in `inserts`. */
  private readonly pending = new Set<string>();
  /** The change log's entry per `entity:rowId`, the latest. */
  private readonly changes = new Map<string, { entity: SyncEntityName; rowId: string; organisationId: string; seq: number; siteId: string | null; deleted: boolean; changedAt: Date }>();
  private appliedRows: Array<AppliedRecord & { appliedAt: Date }> = [];
  private seq: { value: number } | null = null;

  constructor(readonly em: EntityManager) {}

  /** Whether the batch has read or made the row (or found it missing). */
  has(entity: SyncEntityName, id: string): boolean {
    return this.rows.has(`${entity}:${id}`);
  }

  /** A row as the batch has it (read at its start, or written since), else as the database has it. */
  async rowOf(entity: SyncEntityName, id: string): Promise<SyncRecord | null> {
    const key = `${entity}:${id}`;
    if (this.rows.has(key)) return this.rows.get(key)!;
    const row = await this.em.getRepository<SyncRecord>(entity).findOne({ where: { id }, withDeleted: true });
    this.rows.set(key, row);
    return row;
  }

  /** Reads rows in one query and keeps them, and the absence of the ones not there. */
  async load(entity: SyncEntityName, ids: readonly string[]): Promise<SyncRecord[]> {
    const found = await selectMany<SyncRecord>(this.em, SYNC_SCHEMAS[entity], 'id', ids);
    for (const id of ids) this.rows.set(`${entity}:${id}`, null);
    for (const row of found) this.rows.set(`${entity}:${row.id}`, row);
    return found;
  }

  /** Rows of an entity matching a plain condition, read from the database (rows still waiting are not among them). */
  select(entity: SyncEntityName, column: string, values: readonly unknown[], where: Record<string, unknown> = {}): Promise<SyncRecord[]> {
    return selectMany<SyncRecord>(this.em, SYNC_SCHEMAS[entity], column, values, where);
  }

  /** New rows of an entity that the batch has made and not yet inserted. */
  waiting(entity: SyncEntityName): readonly SyncRecord[] {
    return this.inserts.get(entity) ?? [];
  }

  /** Drops what the batch holds of a row, so that the next read asks the database. */
  forget(entity: SyncEntityName, id: string): void {
    this.rows.delete(`${entity}:${id}`);
  }

  /** The next number of the one global sequence; read once per batch, written back by close(). */
  async nextSeq(): Promise<number> {
    if (this.seq) return ++this.seq.value;
    const [current] = await selectMany(this.em, SyncCounter, 'name', ['global']);
    if (!current) await this.em.insert(SyncCounter, { name: 'global', value: 0 });
    this.seq = { value: (current?.value ?? 0) + 1 };
    return this.seq.value;
  }

  /** A new row: kept back (and visible to the rest of the batch) until flush(). */
  insert(entity: SyncEntityName, row: SyncRecord): void {
    // Every row of one multi-row insert names the same columns, and gets its times here rather than from column defaults.
    for (const column of columnsOf(entity)) if (row[column] === undefined) row[column] = null;
    row.createdAt ??= this.now;
    row.updatedAt ??= this.now;
    if (!this.inserts.has(entity)) this.inserts.set(entity, []);
    this.inserts.get(entity)!.push(row);
    this.pending.add(`${entity}:${row.id}`);
    this.rows.set(`${entity}:${row.id}`, row);
    this.known.add(`${entity}:${row.id}`);
  }

  /**
   * Writes a row's changes: to the row itself while it waits to be inserted, else to the database at once. The
   * object given is changed too; if the batch held another copy of the row, that copy is dropped.
   */
  async write(entity: SyncEntityName, row: SyncRecord, changes: Record<string, unknown>): Promise<void> {
    const key = `${entity}:${row.id}`;
    if (!this.pending.has(key)) await updateWhere(this.em, SYNC_SCHEMAS[entity], { id: row.id }, changes);
    Object.assign(row, changes);
    if (this.rows.has(key) && this.rows.get(key) !== row) this.rows.delete(key);
  }

  /** The change log keeps one entry per row, its latest; only the last one of a batch is written. */
  recordChange(entity: SyncEntityName, row: SyncRecord, seq: number, deleted = false): void {
    const spec = SYNC_ENTITIES[entity];
    const siteId = spec.siteField === 'id' ? row.id : spec.siteField === 'siteId' && typeof row.siteId === 'string' ? row.siteId : null;
    this.changes.set(`${entity}:${row.id}`, { entity, rowId: row.id, organisationId: row.organisationId, seq, siteId, deleted, changedAt: this.now });
  }

  /** A mutation applied (or refused for good): a replay of its id gets the same answer, in this batch and after. */
  recordApplied(record: AppliedRecord): void {
    // Stamped here to the millisecond, not by the database's clock: compaction compares it with the device's last pull.
    this.appliedRows.push({ ...record, appliedAt: this.now });
    this.applied.set(record.mutationId, record);
  }

  /** Inserts what the batch has kept back: new rows in the order they were made, then applied mutations and the change log. */
  async flush(): Promise<void> {
    for (const [entity, rows] of this.inserts) {
      for (let i = 0; i < rows.length; i += INSERT_CHUNK) await insertMany(this.em, entity, rows.slice(i, i + INSERT_CHUNK));
    }
    this.inserts.clear();
    this.pending.clear();
    for (let i = 0; i < this.appliedRows.length; i += INSERT_CHUNK) await insertMany(this.em, AppliedMutation, this.appliedRows.slice(i, i + INSERT_CHUNK));
    this.appliedRows = [];
    const changes = [...this.changes.values()];
    for (let i = 0; i < changes.length; i += INSERT_CHUNK) await insertMany(this.em, SyncChange, changes.slice(i, i + INSERT_CHUNK), { columns: ['entity', 'rowId'] });
    this.changes.clear();
  }

  /** Flushes, and writes the counter's final value, before the transaction commits. */
  async close(): Promise<void> {
    await this.flush();
    if (this.seq) await updateWhere(this.em, SyncCounter, { name: 'global' }, { value: this.seq.value });
  }
}

/** Rows per multi-row insert: well inside SQLite's and PostgreSQL's limits on bound parameters. */
const INSERT_CHUNK = 100;

const COLUMNS = new Map<SyncEntityName, string[]>();
/** Every column of an entity's table, read once from its schema. */
function columnsOf(entity: SyncEntityName): string[] {
  let columns = COLUMNS.get(entity);
  if (!columns) COLUMNS.set(entity, (columns = Object.keys(SYNC_SCHEMAS[entity].options.columns)));
  return columns;
}
