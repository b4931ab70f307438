import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, DEMO_PASSWORD, type TestApp } from './test-app.js';

// Its own file: the environment is read once per module graph, and this app needs a low limit.
describe('sign-in rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ SIGN_IN_RATE_LIMIT: '3' });
  });
  afterAll(() => t.close());

  it('answers 429 after too many attempts in the window', async () => {
    for (let i = 0; i < 3; i++) {
      await t.http.post('/api/auth/sign-in').send({ email: 'office@larkfield.example', password: 'wrong-password' }).expect(401);
    }
    const res = await t.http.post('/api/auth/sign-in').send({ email: 'office@larkfield.example', password: DEMO_PASSWORD }).expect(429);
    expect(res.body.message).toMatch(/Too many sign-in attempts/);
    // Other routes are not limited by it.
    await t.http.get('/api/health').expect(200);
  });
});
