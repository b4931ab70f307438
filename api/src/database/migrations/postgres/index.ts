import { PostgresSchema1796424218561 } from './1796424218561-PostgresSchema.js';
import { PostgresBilling1796424218562 } from './1796424218562-PostgresBilling.js';
import { PostgresPhotoSenders1796430000001 } from './1796430000001-PostgresPhotoSenders.js';

/** Every PostgreSQL migration in order; the SQLite set is ../index.ts. A schema change adds one to each. */
export const POSTGRES_MIGRATIONS = [PostgresSchema1796424218561, PostgresBilling1796424218562, PostgresPhotoSenders1796430000001];
