import { PostgresSchema1796424218561 } from './1796424218561-PostgresSchema.js';
import { PostgresBilling1796424218562 } from './1796424218562-PostgresBilling.js';
import { PostgresChecksBeforeWork1796424218570 } from './1796424218570-PostgresChecksBeforeWork.js';

/** Every PostgreSQL migration in order; the SQLite set is ../index.ts. A schema change adds one to each. */
export const POSTGRES_MIGRATIONS = [PostgresSchema1796424218561, PostgresBilling1796424218562, PostgresChecksBeforeWork1796424218570];
