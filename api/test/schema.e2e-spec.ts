import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './test-app.js';

/**
 * The migrations of the database under test (SQLite's, or PostgreSQL's own set) build exactly the schema the
 * entities describe: a schema change that reaches one set and not the other fails here on that database.
 */
describe('the schema the migrations build', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('is the one the entities describe, with nothing left for a new migration to do', async () => {
    const pending = await t.dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((q) => q.query)).toEqual([]);
    expect(await t.dataSource.showMigrations()).toBe(false);
  });
});
