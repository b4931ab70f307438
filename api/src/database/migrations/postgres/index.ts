import { PostgresSchema1796424218561 } from './1796424218561-PostgresSchema.js';
import { PostgresBilling1796424218562 } from './1796424218562-PostgresBilling.js';
import { PostgresCertificateContent1796471619935 } from './1796471619935-PostgresCertificateContent.js';

/** Every PostgreSQL migration in order; the SQLite set is ../index.ts. A schema change adds one to each. */
export const POSTGRES_MIGRATIONS = [PostgresSchema1796424218561, PostgresBilling1796424218562, PostgresCertificateContent1796471619935];
