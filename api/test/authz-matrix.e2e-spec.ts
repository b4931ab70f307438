import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { JwtService } from '@nestjs/jwt';
import { fillPath, type Route, routesOf } from './app-routes.js';
import { createTestApp, signIn, signInTo, type TestApp } from './test-app.js';

describe('authorisation matrix: every route × every role × own and other organisation × bad tokens', () => {
  let t: TestApp;
  let routes: Route[];
  const tokens: Record<string, string> = {};
  let larkfieldIds: string[];
  let larkfieldChanges: Array<{ entity: string; id: string }>;
  let larkfieldOrg: string;
  /** Rows that do not sync (quotes, invoices, rates), read over REST: one of each kind. */
  let larkfieldBilling: string[];

  beforeAll(async () => {
    t = await createTestApp();
    routes = routesOf(t);
    for (const [role, email] of [['admin', 'admin@larkfield.example'], ['office', 'office@larkfield.example'], ['technician', 'tech1@larkfield.example'], ['otherAdmin', 'admin@oakmere.example']] as const) {
      const s = await signIn(t, email);
      tokens[role] = s.accessToken;
      if (role === 'admin') larkfieldOrg = s.user.organisationId;
    }
    const pulled = await t.http.get('/api/sync/pull?checkpoint=0&limit=1000&deviceId=matrix-office').set('authorization', `Bearer ${tokens.office}`);
    larkfieldChanges = pulled.body.changes as Array<{ entity: string; id: string }>;
    const office = { authorization: `Bearer ${tokens.office}` };
    const invoices = (await t.http.get('/api/invoices').set(office)).body.items as Array<{ id: string; kind: string }>;
    const [vat, labour] = await Promise.all(['/api/vat-rates', '/api/labour-rates'].map(async (path) => (await t.http.get(path).set(office)).body.items as Array<{ id: string }>));
    larkfieldBilling = [...new Map(invoices.map((i) => [i.kind, i.id])).values(), vat![0]!.id, labour![0]!.id];
    expect(larkfieldBilling).toHaveLength(4);
    larkfieldIds = [...larkfieldChanges.map((c) => c.id), ...larkfieldBilling];
  });
  afterAll(() => t.close());

  const send = (r: Route, token: string | null, id = '01890000-0000-7000-8000-000000000000') => {
    const req = t.http[r.method](fillPath(r.path, id));
    if (token) req.set('authorization', `Bearer ${token}`);
    return r.method === 'get' || r.method === 'delete' ? req : req.send({});
  };

  it('finds the routes of every feature', () => {
    const paths = routes.map((r) => `${r.method} ${r.path}`);
    for (const expected of [
      'post /api/auth/sign-in', 'get /api/users', 'post /api/sync/push', 'get /api/sync/pull', 'get /api/conflicts', 'get /api/circuits', 'patch /api/visits/:id', 'get /api/visits/:id/record',
      'post /api/jobs/:id/documents', 'get /api/jobs/:id/documents', 'get /api/documents/:id', 'get /api/documents/:id/pdf', 'post /api/documents/:id/send', 'post /api/jobs/:id/documents/send',
      'get /api/jobs/:id/held-changes', 'post /api/documents/:id/revisions',
      'post /api/jobs/:id/share-links', 'get /api/jobs/:id/share-links', 'post /api/share-links/:id/revoke',
      'get /api/shared/:token', 'get /api/shared/:token/photos/:photoId/thumb', 'get /api/shared/:token/photos/:photoId/display', 'get /api/shared/:token/documents/:documentId/pdf',
      'get /api/jobs/status-counts', 'get /api/cable-runs', 'get /api/cable-runs/:id', 'patch /api/cable-runs/:id',
      'get /api/point-changes', 'get /api/point-changes/:id', 'get /api/test-results', 'get /api/test-results/:id',
      'get /api/price-items', 'get /api/price-items/:id', 'post /api/price-items', 'patch /api/price-items/:id',
      'get /api/vat-rates', 'post /api/vat-rates', 'patch /api/vat-rates/:id', 'get /api/labour-rates', 'post /api/labour-rates', 'patch /api/labour-rates/:id',
      'get /api/billing-terms', 'patch /api/billing-terms',
      'get /api/jobs/:id/invoices', 'post /api/jobs/:id/invoices', 'get /api/invoices', 'get /api/invoices/aged-debt', 'get /api/invoices/:id', 'patch /api/invoices/:id',
      'delete /api/invoices/:id', 'post /api/invoices/:id/issue', 'post /api/invoices/:id/credit-note', 'get /api/invoices/:id/pdf', 'post /api/invoices/:id/send',
      'post /api/invoices/:id/payments', 'post /api/invoices/:id/refunds',
      'get /api/shared/:token/invoices', 'get /api/shared/:token/invoices/:invoiceId/pdf', 'post /api/shared/:token/invoices/:invoiceId/checkout',
      'post /api/payments/webhook',
    ]) {
      expect(paths).toContain(expected);
    }
    // The office's reads of site records are the office's and the admin's alone.
    for (const r of routes.filter((x) => /^\/api\/(cable-runs|point-changes|test-results|jobs\/status-counts)/.test(x.path))) {
      expect([r.method, r.path, [...r.roles!].sort()]).toEqual([r.method, r.path, ['admin', 'office']]);
    }
    expect(routes.length).toBeGreaterThan(35);
    // Deny by default: every route names its roles or is public.
    expect(routes.filter((r) => !r.isPublic && !r.roles)).toEqual([]);
    // Documents, share links and money are the office's; technicians see document rows and the price list through sync only.
    for (const r of routes.filter((x) => /\/(documents|share-links|invoices|price-items|vat-rates|labour-rates|billing-terms)\b/.test(x.path) && !x.isPublic)) {
      expect([`${r.method} ${r.path}`, r.roles]).toEqual([`${r.method} ${r.path}`, ['office', 'admin']]);
    }
    // What anyone may reach without an account: sign-in and health, a customer's link, and the payment provider's signed events.
    expect(routes.filter((r) => r.isPublic && !r.path.startsWith('/api/auth') && r.path !== '/api/health').map((r) => `${r.method} ${r.path}`).sort()).toEqual([
      'get /api/shared/:token',
      'get /api/shared/:token/documents/:documentId/pdf',
      'get /api/shared/:token/invoices',
      'get /api/shared/:token/invoices/:invoiceId/pdf',
      'get /api/shared/:token/photos/:photoId/display',
      'get /api/shared/:token/photos/:photoId/thumb',
      'post /api/payments/webhook',
      'post /api/shared/:token/invoices/:invoiceId/checkout',
    ]);
  });

  it('takes nothing unsigned at the payment webhook, and says nothing of any organisation', async () => {
    for (const token of [null, tokens.admin!]) {
      const req = t.http.post('/api/payments/webhook').set('stripe-signature', 't=1,v1=00');
      const res = await (token ? req.set('authorization', `Bearer ${token}`) : req).send({ id: 'evt_made_up', type: 'checkout.session.completed' });
      // Card payments are not set up in this app, so nothing can be verified: refused before anything is read.
      expect(res.status).toBe(503);
      expect(res.body).toMatchObject({ statusCode: 503, message: expect.stringContaining('not set up') });
      expect(JSON.stringify(res.body)).not.toContain(larkfieldOrg);
    }
  });

  it("answers a customer's share route with a made-up token with 404 and no data, signed in or not", async () => {
    const failures: string[] = [];
    for (const r of routes.filter((x) => x.isPublic && x.path.startsWith('/api/shared'))) {
      for (const token of [null, tokens.admin!, tokens.otherAdmin!]) {
        // A link-shaped token and one of another shape; photo and document ids are well-formed ids of nothing.
        for (const made of ['A'.repeat(43), 'not-a-link']) {
          const req = t.http[r.method](fillPath(r.path.replace(':token', made), '01890000-0000-7000-8000-000000000000'));
          const res = await (token ? req.set('authorization', `Bearer ${token}`) : req);
          if (res.status !== 404) failures.push(`${r.method} ${r.path} with ${made} → ${res.status}`);
          if (JSON.stringify(res.body).includes(larkfieldOrg)) failures.push(`${r.path} leaked Larkfield's organisation id`);
        }
      }
    }
    expect(failures).toEqual([]);
  });

  it('gives each role exactly the routes it is allowed, and never a 5xx', async () => {
    const failures: string[] = [];
    let refused = 0;
    for (const r of routes.filter((x) => !x.isPublic)) {
      for (const role of ['admin', 'office', 'technician']) {
        const res = await send(r, tokens[role]!);
        const allowed = r.roles!.includes(role);
        const ok = allowed ? res.status !== 403 && res.status !== 401 && res.status < 500 : res.status === 403;
        if (!ok) failures.push(`${role} ${r.method} ${r.path} → ${res.status}`);
        if (!allowed) refused++;
        expect(res.body).toEqual(expect.any(Object));
      }
    }
    expect(failures).toEqual([]);
    expect(refused).toBeGreaterThan(30);
  });

  it('answers 401 to no token, an expired token and a tampered token on every protected route', async () => {
    const jwt = t.app.get(JwtService);
    const admin = JSON.parse(Buffer.from(tokens.admin!.split('.')[1]!, 'base64url').toString());
    const expired = await jwt.signAsync({ sub: admin.sub, org: admin.org, role: 'admin' }, { expiresIn: -10 });
    const [h, p, s] = tokens.technician!.split('.');
    const raised = Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(p!, 'base64url').toString()), role: 'admin' })).toString('base64url');
    const tampered = `${h}.${raised}.${s}`;
    const forged = await new JwtService({ secret: 'not-our-secret-but-long-enough-to-sign' }).signAsync({ sub: admin.sub, org: admin.org, role: 'admin' });
    const failures: string[] = [];
    for (const r of routes.filter((x) => !x.isPublic)) {
      for (const [name, token] of [['none', null], ['expired', expired], ['tampered', tampered], ['forged', forged]] as const) {
        const res = await send(r, token);
        if (res.status !== 401) failures.push(`${name} ${r.method} ${r.path} → ${res.status}`);
      }
    }
    expect(failures).toEqual([]);
  });

  it("never shows another organisation's rows: every id route answers 404 to Oakmere for Larkfield's ids", async () => {
    const failures: string[] = [];
    const sampleIds = [...new Map(larkfieldChanges.map((c) => [c.entity, c.id])).values()];
    for (const r of routes.filter((x) => !x.isPublic && x.path.includes(':') && x.roles!.includes('admin'))) {
      // The organisation and a sample of each kind of row stand for all of Larkfield's ids.
      for (const id of [larkfieldOrg, ...sampleIds, ...larkfieldBilling]) {
        const res = await send(r, tokens.otherAdmin!, id);
        if (res.status < 400 || res.status >= 500) failures.push(`${r.method} ${fillPath(r.path, id)} → ${res.status}`);
        if (JSON.stringify(res.body).includes(larkfieldOrg)) failures.push(`${r.method} ${r.path} leaked Larkfield's organisation id`);
      }
    }
    expect(failures).toEqual([]);
    for (const r of routes.filter((x) => x.method === 'get' && !x.path.includes(':') && !x.isPublic && x.roles!.includes('admin'))) {
      const res = await t.http.get(r.path === '/api/sync/pull' ? `${r.path}?checkpoint=0&deviceId=matrix-oakmere` : r.path).set('authorization', `Bearer ${tokens.otherAdmin}`);
      expect(JSON.stringify(res.body)).not.toContain(larkfieldOrg);
      for (const id of [...larkfieldIds.slice(0, 200), ...larkfieldBilling]) expect(JSON.stringify(res.body)).not.toContain(id);
    }
  }, 120_000);

  it('lets a person who works for both organisations read each only with a session of the one chosen', async () => {
    const atOakmere = await signInTo(t, 'corin@valewiring.example', 'Oakmere Power & Data');
    const atLarkfield = await signInTo(t, 'corin@valewiring.example', 'Larkfield Electrical & Data');
    const oakmereOrg = atOakmere.user.organisationId;
    const oakmereIds = ((await t.http.get('/api/sync/pull?checkpoint=0&limit=1000&deviceId=matrix-oakmere-admin').set('authorization', `Bearer ${tokens.otherAdmin}`)).body.changes as Array<{ id: string }>).map((c) => c.id);
    expect(oakmereIds.length).toBeGreaterThan(3);
    const failures: string[] = [];
    const sampleIds = [...new Map(larkfieldChanges.map((c) => [c.entity, c.id])).values()];
    const mine = routes.filter((x) => !x.isPublic && x.roles!.includes('technician'));
    for (const [session, theirOrg, theirIds] of [[atOakmere, larkfieldOrg, [larkfieldOrg, ...sampleIds]], [atLarkfield, oakmereOrg, [oakmereOrg, ...oakmereIds]]] as const) {
      for (const r of mine.filter((x) => x.path.includes(':'))) {
        for (const id of theirIds) {
          const res = await send(r, session.accessToken, id);
          if (res.status < 400 || res.status >= 500) failures.push(`${session.user.organisationName} ${r.method} ${fillPath(r.path, id)} → ${res.status}`);
          if (JSON.stringify(res.body).includes(theirOrg)) failures.push(`${r.method} ${r.path} leaked the other organisation's id`);
        }
      }
      for (const r of mine.filter((x) => x.method === 'get' && !x.path.includes(':'))) {
        const res = await t.http.get(r.path === '/api/sync/pull' ? `${r.path}?checkpoint=0&limit=1000&deviceId=matrix-corin-${session.user.id}` : r.path).set('authorization', `Bearer ${session.accessToken}`);
        const body = JSON.stringify(res.body);
        if (body.includes(theirOrg) || theirIds.some((id) => body.includes(id))) failures.push(`${session.user.organisationName} ${r.path} showed the other organisation's rows`);
      }
    }
    expect(failures).toEqual([]);
    // A token signed with our own key that pairs one membership with the other organisation opens nothing.
    const jwt = t.app.get(JwtService);
    const claims = JSON.parse(Buffer.from(atOakmere.accessToken.split('.')[1]!, 'base64url').toString());
    const crossed = await jwt.signAsync({ sub: claims.sub, org: larkfieldOrg, role: claims.role, sid: claims.sid });
    await t.http.get('/api/auth/me').set('authorization', `Bearer ${crossed}`).expect(401);
    await t.http.get('/api/auth/me').set('authorization', `Bearer ${atOakmere.accessToken}`).expect(200);
  }, 120_000);

  it("gives Oakmere nothing of Larkfield's when its lists are filtered by Larkfield's sites, jobs and visits", async () => {
    const byEntity = (entity: string) => larkfieldChanges.filter((c) => c.entity === entity).map((c) => c.id);
    const filters = [...byEntity('site').map((id) => `siteId=${id}`), ...byEntity('job').map((id) => `jobId=${id}`), ...byEntity('visit').map((id) => `visitId=${id}`)];
    const failures: string[] = [];
    let answered = 0;
    for (const r of routes.filter((x) => x.method === 'get' && !x.path.includes(':') && !x.isPublic && x.roles!.includes('admin') && x.path !== '/api/sync/pull')) {
      for (const filter of filters) {
        const res = await t.http.get(`${r.path}?${filter}`).set('authorization', `Bearer ${tokens.otherAdmin}`);
        // A list that has no such filter refuses it; one that has it must come back without Larkfield's rows.
        if (res.status === 400) continue;
        answered++;
        if (res.status !== 200) failures.push(`${r.path}?${filter} → ${res.status}`);
        const body = JSON.stringify(res.body);
        if (body.includes(larkfieldOrg) || larkfieldIds.some((id) => !filter.endsWith(id) && body.includes(id))) failures.push(`${r.path}?${filter} showed a Larkfield row`);
      }
    }
    expect(failures).toEqual([]);
    expect(answered).toBeGreaterThan(20);
  }, 120_000);
});
