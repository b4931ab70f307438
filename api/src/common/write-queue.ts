import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';

/**
 * Every database transaction, and every read of synced rows, goes through this queue, so that writers take turns
 * and no read sees a transaction half done.
 *
 * SQLite: TypeORM keeps one connection, so anything run on it while a transaction is open across an await would
 * land inside that transaction: a second BEGIN fails ("cannot start a transaction within a transaction"), another
 * request's write would commit or roll back with it, and a read would see changes that may yet be rolled back.
 * Taking turns in the process avoids all three; WAL and the busy timeout cover other processes (the CLI).
 *
 * PostgreSQL: several API processes may share the database. A writer first takes one transaction-level advisory
 * lock, so writes from every process still go one at a time, as on SQLite: every change takes the next number of
 * one global sequence, and a pull must never see number 11 committed while 10 is still to come, or a phone would
 * step past 10 for ever. The lock is released by the commit, after the changes are visible. Reads run at once on
 * their own pooled connection, in a read-only snapshot (repeatable read), beside the writer.
 *
 * Group commit: writes that are waiting together run one after another in one transaction, each inside a savepoint
 * of its own, and are committed together. A write that fails is rolled back to its savepoint alone and gets its own
 * error; none is answered before the commit that makes it durable. Twenty phones pushing at once then wait for a
 * few disk syncs instead of twenty.
 */
@Injectable()
export class WriteQueue {
  private readonly jobs: Job[] = [];
  private readonly rollbackListeners: Array<() => void> = [];
  private running = false;
  private readonly postgres: boolean;

  constructor(private readonly dataSource: DataSource) {
    this.postgres = dataSource.options.type === 'postgres';
  }

  /** Tells a cache of what transactions read that some work was rolled back, and what it saw may never have been. */
  onRollback(listener: () => void): void {
    this.rollbackListeners.push(listener);
  }

  private rolledBack(): void {
    for (const listener of this.rollbackListeners) listener();
  }

  run<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
    return this.enqueue('write', work);
  }

  /** A read that must not see a transaction half done. */
  read<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
    if (this.postgres) {
      return this.dataSource.transaction('REPEATABLE READ', async (em) => {
        await em.query('SET TRANSACTION READ ONLY');
        return work(em);
      });
    }
    return this.enqueue('read', work);
  }

  private enqueue<T>(kind: Job['kind'], work: (em: EntityManager) => Promise<T>): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      // The job hands back how to answer, so each caller gets its own work's value once the transaction commits.
      this.jobs.push({ kind, work: async (em) => { const value = await work(em); return () => resolve(value); }, reject });
      void this.drain();
    });
  }

  /** Takes the jobs in order: a read alone, or every write waiting at the head of the line as one group. */
  private async drain(): Promise<void> {
    if (this.running) return;
    this.running = true;
    try {
      while (this.jobs.length > 0) {
        if (this.jobs[0]!.kind === 'read') {
          const job = this.jobs.shift()!;
          await job.work(this.dataSource.manager).then((answer) => answer(), job.reject);
          continue;
        }
        // A few turns of the event loop first, so that requests still being read reach the queue and commit with
        // this group: SQLite answers without yielding, so none could while the last group ran, and a push of a few
        // hundred mutations arrives in several reads. Idle, each turn costs microseconds.
        for (let turn = 0; turn < GATHER_TURNS; turn++) await new Promise((resolve) => setImmediate(resolve));
        const group: Job[] = [];
        while (group.length < MAX_GROUP && this.jobs[0]?.kind === 'write') group.push(this.jobs.shift()!);
        await this.commitGroup(group);
      }
    } finally {
      this.running = false;
    }
  }

  private async commitGroup(group: Job[]): Promise<void> {
    const outcomes: Array<{ ok: true; answer: () => void } | { ok: false; error: unknown }> = [];
    try {
      await this.dataSource.transaction(async (em) => {
        if (this.postgres) await em.query('SELECT pg_advisory_xact_lock($1)', [WRITER_LOCK]);
        for (const job of group) {
          if (group.length === 1) {
            // Alone, it needs no savepoint: its failure rolls the transaction back.
            outcomes.push({ ok: true, answer: await job.work(em) });
            continue;
          }
          await em.query('SAVEPOINT write_queue_job');
          try {
            outcomes.push({ ok: true, answer: await job.work(em) });
            await em.query('RELEASE SAVEPOINT write_queue_job');
          } catch (error) {
            await em.query('ROLLBACK TO SAVEPOINT write_queue_job');
            this.rolledBack();
            await em.query('RELEASE SAVEPOINT write_queue_job');
            outcomes.push({ ok: false, error });
          }
        }
      });
    } catch (error) {
      // Not committed: nothing in the group happened, and each is told so (a lone write gets its own error).
      this.rolledBack();
      for (const job of group) job.reject(error);
      return;
    }
    group.forEach((job, i) => {
      const outcome = outcomes[i]!;
      if (outcome.ok) outcome.answer();
      else job.reject(outcome.error);
    });
  }
}

interface Job {
  kind: 'read' | 'write';
  /** Does the work, and gives back the call that answers its caller with the result. */
  work: (em: EntityManager) => Promise<() => void>;
  reject: (error: unknown) => void;
}

/** Turns of the event loop a group waits for its company (3 measured best for twenty phones pushing at once). */
const GATHER_TURNS = 3;

/** The most writes committed together: enough for a morning's rush of phones, few enough to keep each answer prompt. */
const MAX_GROUP = 32;

/** The advisory lock every writer holds on PostgreSQL: any fixed number, the same in every process ("WIRE"). */
const WRITER_LOCK = 0x57495245;
