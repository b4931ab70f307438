import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type { DataSourceOptions } from 'typeorm';
import type { DatabaseConfig } from '../config/database.config.js';
import { MIGRATIONS } from './migrations/index.js';
import { POSTGRES_MIGRATIONS } from './migrations/postgres/index.js';

/** The one place the database connection is described, shared by the app, the CLI and tests. */
export function databaseOptions(config: Pick<DatabaseConfig, 'type' | 'path' | 'url' | 'poolSize'>): DataSourceOptions {
  return config.type === 'postgres' ? postgresOptions(config.url, config.poolSize) : sqliteOptions(config.path);
}

/** WAL lets readers go on while a write is under way; the busy timeout makes a second writer wait rather than fail. */
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

/** A pool of connections; the PostgreSQL schema has its own migrations, kept in step with SQLite's. */
export function postgresOptions(url: string, poolSize = 10): DataSourceOptions {
  return {
    type: 'postgres',
    url,
    extra: { max: poolSize },
    migrations: POSTGRES_MIGRATIONS,
    migrationsTransactionMode: 'each',
    synchronize: false,
  };
}
