import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type Mailbox, startMailbox } from '../../scripts/mailbox.mjs';
import { bearer, createTestApp, signIn, type TestApp, until } from './test-app.js';

/**
 * An access token lives 15 minutes, but it belongs to the session it was issued with: once that session ends
 * (signed out, a stolen refresh token used twice, a new password set from a link) the token is refused at once.
 */
describe('access tokens end with their session', () => {
  let t: TestApp;
  let mailbox: Mailbox;

  beforeAll(async () => {
    mailbox = await startMailbox();
    t = await createTestApp({ SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mailbox.port), PUBLIC_URL: 'https://larkfield.wiretrail.example' });
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  const me = (s: { accessToken: string }) => t.http.get('/api/auth/me').set(bearer(s));

  it('refuses the access token of a session that signed out, and keeps the same user’s other sessions', async () => {
    const phone = await signIn(t, 'tech1@larkfield.example');
    const desk = await signIn(t, 'tech1@larkfield.example');
    await me(phone).expect(200);
    await t.http.post('/api/auth/sign-out').send({ refreshToken: phone.refreshToken }).expect(204);
    const refused = await me(phone).expect(401);
    expect(refused.body).toMatchObject({ statusCode: 401, message: 'Your session has ended. Please sign in again.' });
    await t.http.get('/api/sync/pull').set(bearer(phone)).expect(401);
    // Photo uploads check tokens themselves, outside Nest's guard: the ended session opens them no more.
    const upload = (s: { accessToken: string }) =>
      t.http.post('/api/uploads').set(bearer(s)).set('Tus-Resumable', '1.0.0').set('Upload-Length', '10')
        .set('Upload-Metadata', `sha256 ${Buffer.from('a'.repeat(64)).toString('base64')}`);
    expect((await upload(phone)).status).toBe(401);
    expect((await upload(desk)).status).toBe(201);
    await me(desk).expect(200);
  });

  it('refuses every access token of a session ended because a rotated refresh token came back', async () => {
    const s = await signIn(t, 'tech2@larkfield.example');
    const rotated = (await t.http.post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(200)).body;
    await me(s).expect(200);
    await me(rotated).expect(200);
    // The first refresh token again: someone else holds this session, so all of it ends.
    await t.http.post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(401);
    await me(s).expect(401);
    await me(rotated).expect(401);
  });

  it('refuses the access tokens of every session of a user whose password was set anew from a link', async () => {
    const admin = await signIn(t, 'admin@larkfield.example');
    const office = await signIn(t, 'office@larkfield.example');
    await me(office).expect(200);
    await t.http.post(`/api/users/${office.user.id}/password-reset`).set(bearer(admin)).expect(202);
    await until(() => mailbox.messages.length === 1);
    const token = decodeURIComponent(/reset-password\?token=([^\s]+)/.exec(mailbox.messages[0]!.text)![1]!);
    await t.http.post('/api/auth/password-reset').send({ token, password: 'office-new-password' }).expect(204);
    await me(office).expect(401);
    await t.http.get('/api/invoices').set(bearer(office)).expect(401);
    // The new password opens a new session; the admin's own session is untouched.
    await me(await signIn(t, 'office@larkfield.example', 'office-new-password')).expect(200);
    await me(admin).expect(200);
  });
});
