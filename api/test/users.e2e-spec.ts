import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { addPerson, createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

type Session = Awaited<ReturnType<typeof signIn>>;

describe('users: roles and administration', () => {
  let t: TestApp;
  let admin: Session;
  let office: Session;
  let tech: Session;
  const auth = (s: Session) => ({ authorization: `Bearer ${s.accessToken}` });

  beforeAll(async () => {
    t = await createTestApp();
    admin = await signIn(t, 'admin@larkfield.example');
    office = await signIn(t, 'office@larkfield.example');
    tech = await signIn(t, 'tech1@larkfield.example');
  });
  afterAll(() => t.close());

  const routes = (id: string) => [
    { method: 'get', path: '/api/users', body: undefined },
    { method: 'get', path: `/api/users/${id}`, body: undefined },
    { method: 'post', path: '/api/users', body: { email: 'new.one@larkfield.example', name: 'New One', role: 'technician' } },
    { method: 'patch', path: `/api/users/${id}`, body: { name: 'Renamed' } },
  ] as const;

  it.each(['office', 'technician'] as const)('refuses every users route to %s with 403', async (role) => {
    const s = role === 'office' ? office : tech;
    for (const r of routes(tech.user.id)) {
      const req = t.http[r.method](r.path).set(auth(s));
      const res = await (r.body ? req.send(r.body) : req);
      expect([r.method, r.path, res.status]).toEqual([r.method, r.path, 403]);
      expectErrorBody(res.body, 403);
    }
  });

  it('refuses every users route without a token with 401', async () => {
    for (const r of routes(tech.user.id)) {
      const res = await t.http[r.method](r.path).send(r.body ?? {});
      expect([r.method, r.path, res.status]).toEqual([r.method, r.path, 401]);
    }
  });

  it('lets the admin list, search and page users of their own organisation only', async () => {
    const all = await t.http.get('/api/users').set(auth(admin)).expect(200);
    expect(all.body.total).toBe(5);
    expect(all.body.items.map((u: { email: string }) => u.email).sort()).toEqual([
      'admin@larkfield.example', 'corin@valewiring.example', 'office@larkfield.example', 'tech1@larkfield.example', 'tech2@larkfield.example',
    ]);
    const techs = await t.http.get('/api/users?role=technician&pageSize=1&page=2').set(auth(admin)).expect(200);
    expect(techs.body).toMatchObject({ total: 3, page: 2, pageSize: 1 });
    expect(techs.body.items).toHaveLength(1);
    const search = await t.http.get('/api/users?search=brannigan').set(auth(admin)).expect(200);
    expect(search.body.items.map((u: { email: string }) => u.email)).toEqual(['tech1@larkfield.example']);
    const bad = await t.http.get('/api/users?pageSize=5000&role=boss').set(auth(admin)).expect(400);
    expect(bad.body.message.join(' ')).toMatch(/pageSize/);
    expect(bad.body.message.join(' ')).toMatch(/role must be one of/);
  });

  it('gives office staff a directory of names and roles, without e-mails', async () => {
    const res = await t.http.get('/api/users/directory').set(auth(office)).expect(200);
    expect(res.body.map((u: { name: string }) => u.name)).toEqual(expect.arrayContaining(['Sam Brannigan', 'Aled Pryce']));
    expect(JSON.stringify(res.body)).not.toContain('@');
    await t.http.get('/api/users/directory').set(auth(tech)).expect(403);
  });

  it('lets the admin add someone who can then sign in', async () => {
    const created = await addPerson(t, admin, { email: 'Tech3@Larkfield.example', name: 'Mina Corr', role: 'technician' }, 'a-long-password');
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ email: 'tech3@larkfield.example', role: 'technician', organisationId: admin.user.organisationId });
    const s = await signIn(t, 'tech3@larkfield.example', 'a-long-password');
    expect(s.user.role).toBe('technician');
    const dup = await t.http.post('/api/users').set(auth(admin))
      .send({ email: 'tech3@larkfield.example', name: 'Again', role: 'office' }).expect(409);
    expectErrorBody(dup.body, 409);
  });

  it('validates new users field by field', async () => {
    const res = await t.http.post('/api/users').set(auth(admin)).send({ email: 'nope', name: '', role: 'boss', password: 'a-long-password' }).expect(400);
    const text = res.body.message.join(' | ');
    expect(text).toMatch(/email must be an e-mail address/);
    expect(text).toMatch(/name must not be empty/);
    expect(text).toMatch(/role must be one of: admin, office, technician/);
    // The office never sets anyone's password: the person sets it from their link.
    expect(text).toMatch(/password is not a field we accept/);
    await t.http.get('/api/users/not-a-uuid').set(auth(admin)).expect(400);
  });

  it('lets the admin change a role, and nobody change their own', async () => {
    const created = await addPerson(t, admin, { email: 'promote@larkfield.example', name: 'Lee Ash', role: 'technician' }, 'a-long-password');
    const changed = await t.http.patch(`/api/users/${created.body.id}`).set(auth(admin)).send({ role: 'office' }).expect(200);
    expect(changed.body.role).toBe('office');
    const own = await t.http.patch(`/api/users/${admin.user.id}`).set(auth(admin)).send({ role: 'technician' }).expect(403);
    expect(own.body.message).toMatch(/own role/);
    await t.http.patch(`/api/users/${admin.user.id}`).set(auth(admin)).send({ active: false }).expect(403);
    // Renaming oneself is fine.
    await t.http.patch(`/api/users/${admin.user.id}`).set(auth(admin)).send({ name: 'Ruth Okafor' }).expect(200);
    await t.http.patch(`/api/users/${created.body.id}`).set(auth(admin)).send({}).expect(400);
    await t.http.patch(`/api/users/${created.body.id}`).set(auth(admin)).send({ email: 'x@y.example' }).expect(400);
  });

  it("stops a deactivated user's access and refresh tokens at once", async () => {
    expect((await addPerson(t, admin, { email: 'leaver@larkfield.example', name: 'Pat Leaver', role: 'technician' }, 'a-long-password')).status).toBe(201);
    const s = await signIn(t, 'leaver@larkfield.example', 'a-long-password');
    await t.http.get('/api/auth/me').set(auth(s)).expect(200);
    await t.http.patch(`/api/users/${s.user.id}`).set(auth(admin)).send({ active: false }).expect(200);
    await t.http.get('/api/auth/me').set(auth(s)).expect(401);
    await t.http.post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(401);
    await t.http.post('/api/auth/sign-in').send({ email: 'leaver@larkfield.example', password: 'a-long-password' }).expect(401);
  });

  it('re-reads the role on every request, so a demotion takes effect at once', async () => {
    expect((await addPerson(t, admin, { email: 'acting@larkfield.example', name: 'Acting Admin', role: 'admin' }, 'a-long-password')).status).toBe(201);
    const s = await signIn(t, 'acting@larkfield.example', 'a-long-password');
    await t.http.get('/api/users').set(auth(s)).expect(200);
    await t.http.patch(`/api/users/${s.user.id}`).set(auth(admin)).send({ role: 'office' }).expect(200);
    await t.http.get('/api/users').set(auth(s)).expect(403);
  });
});
