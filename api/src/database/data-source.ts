import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ALL_ENTITIES } from './entities.js';
import { sqliteOptions } from './typeorm-options.js';

/** Used by the TypeORM CLI (`npm run migration:run -w api`) and by scripts/start.mjs. */
export default new DataSource({
  ...sqliteOptions(process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite'),
  entities: ALL_ENTITIES,
});
