import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { Organisation } from '../src/organisations/entities/organisation.entity.js';
import { User } from '../src/users/entities/user.entity.js';
import { createTestApp, type TestApp } from './test-app.js';

/**
 * The billing migration adds the organisation's columns in place. Rebuilding the table instead (what a generated
 * migration does on SQLite) would delete every user with it, since their foreign key cascades.
 */
describe('the billing migration', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('keeps every organisation and user when it is undone and done again', async () => {
    const users = await t.dataSource.getRepository(User).count();
    const organisations = await t.dataSource.query(`SELECT "id", "name" FROM "organisation" ORDER BY "id"`);
    expect(users).toBe(5);
    expect((await t.dataSource.query(`SELECT COUNT(*) AS n FROM "vat_rate"`))[0].n).toBe(6);

    await t.dataSource.undoLastMigration({ transaction: 'each' });
    const columns = (await t.dataSource.query(`PRAGMA table_info("organisation")`)).map((c: { name: string }) => c.name);
    expect(columns).not.toContain('vatNumber');
    expect(await t.dataSource.query(`SELECT COUNT(*) AS n FROM "user"`)).toEqual([{ n: users }]);
    expect(await t.dataSource.query(`SELECT "id", "name" FROM "organisation" ORDER BY "id"`)).toEqual(organisations);

    await t.dataSource.runMigrations({ transaction: 'each' });
    expect(await t.dataSource.getRepository(User).count()).toBe(users);
    // Organisations that were there before start with the UK's three rates, and the default terms.
    expect((await t.dataSource.query(`SELECT COUNT(*) AS n FROM "vat_rate"`))[0].n).toBe(6);
    expect(await t.dataSource.getRepository(Organisation).findOneByOrFail({ name: 'Larkfield Electrical & Data' })).toMatchObject({ vatNumber: null, paymentTermsDays: 30, quoteValidDays: 30 });
  });
});
