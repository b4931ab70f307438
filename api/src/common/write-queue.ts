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
 */
@Injectable()
export class WriteQueue {
  private tail: Promise<unknown> = Promise.resolve();
  private readonly postgres: boolean;

  constructor(private readonly dataSource: DataSource) {
    this.postgres = dataSource.options.type === 'postgres';
  }

  run<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
    // One writer per process even on PostgreSQL: others would only hold pooled connections while they wait for the lock.
    const next = this.tail.then(() =>
      this.postgres
        ? this.dataSource.transaction(async (em) => {
            await em.query('SELECT pg_advisory_xact_lock($1)', [WRITER_LOCK]);
            return work(em);
          })
        : this.dataSource.transaction(work),
    );
    this.tail = next.catch(() => undefined);
    return next;
  }

  /** A read that must not see a transaction half done. */
  read<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
    if (this.postgres) return this.dataSource.transaction('REPEATABLE READ', async (em) => {
      await em.query('SET TRANSACTION READ ONLY');
      return work(em);
    });
    const next = this.tail.then(() => work(this.dataSource.manager));
    this.tail = next.catch(() => undefined);
    return next;
  }
}

/** The advisory lock every writer holds on PostgreSQL: any fixed number, the same in every process ("WIRE"). */
const WRITER_LOCK = 0x57495245;
