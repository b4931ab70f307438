import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { Organisation } from '../src/organisations/entities/organisation.entity.js';
import { User } from '../src/users/entities/user.entity.js';
import { createTestApp, type TestApp } from './test-app.js';

/**
 * The billing migration (on PostgreSQL, its counterpart in migrations/postgres/) adds the organisation's columns in place. Rebuilding the table instead (what a generated
 * migration does on SQLite) would delete every user with it, since their foreign key cascades.
 */
describe('the billing migration', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  // Behind the entities' backs, since the undone migration leaves them out of step with the tables.
  const count = async (table: string) => Number((await t.dataSource.query(`SELECT COUNT(*) AS n FROM "${table}"`))[0].n);

  it('keeps every organisation and user when it is undone and done again', async () => {
    const users = await t.dataSource.getRepository(User).count();
    const organisations = await t.dataSource.query(`SELECT "id", "name" FROM "organisation" ORDER BY "id"`);
    // Five people, one of them (a subcontractor) in both organisations.
    expect(users).toBe(7);
    expect(await count('person')).toBe(6);
    expect(await count('vat_rate')).toBe(6);

    // Back to just before the billing migration: the ones after it first, newest first.
    const names = t.dataSource.migrations.map((m) => m.name ?? m.constructor.name);
    const after = names.length - names.findIndex((n) => /^(Postgres)?Billing\d+$/.test(n));
    for (let i = 0; i < after; i++) await t.dataSource.undoLastMigration({ transaction: 'each' });
    const runner = t.dataSource.createQueryRunner();
    expect(await runner.hasColumn('organisation', 'vatNumber')).toBe(false);
    expect(await runner.hasTable('invoice')).toBe(false);
    await runner.release();
    expect(await count('user')).toBe(users);
    expect(await t.dataSource.query(`SELECT "id", "name" FROM "organisation" ORDER BY "id"`)).toEqual(organisations);

    await t.dataSource.runMigrations({ transaction: 'each' });
    expect(await t.dataSource.getRepository(User).count()).toBe(users);
    // Organisations that were there before start with the UK's three rates, and the default terms.
    expect(await count('vat_rate')).toBe(6);
    expect(await t.dataSource.getRepository(Organisation).findOneByOrFail({ name: 'Larkfield Electrical & Data' })).toMatchObject({ vatNumber: null, paymentTermsDays: 30, quoteValidDays: 30 });
  });
});
