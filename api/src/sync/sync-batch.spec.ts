import { afterEach, beforeEach, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { ALL_ENTITIES } from '../database/entities.js';
import { sqliteOptions } from '../database/typeorm-options.js';
import type { SyncRecord } from './entities/sync-schemas.js';
import { SyncBatch } from './sync-batch.js';

const ORG = '0190c0de-0000-7000-8000-0000000000f1';
const VISIT = '0190c0de-0000-7000-8000-000000000001';
const SITE = '0190c0de-0000-7000-8000-000000000011';
const NOTE = '0190c0de-0000-7000-8000-000000000021';

const note = (id: string, text: string): SyncRecord => ({
  id, organisationId: ORG, version: 1, fieldMeta: {}, deletedAt: null, createdById: null, updatedById: null, createdAt: new Date(), updatedAt: new Date(),
  visitId: VISIT, siteId: SITE, text,
});

/** The bookkeeping of one batch, on a real SQLite database brought up by the migrations. */
describe('SyncBatch', () => {
  let db: DataSource;

  beforeEach(async () => {
    db = new DataSource({ ...sqliteOptions(':memory:'), entities: ALL_ENTITIES });
    await db.initialize();
    await db.runMigrations();
  });
  afterEach(() => db.destroy());

  const counter = async () => ((await db.query(`SELECT "value" FROM "sync_counter" WHERE "name" = 'global'`)) as Array<{ value: number }>)[0]?.value;

  it('numbers changes from the one counter, read once and written back when the batch closes', async () => {
    await db.transaction(async (em) => {
      const batch = new SyncBatch(em);
      expect([await batch.nextSeq(), await batch.nextSeq(), await batch.nextSeq()]).toEqual([1, 2, 3]);
      await batch.close();
    });
    expect(await counter()).toBe(3);
    await db.transaction(async (em) => {
      const batch = new SyncBatch(em);
      expect(await batch.nextSeq()).toBe(4);
      await batch.close();
    });
    expect(await counter()).toBe(4);
  });

  it('keeps a new row back until flushed, shows it to the rest of the batch, and logs only its latest change', async () => {
    await db.transaction(async (em) => {
      const batch = new SyncBatch(em);
      const row = note(NOTE, 'Lights off at the board');
      batch.insert('note', row);
      batch.recordChange('note', row, await batch.nextSeq());
      expect(await batch.rowOf('note', NOTE)).toBe(row);
      expect(batch.waiting('note')).toEqual([row]);
      expect(await em.query('SELECT "id" FROM "note"')).toEqual([]);
      await batch.write('note', row, { text: 'Lights off at the board; circuit 4 isolated', version: await batch.nextSeq() });
      batch.recordChange('note', row, row.version);
      await batch.close();
    });
    expect(await db.query('SELECT "text", "version" FROM "note"')).toEqual([{ text: 'Lights off at the board; circuit 4 isolated', version: 2 }]);
    expect(await db.query('SELECT "entity", "rowId", "seq", "siteId" FROM "sync_change"')).toEqual([{ entity: 'note', rowId: NOTE, seq: 2, siteId: SITE }]);
  });

  it('writes a stored row at once, and drops another copy of it so the next read asks the database', async () => {
    await db.transaction(async (em) => {
      const first = new SyncBatch(em);
      first.insert('note', note(NOTE, 'first words'));
      await first.close();
    });
    await db.transaction(async (em) => {
      const batch = new SyncBatch(em);
      const held = (await batch.rowOf('note', NOTE))!;
      const copy = { ...held };
      await batch.write('note', copy, { text: 'second words' });
      expect(copy.text).toBe('second words');
      const again = (await batch.rowOf('note', NOTE))!;
      expect(again).not.toBe(held);
      expect(again.text).toBe('second words');
      await batch.close();
    });
  });

  it('answers a mutation id applied earlier in the batch as a replay, and keeps it once flushed', async () => {
    await db.transaction(async (em) => {
      const batch = new SyncBatch(em);
      const record = { mutationId: 'mutation-0001', organisationId: ORG, userId: 'user-1', deviceId: 'phone-a', result: { mutationId: 'mutation-0001', status: 'applied' } as never };
      batch.recordApplied(record);
      expect(batch.applied.get('mutation-0001')).toBe(record);
      await batch.close();
    });
    expect(await db.query('SELECT "mutationId", "deviceId" FROM "applied_mutation"')).toEqual([{ mutationId: 'mutation-0001', deviceId: 'phone-a' }]);
  });
});
