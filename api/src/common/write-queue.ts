import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';

/**
 * Every write transaction goes through this queue. TypeORM shares one SQLite connection, so two
 * transactions interleaving across awaits would collide ("cannot start a transaction within a transaction");
 * queueing them in the process makes them take turns, and WAL keeps readers going meanwhile.
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
}
