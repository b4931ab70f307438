import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { databaseConfig } from '../config/database.config.js';
import { ALL_ENTITIES } from './entities.js';
import { databaseOptions } from './typeorm-options.js';

/** Used by the TypeORM CLI (`npm run migration:run -w api`) and by scripts/start.mjs; DB_TYPE and DATABASE_URL as for the app. */
export default new DataSource({
  ...databaseOptions(databaseConfig()),
  entities: ALL_ENTITIES,
});
