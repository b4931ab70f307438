import { BadGatewayException, BadRequestException, ConflictException, Inject, Injectable, Logger, NotFoundException, type OnModuleInit, ServiceUnavailableException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { formatMoney, localDate } from '@wiretrail/core';
import Stripe from 'stripe';
import { type EntityManager, IsNull } from 'typeorm';
import { WriteQueue } from '../common/write-queue.js';
import { mailConfig } from '../config/app.config.js';
import { paymentsConfig } from '../config/payments.config.js';
import { Invoice } from '../invoices/entities/invoice.entity.js';
import { accountsOf, todayFor } from '../invoices/invoice-accounts.js';
import { Payment } from '../invoices/entities/payment.entity.js';
import { CardRefunds, type CardRefundRequest, type CardRefundResult } from '../invoices/card-refunds.js';
import { OwedChanges } from '../invoices/owed-changes.js';
import { PaymentsService } from '../invoices/payments.service.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { ShareLinksService } from '../share-links/share-links.service.js';
import { syncRepository } from '../sync/entities/sync-schemas.js';
import { CardCheckout } from './entities/card-checkout.entity.js';
import { PaymentEvent } from './entities/payment-event.entity.js';
import { PAYMENT_PROVIDER } from './payment-provider.js';

const NOT_SET_UP = 'Card payments are not set up for this contractor. Please pay another way, as the invoice says.';
const reasonOf = (err: unknown) => (err instanceof Error ? err.message : String(err)).replace(/\s+/g, ' ').slice(0, 300);

interface Applied {
  organisationId: string | null;
  outcome: string;
  /** An invoice a card payment was recorded against: its other open checkouts are withdrawn. */
  paidInvoiceId?: string;
}

const CHECKOUT_EVENTS = ['checkout.session.completed', 'checkout.session.async_payment_succeeded', 'checkout.session.expired'];

/**
 * Card payments through the provider's hosted checkout, reached only through its official SDK: a customer on a
 * share link is sent to a checkout for what the invoice still owes, and the provider's signed webhook records the
 * payment. An event is taken in once, by its id, however often it is delivered.
 */
@Injectable()
export class CardPaymentsService implements OnModuleInit {
  private readonly logger = new Logger('CardPayments');
  /** One checkout being started per invoice at a time, so two quick taps cannot open two. */
  private readonly starting = new Map<string, Promise<unknown>>();

  constructor(
    private readonly queue: WriteQueue,
    private readonly shareLinks: ShareLinksService,
    private readonly payments: PaymentsService,
    @Inject(PAYMENT_PROVIDER) private readonly provider: Stripe | null,
    @Inject(paymentsConfig.KEY) private readonly config: ConfigType<typeof paymentsConfig>,
    @Inject(mailConfig.KEY) private readonly mail: ConfigType<typeof mailConfig>,
    private readonly owedChanges: OwedChanges,
    private readonly cardRefunds: CardRefunds,
  ) {}

  onModuleInit(): void {
    // The office gives money back to a card only through the provider's SDK.
    if (this.provider) this.cardRefunds.offer((request) => this.refundToCard(this.provider!, request));
    // A checkout offers a figure; once what is owed changes, that figure is wrong and the offer is withdrawn.
    this.owedChanges.listen((invoiceId) => this.inTurnFor(invoiceId, () => this.closeOpenCheckouts(invoiceId)));
  }

  /** `origin` is the address the customer's request came to: where they return when PUBLIC_URL is not set. */
  async checkout(token: string, invoiceId: string, origin: string | null = null): Promise<{ url: string; amountMinor: number }> {
    const link = await this.shareLinks.open(token);
    if (!this.provider) throw new ServiceUnavailableException(NOT_SET_UP);
    const base = this.mail.publicUrlGiven || !origin ? this.mail.publicUrl : origin;
    return this.inTurnFor(invoiceId, () => this.startCheckout(this.provider!, token, link.organisationId, link.jobId, link.id, invoiceId, base));
  }

  /** One thing at a time per invoice: opening a checkout, or withdrawing them after what is owed changed. */
  private async inTurnFor<T>(invoiceId: string, work: () => Promise<T>): Promise<T> {
    const previous = this.starting.get(invoiceId) ?? Promise.resolve();
    const next = previous.catch(() => undefined).then(work);
    this.starting.set(invoiceId, next);
    try {
      return await next;
    } finally {
      if (this.starting.get(invoiceId) === next) this.starting.delete(invoiceId);
    }
  }

  /**
   * Expires at the provider every checkout of the invoice still open here. One the customer has just paid stays as
   * it is: its event is on the way, and what it brings above what is owed then goes back to the card. A provider
   * that does not answer leaves the checkout open here, to be tried again; the refund on arrival still holds.
   */
  private async closeOpenCheckouts(invoiceId: string): Promise<void> {
    const provider = this.provider;
    if (!provider) return;
    const open = await this.queue.read((em) => em.find(CardCheckout, { where: { invoiceId, state: 'open' } }));
    for (const c of open) {
      try {
        let session = await provider.checkout.sessions.retrieve(c.sessionId);
        if (session.status === 'open') session = await provider.checkout.sessions.expire(c.sessionId);
        if (session.status === 'expired') {
          await this.queue.run((em) => em.update(CardCheckout, { id: c.id, state: 'open' }, { state: 'expired' }));
          this.logger.log(`Checkout ${c.sessionId} expired: what invoice ${invoiceId} owes has changed`);
        }
      } catch (err) {
        if (!(err instanceof Stripe.errors.StripeError)) throw err;
        this.logger.warn(`Could not expire checkout ${c.sessionId} after invoice ${invoiceId} changed: ${reasonOf(err)}`);
      }
    }
  }

  private async startCheckout(provider: Stripe, token: string, organisationId: string, jobId: string, shareLinkId: string, invoiceId: string, base: string) {
    const { invoice, owed, open, organisation, email } = await this.queue.read(async (em) => {
      const invoice = await em.findOneBy(Invoice, { id: invoiceId, organisationId, jobId, kind: 'invoice', status: 'issued' });
      if (!invoice) throw new NotFoundException('No such invoice on this job.');
      const account = (await accountsOf(em, [invoice], await todayFor(em, organisationId))).get(invoice.id)!;
      const job = await syncRepository(em, 'job').findOneByOrFail({ id: jobId });
      const customer = await syncRepository(em, 'customer').findOne({ where: { id: job.customerId, organisationId }, withDeleted: true });
      return {
        invoice,
        owed: account.owedMinor,
        open: await em.find(CardCheckout, { where: { invoiceId, state: 'open' } }),
        organisation: await em.findOneByOrFail(Organisation, { id: organisationId }),
        email: typeof customer?.email === 'string' && customer.email ? customer.email : null,
      };
    });
    if (owed <= 0) throw new ConflictException(`Nothing is owed on invoice ${invoice.number}.`);
    try {
      // An earlier checkout stays payable until it is closed: close it, unless it was paid and its news is on the way.
      for (const c of open) {
        const session = await provider.checkout.sessions.retrieve(c.sessionId);
        if (session.status === 'complete') {
          throw new ConflictException('A card payment for this invoice has just been made and is being confirmed. Refresh the page in a minute.');
        }
        if (session.status === 'open') await provider.checkout.sessions.expire(c.sessionId);
        await this.queue.run((em) => em.update(CardCheckout, { id: c.id }, { state: 'expired' }));
      }
      const back = `${base}/shared/${token}`;
      const session = await provider.checkout.sessions.create({
        mode: 'payment',
        line_items: [
          { quantity: 1, price_data: { currency: this.config.currency, unit_amount: owed, product_data: { name: `Invoice ${invoice.number} from ${organisation.name}` } } },
        ],
        // Back on the link, the page watches this invoice until the provider's event has marked it paid.
        success_url: `${back}?paid=${invoice.id}`,
        cancel_url: back,
        client_reference_id: invoice.id,
        metadata: { invoiceId: invoice.id, organisationId, invoiceNumber: invoice.number ?? '' },
        ...(email ? { customer_email: email } : {}),
      });
      if (!session.url) throw new Error('the provider gave no checkout address');
      await this.queue.run((em) => em.save(em.create(CardCheckout, { organisationId, invoiceId: invoice.id, sessionId: session.id, amountMinor: owed, state: 'open', shareLinkId })));
      this.logger.log(`Checkout ${session.id} for ${formatMoney(owed)} on ${invoice.number}`);
      return { url: session.url, amountMinor: owed };
    } catch (err) {
      if (!(err instanceof Stripe.errors.StripeError)) throw err;
      this.logger.warn(`The payment provider refused or did not answer for ${invoice.number}: ${reasonOf(err)}`);
      throw new BadGatewayException('The card payment service did not answer. Please try again in a minute.');
    }
  }

  /**
   * The provider's event, verified with the SDK against the raw body it signed. A bad signature is refused and
   * logged; an event already taken in is acknowledged and changes nothing.
   */
  async takeEvent(rawBody: Buffer | undefined, signature: string | undefined): Promise<{ received: true; duplicate?: true }> {
    const secret = this.config.webhookSecret;
    if (!secret) throw new ServiceUnavailableException(NOT_SET_UP);
    if (!rawBody?.length || !signature) {
      this.logger.warn('Refused a payment event without a body or a stripe-signature header.');
      throw new BadRequestException('A payment event needs its body and its stripe-signature header.');
    }
    let event: Stripe.Event;
    try {
      event = (this.provider?.webhooks ?? Stripe.webhooks).constructEvent(rawBody, signature, secret);
    } catch (err) {
      this.logger.warn(`Refused a payment event whose signature does not verify: ${reasonOf(err)}`);
      throw new BadRequestException('The payment event’s signature does not verify.');
    }
    const taken = await this.queue.run(async (em) => {
      if (await em.findOneBy(PaymentEvent, { eventId: event.id })) return { duplicate: true } as const;
      const applied = await this.apply(em, event);
      await em.insert(PaymentEvent, { eventId: event.id, type: event.type, organisationId: applied.organisationId, outcome: applied.outcome.slice(0, 300) });
      this.logger.log(`Payment event ${event.id} (${event.type}): ${applied.outcome}`);
      return applied;
    });
    // After the commit: a refund still owed is made now, and again when the provider resends the event after a
    // failure (a 502 asks it to), so none is left waiting; the provider's idempotency key makes it once.
    if (CHECKOUT_EVENTS.includes(event.type)) await this.refundDue((event.data.object as Stripe.Checkout.Session).id);
    if ('paidInvoiceId' in taken && taken.paidInvoiceId) await this.owedChanges.changed(taken.paidInvoiceId);
    return 'duplicate' in taken ? { received: true, duplicate: true } : { received: true };
  }

  /** A refund the office asked for, through the SDK; the provider's refusal comes back in words, not as an error. */
  private async refundToCard(provider: Stripe, r: CardRefundRequest): Promise<CardRefundResult> {
    try {
      const refund = await provider.refunds.create(
        { payment_intent: r.paymentReference, amount: r.amountMinor, reason: 'requested_by_customer', metadata: r.metadata },
        { idempotencyKey: r.idempotencyKey },
      );
      return { made: true, reference: refund.id };
    } catch (err) {
      if (!(err instanceof Stripe.errors.StripeError)) throw err;
      return { made: false, reason: reasonOf(err) };
    }
  }

  /** Gives back to the card what a payment brought above what was owed, through the provider's SDK. */
  private async refundDue(sessionId: string): Promise<void> {
    const payment = await this.queue.read((em) => em.findOneBy(Payment, { checkoutSessionId: sessionId, refundedAt: IsNull() }));
    if (!payment || payment.refundMinor <= 0) return;
    if (!this.provider || !payment.reference) {
      this.logger.error(`${formatMoney(payment.refundMinor)} of card payment ${payment.id} is to be refunded, but there is no provider to refund it through.`);
      return;
    }
    let refund: Stripe.Refund;
    try {
      refund = await this.provider.refunds.create(
        { payment_intent: payment.reference, amount: payment.refundMinor, reason: 'duplicate', metadata: { invoiceId: payment.invoiceId, paymentId: payment.id } },
        { idempotencyKey: `wiretrail-refund-${payment.id}` },
      );
    } catch (err) {
      if (!(err instanceof Stripe.errors.StripeError)) throw err;
      this.logger.warn(`The refund of ${formatMoney(payment.refundMinor)} for card payment ${payment.id} was not made yet: ${reasonOf(err)}`);
      throw new BadGatewayException('The refund could not be made yet; send the event again.');
    }
    await this.queue.run((em) => em.update(Payment, { id: payment.id }, { refundedAt: new Date(), refundReference: refund.id }));
    this.logger.log(`Refunded ${formatMoney(payment.refundMinor)} of card payment ${payment.id} (${refund.id})`);
  }

  private async apply(em: EntityManager, event: Stripe.Event): Promise<Applied> {
    if (!CHECKOUT_EVENTS.includes(event.type)) {
      return { organisationId: null, outcome: 'not an event this server acts on' };
    }
    const session = event.data.object as Stripe.Checkout.Session;
    const checkout = await em.findOneBy(CardCheckout, { sessionId: session.id });
    if (!checkout) return { organisationId: null, outcome: 'not a checkout this server started' };
    const org = checkout.organisationId;
    if (event.type === 'checkout.session.expired') {
      if (checkout.state === 'open') await em.update(CardCheckout, { id: checkout.id }, { state: 'expired' });
      return { organisationId: org, outcome: 'checkout expired' };
    }
    if (session.payment_status !== 'paid') return { organisationId: org, outcome: `payment ${session.payment_status}, not recorded yet` };
    if (session.currency !== this.config.currency || typeof session.amount_total !== 'number') {
      this.logger.warn(`Checkout ${session.id} was paid in ${session.currency ?? 'no currency'}; it was not recorded.`);
      return { organisationId: org, outcome: `paid in ${session.currency ?? 'no currency'}: not recorded` };
    }
    const invoice = await em.findOneByOrFail(Invoice, { id: checkout.invoiceId, organisationId: org });
    const { timeZone } = await em.findOneByOrFail(Organisation, { id: org });
    // What is owed now, not what the checkout was opened for: a payment or credit since may have lowered it.
    const owed = (await accountsOf(em, [invoice], localDate(new Date(), timeZone))).get(invoice.id)?.owedMinor ?? 0;
    const intent = session.payment_intent;
    const payment = await this.payments.recordCard(em, {
      organisationId: org,
      invoiceId: invoice.id,
      amountMinor: session.amount_total,
      receivedOn: localDate(new Date(event.created * 1000), timeZone),
      reference: (typeof intent === 'string' ? intent : intent?.id) ?? session.id,
      checkoutSessionId: session.id,
      owedMinor: owed,
    });
    await em.update(CardCheckout, { id: checkout.id }, { state: 'complete' });
    if (!payment) return { organisationId: org, outcome: `already recorded against ${invoice.number}` };
    const refund = payment.refundMinor > 0 ? `; ${formatMoney(payment.refundMinor)} above the ${formatMoney(Math.max(0, owed))} owed goes back to the card` : '';
    return { organisationId: org, outcome: `recorded ${formatMoney(payment.amountMinor)} by card against ${invoice.number}${refund}`, paidInvoiceId: invoice.id };
  }
}
