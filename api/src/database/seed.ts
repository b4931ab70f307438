import { readFile } from 'node:fs/promises';
import type { DataSource } from 'typeorm';
import { hashPassword } from '../auth/password.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { type Role, User } from '../users/entities/user.entity.js';

interface Scenario {
  password: string;
  organisations: Array<{
    name: string;
    address?: string;
    phone?: string;
    email?: string;
    users: Array<{ email: string; name: string; role: Role }>;
  }>;
}

export const DEFAULT_SCENARIO = new URL('../../../seed/scenario.json', import.meta.url);

/** Loads the demo scenario into an empty database; returns false (and changes nothing) when data exists. */
export async function seedDemoData(dataSource: DataSource, scenarioPath: string | URL = DEFAULT_SCENARIO): Promise<boolean> {
  if ((await dataSource.getRepository(Organisation).count()) > 0) return false;
  const scenario = JSON.parse(await readFile(scenarioPath, 'utf8')) as Scenario;
  const passwordHash = await hashPassword(scenario.password);
  await dataSource.transaction(async (em) => {
    for (const o of scenario.organisations) {
      const org = await em.save(em.create(Organisation, { name: o.name, address: o.address ?? null, phone: o.phone ?? null, email: o.email ?? null }));
      for (const u of o.users) {
        await em.save(em.create(User, { organisationId: org.id, email: u.email, name: u.name, role: u.role, passwordHash, active: true, lastSignInAt: null }));
      }
    }
  });
  return true;
}
