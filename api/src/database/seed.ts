import { formatHlc, type Mutation, type SyncEntityName } from '@wiretrail/core';
import { readFile } from 'node:fs/promises';
import type { DataSource } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { hashPassword } from '../auth/password.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { ScopeService } from '../sync/scope.service.js';
import { SyncEngine } from '../sync/sync-engine.service.js';
import { type Role, User } from '../users/entities/user.entity.js';

interface ScenarioRecord {
  entity: SyncEntityName;
  key: string;
  set: Record<string, unknown>;
}

interface Scenario {
  password: string;
  organisations: Array<{
    name: string;
    address?: string;
    phone?: string;
    email?: string;
    users: Array<{ email: string; name: string; role: Role }>;
    records?: ScenarioRecord[];
  }>;
}

export const DEFAULT_SCENARIO = new URL('../../../seed/scenario.json', import.meta.url);

/**
 * Values in the scenario may point at other records (`@site:orchard`), at users (`@user:tech1@…`) or at days
 * relative to today (`@day+1T08:30`, UTC), so the demo always has visits for today and the coming week.
 */
function resolve(value: unknown, ids: Map<string, string>, users: Map<string, string>, today: Date): unknown {
  if (Array.isArray(value)) return value.map((v) => resolve(v, ids, users, today));
  if (typeof value !== 'string' || !value.startsWith('@')) return value;
  const day = /^@day([+-]\d+)T(\d{2}):(\d{2})$/.exec(value);
  if (day) {
    const d = new Date(today);
    d.setUTCDate(d.getUTCDate() + Number(day[1]));
    d.setUTCHours(Number(day[2]), Number(day[3]), 0, 0);
    return d.toISOString();
  }
  if (value.startsWith('@user:')) {
    const id = users.get(value.slice(6));
    if (!id) throw new Error(`Scenario names an unknown user: ${value}`);
    return id;
  }
  const id = ids.get(value.slice(1));
  if (!id) throw new Error(`Scenario names an unknown record: ${value}`);
  return id;
}

/** Loads the demo scenario into an empty database; returns false (and changes nothing) when data exists. */
export async function seedDemoData(dataSource: DataSource, scenarioPath: string | URL = DEFAULT_SCENARIO, now = new Date()): Promise<boolean> {
  if ((await dataSource.getRepository(Organisation).count()) > 0) return false;
  const scenario = JSON.parse(await readFile(scenarioPath, 'utf8')) as Scenario;
  const passwordHash = await hashPassword(scenario.password);
  const engine = new SyncEngine(new ScopeService());
  const today = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
  await dataSource.transaction(async (em) => {
    for (const o of scenario.organisations) {
      const org = await em.save(em.create(Organisation, { name: o.name, address: o.address ?? null, phone: o.phone ?? null, email: o.email ?? null }));
      const users = new Map<string, string>();
      for (const u of o.users) {
        const user = await em.save(em.create(User, { organisationId: org.id, email: u.email, name: u.name, role: u.role, passwordHash, active: true, lastSignInAt: null }));
        users.set(u.email, user.id);
      }
      const admin = o.users.find((u) => u.role === 'admin');
      if (!o.records?.length || !admin) continue;
      // The demo records go through the same engine as every later change, so they sync like any other row.
      const ids = new Map(o.records.map((r) => [`${r.entity}:${r.key}`, uuidv7()]));
      const mutations: Mutation[] = o.records.map((r, i) => ({
        mutationId: uuidv7(),
        entity: r.entity,
        id: ids.get(`${r.entity}:${r.key}`)!,
        baseVersion: 0,
        set: Object.fromEntries(Object.entries(r.set).map(([k, v]) => [k, resolve(v, ids, users, today)])) as Mutation['set'],
        hlc: formatHlc({ ms: now.getTime(), counter: i, deviceId: 'seed' }),
      }));
      const actor = { userId: users.get(admin.email)!, organisationId: org.id, role: 'admin' as const, deviceId: 'seed' };
      const results = await engine.applyAll(em, actor, mutations);
      const refused = results.filter((r) => r.status === 'rejected');
      if (refused.length) throw new Error(`Demo data refused: ${refused.map((r) => r.error).join('; ')}`);
    }
  });
  return true;
}
