import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type PaymentsFake, startPaymentsFake } from '../../scripts/payments-fake.mjs';
import { bearer, jobByReference } from './document-helpers.js';
import { fixedLine, issuedInvoice } from './invoice-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

const PAYMENTS_ENV = { PAYMENTS_API_KEY: 'sk_test_wiretrail_return', PAYMENTS_WEBHOOK_SECRET: 'whsec_wiretrail_return' };

/**
 * Without PUBLIC_URL, a customer leaving for the card checkout comes back to the address they came from, never to
 * localhost; with no TRUST_PROXY, a forwarded host is not believed.
 */
describe('the card checkout’s way back without PUBLIC_URL', () => {
  let t: TestApp;
  let fake: PaymentsFake;

  beforeAll(async () => {
    delete process.env.PUBLIC_URL;
    delete process.env.TRUST_PROXY;
    fake = await startPaymentsFake({ webhookSecret: PAYMENTS_ENV.PAYMENTS_WEBHOOK_SECRET });
    t = await createTestApp({ ...PAYMENTS_ENV, PAYMENTS_API_URL: fake.url });
  });
  afterAll(async () => {
    await t.close();
    await fake.close();
    for (const key of [...Object.keys(PAYMENTS_ENV), 'PAYMENTS_API_URL']) delete process.env[key];
  });

  it('returns the customer to the host their request came to', async () => {
    const office = await signIn(t, 'office@larkfield.example');
    const job = await jobByReference(t, office, 'LED-0033');
    const link = (await t.http.post(`/api/jobs/${job.id}/share-links`).set(bearer(office)).send({ days: 7 }).expect(201)).body;
    const token = new URL(link.url).pathname.split('/').pop()!;
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Outside socket', 9_000)]);
    const started = await t.http
      .post(`/api/shared/${token}/invoices/${inv.id}/checkout`)
      .set('host', 'jobs.larkfield-electrical.example')
      .set('x-forwarded-host', 'elsewhere.example')
      .set('x-forwarded-proto', 'https')
      .expect(201);
    const session = fake.sessions.get(started.body.url.split('/checkout/')[1])!;
    expect(session.success_url).toBe(`http://jobs.larkfield-electrical.example/shared/${token}?paid=${inv.id}`);
    expect(session.cancel_url).toBe(`http://jobs.larkfield-electrical.example/shared/${token}`);
    expect(session.success_url).not.toContain('localhost');
  });
});
