import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, DEMO_PASSWORD, type TestApp } from './test-app.js';

// Its own file: the environment is read once per module graph, and this app needs low limits.
describe('rate limits', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ SIGN_IN_RATE_LIMIT: '3', SHARE_RATE_LIMIT: '5' });
  });
  afterAll(() => t.close());

  it('answers 429 after too many attempts in the window', async () => {
    // No TRUST_PROXY: a forwarded address is the client's own word, and ignored; every failure counts against the peer.
    for (let i = 0; i < 3; i++) {
      await t.http.post('/api/auth/sign-in').set('x-forwarded-for', `203.0.113.${i}`).send({ email: `guess${i}@larkfield.example`, password: 'wrong-password' }).expect(401);
    }
    const res = await t.http.post('/api/auth/sign-in').set('x-forwarded-for', '203.0.113.9').send({ email: 'office@larkfield.example', password: DEMO_PASSWORD }).expect(429);
    expect(res.body.message).toMatch(/Too many sign-in attempts/);
    // Other routes are not limited by it.
    await t.http.get('/api/health').expect(200);
  });

  it("answers 429 to a client that asks for customers' share pages too often", async () => {
    for (let i = 0; i < 5; i++) await t.http.get(`/api/shared/${'x'.repeat(43)}`).expect(404);
    const res = await t.http.get(`/api/shared/${'y'.repeat(43)}`).expect(429);
    expect(res.body.message).toMatch(/Too many requests for this page/);
    await t.http.get('/api/health').expect(200);
  });
});
