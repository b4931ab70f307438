import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type { DataSourceOptions } from 'typeorm';
import { MIGRATIONS } from './migrations/index.js';

/**
 * The one place the database connection is described, shared by the app, the CLI and tests.
 * WAL lets readers go on while a write is under way; the busy timeout makes a second writer wait rather than fail.
 */
export function sqliteOptions(databasePath: string): DataSourceOptions {
  const database = databasePath === ':memory:' ? databasePath : resolve(databasePath);
  if (database !== ':memory:') mkdirSync(dirname(database), { recursive: true });
  return {
    type: 'better-sqlite3',
    database,
    enableWAL: true,
    prepareDatabase: (db: { pragma: (sql: string) => unknown }) => {
      db.pragma('busy_timeout = 5000');
      db.pragma('foreign_keys = ON');
    },
    migrations: MIGRATIONS,
    migrationsTransactionMode: 'each',
    synchronize: false,
  };
}
