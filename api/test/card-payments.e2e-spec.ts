import { afterAll, beforeAll, describe, expect, it, jest } from '@jest/globals';
import { Logger } from '@nestjs/common';
import type { AddressInfo } from 'node:net';
import { DECLINED_CARD, type PaymentsFake, signPayload, startPaymentsFake } from '../../scripts/payments-fake.mjs';
import { CardCheckout } from '../src/card-payments/entities/card-checkout.entity.js';
import { PaymentEvent } from '../src/card-payments/entities/payment-event.entity.js';
import { Payment } from '../src/invoices/entities/payment.entity.js';
import { bearer, jobByReference } from './document-helpers.js';
import { fixedLine, invoice, issuedInvoice } from './invoice-helpers.js';
import type { Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp, until } from './test-app.js';

const SECRET = 'whsec_wiretrail_test_endpoint';
const PUBLIC_URL = 'https://larkfield.wiretrail.example';
const PAYMENTS_ENV = { PAYMENTS_API_KEY: 'sk_test_wiretrail_local', PAYMENTS_WEBHOOK_SECRET: SECRET };

/**
 * Card payments end to end: the API drives the provider's official Node SDK against the local fake (scripts/
 * payments-fake.mjs), the customer pays on the fake's checkout page, and the fake posts its signed webhook to the
 * API listening on a real port. Amounts are pence: 20 % VAT on £100.00 is £20.00 (VAT Notice 700 §17.5 rounding).
 */
describe('paying an invoice by card', () => {
  let t: TestApp;
  let fake: PaymentsFake;
  let office: Session;
  let job: { id: string };
  let token: string;

  const shared = async () => (await t.http.get(`/api/shared/${token}/invoices`).expect(200)).body;
  const checkout = (invoiceId: string) => t.http.post(`/api/shared/${token}/invoices/${invoiceId}/checkout`);
  const sessionOf = (url: string) => url.split('/checkout/')[1]!;
  const count = (entity: typeof Payment | typeof PaymentEvent) => t.dataSource.getRepository(entity).count();
  const webhook = (payload: string, signature: string) => t.http.post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', signature).send(payload);

  beforeAll(async () => {
    fake = await startPaymentsFake({ webhookSecret: SECRET });
    t = await createTestApp({ ...PAYMENTS_ENV, PAYMENTS_API_URL: fake.url, PUBLIC_URL });
    await t.app.listen(0, '127.0.0.1');
    fake.setWebhookUrl(`http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}/api/payments/webhook`);
    office = await signIn(t, 'office@larkfield.example');
    job = await jobByReference(t, office, 'LED-0033');
    const link = (await t.http.post(`/api/jobs/${job.id}/share-links`).set(bearer(office)).send({ days: 7 }).expect(201)).body;
    token = new URL(link.url).pathname.split('/').pop()!;
  });
  afterAll(async () => {
    await t.close();
    await fake.close();
    // Later test files in this worker must not find card payments set up.
    for (const key of [...Object.keys(PAYMENTS_ENV), 'PAYMENTS_API_URL', 'PUBLIC_URL']) delete process.env[key];
  });

  describe('a card payment of the whole invoice', () => {
    let inv: Awaited<ReturnType<typeof invoice>>;
    let sessionId: string;

    beforeAll(async () => {
      inv = await issuedInvoice(t, office, job.id, [fixedLine('Labour', 18_000)]);
    });

    it('offers to pay what is owed on the customer’s page, and sends them to a checkout for exactly that', async () => {
      const before = await shared();
      expect(before.cardPayments).toBe(true);
      expect(before.items.find((i: { id: string }) => i.id === inv.id)).toMatchObject({ number: inv.number, kind: 'invoice', owedMinor: 21_600, state: 'awaiting', payByCard: true });
      // The job's invoice from the demo data is there too.
      expect(before.items.map((i: { number: string }) => i.number)).toContain('INV-0002');

      const started = (await checkout(inv.id).expect(201)).body;
      expect(started).toEqual({ url: expect.stringMatching(new RegExp(`^${fake.url}/checkout/cs_test_[0-9a-f]+$`)), amountMinor: 21_600 });
      sessionId = sessionOf(started.url);
      // What the SDK sent, as the provider keeps it.
      expect(fake.sessions.get(sessionId)).toMatchObject({
        mode: 'payment',
        status: 'open',
        amount_total: 21_600,
        currency: 'gbp',
        client_reference_id: inv.id,
        customer_email: 'hannah.greaves@example.com',
        metadata: { invoiceId: inv.id, organisationId: office.user.organisationId, invoiceNumber: inv.number },
        success_url: `${PUBLIC_URL}/shared/${token}?paid=${inv.id}`,
        cancel_url: `${PUBLIC_URL}/shared/${token}`,
      });
    });

    it('is marked paid when the provider’s signed event arrives', async () => {
      const paid = await fake.pay(sessionId);
      expect(paid.status).toBe(303);
      expect(paid.headers.get('location')).toBe(`${PUBLIC_URL}/shared/${token}?paid=${inv.id}`);
      expect(fake.events.at(-1)!.deliveries).toEqual([expect.objectContaining({ status: 200 })]);

      const after = await invoice(t, office, inv.id);
      expect(after.account).toEqual({ paidMinor: 21_600, creditedMinor: 0, refundedMinor: 0, owedMinor: 0, state: 'paid', overdueDays: 0 });
      expect(after.payments).toEqual([expect.objectContaining({ amountMinor: 21_600, method: 'card', receivedOn: after.issueDate, reference: expect.stringMatching(/^pi_/) })]);
      expect(await t.dataSource.getRepository(CardCheckout).findOneByOrFail({ sessionId })).toMatchObject({ state: 'complete', amountMinor: 21_600 });
      expect((await shared()).items.find((i: { id: string }) => i.id === inv.id)).toMatchObject({ owedMinor: 0, state: 'paid', payByCard: false });
      expect((await checkout(inv.id).expect(409)).body.message).toBe(`Nothing is owed on invoice ${inv.number}.`);
    });

    it('changes nothing when the same event comes again', async () => {
      const payments = await count(Payment);
      const events = await count(PaymentEvent);
      const event = fake.events.at(-1)!;
      const resent = await fetch(`${fake.url}/_fake/events/${event.id}/resend`, { method: 'POST' });
      expect(resent.status).toBe(200);
      expect(event.deliveries.at(-1)).toMatchObject({ status: 200 });
      // The same event, signed afresh and posted by hand, is acknowledged as one already taken in.
      const payload = JSON.stringify(event);
      expect((await webhook(payload, signPayload(payload, SECRET)).expect(200)).body).toEqual({ received: true, duplicate: true });
      expect([await count(Payment), await count(PaymentEvent)]).toEqual([payments, events]);
      expect((await invoice(t, office, inv.id)).account).toMatchObject({ paidMinor: 21_600, owedMinor: 0 });
    });
  });

  it('refuses an event whose signature does not verify, logs why, and changes nothing', async () => {
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Call-out', 6_000)]);
    const url = (await checkout(inv.id).expect(201)).body.url as string;
    const session = { ...fake.sessions.get(sessionOf(url))!, status: 'complete', payment_status: 'paid', payment_intent: 'pi_forged' };
    const forged = JSON.stringify({ id: 'evt_forged_1', object: 'event', type: 'checkout.session.completed', created: Math.floor(Date.now() / 1000), data: { object: session } });
    const payments = await count(Payment);
    const events = await count(PaymentEvent);
    const warn = jest.spyOn(Logger.prototype, 'warn');
    try {
      // Signed with another secret; a genuine signature over another body; no signature at all.
      const other = JSON.stringify({ id: 'evt_other', object: 'event', type: 'ping', data: { object: {} } });
      for (const [body, signature] of [
        [forged, signPayload(forged, 'whsec_not_ours')],
        [forged, signPayload(other, SECRET)],
        [forged, 't=1700000000,v1=' + '0'.repeat(64)],
      ] as const) {
        const res = await webhook(body, signature).expect(400);
        expect(res.body).toMatchObject({ statusCode: 400, message: 'The payment event’s signature does not verify.' });
      }
      await t.http.post('/api/payments/webhook').set('content-type', 'application/json').send(forged).expect(400);
      expect(warn.mock.calls.filter(([m]) => String(m).startsWith('Refused a payment event whose signature does not verify'))).toHaveLength(3);
      expect(warn.mock.calls.some(([m]) => String(m).startsWith('Refused a payment event without a body or a stripe-signature header'))).toBe(true);
    } finally {
      warn.mockRestore();
    }
    expect([await count(Payment), await count(PaymentEvent)]).toEqual([payments, events]);
    expect((await invoice(t, office, inv.id)).account).toMatchObject({ paidMinor: 0, owedMinor: 7_200, state: 'awaiting' });
  });

  it('takes a part payment on site, then the rest by card', async () => {
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Two sockets moved', 10_000)]);
    const day = inv.issueDate!;
    await t.http.post(`/api/invoices/${inv.id}/payments`).set(bearer(office)).send({ amountMinor: 5_000, method: 'cash', receivedOn: day }).expect(201);
    expect((await shared()).items.find((i: { id: string }) => i.id === inv.id)).toMatchObject({ owedMinor: 7_000, state: 'part-paid', payByCard: true });
    const started = (await checkout(inv.id).expect(201)).body;
    expect(started.amountMinor).toBe(7_000);
    expect(fake.sessions.get(sessionOf(started.url))!.amount_total).toBe(7_000);
    expect((await fake.pay(sessionOf(started.url))).status).toBe(303);
    const after = await invoice(t, office, inv.id);
    expect(after.account).toMatchObject({ paidMinor: 12_000, owedMinor: 0, state: 'paid' });
    expect(after.payments.map((p) => [p.method, p.amountMinor])).toEqual([['cash', 5_000], ['card', 7_000]]);
  });

  it('pays nothing on a declined card, and closes an older checkout before opening a new one, so a debt is paid once', async () => {
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Fused spur', 4_000)]);
    const first = sessionOf((await checkout(inv.id).expect(201)).body.url);
    const events = fake.events.length;
    expect((await fake.pay(first, DECLINED_CARD)).status).toBe(402);
    expect(fake.events.length).toBe(events);
    expect((await invoice(t, office, inv.id)).account).toMatchObject({ paidMinor: 0, owedMinor: 4_800 });

    const second = sessionOf((await checkout(inv.id).expect(201)).body.url);
    expect(second).not.toBe(first);
    expect(fake.sessions.get(first)!.status).toBe('expired');
    expect(await t.dataSource.getRepository(CardCheckout).findOneByOrFail({ sessionId: first })).toMatchObject({ state: 'expired' });
    // The old page no longer takes a payment.
    expect(await (await fetch(`${fake.url}/checkout/${first}`)).text()).toContain('no longer open');
    expect((await fake.pay(second)).status).toBe(303);
    await until(async () => (await invoice(t, office, inv.id)).account!.state === 'paid');
  });

  describe('when what is owed changes while a checkout is open', () => {
    const webhookUrl = () => `http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}/api/payments/webhook`;
    const cash = (id: string, amountMinor: number, receivedOn: string) =>
      t.http.post(`/api/invoices/${id}/payments`).set(bearer(office)).send({ amountMinor, method: 'cash', receivedOn }).expect(201);
    const creditInFull = async (id: string) => {
      const credit = (await t.http.post(`/api/invoices/${id}/credit-note`).set(bearer(office)).expect(201)).body;
      return (await t.http.post(`/api/invoices/${credit.id}/issue`).set(bearer(office)).expect(200)).body;
    };
    const paymentOf = (sessionId: string) => t.dataSource.getRepository(Payment).findOneByOrFail({ checkoutSessionId: sessionId });
    /** The customer pays at the provider, but its event is held back, as when its delivery is slow. */
    const payWithNewsHeldBack = async (sessionId: string) => {
      fake.setWebhookUrl(undefined);
      try {
        expect((await fake.pay(sessionId)).status).toBe(303);
      } finally {
        fake.setWebhookUrl(webhookUrl());
      }
      return fake.events.at(-1)!;
    };
    const resend = async (eventId: string) => (await fetch(`${fake.url}/_fake/events/${eventId}/resend`, { method: 'POST' })).json() as Promise<{ deliveries: Array<{ status?: number }> }>;

    it('expires the open checkout at the provider when the office records a payment, so the old figure cannot be paid', async () => {
      // £216.67 + 20 % VAT = £260.00 (VAT Notice 700 §17.5: rounded to the nearest penny).
      const inv = await issuedInvoice(t, office, job.id, [fixedLine('Kitchen circuit', 21_667)]);
      const opened = (await checkout(inv.id).expect(201)).body;
      expect(opened.amountMinor).toBe(26_000);
      const session = sessionOf(opened.url);
      await cash(inv.id, 10_000, inv.issueDate!);
      expect(fake.sessions.get(session)!.status).toBe('expired');
      expect(await t.dataSource.getRepository(CardCheckout).findOneByOrFail({ sessionId: session })).toMatchObject({ state: 'expired' });
      const events = fake.events.length;
      expect(await (await fake.pay(session)).text()).toContain('no longer open');
      expect(fake.events.length).toBe(events);
      // A new checkout asks for what is owed now.
      expect((await checkout(inv.id).expect(201)).body.amountMinor).toBe(16_000);
    });

    it('expires the open checkout when a credit note is issued against the invoice', async () => {
      const inv = await issuedInvoice(t, office, job.id, [fixedLine('Smoke alarms', 17_388)]);
      const session = sessionOf((await checkout(inv.id).expect(201)).body.url);
      expect(fake.sessions.get(session)!.amount_total).toBe(20_866);
      await creditInFull(inv.id);
      expect(fake.sessions.get(session)!.status).toBe('expired');
      expect(await t.dataSource.getRepository(CardCheckout).findOneByOrFail({ sessionId: session })).toMatchObject({ state: 'expired' });
      expect((await checkout(inv.id).expect(409)).body.message).toBe(`Nothing is owed on invoice ${inv.number}.`);
    });

    it('records a card payment whose news arrives after cash was recorded, and refunds what is above what was owed', async () => {
      const inv = await issuedInvoice(t, office, job.id, [fixedLine('Kitchen circuit', 21_667)]);
      const session = sessionOf((await checkout(inv.id).expect(201)).body.url);
      const event = await payWithNewsHeldBack(session);
      await cash(inv.id, 10_000, inv.issueDate!);
      // Paid at the provider: nothing to expire; its news is on the way.
      expect(fake.sessions.get(session)!.status).toBe('complete');
      expect((await resend(event.id)).deliveries.at(-1)).toMatchObject({ status: 200 });

      const intent = fake.sessions.get(session)!.payment_intent;
      expect(fake.refunds.filter((r) => r.payment_intent === intent)).toEqual([expect.objectContaining({ amount: 10_000, status: 'succeeded' })]);
      const after = await invoice(t, office, inv.id);
      expect(after.account).toMatchObject({ paidMinor: 26_000, owedMinor: 0, state: 'paid' });
      expect(after.payments.map((p) => [p.method, p.amountMinor, p.refundMinor])).toEqual([['cash', 10_000, 0], ['card', 26_000, 10_000]]);
      expect(await paymentOf(session)).toMatchObject({ refundMinor: 10_000, refundedAt: expect.any(Date), refundReference: expect.stringMatching(/^re_/) });
      expect((await t.dataSource.getRepository(PaymentEvent).findOneByOrFail({ eventId: event.id })).outcome).toBe(
        `recorded £260.00 by card against ${inv.number}; £100.00 above the £160.00 owed goes back to the card`,
      );
      // The same news again refunds nothing more.
      await resend(event.id);
      expect(fake.refunds.filter((r) => r.payment_intent === intent)).toHaveLength(1);
    });

    it('refunds the whole of a payment whose news arrives after the invoice was credited in full, and tries again until the provider refunds it', async () => {
      const inv = await issuedInvoice(t, office, job.id, [fixedLine('Smoke alarms', 17_388)]);
      const session = sessionOf((await checkout(inv.id).expect(201)).body.url);
      const event = await payWithNewsHeldBack(session);
      await creditInFull(inv.id);
      fake.refuseRefunds();
      try {
        // The provider cannot refund just now: the payment is recorded, and the event is answered 502 so it comes again.
        expect((await resend(event.id)).deliveries.at(-1)).toMatchObject({ status: 502 });
        expect(await paymentOf(session)).toMatchObject({ amountMinor: 20_866, refundMinor: 20_866, refundedAt: null });
      } finally {
        fake.refuseRefunds(false);
      }
      expect((await resend(event.id)).deliveries.at(-1)).toMatchObject({ status: 200 });
      const intent = fake.sessions.get(session)!.payment_intent;
      expect(fake.refunds.filter((r) => r.payment_intent === intent)).toEqual([expect.objectContaining({ amount: 20_866 })]);
      expect(await paymentOf(session)).toMatchObject({ refundedAt: expect.any(Date) });
      const after = await invoice(t, office, inv.id);
      // Never an unexplained overpayment: nothing owed, nothing kept.
      expect(after.account).toMatchObject({ paidMinor: 0, creditedMinor: 20_866, owedMinor: 0 });
    });

    it('takes no payment on a checkout whose time at the provider is up, and marks it expired on the provider’s news', async () => {
      const inv = await issuedInvoice(t, office, job.id, [fixedLine('Outdoor socket', 9_500)]);
      const session = sessionOf((await checkout(inv.id).expect(201)).body.url);
      fake.sessions.get(session)!.expires_at = Math.floor(Date.now() / 1000) - 1;
      expect(await (await fake.pay(session)).text()).toContain('no longer open');
      expect(fake.events.at(-1)).toMatchObject({ type: 'checkout.session.expired' });
      await until(async () => (await t.dataSource.getRepository(CardCheckout).findOneByOrFail({ sessionId: session })).state === 'expired');
      expect((await invoice(t, office, inv.id)).account).toMatchObject({ paidMinor: 0, owedMinor: 11_400 });
    });
  });

  it('opens checkouts only for issued invoices of the link’s own job', async () => {
    const other = await jobByReference(t, office, 'LED-0042');
    const elsewhere = await issuedInvoice(t, office, other.id, [fixedLine('Patch panel', 9_000)]);
    expect((await checkout(elsewhere.id).expect(404)).body.message).toBe('No such invoice on this job.');
    const quote = await issuedInvoice(t, office, job.id, [fixedLine('Outside light', 9_000)], 'quote');
    await checkout(quote.id).expect(404);
    await t.http.post(`/api/shared/${'B'.repeat(43)}/invoices/${quote.id}/checkout`).expect(404);
    await t.http.get(`/api/shared/${token}/invoices/${elsewhere.id}/pdf`).expect(404);
    const own = (await shared()).items[0];
    const pdf = await t.http.get(own.pdfUrl).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
  });
});
