import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, DEMO_PASSWORD, expectErrorBody, signIn, type TestApp } from './test-app.js';

describe('sign-in, refresh and sign-out', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('signs in with the demo credentials and returns tokens and the user', async () => {
    const res = await t.http.post('/api/auth/sign-in').send({ email: 'Office@Larkfield.example ', password: DEMO_PASSWORD }).expect(200);
    expect(res.body.accessToken).toMatch(/^eyJ/);
    expect(res.body.refreshToken).toMatch(/^[0-9a-f-]{36}\./);
    expect(res.body.user).toEqual({
      id: expect.any(String),
      email: 'office@larkfield.example',
      name: 'Dan Whitlow',
      role: 'office',
      organisationId: expect.any(String),
      organisationName: 'Larkfield Electrical & Data',
      active: true,
    });
    expect(res.body.organisations).toEqual([{ id: res.body.user.organisationId, name: 'Larkfield Electrical & Data' }]);
    expect(res.body.user.passwordHash).toBeUndefined();
  });

  it('gives the same 401 message for a wrong password and an unknown e-mail', async () => {
    const wrong = await t.http.post('/api/auth/sign-in').send({ email: 'office@larkfield.example', password: 'not-the-password' }).expect(401);
    const unknown = await t.http.post('/api/auth/sign-in').send({ email: 'nobody@larkfield.example', password: 'not-the-password' }).expect(401);
    expectErrorBody(wrong.body, 401);
    expect(wrong.body.message).toBe(unknown.body.message);
    expect(wrong.body.message).not.toMatch(/exist|unknown|not found/i);
  });

  it('answers bad sign-in bodies with 400 and a message naming the field, never 500', async () => {
    const missing = await t.http.post('/api/auth/sign-in').send({}).expect(400);
    expect(missing.body.message.join(' ')).toMatch(/email/);
    expect(missing.body.message.join(' ')).toMatch(/password/);
    const extra = await t.http.post('/api/auth/sign-in').send({ email: 'a@b.example', password: 'x', admin: true }).expect(400);
    expect(extra.body.message).toContain('admin is not a field we accept');
    const notJson = await t.http.post('/api/auth/sign-in').set('content-type', 'application/json').send('{"email":').expect(400);
    expectErrorBody(notJson.body, 400);
    const wrongTypes = await t.http.post('/api/auth/sign-in').send({ email: 42, password: ['x'] }).expect(400);
    expectErrorBody(wrongTypes.body, 400);
  });

  it('returns the caller from /me and refuses it without a token', async () => {
    const s = await signIn(t, 'tech1@larkfield.example');
    const me = await t.http.get('/api/auth/me').set('authorization', `Bearer ${s.accessToken}`).expect(200);
    expect(me.body).toMatchObject({ email: 'tech1@larkfield.example', role: 'technician' });
    const none = await t.http.get('/api/auth/me').expect(401);
    expectErrorBody(none.body, 401);
    await t.http.get('/api/auth/me').set('authorization', 'Bearer not.a.jwt').expect(401);
  });

  it('rotates the refresh token on every refresh', async () => {
    const s = await signIn(t, 'tech1@larkfield.example');
    const r1 = await t.http.post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(200);
    expect(r1.body.refreshToken).not.toBe(s.refreshToken);
    const r2 = await t.http.post('/api/auth/refresh').send({ refreshToken: r1.body.refreshToken }).expect(200);
    await t.http.get('/api/auth/me').set('authorization', `Bearer ${r2.body.accessToken}`).expect(200);
  });

  it('treats reuse of a rotated refresh token as theft and ends the whole session', async () => {
    const s = await signIn(t, 'tech2@larkfield.example');
    const r1 = await t.http.post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(200);
    // The old token comes back: refuse it, and the newer one stops working too.
    await t.http.post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(401);
    await t.http.post('/api/auth/refresh').send({ refreshToken: r1.body.refreshToken }).expect(401);
    // Another sign-in of the same user is a separate session and is untouched.
    const other = await signIn(t, 'tech2@larkfield.example');
    await t.http.post('/api/auth/refresh').send({ refreshToken: other.refreshToken }).expect(200);
  });

  it('refuses a forged refresh token with a real id', async () => {
    const s = await signIn(t, 'tech1@larkfield.example');
    const [id] = s.refreshToken.split('.');
    await t.http.post('/api/auth/refresh').send({ refreshToken: `${id}.AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA` }).expect(401);
    await t.http.post('/api/auth/refresh').send({ refreshToken: 'garbage' }).expect(400);
  });

  it('signs out: the refresh token no longer works', async () => {
    const s = await signIn(t, 'office@larkfield.example');
    await t.http.post('/api/auth/sign-out').send({ refreshToken: s.refreshToken }).expect(204);
    await t.http.post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(401);
  });

  it('reports health after checking the database', async () => {
    await t.http.get('/api/health').expect(200, { status: 'ok' });
  });
});
