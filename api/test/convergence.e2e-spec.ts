import { afterAll, beforeAll, describe, it } from '@jest/globals';
import fc from 'fast-check';
import { v7 as uuidv7 } from 'uuid';
import type { AuthUser } from '../src/common/decorators/current-user.decorator.js';
import { Organisation } from '../src/organisations/entities/organisation.entity.js';
import { SyncService } from '../src/sync/sync.service.js';
import { User } from '../src/users/entities/user.entity.js';
import { convergenceProperty, type SyncPort } from './convergence-model.js';
import { createTestApp, type TestApp } from './test-app.js';

/**
 * The convergence property (convergence-model.ts) against one app, calling its sync service directly, so that
 * thousands of cases run in minutes. CONVERGENCE_RUNS sets the number of cases (the soak script runs thousands).
 */
const RUNS = Number(process.env.CONVERGENCE_RUNS ?? 200);

describe('convergence under a faulty network', () => {
  let t: TestApp;
  let port: SyncPort;

  beforeAll(async () => {
    t = await createTestApp();
    const sync = t.app.get(SyncService);
    port = {
      push: (user, deviceId, mutations) => sync.push(user, deviceId, mutations),
      pull: (user, deviceId, checkpoint, limit) => sync.pull(user, deviceId, checkpoint, limit),
      newOrganisation: async (n) => {
        const orgs = t.dataSource.getRepository(Organisation);
        const org = await orgs.save(orgs.create({ name: `Convergence ${n}`, address: null, phone: null, email: null }));
        const users: AuthUser[] = [];
        for (const [i, role] of (['admin', 'office', 'office'] as const).entries()) {
          const repo = t.dataSource.getRepository(User);
          const u = await repo.save(repo.create({ organisationId: org.id, email: `c${n}-${i}-${uuidv7()}@convergence.example`, name: `User ${i}`, role, passwordHash: 'x', active: true, lastSignInAt: null }));
          users.push({ id: u.id, organisationId: org.id, role, email: u.email, name: u.name });
        }
        return users;
      },
    };
  });
  afterAll(() => t.close());

  it(`converges with nothing typed lost (${RUNS} cases)`, async () => {
    await fc.assert(convergenceProperty(port), { numRuns: RUNS });
  }, 15 * 60_000);
});
