import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type Mailbox, startMailbox } from '../../scripts/mailbox.mjs';
import { createTestApp, DEMO_PASSWORD, signIn, type TestApp, until } from './test-app.js';

describe('password reset by e-mailed link', () => {
  let t: TestApp;
  let mailbox: Mailbox;
  let admin: Awaited<ReturnType<typeof signIn>>;

  beforeAll(async () => {
    mailbox = await startMailbox();
    t = await createTestApp({ SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mailbox.port), PUBLIC_URL: 'https://larkfield.wiretrail.example' });
    admin = await signIn(t, 'admin@larkfield.example');
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  const tokenFrom = (text: string) => decodeURIComponent(/reset-password\?token=([^\s]+)/.exec(text)![1]!);

  it('sends a link; the link sets a new password once and ends the old sessions', async () => {
    const tech = await signIn(t, 'tech2@larkfield.example');
    const sent = await t.http.post(`/api/users/${tech.user.id}/password-reset`).set('authorization', `Bearer ${admin.accessToken}`).expect(202);
    expect(sent.body.sentTo).toBe('tech2@larkfield.example');
    await until(() => mailbox.messages.length === 1);
    const mail = mailbox.messages[0]!;
    expect(mail.to).toEqual(['tech2@larkfield.example']);
    expect(mail.subject).toBe('Set a new Wiretrail password');
    expect(mail.text).toContain('https://larkfield.wiretrail.example/reset-password?token=');
    const token = tokenFrom(mail.text);
    // The HTML part comes from the same template: the same link, as a link.
    // Handlebars escapes "=" as &#x3D;, which a mail reader reads back as "=".
    expect(mail.html).toContain(`<a href="https://larkfield.wiretrail.example/reset-password?token&#x3D;${encodeURIComponent(token)}">`);
    expect(mail.html).toContain('asked Wiretrail to let you set a new password. Open this link within an hour:');

    const short = await t.http.post('/api/auth/password-reset').send({ token, password: 'short' }).expect(400);
    expect(short.body.message).toContain('password must be at least 10 characters');
    await t.http.post('/api/auth/password-reset').send({ token, password: 'a-brand-new-password' }).expect(204);
    await t.http.post('/api/auth/sign-in').send({ email: 'tech2@larkfield.example', password: DEMO_PASSWORD }).expect(401);
    await signIn(t, 'tech2@larkfield.example', 'a-brand-new-password');
    await t.http.post('/api/auth/refresh').send({ refreshToken: tech.refreshToken }).expect(401);
    const again = await t.http.post('/api/auth/password-reset').send({ token, password: 'another-new-password' }).expect(400);
    expect(again.body.message).toMatch(/not valid any more/);
  });

  it('keeps only the newest link working, and refuses forged ones', async () => {
    const office = await signIn(t, 'office@larkfield.example');
    const auth = { authorization: `Bearer ${admin.accessToken}` };
    const before = mailbox.messages.length;
    await t.http.post(`/api/users/${office.user.id}/password-reset`).set(auth).expect(202);
    await t.http.post(`/api/users/${office.user.id}/password-reset`).set(auth).expect(202);
    await until(() => mailbox.messages.length === before + 2);
    const [first, second] = mailbox.messages.slice(before).map((m) => tokenFrom(m.text));
    await t.http.post('/api/auth/password-reset').send({ token: first, password: 'office-new-password' }).expect(400);
    const [id] = second!.split('.');
    await t.http.post('/api/auth/password-reset').send({ token: `${id}.AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA`, password: 'office-new-password' }).expect(400);
    await t.http.post('/api/auth/password-reset').send({ token: 'nonsense', password: 'office-new-password' }).expect(400);
    await t.http.post('/api/auth/password-reset').send({ token: second, password: 'office-new-password' }).expect(204);
  });

  it('lets only an admin send links, and only within the organisation', async () => {
    const office = await signIn(t, 'office@larkfield.example', 'office-new-password');
    await t.http.post(`/api/users/${admin.user.id}/password-reset`).set('authorization', `Bearer ${office.accessToken}`).expect(403);
    const oakmere = await signIn(t, 'admin@oakmere.example');
    await t.http.post(`/api/users/${admin.user.id}/password-reset`).set('authorization', `Bearer ${oakmere.accessToken}`).expect(404);
  });
});
