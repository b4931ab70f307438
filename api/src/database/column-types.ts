import { databaseType } from '../config/database.config.js';

/**
 * The column types that SQLite and PostgreSQL spell differently. On SQLite they stay what the existing
 * migrations made, so the schema there does not move; PostgreSQL gets time zone–aware timestamps.
 */
const postgres = databaseType() === 'postgres';

export const TIMESTAMP = postgres ? 'timestamptz' : 'datetime';

/** The database's clock as a column default. */
export const NOW = postgres ? () => 'now()' : () => "(datetime('now'))";
