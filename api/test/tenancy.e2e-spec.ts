import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

describe('organisations never see each other', () => {
  let t: TestApp;
  let larkfield: Awaited<ReturnType<typeof signIn>>;
  let oakmere: Awaited<ReturnType<typeof signIn>>;
  const auth = (s: { accessToken: string }) => ({ authorization: `Bearer ${s.accessToken}` });

  beforeAll(async () => {
    t = await createTestApp();
    larkfield = await signIn(t, 'admin@larkfield.example');
    oakmere = await signIn(t, 'admin@oakmere.example');
  });
  afterAll(() => t.close());

  it("answers 404 for another organisation's user, exactly as for one that does not exist", async () => {
    const theirs = await t.http.get(`/api/users/${larkfield.user.id}`).set(auth(oakmere)).expect(404);
    const none = await t.http.get('/api/users/01890000-0000-7000-8000-000000000000').set(auth(oakmere)).expect(404);
    expectErrorBody(theirs.body, 404);
    expect(theirs.body).toEqual(none.body);
    expect(JSON.stringify(theirs.body)).not.toContain('larkfield');
  });

  it("cannot change another organisation's user", async () => {
    await t.http.patch(`/api/users/${larkfield.user.id}`).set(auth(oakmere)).send({ active: false }).expect(404);
    await t.http.get('/api/auth/me').set(auth(larkfield)).expect(200);
  });

  it('lists only its own users', async () => {
    const res = await t.http.get('/api/users?search=larkfield').set(auth(oakmere)).expect(200);
    expect(res.body).toMatchObject({ total: 0, items: [] });
    const own = await t.http.get('/api/users').set(auth(oakmere)).expect(200);
    // The subcontractor both contractors share is in each list as that organisation's own membership.
    expect(own.body.items.map((u: { email: string }) => u.email)).toEqual(['corin@valewiring.example', 'admin@oakmere.example']);
    const lark = await t.http.get('/api/users?search=corin').set(auth(larkfield)).expect(200);
    expect(lark.body.items).toHaveLength(1);
    expect(lark.body.items[0].id).not.toBe(own.body.items[0].id);
    expect(lark.body.items[0].organisationId).toBe(larkfield.user.organisationId);
  });

  it("answers 404 for another organisation's record and allows its own", async () => {
    await t.http.get(`/api/organisations/${larkfield.user.organisationId}`).set(auth(oakmere)).expect(404);
    await t.http.patch(`/api/organisations/${larkfield.user.organisationId}`).set(auth(oakmere)).send({ name: 'Taken over' }).expect(404);
    const own = await t.http.get('/api/organisations/current').set(auth(oakmere)).expect(200);
    expect(own.body.name).toBe('Oakmere Power & Data');
    const lark = await t.http.get(`/api/organisations/${larkfield.user.organisationId}`).set(auth(larkfield)).expect(200);
    expect(lark.body.name).toBe('Larkfield Electrical & Data');
  });

  it('lets only the admin edit the organisation', async () => {
    const office = await signIn(t, 'office@larkfield.example');
    await t.http.patch(`/api/organisations/${office.user.organisationId}`).set(auth(office)).send({ phone: '01632 960 000' }).expect(403);
    const res = await t.http.patch(`/api/organisations/${larkfield.user.organisationId}`).set(auth(larkfield)).send({ phone: '01632 960 419' }).expect(200);
    expect(res.body.phone).toBe('01632 960 419');
  });
});
