import { registerAs } from '@nestjs/config';

export type DatabaseType = 'sqlite' | 'postgres';

/**
 * SQLite in one file by default; PostgreSQL when DB_TYPE=postgres, at DATABASE_URL. Entities read this when they
 * are decorated (their timestamp columns differ), so it comes straight from the environment.
 */
export function databaseType(): DatabaseType {
  return process.env.DB_TYPE === 'postgres' ? 'postgres' : 'sqlite';
}

export const databaseConfig = registerAs('database', () => ({
  type: databaseType(),
  path: process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite',
  url: process.env.DATABASE_URL ?? '',
  poolSize: Number(process.env.DATABASE_POOL_SIZE ?? 10),
}));

export type DatabaseConfig = ReturnType<typeof databaseConfig>;
