import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';

/**
 * Every database transaction, and every read of synced rows, goes through this queue. TypeORM keeps one
 * SQLite connection, so anything run on it while a transaction is open across an await would land inside that
 * transaction: a second BEGIN fails ("cannot start a transaction within a transaction"), another request's write
 * would commit or roll back with it, and a read would see changes that may yet be rolled back. Taking turns in
 * the process avoids all three; WAL and the busy timeout cover other processes (the CLI, a second instance).
 */
@Injectable()
export class WriteQueue {
  private tail: Promise<unknown> = Promise.resolve();

  constructor(private readonly dataSource: DataSource) {}

  run<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
    const next = this.tail.then(() => this.dataSource.transaction(work));
    this.tail = next.catch(() => undefined);
    return next;
  }

  /** A read that must not see a transaction half done. */
  read<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
    const next = this.tail.then(() => work(this.dataSource.manager));
    this.tail = next.catch(() => undefined);
    return next;
  }
}
