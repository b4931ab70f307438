import { afterEach, beforeEach, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { WriteQueue } from './write-queue.js';

/** Writes waiting together commit together; each still succeeds or fails on its own. On a real SQLite database. */
describe('WriteQueue', () => {
  let db: DataSource;
  let queue: WriteQueue;
  const names = async () => ((await db.query('SELECT name FROM item ORDER BY name')) as Array<{ name: string }>).map((r) => r.name);

  beforeEach(async () => {
    db = new DataSource({ type: 'better-sqlite3', database: ':memory:' });
    await db.initialize();
    await db.query('CREATE TABLE item (name TEXT PRIMARY KEY)');
    queue = new WriteQueue(db);
  });
  afterEach(() => db.destroy());

  it('commits the writes waiting together, and rolls back a failing one alone with its own error', async () => {
    const commits: number[] = [];
    const original = db.createQueryRunner.bind(db);
    // Counts the transactions the queue opens.
    db.createQueryRunner = (...args) => {
      const runner = original(...args);
      const commit = runner.commitTransaction.bind(runner);
      runner.commitTransaction = async () => {
        commits.push(Date.now());
        return commit();
      };
      return runner;
    };
    const results = await Promise.allSettled([
      queue.run((em) => em.query(`INSERT INTO item (name) VALUES ('board')`)),
      queue.run(async (em) => {
        await em.query(`INSERT INTO item (name) VALUES ('half-done')`);
        throw new Error('refused after a write');
      }),
      queue.run((em) => em.query(`INSERT INTO item (name) VALUES ('board')`)),
      queue.run(async (em) => {
        await em.query(`INSERT INTO item (name) VALUES ('circuit')`);
        return 'kept';
      }),
    ]);
    expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'rejected', 'fulfilled']);
    expect((results[1] as PromiseRejectedResult).reason.message).toBe('refused after a write');
    expect(String((results[2] as PromiseRejectedResult).reason.message)).toMatch(/UNIQUE/);
    expect((results[3] as PromiseFulfilledResult<string>).value).toBe('kept');
    expect(await names()).toEqual(['board', 'circuit']);
    expect(commits).toHaveLength(1);
  });

  it('answers no write before its group is committed, and a read after the writes queued before it', async () => {
    const seen: string[] = [];
    const write = queue.run((em) => em.query(`INSERT INTO item (name) VALUES ('socket')`)).then(() => seen.push('write answered'));
    const read = queue.read(async (em) => {
      // Outside any transaction: it sees only what is committed.
      const rows = (await em.query('SELECT name FROM item')) as unknown[];
      seen.push(`read ${rows.length}`);
    });
    await Promise.all([write, read]);
    expect(seen).toEqual(['write answered', 'read 1']);
  });

  it('tells every write of a group that could not commit', async () => {
    await db.query('CREATE TABLE parent (id INTEGER PRIMARY KEY)');
    await db.query('PRAGMA foreign_keys = ON');
    await db.query('CREATE TABLE child (parentId INTEGER REFERENCES parent(id) DEFERRABLE INITIALLY DEFERRED)');
    const results = await Promise.allSettled([
      queue.run((em) => em.query(`INSERT INTO item (name) VALUES ('spur')`)),
      // Only checked at the commit, which then fails for the whole group.
      queue.run((em) => em.query('INSERT INTO child (parentId) VALUES (42)')),
    ]);
    expect(results.map((r) => r.status)).toEqual(['rejected', 'rejected']);
    expect(await names()).toEqual([]);
  });
});
