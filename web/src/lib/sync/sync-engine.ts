import {
  type Change,
  type FieldValue,
  formatHlc,
  type Hlc,
  MAX_CLOCK_AHEAD_MS,
  MAX_PULL_LIMIT,
  MAX_PUSH_MUTATIONS,
  type Mutation,
  type MutationResult,
  type PullResponse,
  type PushRequest,
  type PushResponse,
  parseHlc,
  SYNC_ENTITY_NAMES,
  type SyncEntityName,
  tickHlc,
} from '@wiretrail/core';
import type { Table } from 'dexie';
import { ApiError, OfflineError } from '@/lib/api-client';
import type { LocalRow, OutboxEntry, WiretrailDb } from '@/lib/db';
import { deviceIdFor } from './device-id';
import { setEngineState } from './sync-state';

/** How the engine reaches the server; tests give it an in-memory server instead. */
export interface SyncTransport {
  push(request: PushRequest): Promise<PushResponse>;
  pull(params: { checkpoint: number; limit: number; deviceId: string }): Promise<PullResponse>;
}

export interface SyncEngineOptions {
  db: WiretrailDb;
  transport: SyncTransport;
  /** The signed-in user: only their changes are sent. */
  userId: string;
  /** Runs one sync at a time across tabs. */
  lock?: (run: () => Promise<void>) => Promise<void>;
  now?: () => number;
  /**
   * Runs before each push: sends photo bytes ahead of the rows that point at them. Resolves true when more remain,
   * to run another round at once.
   */
  beforePush?: () => Promise<boolean>;
  /** Schedules the retry after a failure; tests run it by hand. */
  timers?: { set(run: () => void, ms: number): unknown; clear(handle: unknown): void };
}

export type SyncOutcome = 'done' | 'failed' | 'signed-out' | 'stopped' | 'offline';

const FIRST_RETRY_MS = 5_000;
const MAX_RETRY_MS = 5 * 60_000;
const PULL_LIMIT = Math.min(500, MAX_PULL_LIMIT);
const SYNCED = new Set<string>(SYNC_ENTITY_NAMES);

/** The engine was stopped (signed out) while a sync was under way. */
class StoppedError extends Error {}

/** Wait before the next try after `failures` failures in a row: doubling, capped, with jitter so phones spread out. */
export function retryDelay(failures: number, random = Math.random): number {
  const base = Math.min(MAX_RETRY_MS, FIRST_RETRY_MS * 2 ** Math.max(0, failures - 1));
  return Math.round(base * (0.75 + random() * 0.5));
}

/** The reason a sync stopped, in words for the person holding the phone. */
export function describeSyncError(err: unknown): string {
  if (err instanceof OfflineError) return 'No signal. Your changes are kept on this phone and sent when the connection returns.';
  if (err instanceof ApiError && err.status === 401) {
    return 'Your sign-in has ended. Sign in again to send your changes; they stay on this phone until then.';
  }
  if (err instanceof ApiError && err.status >= 500) return 'The office system is not answering just now. Wiretrail will try again shortly.';
  if (err instanceof ApiError) return `The office system refused the sync: ${err.message}`;
  const name = (err as { name?: string; inner?: { name?: string } })?.inner?.name ?? (err as Error)?.name;
  if (name === 'QuotaExceededError') return 'This phone has no space left for Wiretrail. Free some space; nothing recorded is lost.';
  return `Sync stopped: ${(err as Error)?.message ?? 'unknown error'}.`;
}

const sameRow = (e: { entity: string; id: string }) => `${e.entity}\u0000${e.id}`;

/**
 * Push, then pull. Push sends this user's outbox in the order it was made, in batches; each reply is applied in
 * one transaction. Pull fetches pages until there are no more, each page applied in one transaction, keeping the
 * phone's unsent values. Network calls never happen inside a database transaction (IndexedDB would commit it early).
 */
export class SyncEngine {
  private readonly db: WiretrailDb;
  private readonly transport: SyncTransport;
  private readonly userId: string;
  private readonly lock: (run: () => Promise<void>) => Promise<void>;
  private readonly now: () => number;
  private readonly beforePush: () => Promise<boolean>;
  private running: Promise<SyncOutcome> | null = null;
  private again = false;
  private stopped = false;
  private failures = 0;
  private readonly timers: NonNullable<SyncEngineOptions['timers']>;
  private retryTimer: unknown = null;

  constructor(options: SyncEngineOptions) {
    this.db = options.db;
    this.transport = options.transport;
    this.userId = options.userId;
    this.lock = options.lock ?? ((run) => run());
    this.now = options.now ?? Date.now;
    this.beforePush = options.beforePush ?? (async () => false);
    this.timers = options.timers ?? { set: (run, ms) => setTimeout(run, ms), clear: (h) => clearTimeout(h as ReturnType<typeof setTimeout>) };
  }

  /** Syncs now; a call during a sync runs one more round after it, so nothing written meanwhile waits for the timer. */
  syncNow(): Promise<SyncOutcome> {
    if (this.stopped) return Promise.resolve('stopped');
    if (this.running) {
      this.again = true;
      return this.running;
    }
    const run = async (): Promise<SyncOutcome> => {
      let outcome = 'stopped' as SyncOutcome;
      do {
        this.again = false;
        await this.lock(async () => {
          outcome = await this.round();
        });
      } while (this.again && !this.stopped && outcome === 'done');
      return outcome;
    };
    this.running = run().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  /** Ends timers; a sync in flight finishes its current step. */
  stop(): void {
    this.stopped = true;
    this.clearRetry();
    setEngineState({ syncing: false, nextRetryAt: null });
  }

  /** Forgets the back-off, for when the connection has just come back. */
  resetBackoff(): void {
    this.failures = 0;
  }

  private async round(): Promise<SyncOutcome> {
    if (this.stopped) return 'stopped';
    setEngineState({ syncing: true });
    try {
      await this.prepareUser();
      const deviceId = await this.deviceId();
      const more = await this.beforePush();
      await this.restampClocksAhead(deviceId);
      await this.pushAll(deviceId);
      await this.pullAll(deviceId);
      await this.db.meta.bulkPut([
        { key: 'lastSyncAt', value: new Date(this.now()).toISOString() },
        { key: 'lastError', value: null },
      ]);
      this.failures = 0;
      this.clearRetry();
      setEngineState({ syncing: false, nextRetryAt: null });
      if (more) this.again = true;
      return 'done';
    } catch (err) {
      if (err instanceof StoppedError) return 'stopped';
      await this.db.setMeta('lastError', describeSyncError(err)).catch(() => undefined);
      // The refresh was refused and the session is gone: nothing is retried until the user signs in again.
      if (err instanceof ApiError && err.status === 401) {
        this.clearRetry();
        setEngineState({ syncing: false, nextRetryAt: null });
        return 'signed-out';
      }
      this.failures++;
      this.scheduleRetry();
      setEngineState({ syncing: false });
      return err instanceof OfflineError ? 'offline' : 'failed';
    }
  }

  private scheduleRetry(): void {
    this.clearRetry();
    if (this.stopped) return;
    const delay = retryDelay(this.failures);
    this.retryTimer = this.timers.set(() => {
      this.retryTimer = null;
      void this.syncNow();
    }, delay);
    setEngineState({ nextRetryAt: this.now() + delay });
  }

  private clearRetry(): void {
    if (this.retryTimer !== null) this.timers.clear(this.retryTimer);
    this.retryTimer = null;
  }

  /** Another person signed in on this phone: drop the rows they may not see, keep everyone's unsent changes. */
  private async prepareUser(): Promise<void> {
    const { db } = this;
    await db.transaction('rw', [...db.syncedTables(), db.meta], async () => {
      const previous = await db.getMeta('userId');
      if (previous === this.userId) return;
      if (previous !== undefined) {
        await Promise.all(db.syncedTables().map((t) => t.clear()));
        await db.setMeta('checkpoint', 0);
      }
      await db.setMeta('userId', this.userId);
    });
  }

  private async deviceId(): Promise<string> {
    const { db } = this;
    return db.transaction('rw', db.meta, () => deviceIdFor(db.meta, this.userId));
  }

  /**
   * Changes stamped while this phone's clock ran ahead would be refused (or, worse, win every later edit) once the
   * clock is put right: they are stamped again from now, in the order they were made, and the clock starts over.
   */
  private async restampClocksAhead(deviceId: string): Promise<void> {
    const { db } = this;
    const now = this.now();
    const ahead = (hlc: string | undefined) => (parseHlc(hlc ?? '')?.ms ?? 0) > now + MAX_CLOCK_AHEAD_MS;
    await db.transaction('rw', db.outbox, db.meta, async () => {
      const entries = await db.outbox.orderBy('seq').filter((e) => e.userId === this.userId).toArray();
      const last = await db.getMeta('hlc');
      if (!ahead(last) && !entries.some((e) => ahead(e.hlc))) return;
      let clock: Hlc | null = null;
      for (const e of entries) {
        clock = tickHlc(clock, now, deviceId);
        if (ahead(e.hlc)) await db.outbox.update(e.seq!, { hlc: formatHlc(clock) });
      }
      const stamped = tickHlc(clock, now, deviceId);
      await db.setMeta('hlc', formatHlc(stamped));
    });
  }

  // ---- push ----

  private async pushAll(deviceId: string): Promise<void> {
    let limit = MAX_PUSH_MUTATIONS;
    for (;;) {
      if (this.stopped) throw new StoppedError('Sync stopped.');
      const queued = await this.db.outbox.orderBy('seq').filter((e) => e.userId === this.userId).limit(limit).toArray();
      if (queued.length === 0) return;
      // A second change to the same row waits for the next batch, so it goes with the version the first one made.
      const seen = new Set<string>();
      const batch: OutboxEntry[] = [];
      for (const entry of queued) {
        if (seen.has(sameRow(entry))) break;
        seen.add(sameRow(entry));
        batch.push(entry);
      }
      const mutations = this.toMutations(batch);
      let response: PushResponse;
      try {
        response = await this.transport.push({ deviceId, mutations });
      } catch (err) {
        if (err instanceof ApiError && err.status === 413 && limit > 1) {
          limit = Math.max(1, Math.floor(batch.length / 2));
          continue;
        }
        await this.noteAttempt(batch, describeSyncError(err));
        throw err;
      }
      const applied = await this.applyPushResults(batch, response.results ?? []);
      if (applied === 0) throw new Error('the office system answered without results');
    }
  }

  private toMutations(batch: OutboxEntry[]): Mutation[] {
    return batch.map((e) => {
      // The version the user saw when making the change (moved on only by this phone's own acknowledged changes),
      // so an edit made offline still counts as concurrent with what others did meanwhile.
      const m: Mutation = { mutationId: e.mutationId, entity: e.entity, id: e.id, baseVersion: e.baseVersion, hlc: e.hlc };
      if (e.set) m.set = e.set;
      if (e.delete) m.delete = true;
      return m;
    });
  }

  private async noteAttempt(batch: OutboxEntry[], message: string): Promise<void> {
    const { db } = this;
    await db
      .transaction('rw', db.outbox, async () => {
        for (const e of batch) await db.outbox.update(e.seq!, { attempts: e.attempts + 1, lastError: message });
      })
      .catch(() => undefined);
  }

  /** Applies one reply in one transaction; returns how many entries it settled. Stops at the first entry without a result. */
  private async applyPushResults(batch: OutboxEntry[], results: MutationResult[]): Promise<number> {
    const { db } = this;
    const byId = new Map(results.map((r) => [r.mutationId, r]));
    let settled = 0;
    await db.transaction('rw', [...db.syncedTables(), db.outbox, db.failed], async () => {
      for (const entry of batch) {
        const result = byId.get(entry.mutationId);
        if (!result) break;
        await db.outbox.delete(entry.seq!);
        const pending = await db.outbox.where('[entity+id]').equals([entry.entity, entry.id]).toArray();
        if (result.status === 'rejected') await this.settleRejected(entry, result, pending);
        else await this.settleAccepted(entry, result, pending);
        settled++;
      }
    });
    return settled;
  }

  private async settleAccepted(entry: OutboxEntry, result: MutationResult, pending: OutboxEntry[]): Promise<void> {
    const { db } = this;
    const table = db.rows(entry.entity);
    const row = await table.get(entry.id);
    if (!row) {
      // A deletion that lost to someone's edit: the row stays on the server, so it comes back here.
      if (entry.delete && result.status === 'merged' && entry.restore && pending.length === 0) await table.put(entry.restore);
      return;
    }
    const base = row._base;
    // The base version stays the one last pulled. The reply's version can include other people's changes this
    // phone has not seen; claiming it would let a later edit here overwrite them unnoticed. The server knows
    // this phone's own changes follow one another, so they are never taken as concurrent.
    const next: LocalRow = {
      ...row,
      _base: { version: base.version, fieldVersions: { ...base.fieldVersions, ...(result.fieldVersions ?? {}) }, values: { ...base.values } },
    };
    const stillPending = pendingFields(pending);
    for (const [field, value] of Object.entries(entry.set ?? {})) {
      // 'merged': a field whose version is not the one this change made lost to a concurrent edit on the server.
      const won = result.status === 'applied' || (result.version !== undefined && result.fieldVersions?.[field] === result.version);
      if (stillPending.has(field)) {
        if (won) next._base.values[field] = value;
      } else {
        if (!won && field in next._base.values) next[field] = next._base.values[field] ?? null;
        delete next._base.values[field];
      }
    }
    await table.put(next);
  }

  private async settleRejected(entry: OutboxEntry, result: MutationResult, pending: OutboxEntry[]): Promise<void> {
    const { db } = this;
    await db.failed.add({
      mutationId: entry.mutationId,
      entity: entry.entity,
      id: entry.id,
      set: entry.set,
      delete: entry.delete,
      userId: entry.userId,
      createdAt: entry.createdAt,
      failedAt: new Date(this.now()).toISOString(),
      error: result.error ?? 'The office system refused this change.',
    });
    const table = db.rows(entry.entity);
    const row = await table.get(entry.id);
    if (entry.delete) {
      // The deletion did not happen on the server: show the row again.
      if (!row && entry.restore && pending.length === 0) await table.put(entry.restore);
      return;
    }
    if (!row) return;
    if (row._base.version === 0 && pending.length === 0) {
      // Never reached the server; what was typed is kept in the failed list.
      await table.delete(entry.id);
      return;
    }
    const stillPending = pendingFields(pending);
    const next: LocalRow = { ...row, _base: { ...row._base, values: { ...row._base.values } } };
    for (const field of Object.keys(entry.set ?? {})) {
      if (stillPending.has(field)) continue;
      if (field in next._base.values) next[field] = next._base.values[field] ?? null;
      delete next._base.values[field];
    }
    await table.put(next);
  }

  // ---- pull ----

  private async pullAll(deviceId: string): Promise<void> {
    const stored = await this.db.getMeta('checkpoint');
    let checkpoint = stored ?? 0;
    // From the start, nearly every row is new: keep track of what is on the phone instead of reading it back.
    let onPhone = checkpoint === 0 ? new RowsOnPhone(stored) : null;
    let resets = 0;
    for (;;) {
      if (this.stopped) throw new StoppedError('Sync stopped.');
      const page = await this.transport.pull({ checkpoint, limit: PULL_LIMIT, deviceId });
      if (page.reset) {
        if (++resets > 2) throw new Error('the office system asked this phone to start over again and again');
        await this.resetLocal();
        checkpoint = 0;
        onPhone = new RowsOnPhone(0);
        continue;
      }
      await this.applyPage(page, onPhone);
      if (!page.hasMore) return;
      if (page.checkpoint <= checkpoint && page.changes.length === 0) throw new Error('the office system sent an empty page');
      checkpoint = page.checkpoint;
    }
  }

  /** Starts over from the server's full state, keeping unsent changes and the rows they belong to. */
  private async resetLocal(): Promise<void> {
    const { db } = this;
    await db.transaction('rw', [...db.syncedTables(), db.outbox, db.meta], async () => {
      const keep = new Set((await db.outbox.toArray()).map(sameRow));
      for (const name of SYNC_ENTITY_NAMES) {
        await db.rows(name).filter((row) => !keep.has(sameRow({ entity: name, id: row.id }))).delete();
      }
      await db.setMeta('checkpoint', 0);
    });
  }

  /**
   * Applies a page in one transaction with one read and one write per table: row-by-row gets and puts made a
   * first sync of a large site several times slower than the store itself. With `onPhone`, only rows that can be
   * on the phone are read back.
   */
  private async applyPage(page: PullResponse, onPhone: RowsOnPhone | null = null): Promise<void> {
    const { db } = this;
    await db.transaction('rw', [...db.syncedTables(), db.outbox, db.meta], async () => {
      const narrow = onPhone?.stillTrue(await db.getMeta('checkpoint')) ? onPhone : null;
      const pending = new Map<string, OutboxEntry[]>();
      for (const e of await db.outbox.orderBy('seq').toArray()) listIn(pending, `${e.entity}:${e.id}`).push(e);
      const restores: Array<[number, LocalRow]> = [];
      const byEntity = new Map<SyncEntityName, Change[]>();
      for (const change of page.changes) if (SYNCED.has(change.entity)) listIn(byEntity, change.entity as SyncEntityName).push(change);
      for (const [entity, changes] of byEntity) {
        const table = db.rows(entity);
        let ids = [...new Set(changes.map((c) => c.id))];
        const present = narrow ? await narrow.idsOf(entity, table) : null;
        // A row neither on the phone nor waiting to be sent cannot be there: nothing to read back.
        if (present) ids = ids.filter((id) => present.has(id) || pending.has(`${entity}:${id}`));
        const found = ids.length ? await table.bulkGet(ids) : [];
        const state = new Map<string, LocalRow | undefined>(ids.map((id, i) => [id, found[i]]));
        const touched = new Set<string>();
        for (const change of changes) {
          const outcome = this.merge(change, state.get(change.id), pending.get(`${entity}:${change.id}`) ?? [], restores);
          if (outcome === 'keep') continue;
          state.set(change.id, outcome ?? undefined);
          touched.add(change.id);
        }
        const puts = [...touched].map((id) => state.get(id)).filter((r): r is LocalRow => !!r);
        const deletes = [...touched].filter((id) => !state.get(id) && (!present || present.has(id)));
        if (puts.length) await table.bulkPut(puts);
        if (deletes.length) await table.bulkDelete(deletes);
        if (present) {
          for (const row of puts) present.add(row.id);
          for (const id of deletes) present.delete(id);
        }
      }
      for (const [seq, restore] of restores) await db.outbox.update(seq, { restore });
      await db.setMeta('checkpoint', page.checkpoint);
    });
    onPhone?.wrote(page.checkpoint);
  }

  /**
   * What a pulled change makes of the local row: the new row, null to remove it, or 'keep' to leave it be.
   * Synchronous on purpose: awaiting anything but Dexie inside the page's transaction would end it early.
   */
  private merge(change: Change, local: LocalRow | undefined, pending: OutboxEntry[], restores: Array<[number, LocalRow]>): LocalRow | null | 'keep' {
    if (change.deleted || !change.row) {
      // Gone on the server or out of this user's scope; a row with unsent changes stays until they are sent.
      return pending.length === 0 ? null : 'keep';
    }
    const { id: _id, version, fieldVersions, ...fields } = change.row;
    // Deleted here and not yet sent: the deletion goes out first, but the server's latest row is kept with it,
    // to show again if the deletion loses to someone's edit.
    const deletion = pending.find((e) => e.delete);
    if (deletion) {
      restores.push([deletion.seq!, { ...fields, id: change.id, _base: { version, fieldVersions: fieldVersions ?? {}, values: {} } }]);
      return 'keep';
    }
    if (local && version < local._base.version) return 'keep';
    const next: LocalRow = { ...fields, id: change.id, _base: { version, fieldVersions: fieldVersions ?? {}, values: {} } };
    for (const field of pendingFields(pending)) {
      // The phone's unsent value stays on screen; the server's is kept to fall back on.
      next._base.values[field] = (fields[field] ?? null) as FieldValue;
      next[field] = local ? local[field] : fields[field];
    }
    return next;
  }
}

/**
 * The ids of the rows on the phone during a pull from checkpoint 0 (a first sync, or one after a reset): each
 * table's keys as the pull first finds them, kept up to date by the pages it applies. With the outbox they say
 * which rows of a page can be on the phone at all, so a first sync of a large site does not read back thousands
 * of rows that are not there. Only this pull may have written the checkpoint between its pages; when it finds
 * another value (another tab synced meanwhile) the ids may be out of date, and every later page reads all its
 * rows as before.
 */
class RowsOnPhone {
  private readonly ids = new Map<SyncEntityName, Set<string>>();
  private trusted = true;

  constructor(private checkpoint: number | undefined) {}

  /** Whether the ids still hold, given the checkpoint found at the start of a page's transaction. */
  stillTrue(found: number | undefined): boolean {
    if (found !== this.checkpoint) this.trusted = false;
    return this.trusted;
  }

  /** The table's ids: read once, inside a page's transaction, then kept up to date by the caller. */
  async idsOf(entity: SyncEntityName, table: Table<LocalRow, string>): Promise<Set<string>> {
    let ids = this.ids.get(entity);
    if (!ids) this.ids.set(entity, (ids = new Set(await table.toCollection().primaryKeys())));
    return ids;
  }

  /** The checkpoint a page's transaction wrote, once it has committed. */
  wrote(checkpoint: number): void {
    this.checkpoint = checkpoint;
  }
}

/** The list kept under `key`, made on first use: grouping without copying the list for every entry. */
function listIn<K, V>(map: Map<K, V[]>, key: K): V[] {
  let list = map.get(key);
  if (!list) map.set(key, (list = []));
  return list;
}

function pendingFields(entries: OutboxEntry[]): Set<string> {
  const fields = new Set<string>();
  for (const e of entries) for (const f of Object.keys(e.set ?? {})) fields.add(f);
  return fields;
}
