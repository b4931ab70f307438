import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import fc from 'fast-check';
import { fillPath, type Route, routesOf } from './app-routes.js';
import { anyBody, dtoObject, type IdPool, pathValue, queryString, syncPush } from './request-arbitraries.js';
import { DeviceMirror } from './sync-helpers.js';
import { badAnswer, createTestApp, signIn, type TestApp } from './test-app.js';
import { type PaymentsFake, startPaymentsFake } from '../../scripts/payments-fake.mjs';

/**
 * Property-based fuzzing of every route the app serves: bodies and query strings generated from each handler's own
 * DTO (read from the running app, like the authorisation matrix), arbitrary JSON, and sync pushes of hostile
 * mutations. Whatever comes in, the answer is never a 5xx, and every refusal is Nest's `{ statusCode, message,
 * error }` with a message. `FUZZ_RUNS` sets the bodies per route (`npm run soak:fuzz -w api`), `FUZZ_SEED` repeats a run.
 */
const RUNS = Number(process.env.FUZZ_RUNS ?? 40);
const SEED = Number(process.env.FUZZ_SEED ?? Date.now() % 2 ** 31);

describe('bad input: generated requests on every route never break the API', () => {
  let t: TestApp;
  let routes: Route[];
  let pool: IdPool;
  let fake: PaymentsFake;
  const tokens: Record<string, string> = {};
  let adminId: string;
  const foreign: string[] = [];
  const usedMutationIds: string[] = [];
  const counts = { requests: 0, refused: 0, accepted: 0, mutations: 0 };

  beforeAll(async () => {
    // Share links are rate-limited per address; every generated request here comes from one. Card payments are
    // set up against the local fake, so that the webhook and checkout routes reach their own checks.
    fake = await startPaymentsFake({ webhookSecret: 'whsec_wiretrail_fuzz' });
    t = await createTestApp({ SHARE_RATE_LIMIT: '100000', PAYMENTS_API_KEY: 'sk_test_wiretrail_fuzz', PAYMENTS_WEBHOOK_SECRET: 'whsec_wiretrail_fuzz', PAYMENTS_API_URL: fake.url });
    routes = routesOf(t);
    for (const [role, email] of [['admin', 'admin@larkfield.example'], ['office', 'office@larkfield.example'], ['technician', 'tech1@larkfield.example'], ['oakmere', 'admin@oakmere.example']] as const) {
      const s = await signIn(t, email);
      tokens[role] = s.accessToken;
      if (role === 'admin') adminId = s.user.id;
      if (role === 'oakmere') foreign.push(s.user.id, s.user.organisationId);
    }
    const larkfield = new DeviceMirror('fuzz-larkfield');
    await larkfield.pullAll(t, await signIn(t, 'office@larkfield.example'));
    const oakmere = new DeviceMirror('fuzz-oakmere');
    await oakmere.pullAll(t, await signIn(t, 'admin@oakmere.example'));
    const byEntity = new Map<string, string[]>();
    for (const key of larkfield.rows.keys()) {
      const [entity, id] = key.split(':') as [string, string];
      byEntity.set(entity, [...(byEntity.get(entity) ?? []), id]);
    }
    // The admin is left alone: a generated PATCH that switched the admin off would end the run's session.
    const users = ((await t.http.get('/api/users').set('authorization', `Bearer ${tokens.admin}`)).body.items as Array<{ id: string }>).map((u) => u.id).filter((id) => id !== adminId);
    byEntity.set('user', users);
    foreign.push(...[...oakmere.rows.keys()].map((k) => k.split(':')[1]!));
    pool = { own: [...byEntity.values()].flat(), foreign, byEntity };
  });
  afterAll(async () => {
    console.log(`bad input: seed ${SEED}; ${counts.requests} generated requests (${counts.mutations} sync mutations), ${counts.refused} refused with a message, ${counts.accepted} accepted; 5xx found: 0`);
    await t.close();
    await fake.close();
    for (const key of ['PAYMENTS_API_KEY', 'PAYMENTS_WEBHOOK_SECRET', 'PAYMENTS_API_URL']) delete process.env[key];
  });

  /** The signed-in person who may use the route (so that requests reach validation and the service), or nobody. */
  const tokenFor = (r: Route) => (r.isPublic ? null : r.roles!.includes('admin') ? tokens.admin! : tokens[r.roles![0]!]!);

  async function send(r: Route, path: string, body: unknown, token: string | null): Promise<string | null> {
    let req = t.http[r.method](path);
    if (token) req = req.set('authorization', `Bearer ${token}`);
    const res = r.method === 'get' || r.method === 'delete' || body === undefined ? await req : await req.set('content-type', 'application/json').send(JSON.stringify(body));
    counts.requests++;
    if (res.status >= 400) counts.refused++;
    else counts.accepted++;
    const wrong = badAnswer(res);
    return wrong && `${r.method.toUpperCase()} ${path} ${body === undefined ? '' : JSON.stringify(body).slice(0, 300)} → ${wrong}`;
  }

  /** Runs a property and turns its failure (shrunk by fast-check) into one line per route. */
  async function check<T>(failures: string[], label: string, property: fc.IAsyncPropertyWithHooks<[T]>, runs: number): Promise<void> {
    try {
      await fc.assert(property, { numRuns: runs, seed: SEED });
    } catch (err) {
      const cause = (err as Error).cause as Error | undefined;
      failures.push(`${label}: ${String((err as Error).message).split('\n').slice(0, 3).join(' ')} ${cause?.message ?? ''}`);
    }
  }

  const fuzzed = () => routes.filter((r) => r.path !== '/api/sync/push');

  it('finds a DTO behind every route that takes a body or a query', () => {
    const withBody = fuzzed().filter((r) => r.method === 'post' || r.method === 'patch');
    expect(withBody.filter((r) => r.body).length).toBeGreaterThan(15);
    expect(fuzzed().filter((r) => r.query).length).toBeGreaterThan(10);
    expect(routes.find((r) => r.path === '/api/sync/push')?.body?.name).toBe('PushDto');
  });

  it(`answers ${RUNS} generated bodies and query strings per route, with real and made-up ids in the path`, async () => {
    const failures: string[] = [];
    for (const r of fuzzed()) {
      const request = fc.record({
        params: fc.array(pathValue(pool), { minLength: r.params.length, maxLength: r.params.length }),
        query: fc.oneof({ arbitrary: queryString(r.query, pool), weight: 4 }, { arbitrary: queryString(null, pool), weight: 1 }),
        body: r.body ? fc.oneof({ arbitrary: dtoObject(r.body, pool), weight: 6 }, { arbitrary: anyBody, weight: 1 }) : fc.oneof(fc.constant(undefined), anyBody),
      });
      const property = fc.asyncProperty(request, async ({ params, query, body }) => {
        const path = `${fillPath(r.path, params.map(encodeURIComponent))}${query ? `?${query}` : ''}`;
        const wrong = await send(r, path, body, tokenFor(r));
        if (wrong) throw new Error(wrong);
      });
      await check(failures, `${r.method} ${r.path}`, property, RUNS);
    }
    expect(failures).toEqual([]);
  }, 600_000);

  it(`answers ${RUNS * 10} sync pushes of hostile mutations from each role with a result per mutation`, async () => {
    const failures: string[] = [];
    const push = routes.find((r) => r.path === '/api/sync/push')!;
    for (const role of ['technician', 'office', 'oakmere'] as const) {
      const property = fc.asyncProperty(syncPush(pool, usedMutationIds), async (body) => {
        const res = await t.http.post('/api/sync/push').set('authorization', `Bearer ${tokens[role]}`).set('content-type', 'application/json').send(JSON.stringify(body));
        counts.requests++;
        const wrong = badAnswer(res);
        if (wrong) throw new Error(`${role} push ${JSON.stringify(body).slice(0, 500)} → ${wrong}`);
        if (res.status >= 400) {
          counts.refused++;
          return;
        }
        counts.accepted++;
        // A well-formed batch answers every mutation, in order, each applied, merged or refused with a reason.
        const mutations = (body as { mutations: Array<{ mutationId?: unknown }> }).mutations;
        counts.mutations += mutations.length;
        const results = res.body.results as Array<{ mutationId: unknown; status: string; error?: string }>;
        expect(results).toHaveLength(mutations.length);
        for (const result of results) {
          expect(['applied', 'merged', 'rejected']).toContain(result.status);
          if (result.status === 'rejected') expect(result.error).toEqual(expect.stringMatching(/\S/));
        }
        for (const m of mutations) if (typeof m?.mutationId === 'string') usedMutationIds.unshift(m.mutationId);
      });
      await check(failures, `${role} ${push.method} ${push.path}`, property, RUNS * 10);
    }
    expect(failures).toEqual([]);
  }, 600_000);
});
