import Database from 'better-sqlite3';
import { basename, join } from 'node:path';
import pg from 'pg';
import { databaseType } from '../src/config/database.config.js';

/**
 * The API's tests run on SQLite, or on PostgreSQL when DB_TYPE=postgres and DATABASE_URL name a server
 * (`npm run test:postgres` starts one). Each test app, and each API process, gets a database of its own,
 * named after its throwaway directory, so an app started again on the same directory finds the same data.
 */
export const onPostgres = databaseType() === 'postgres';

/** The server the run was given, read once: test apps then point DATABASE_URL at their own database. */
const SERVER_URL = process.env.DATABASE_URL ?? '';

const databaseName = (directory: string) => `wt_${basename(directory).replace(/[^a-zA-Z0-9]/g, '_').toLowerCase()}`;

function urlOf(database: string): string {
  const url = new URL(SERVER_URL);
  url.pathname = `/${database}`;
  return url.toString();
}

async function onServer<T>(work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: SERVER_URL });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** The environment that points the API at the database kept for `directory`, made empty the first time. */
export async function databaseEnvFor(directory: string, file = 'test.sqlite'): Promise<Record<string, string>> {
  const path = join(directory, file);
  if (!onPostgres) return { DATABASE_PATH: path };
  if (!SERVER_URL) throw new Error('DB_TYPE=postgres needs DATABASE_URL: the server the tests may make databases on.');
  const name = databaseName(directory);
  await onServer(async (c) => {
    if (!(await c.query('SELECT 1 FROM pg_database WHERE datname = $1', [name])).rowCount) await c.query(`CREATE DATABASE "${name}"`);
  });
  // DATABASE_PATH still places the photos and documents beside it.
  return { DATABASE_PATH: path, DB_TYPE: 'postgres', DATABASE_URL: urlOf(name) };
}

export async function dropDatabaseFor(directory: string): Promise<void> {
  if (!onPostgres) return;
  await onServer((c) => c.query(`DROP DATABASE IF EXISTS "${databaseName(directory)}" WITH (FORCE)`));
}

/** Reads a database behind the API's back, with `?` for parameters and double-quoted names on both. */
export interface DatabaseProbe {
  all<T = Record<string, unknown>>(sql: string, params?: unknown[]): Promise<T[]>;
  get<T = Record<string, unknown>>(sql: string, params?: unknown[]): Promise<T | undefined>;
  /** 'ok' when the store is whole: SQLite's own check, or on PostgreSQL no writer's lock left behind by a killed process. */
  integrity(): Promise<string>;
  close(): Promise<void>;
}

export async function openProbe(env: Record<string, string | undefined>): Promise<DatabaseProbe> {
  if (env.DB_TYPE !== 'postgres') {
    const db = new Database(env.DATABASE_PATH!, { readonly: true });
    return {
      all: async <T>(sql: string, params: unknown[] = []) => db.prepare(sql).all(...params) as T[],
      get: async <T>(sql: string, params: unknown[] = []) => db.prepare(sql).get(...params) as T | undefined,
      integrity: async () => String(db.pragma('integrity_check', { simple: true })),
      close: async () => void db.close(),
    };
  }
  const client = new pg.Client({ connectionString: env.DATABASE_URL });
  await client.connect();
  const all = async <T>(sql: string, params: unknown[] = []) => {
    let n = 0;
    return (await client.query(sql.replace(/\?/g, () => `$${++n}`), params)).rows as T[];
  };
  return {
    all,
    get: async <T>(sql: string, params: unknown[] = []) => (await all<T>(sql, params))[0],
    integrity: async () => {
      const held = await all<{ n: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS n FROM pg_locks WHERE locktype = 'advisory' AND granted`);
      return held[0]!.n === 0 ? 'ok' : `${held[0]!.n} advisory locks still held`;
    },
    close: () => client.end(),
  };
}
