import { type FieldValue, fieldError, formatHlc, parseHlc, SYNC_ENTITIES, type SyncEntityName, tickHlc } from '@wiretrail/core';
import type { Table, Transaction } from 'dexie';
import { v7 as uuidv7 } from 'uuid';
import { deviceIdFor } from './device-id';
import { db, type LocalRow, type OutboxEntry } from '@/lib/db';
import { getSession } from '@/lib/session';

/** A local write that could not be made; the message is fit to show as it is. */
export class LocalWriteError extends Error {
  constructor(
    message: string,
    /** 'quota': the phone's storage for the app is full. */
    readonly reason?: 'quota',
  ) {
    super(message);
    this.name = 'LocalWriteError';
  }
}

/** Writes that belong with new rows and must be kept or dropped with them (a photo's bytes with its row). */
export interface Alongside {
  tables: Table[];
  write: () => Promise<void>;
}

export type Fields = Record<string, FieldValue>;

type Op =
  | { kind: 'create'; entity: SyncEntityName; id: string; fields: Fields }
  | { kind: 'save'; entity: SyncEntityName; id: string; changes: Fields }
  | { kind: 'delete'; entity: SyncEntityName; id: string };

const listeners = new Set<() => void>();

/** A record that keeps when it was made stamps it now, once, on this phone: the server's clock is the next signal's. */
function stamped(entity: SyncEntityName, fields: Fields): Fields {
  return 'recordedAt' in SYNC_ENTITIES[entity].fields && fields.recordedAt === undefined ? { ...fields, recordedAt: new Date().toISOString() } : fields;
}

/** The sync engine listens here to send soon after something is recorded. */
export function subscribeLocalWrites(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Records a new row made on this phone; returns its id (UUIDv7, so rows sort by when they were made). */
export async function createRecord(entity: SyncEntityName, fields: Fields): Promise<string> {
  const [id] = await createRecords([{ entity, fields }]);
  return id!;
}

/** Several new rows in one go (a board and its first circuit): all are kept, or none. */
export async function createRecords(items: { entity: SyncEntityName; fields: Fields; id?: string }[]): Promise<string[]> {
  return createRecordsWith(items);
}

/** New rows plus other local writes in the same transaction: everything is kept, or nothing. */
export async function createRecordsWith(items: { entity: SyncEntityName; fields: Fields; id?: string }[], alongside?: Alongside): Promise<string[]> {
  const ops: Op[] = items.map(({ entity, fields, id }) => ({ kind: 'create', entity, id: id ?? uuidv7(), fields: stamped(entity, fields) }));
  await write(ops, alongside);
  return ops.map((op) => op.id);
}

/**
 * New rows that take the place of others (a photo taken again) plus other local writes: the new rows are kept and
 * the old ones deleted together, or nothing happens.
 */
export async function replaceRecordsWith(
  items: { entity: SyncEntityName; fields: Fields; id?: string }[],
  replaced: { entity: SyncEntityName; id: string }[],
  alongside?: Alongside,
): Promise<string[]> {
  const created: Op[] = items.map(({ entity, fields, id }) => ({ kind: 'create', entity, id: id ?? uuidv7(), fields: stamped(entity, fields) }));
  await write([...created, ...replaced.map(({ entity, id }): Op => ({ kind: 'delete', entity, id }))], alongside);
  return created.map((op) => op.id);
}

/** Deletes a row together with other local writes (a refused photo and its bytes). */
export async function deleteRecordWith(entity: SyncEntityName, id: string, alongside: Alongside): Promise<void> {
  await write([{ kind: 'delete', entity, id }], alongside);
}

export async function saveRecord(entity: SyncEntityName, id: string, changes: Fields): Promise<void> {
  await write([{ kind: 'save', entity, id, changes }]);
}

export async function deleteRecord(entity: SyncEntityName, id: string): Promise<void> {
  await write([{ kind: 'delete', entity, id }]);
}

function validate(op: Op, role: string): void {
  const spec = SYNC_ENTITIES[op.entity];
  if (!spec || spec.serverOnly) throw new LocalWriteError(`${op.entity} records are made by the office system only.`);
  if (role === 'technician' && spec.technicianWrite === 'none') throw new LocalWriteError(`Only the office can change ${op.entity} records.`);
  if (op.kind === 'delete') return;
  const values = op.kind === 'create' ? op.fields : op.changes;
  for (const [field, value] of Object.entries(values)) {
    const error = fieldError(op.entity, field, value);
    if (error) throw new LocalWriteError(error);
    if (role === 'technician' && !spec.fields[field]?.technician) throw new LocalWriteError(`Only the office can change ${op.entity}.${field}.`);
  }
  if (op.kind === 'create') {
    for (const [field, f] of Object.entries(spec.fields)) {
      if (f.required && (values[field] === undefined || values[field] === null)) throw new LocalWriteError(`${op.entity}.${field} must not be empty`);
    }
  }
}

async function nextHlc(tx: Transaction, userId: string): Promise<string> {
  const meta = tx.table('meta');
  const deviceId = await deviceIdFor(meta, userId);
  const last = parseHlc(((await meta.get('hlc'))?.value as string | undefined) ?? '');
  const hlc = formatHlc(tickHlc(last, Date.now(), deviceId));
  await meta.put({ key: 'hlc', value: hlc });
  return hlc;
}

async function write(ops: Op[], alongside?: Alongside): Promise<void> {
  const session = getSession();
  if (!session) throw new LocalWriteError('Sign in to record work on this phone.');
  for (const op of ops) validate(op, session.user.role);
  const tables = [...new Set(ops.map((op) => op.entity))].map((e) => db.rows(e));
  try {
    await withReopen(() =>
      // The row and its outbox entry are kept together or not at all.
      db.transaction('rw', [...tables, ...(alongside?.tables ?? []), db.outbox, db.meta], async (tx) => {
        await alongside?.write();
        for (const op of ops) await apply(tx, op, session.user.id);
      }),
    );
  } catch (err) {
    throw plainError(err);
  }
  listeners.forEach((l) => l());
}

/**
 * The version a change builds on. While the row has unsent changes, the screen shows those, not what later
 * pulls brought underneath; so the new change rests on the base of the first unsent one, and the server treats
 * anything newer as concurrent (and keeps whatever loses in a conflict) instead of overwriting it unseen.
 */
async function baseFor(tx: Transaction, entity: string, id: string, existing: LocalRow): Promise<number> {
  const first = (await tx.table('outbox').where('[entity+id]').equals([entity, id]).sortBy('seq'))[0] as OutboxEntry | undefined;
  return first ? first.baseVersion : existing._base.version;
}

async function apply(tx: Transaction, op: Op, userId: string): Promise<void> {
  const table = db.rows(op.entity);
  const now = new Date().toISOString();
  const entry: OutboxEntry = {
    mutationId: uuidv7(),
    entity: op.entity,
    id: op.id,
    baseVersion: 0,
    hlc: '',
    userId,
    createdAt: now,
    attempts: 0,
    lastError: null,
  };
  const existing = await table.get(op.id);
  if (op.kind === 'create') {
    if (existing) throw new LocalWriteError('That record already exists on this phone.');
    await table.add({ ...op.fields, id: op.id, createdAt: now, updatedAt: now, _base: { version: 0, fieldVersions: {}, values: {} } });
    entry.set = { ...op.fields };
  } else if (op.kind === 'save') {
    if (!existing) throw new LocalWriteError('That record is no longer on this phone.');
    const changed = Object.entries(op.changes).filter(([f, v]) => JSON.stringify(existing[f] ?? null) !== JSON.stringify(v));
    if (changed.length === 0) return;
    const next: LocalRow = { ...existing, updatedAt: now, _base: { ...existing._base, values: { ...existing._base.values } } };
    for (const [f, v] of changed) {
      // Remember the server's value the first time a field is changed here, to fall back on if the change is refused.
      if (!(f in next._base.values)) next._base.values[f] = (existing[f] ?? null) as FieldValue;
      next[f] = v;
    }
    await table.put(next);
    entry.baseVersion = await baseFor(tx, op.entity, op.id, existing);
    entry.set = Object.fromEntries(changed);
  } else {
    if (!existing) return;
    await table.delete(op.id);
    entry.baseVersion = await baseFor(tx, op.entity, op.id, existing);
    entry.delete = true;
    entry.restore = existing;
  }
  entry.hlc = await nextHlc(tx, userId);
  await tx.table('outbox').add(entry);
}

const isName = (err: unknown, ...names: string[]) =>
  err instanceof Error && (names.includes(err.name) || names.includes((err as { inner?: Error }).inner?.name ?? ''));

/** iOS can close the database while the app is in the background: open it again and retry once. */
async function withReopen<T>(run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (err) {
    if (!isName(err, 'DatabaseClosedError', 'InvalidStateError')) throw err;
    if (!db.isOpen()) await db.open();
    return run();
  }
}

function plainError(err: unknown): Error {
  if (err instanceof LocalWriteError) return err;
  if (isName(err, 'QuotaExceededError')) {
    return new LocalWriteError('This phone has no space left for Wiretrail. Free some space, then save again; nothing saved before is lost.', 'quota');
  }
  return new LocalWriteError(`This could not be saved on the phone: ${(err as Error)?.message ?? 'unknown error'}.`);
}
