import { BadGatewayException, BadRequestException, ConflictException, Injectable, Logger, NotFoundException, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { formatMoney, type InvoiceDetail, isCalendarDate, refundProblems, toRefundMinor } from '@wiretrail/core';
import { In, Not } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { CardRefunds } from './card-refunds.js';
import type { RecordRefundDto } from './dto/record-refund.dto.js';
import { Invoice } from './entities/invoice.entity.js';
import { Payment } from './entities/payment.entity.js';
import { Refund } from './entities/refund.entity.js';
import { accountsOf, detail, todayFor } from './invoice-accounts.js';
import { OwedChanges } from './owed-changes.js';

const keyOf = (refund: Pick<Refund, 'id'>) => `wiretrail-office-refund-${refund.id}`;
const RETRY_AFTER_START_MS = 5_000;

/**
 * Money the office gives back to a customer on an invoice, never more than the customer is owed there (paid above
 * what the invoice asks for once credited): by hand, recorded as made; or to a card payment, recorded as on its way
 * in the same transaction as the check, then made through the provider after the commit.
 */
@Injectable()
export class RefundsService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('Refunds');

  constructor(
    private readonly queue: WriteQueue,
    private readonly cards: CardRefunds,
    private readonly owedChanges: OwedChanges,
  ) {}

  private retry: NodeJS.Timeout | null = null;

  /**
   * A card refund recorded just before the process stopped is asked for again soon after start (not during it, so
   * the start never waits on the provider); its key makes it once at the provider.
   */
  onApplicationBootstrap(): void {
    if (!this.cards.available) return;
    this.retry = setTimeout(() => void this.retryPending(), RETRY_AFTER_START_MS);
    this.retry.unref();
  }

  onModuleDestroy(): void {
    if (this.retry) clearTimeout(this.retry);
  }

  private async retryPending(): Promise<void> {
    try {
      const pending = await this.queue.read((em) => em.find(Refund, { where: { state: 'pending', method: 'card' } }));
      for (const refund of pending) await this.toCard(refund).catch(() => undefined);
    } catch (err) {
      this.logger.warn(`Card refunds left waiting were not looked for: ${err instanceof Error ? err.message : String(err)}`);
    }
  }

  async record(user: AuthUser, invoiceId: string, dto: RecordRefundDto): Promise<InvoiceDetail> {
    const { refund, again } = await this.queue.run(async (em) => {
      if (dto.requestId) {
        const earlier = await em.findOneBy(Refund, { organisationId: user.organisationId, requestId: dto.requestId });
        // The same request once more (a double click, a retry after a lost answer): answered as it stands, done once.
        if (earlier) {
          if (earlier.invoiceId !== invoiceId) throw new ConflictException('requestId: already used for a refund on another invoice.');
          return { refund: earlier, again: true };
        }
      }
      const invoice = await em.findOneBy(Invoice, { id: invoiceId, organisationId: user.organisationId });
      if (!invoice) throw new NotFoundException('No such invoice.');
      if (invoice.kind !== 'invoice' || invoice.status !== 'issued') throw new ConflictException('Refunds are recorded against issued invoices only.');
      const today = await todayFor(em, user.organisationId);
      const refundedOn = dto.method === 'card' ? today : (dto.refundedOn ?? today);
      const shape: string[] = [];
      if (!isCalendarDate(refundedOn)) shape.push('refundedOn must be a date that exists, written YYYY-MM-DD.');
      else if (refundedOn > today) shape.push(`refundedOn must not be later than today (${today}).`);
      let cardLeftMinor: number | undefined;
      let payment: Payment | null = null;
      if (dto.method === 'card') {
        if (!this.cards.available) shape.push('method: card payments are not set up, so nothing can go back to a card; refund by hand.');
        else if (!dto.paymentId) shape.push('paymentId: choose the card payment to give the money back to.');
        else {
          payment = await em.findOneBy(Payment, { id: dto.paymentId, invoiceId: invoice.id, organisationId: user.organisationId, method: 'card' });
          if (!payment?.reference) shape.push(`paymentId: not a card payment of ${invoice.number}.`);
          else {
            const earlier = await em.find(Refund, { where: { paymentId: payment.id, state: Not('failed') } });
            cardLeftMinor = payment.amountMinor - payment.refundMinor - earlier.reduce((s, r) => s + r.amountMinor, 0);
          }
        }
      } else if (dto.paymentId) shape.push('paymentId: only a refund to a card names a payment.');
      if (shape.length) throw new BadRequestException(shape);
      const account = (await accountsOf(em, [invoice], today)).get(invoice.id)!;
      const problems = refundProblems({ amountMinor: dto.amountMinor, toRefundMinor: toRefundMinor(account), invoiceNumber: invoice.number!, cardLeftMinor });
      if (problems.length) throw new ConflictException(problems);
      const refund = await em.save(
        em.create(Refund, {
          organisationId: user.organisationId,
          invoiceId: invoice.id,
          amountMinor: dto.amountMinor,
          method: dto.method,
          paymentId: payment?.id ?? null,
          refundedOn,
          reference: dto.method === 'card' ? null : (dto.reference ?? null),
          note: dto.note ?? null,
          state: dto.method === 'card' ? 'pending' : 'made',
          failure: null,
          requestId: dto.requestId ?? null,
          recordedById: user.id,
        }),
      );
      return { refund, again: false };
    });
    if (!again) {
      this.logger.log(`Recorded a refund of ${formatMoney(refund.amountMinor)} (${refund.method}) on invoice ${invoiceId}`);
      if (refund.method === 'card') await this.toCard(refund);
      await this.owedChanges.changed(invoiceId);
    }
    return this.queue.read(async (em) => {
      const invoice = await em.findOneByOrFail(Invoice, { id: invoiceId, organisationId: user.organisationId });
      return detail(em, invoice, await todayFor(em, user.organisationId));
    });
  }

  /** Asks the provider to make a pending card refund; a refusal marks it failed (it counts for nothing) and says why. */
  private async toCard(refund: Refund): Promise<void> {
    const payment = await this.queue.read((em) => em.findOneBy(Payment, { id: refund.paymentId ?? '' }));
    const result = payment?.reference
      ? await this.cards.make({
          paymentReference: payment.reference,
          amountMinor: refund.amountMinor,
          idempotencyKey: keyOf(refund),
          metadata: { invoiceId: refund.invoiceId, paymentId: payment.id, refundId: refund.id },
        })
      : ({ made: false, reason: 'The card payment is no longer on the server.' } as const);
    if (result.made) {
      await this.queue.run((em) => em.update(Refund, { id: refund.id, state: In(['pending']) }, { state: 'made', reference: result.reference }));
      this.logger.log(`Refunded ${formatMoney(refund.amountMinor)} to card payment ${refund.paymentId} (${result.reference})`);
      return;
    }
    await this.queue.run((em) => em.update(Refund, { id: refund.id, state: 'pending' }, { state: 'failed', failure: result.reason.slice(0, 500) }));
    this.logger.warn(`The refund of ${formatMoney(refund.amountMinor)} to card payment ${refund.paymentId} was not made: ${result.reason}`);
    throw new BadGatewayException(`The card payment service did not make the refund, so nothing went back to the card: ${result.reason} Try again in a minute, or refund another way.`);
  }
}
