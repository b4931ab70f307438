import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { JwtService } from '@nestjs/jwt';
import { formatHlc, type Mutation, type MutationResult, type PullResponse } from '@wiretrail/core';
import fc from 'fast-check';
import { DataSource } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { RefreshToken } from '../../src/auth/entities/refresh-token.entity.js';
import type { AuthUser } from '../../src/common/decorators/current-user.decorator.js';
import { ALL_ENTITIES } from '../../src/database/entities.js';
import { databaseOptions } from '../../src/database/typeorm-options.js';
import { ApiProcess, type Answer } from '../api-process.js';
import { convergenceProperty, organisationOfThree, type SyncPort } from '../convergence-model.js';

/**
 * Two API processes on one PostgreSQL database, as behind a load balancer: every request goes to the next
 * process in turn. The writers of both processes take one lock (write-queue.ts), so changes are numbered in the
 * order they commit and no pull can step past a change still to come. TWO_INSTANCE_RUNS sets the cases.
 */
const RUNS = Number(process.env.TWO_INSTANCE_RUNS ?? 100);

describe('two API processes on one PostgreSQL database', () => {
  let apis: ApiProcess[];
  let db: DataSource;
  let jwt: JwtService;
  let turn = 0;
  const figures = { requests: 0, byProcess: [0, 0] };
  const sessions = new Map<string, Promise<string>>();

  /** An access token belongs to a session (a refresh-token family): one per user, opened behind the API's back. */
  function sessionOf(user: AuthUser): Promise<string> {
    let sid = sessions.get(user.id);
    if (!sid) {
      const familyId = uuidv7();
      sid = db
        .getRepository(RefreshToken)
        .insert({ id: uuidv7(), organisationId: user.organisationId, userId: user.id, familyId, tokenHash: '0'.repeat(64), expiresAt: new Date(Date.now() + 86_400_000), rotatedAt: null, revokedAt: null, userAgent: null })
        .then(() => familyId);
      sessions.set(user.id, sid);
    }
    return sid;
  }

  beforeAll(async () => {
    const first = await ApiProcess.create();
    first.prepare();
    const second = await ApiProcess.create({ DATABASE_URL: first.env.DATABASE_URL!, DATABASE_PATH: first.env.DATABASE_PATH! });
    apis = [first, second];
    await Promise.all(apis.map((a) => a.start()));
    db = new DataSource({ ...databaseOptions({ type: 'postgres', url: first.env.DATABASE_URL!, path: '', poolSize: 2 }), entities: ALL_ENTITIES });
    await db.initialize();
    jwt = new JwtService({ secret: first.env.JWT_SECRET! });
  }, 120_000);

  afterAll(async () => {
    await db?.destroy();
    for (const a of [...(apis ?? [])].reverse()) await a.remove();
  });

  /** The round-robin client: each request to the next process. */
  async function send(user: AuthUser, method: string, path: string, body?: object): Promise<Answer> {
    const i = turn++ % apis.length;
    figures.requests++;
    figures.byProcess[i]!++;
    const token = await jwt.signAsync({ sub: user.id, org: user.organisationId, role: user.role, sid: await sessionOf(user) }, { expiresIn: 3600 });
    const res = await apis[i]!.request(method, path, { headers: { authorization: `Bearer ${token}` }, body });
    if (res.status !== 200) throw new Error(`${method} ${path} on process ${i + 1} answered ${res.status}: ${res.text.slice(0, 300)}`);
    return res;
  }

  const port: SyncPort = {
    push: async (user, deviceId, mutations) => (await send(user, 'POST', '/api/sync/push', { deviceId, mutations })).body as { results: MutationResult[] },
    pull: async (user, deviceId, checkpoint, limit) => (await send(user, 'GET', `/api/sync/pull?checkpoint=${checkpoint}&limit=${limit}&deviceId=${deviceId}`)).body as PullResponse,
    newOrganisation: (n) => organisationOfThree(db, `Two instances ${n}`),
  };

  it(`converges with nothing typed lost, devices syncing at once through both (${RUNS} cases)`, async () => {
    await fc.assert(convergenceProperty(port, { concurrent: true }), { numRuns: RUNS });
    expect(Math.min(...figures.byProcess)).toBeGreaterThan(0);
    console.log(`two instances: ${RUNS} convergence cases, ${figures.requests} requests (${figures.byProcess.join(' and ')} per process); losses found: 0`);
  }, 20 * 60_000);

  it('never lets a pull step past a change that another process commits later', async () => {
    const [admin, ...office] = await port.newOrganisation(1_000);
    const writers = [...office, admin!, ...office, admin!].map((user, i) => ({ user: user!, deviceId: `writer-${i}` }));
    const created = new Set<string>();
    let writing = true;
    const write = async ({ user, deviceId }: (typeof writers)[number]) => {
      for (let b = 0; b < 12; b++) {
        const batch: Mutation[] = Array.from({ length: 5 }, (_, k) => ({
          mutationId: uuidv7(), entity: 'customer', id: uuidv7(), baseVersion: 0, set: { name: `${deviceId} ${b}.${k}` },
          hlc: formatHlc({ ms: Date.now(), counter: b * 5 + k, deviceId }),
        }));
        const { results } = await port.push(user, deviceId, batch);
        expect(results.map((r) => r.status)).toEqual(batch.map(() => 'applied'));
        for (const m of batch) created.add(m.id);
      }
    };
    // A reader pulls small pages the whole time the writers write, on whichever process is next.
    const seen = new Set<string>();
    let checkpoint = 0;
    let pages = 0;
    const pullPage = async () => {
      const page = await port.pull(admin!, 'reader', checkpoint, 7);
      expect(page.reset).toBeFalsy();
      for (const c of page.changes) if (c.entity === 'customer' && !c.deleted) seen.add(c.id);
      checkpoint = page.checkpoint;
      pages++;
      return page.hasMore;
    };
    const read = async () => {
      while (writing) await pullPage();
    };
    await Promise.all([Promise.all(writers.map(write)).finally(() => (writing = false)), read()]);
    while (await pullPage());
    expect(created.size).toBe(writers.length * 60);
    expect([...created].filter((id) => !seen.has(id))).toEqual([]);
    const seqs = await db.query(`SELECT CAST(COUNT(DISTINCT "seq") AS INTEGER) AS n, CAST(COUNT(*) AS INTEGER) AS total FROM "sync_change"`);
    expect(seqs[0].n).toBe(seqs[0].total);
    console.log(`two instances: ${writers.length} writers pushed ${created.size} rows while a reader pulled ${pages} pages of 7; every row arrived`);
  }, 5 * 60_000);
});
