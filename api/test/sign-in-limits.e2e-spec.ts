import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { AttemptCount } from '../src/auth/entities/attempt-count.entity.js';
import { RefreshToken } from '../src/auth/entities/refresh-token.entity.js';
import { addPerson, createTestApp, DEMO_PASSWORD, signIn, type TestApp } from './test-app.js';

/**
 * Sign-in limits as shipped (10 failures a minute per address, 5 per quarter hour per account, 30 failed refreshes
 * or refreshes of one session a minute), behind a trusted proxy that names each client in X-Forwarded-For, as
 * behind the README's load balancer. Addresses are from the documentation ranges (RFC 5737).
 */
describe('sign-in limits', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ TRUST_PROXY: 'loopback', SIGN_IN_RATE_LIMIT: '10', SIGN_IN_ACCOUNT_LIMIT: '5', REFRESH_RATE_LIMIT: '30' });
  });
  afterAll(() => t.close());

  const signInFrom = (address: string, email: string, password: string) =>
    t.http.post('/api/auth/sign-in').set('x-forwarded-for', address).send({ email, password });
  const counted = async (key: string) => (await t.dataSource.getRepository(AttemptCount).findOneBy({ key }))?.attempts ?? 0;

  it('signs 30 people in from one office address within a minute, all at once, with a few typing mistakes among them', async () => {
    const admin = await signIn(t, 'admin@larkfield.example');
    const team = Array.from({ length: 30 }, (_, i) => `electrician${i + 1}@larkfield.example`);
    for (const [i, email] of team.entries()) {
      expect((await addPerson(t, admin, { email, name: `Electrician ${i + 1}`, role: 'technician' }, 'office-morning-1')).status).toBe(201);
    }
    const office = '198.51.100.20';
    const started = Date.now();
    // Three mistyped passwords first: failures count, but nowhere near the address's limit.
    for (const email of team.slice(0, 3)) await signInFrom(office, email, 'office-mornin').expect(401);
    const answers = await Promise.all(team.map((email) => signInFrom(office, email, 'office-morning-1')));
    expect(answers.map((r) => r.status)).toEqual(team.map(() => 200));
    expect(Date.now() - started).toBeLessThan(60_000);
    // Successes are never counted: only the three mistakes are.
    expect(await counted(`address:${office}`)).toBe(3);
    // The mistyped accounts were forgotten when their password came right.
    expect(await counted(`account:${team[0]}`)).toBe(0);
  }, 120_000);

  it('holds the account limit against guesses from many addresses, and leaves other accounts alone', async () => {
    const victim = 'office@larkfield.example';
    for (let i = 1; i <= 5; i++) {
      await signInFrom(`203.0.113.${i}`, victim, `guess-number-${i}`).expect(401);
    }
    // The sixth address, even with the right password, is refused until the window has passed.
    const refused = await signInFrom('203.0.113.6', victim, DEMO_PASSWORD).expect(429);
    expect(refused.body).toEqual({ statusCode: 429, message: expect.stringMatching(/^Too many failed sign-ins for this e-mail address\. Wait 15 minutes/), error: 'Too Many Requests' });
    // The same account however its address is written.
    await signInFrom('203.0.113.7', ' Office@Larkfield.EXAMPLE ', DEMO_PASSWORD).expect(429);
    expect(await counted(`account:${victim}`)).toBe(5);
    // Guessing an e-mail that has no account is limited the same way, so the answer tells nothing.
    for (let i = 1; i <= 5; i++) await signInFrom(`203.0.113.${10 + i}`, 'nobody@larkfield.example', `guess-${i}`).expect(401);
    await signInFrom('203.0.113.16', 'nobody@larkfield.example', 'guess-6').expect(429);
    // Each address made one failed attempt: far from its own limit, so its other people still sign in.
    await signInFrom('203.0.113.1', 'admin@larkfield.example', DEMO_PASSWORD).expect(200);
  });

  it('limits failures from one address across accounts, and counts them in the database every instance shares', async () => {
    const address = '192.0.2.50';
    for (let i = 0; i < 10; i++) await signInFrom(address, `spray${i}@larkfield.example`, 'Summer2026!').expect(401);
    const refused = await signInFrom(address, 'tech1@larkfield.example', DEMO_PASSWORD).expect(429);
    expect(refused.body.message).toBe('Too many sign-in attempts. Wait a minute and try again.');
    await signInFrom('192.0.2.51', 'tech1@larkfield.example', DEMO_PASSWORD).expect(200);
    // Another instance's count, written behind this one's back, is honoured too.
    await t.dataSource.getRepository(AttemptCount).insert({ key: 'address:192.0.2.52', attempts: 10, windowStartedAt: new Date() });
    await signInFrom('192.0.2.52', 'tech1@larkfield.example', DEMO_PASSWORD).expect(429);
    // A window that has run out starts again.
    await t.dataSource.getRepository(AttemptCount).update({ key: `address:${address}` }, { windowStartedAt: new Date(Date.now() - 61_000) });
    await signInFrom(address, 'tech1@larkfield.example', DEMO_PASSWORD).expect(200);
  });

  it('counts password links that do not work against the address', async () => {
    const address = '192.0.2.60';
    for (let i = 0; i < 10; i++) {
      await t.http.post('/api/auth/password-reset').set('x-forwarded-for', address).send({ token: `0190a0b0-0000-7000-8000-00000000000${i}.${'A'.repeat(43)}`, password: 'a-new-password' }).expect(400);
    }
    await t.http.post('/api/auth/password-reset').set('x-forwarded-for', address).send({ token: `0190a0b0-0000-7000-8000-000000000010.${'A'.repeat(43)}`, password: 'a-new-password' }).expect(429);
  });

  it('limits failed refreshes per address, and refreshes of one session', async () => {
    const address = '192.0.2.70';
    for (let i = 0; i < 30; i++) {
      await t.http.post('/api/auth/refresh').set('x-forwarded-for', address).send({ refreshToken: `0190a0b0-0000-7000-8000-0000000000${String(i).padStart(2, '0')}.${'B'.repeat(43)}` }).expect(401);
    }
    const s = await signIn(t, 'tech2@larkfield.example');
    const refused = await t.http.post('/api/auth/refresh').set('x-forwarded-for', address).send({ refreshToken: s.refreshToken }).expect(429);
    expect(refused.body.message).toBe('Too many attempts to renew a session. Wait a minute and try again.');

    // One session renewed 30 times in a minute is a script: the 31st is refused, and the session still stands.
    let token = s.refreshToken;
    for (let i = 0; i < 30; i++) token = (await t.http.post('/api/auth/refresh').set('x-forwarded-for', '192.0.2.71').send({ refreshToken: token }).expect(200)).body.refreshToken;
    const tooOften = await t.http.post('/api/auth/refresh').set('x-forwarded-for', '192.0.2.71').send({ refreshToken: token }).expect(429);
    expect(tooOften.body.message).toBe('This session is being renewed too often. Wait a minute and try again.');
    const { familyId } = await t.dataSource.getRepository(RefreshToken).findOneByOrFail({ id: s.refreshToken.split('.')[0] });
    await t.dataSource.getRepository(AttemptCount).update({ key: `session:${familyId}` }, { windowStartedAt: new Date(Date.now() - 61_000) });
    await t.http.post('/api/auth/refresh').set('x-forwarded-for', '192.0.2.71').send({ refreshToken: token }).expect(200);
  });
});
