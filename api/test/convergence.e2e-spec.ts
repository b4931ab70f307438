import { afterAll, beforeAll, describe, it } from '@jest/globals';
import fc from 'fast-check';
import { SyncService } from '../src/sync/sync.service.js';
import { convergenceProperty, organisationOfThree, type SyncPort } from './convergence-model.js';
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
      newOrganisation: (n) => organisationOfThree(t.dataSource, `Convergence ${n}`),
    };
  });
  afterAll(() => t.close());

  it(`converges with nothing typed lost (${RUNS} cases)`, async () => {
    await fc.assert(convergenceProperty(port), { numRuns: RUNS });
  }, 15 * 60_000);
});
