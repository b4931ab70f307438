import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { AddressInfo } from 'node:net';
import { randomUUID } from 'node:crypto';
import { type PaymentsFake, startPaymentsFake } from '../../scripts/payments-fake.mjs';
import { Refund } from '../src/invoices/entities/refund.entity.js';
import { bearer, jobByReference } from './document-helpers.js';
import { fixedLine, invoice, type InvoiceBody, issuedInvoice } from './invoice-helpers.js';
import type { Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

const SECRET = 'whsec_wiretrail_refunds';
const PAYMENTS_ENV = { PAYMENTS_API_KEY: 'sk_test_wiretrail_refunds', PAYMENTS_WEBHOOK_SECRET: SECRET };

/**
 * Money going back to customers: never more than they are owed on the invoice, by hand or to a card through the
 * provider's SDK against the local fake (scripts/payments-fake.mjs), which then really refunds the charge. Amounts
 * are pence; 20 % VAT on £100.00 is £20.00 (VAT Notice 700 §17.5 rounding, plain arithmetic here).
 */
describe('refunds', () => {
  let t: TestApp;
  let fake: PaymentsFake;
  let office: Session;
  let job: { id: string };
  let token: string;
  let day: string;

  const refund = (id: string, body: object) => t.http.post(`/api/invoices/${id}/refunds`).set(bearer(office)).send(body);
  const pay = (id: string, body: object) => t.http.post(`/api/invoices/${id}/payments`).set(bearer(office)).send(body).expect(201);
  const agedDebt = async () => (await t.http.get('/api/invoices/aged-debt').set(bearer(office)).expect(200)).body;
  /** Raises a credit note taking back the whole invoice and issues it. */
  const creditInFull = async (id: string) => {
    const credit = (await t.http.post(`/api/invoices/${id}/credit-note`).set(bearer(office)).expect(201)).body;
    await t.http.post(`/api/invoices/${credit.id}/issue`).set(bearer(office)).expect(200);
  };
  /** Pays the invoice's whole debt by card, as the customer would on their link. */
  const payByCard = async (id: string) => {
    const url = (await t.http.post(`/api/shared/${token}/invoices/${id}/checkout`).expect(201)).body.url as string;
    expect((await fake.pay(url.split('/checkout/')[1]!)).status).toBe(303);
  };

  beforeAll(async () => {
    fake = await startPaymentsFake({ webhookSecret: SECRET });
    t = await createTestApp({ ...PAYMENTS_ENV, PAYMENTS_API_URL: fake.url });
    await t.app.listen(0, '127.0.0.1');
    fake.setWebhookUrl(`http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}/api/payments/webhook`);
    office = await signIn(t, 'office@larkfield.example');
    job = await jobByReference(t, office, 'LED-0033');
    const link = (await t.http.post(`/api/jobs/${job.id}/share-links`).set(bearer(office)).send({ days: 7 }).expect(201)).body;
    token = new URL(link.url).pathname.split('/').pop()!;
    day = (await agedDebt()).asOf;
  });
  afterAll(async () => {
    await t.close();
    await fake.close();
    for (const key of [...Object.keys(PAYMENTS_ENV), 'PAYMENTS_API_URL']) delete process.env[key];
  });

  describe('after a part payment and a credit note for the whole invoice', () => {
    let inv: InvoiceBody;

    beforeAll(async () => {
      // £100.00 + 20 % VAT = £120.00; £50.00 paid in cash; then all £120.00 credited: £50.00 is the customer's.
      inv = await issuedInvoice(t, office, job.id, [fixedLine('Sockets not fitted after all', 10_000)]);
      await pay(inv.id, { amountMinor: 5_000, method: 'cash', receivedOn: day });
      await creditInFull(inv.id);
    });

    it('shows £50.00 to refund on the invoice and as money owed to the customer in the aged view', async () => {
      expect((await invoice(t, office, inv.id)).account).toEqual({ paidMinor: 5_000, creditedMinor: 12_000, refundedMinor: 0, owedMinor: -5_000, state: 'overpaid', overdueDays: 0 });
      const report = await agedDebt();
      const owedBack = report.owedToCustomers.customers.find((c: { name: string }) => c.name === 'Hannah Greaves');
      expect(owedBack).toMatchObject({ totalMinor: 5_000, invoices: [expect.objectContaining({ id: inv.id, number: inv.number, paidMinor: 5_000, creditedMinor: 12_000, toRefundMinor: 5_000 })] });
      expect(report.owedToCustomers.totalMinor).toBeGreaterThanOrEqual(5_000);
      // Money owed back is not debt: the invoice is not among what customers owe.
      expect(report.customers.flatMap((c: { invoices: Array<{ id: string }> }) => c.invoices.map((i) => i.id))).not.toContain(inv.id);
    });

    it('refuses a refund above what the customer is owed there, naming the field, and one on a day still to come', async () => {
      const over = await refund(inv.id, { amountMinor: 5_001, method: 'bank-transfer' }).expect(409);
      expectErrorBody(over.body, 409);
      expect(over.body.message).toEqual([`amountMinor: £50.01 is more than the £50.00 owed back to the customer on ${inv.number}.`]);
      const later = await refund(inv.id, { amountMinor: 100, method: 'cash', refundedOn: '2999-01-01' }).expect(400);
      expect(later.body.message).toEqual([`refundedOn must not be later than today (${day}).`]);
      const shape = await refund(inv.id, { amountMinor: 0, method: 'voucher' }).expect(400);
      expect(shape.body.message).toEqual(['amountMinor must be at least 1 (a penny)', 'method must be one of: cash, bank-transfer, cheque, card']);
      expect((await refund(inv.id, { amountMinor: 100, method: 'card' }).expect(400)).body.message).toEqual(['paymentId: choose the card payment to give the money back to.']);
      expect(await t.dataSource.getRepository(Refund).countBy({ invoiceId: inv.id })).toBe(0);
    });

    it('records a refund by bank transfer, sent twice at once, once; then the invoice is refunded and nothing is left to give back', async () => {
      const requestId = randomUUID();
      const body = { amountMinor: 5_000, method: 'bank-transfer', reference: 'Transfer 2291', requestId };
      const [a, b] = await Promise.all([refund(inv.id, body), refund(inv.id, body)]);
      expect([a.status, b.status]).toEqual([201, 201]);
      expect(a.body.refunds).toEqual([expect.objectContaining({ amountMinor: 5_000, method: 'bank-transfer', state: 'made', reference: 'Transfer 2291', refundedOn: day })]);
      expect(b.body.refunds).toHaveLength(1);
      const after = await invoice(t, office, inv.id);
      expect(after.account).toEqual({ paidMinor: 5_000, creditedMinor: 12_000, refundedMinor: 5_000, owedMinor: 0, state: 'refunded', overdueDays: 0 });
      // Sent again without its request id, it is a second refund, and there is nothing left for it.
      expect((await refund(inv.id, { amountMinor: 5_000, method: 'bank-transfer' }).expect(409)).body.message).toEqual([`amountMinor: nothing is owed back to the customer on ${inv.number}.`]);
      const report = await agedDebt();
      expect(report.owedToCustomers.customers.flatMap((c: { invoices: Array<{ id: string }> }) => c.invoices.map((i) => i.id))).not.toContain(inv.id);
    });
  });

  it('refuses a refund on an invoice that owes the customer nothing', async () => {
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Fused spur', 4_000)]);
    expect((await refund(inv.id, { amountMinor: 100, method: 'cash' }).expect(409)).body.message).toEqual([`amountMinor: nothing is owed back to the customer on ${inv.number}.`]);
  });

  describe('to a card', () => {
    let inv: InvoiceBody;
    let paymentId: string;
    let intent: string;

    beforeAll(async () => {
      // £30.00 cash on site, the other £42.00 (of £60.00 + VAT = £72.00) by card, then all of it credited: £72.00 owed back.
      inv = await issuedInvoice(t, office, job.id, [fixedLine('Outside light', 6_000)]);
      await pay(inv.id, { amountMinor: 3_000, method: 'cash', receivedOn: day });
      await payByCard(inv.id);
      const paid = await invoice(t, office, inv.id);
      const card = paid.payments.find((p) => p.method === 'card')! as InvoiceBody['payments'][number] & { id: string };
      paymentId = card.id;
      intent = card.reference!;
      expect(card.amountMinor).toBe(4_200);
      await creditInFull(inv.id);
      expect((await invoice(t, office, inv.id)).account).toMatchObject({ owedMinor: -7_200, state: 'overpaid' });
    });

    it('never gives a card back more than its payment brought', async () => {
      const res = await refund(inv.id, { amountMinor: 5_000, method: 'card', paymentId }).expect(409);
      expect(res.body.message).toEqual(['amountMinor: £50.00 is more than the £42.00 left of that card payment to give back.']);
      expect(fake.refunds.filter((r) => r.payment_intent === intent)).toEqual([]);
    });

    it('says so and counts nothing when the provider does not make the refund', async () => {
      fake.refuseRefunds(true);
      try {
        const res = await refund(inv.id, { amountMinor: 4_200, method: 'card', paymentId }).expect(502);
        expect(res.body.message).toMatch(/^The card payment service did not make the refund, so nothing went back to the card: Refunds are not available/);
      } finally {
        fake.refuseRefunds(false);
      }
      const after = await invoice(t, office, inv.id) as InvoiceBody & { refunds: Array<{ state: string; failure: string | null }> };
      expect(after.refunds).toEqual([expect.objectContaining({ state: 'failed', failure: expect.stringContaining('Refunds are not available') })]);
      expect(after.account).toMatchObject({ refundedMinor: 0, owedMinor: -7_200 });
      expect(fake.sessions.get([...fake.sessions.values()].find((s) => s.payment_intent === intent)!.id)!.amount_refunded).toBe(0);
    });

    it('gives the card payment back through the provider, which refunds the charge once however often it is asked', async () => {
      const requestId = randomUUID();
      const body = { amountMinor: 4_200, method: 'card', paymentId, requestId };
      const [a, b] = await Promise.all([refund(inv.id, body), refund(inv.id, body)]);
      expect([a.status, b.status]).toEqual([201, 201]);
      const made = fake.refunds.filter((r) => r.payment_intent === intent);
      expect(made).toEqual([expect.objectContaining({ amount: 4_200, currency: 'gbp', reason: 'requested_by_customer', status: 'succeeded' })]);
      expect(made[0]!.metadata).toMatchObject({ invoiceId: inv.id, paymentId });
      // The provider's charge itself is refunded.
      expect([...fake.sessions.values()].find((s) => s.payment_intent === intent)!.amount_refunded).toBe(4_200);
      const after = (await invoice(t, office, inv.id)) as InvoiceBody & { refunds: Array<{ state: string; method: string; reference: string | null; paymentId: string | null }> };
      expect(after.refunds.filter((r) => r.state !== 'failed')).toEqual([expect.objectContaining({ method: 'card', state: 'made', paymentId, reference: made[0]!.id })]);
      expect(after.account).toMatchObject({ refundedMinor: 4_200, owedMinor: -3_000, state: 'overpaid' });
      // Nothing is left on that card payment; the £30.00 cash goes back by hand.
      expect((await refund(inv.id, { amountMinor: 100, method: 'card', paymentId }).expect(409)).body.message).toEqual(['amountMinor: £1.00 is more than the £0.00 left of that card payment to give back.']);
      const last = (await refund(inv.id, { amountMinor: 3_000, method: 'cash' }).expect(201)).body;
      expect(last.account).toMatchObject({ refundedMinor: 7_200, owedMinor: 0, state: 'refunded' });
      expect(fake.refunds.filter((r) => r.payment_intent === intent)).toHaveLength(1);
    });
  });
});
