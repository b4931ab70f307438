import { ConflictException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { AGED_DEBT_BUCKETS, type AgedDebtInvoice, type AgedDebtReport, agedDebtBucket, agedDebtTotals, formatMoney, type InvoiceDetail, type InvoiceSummary, isCalendarDate, toRefundMinor } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { JobProgress } from '../jobs/job-progress.js';
import type { RecordPaymentDto } from './dto/record-payment.dto.js';
import { Invoice } from './entities/invoice.entity.js';
import { Payment } from './entities/payment.entity.js';
import { accountsOf, detail, summarise, todayFor } from './invoice-accounts.js';
import { OwedChanges } from './owed-changes.js';

/** A card payment the provider reported, to record once. */
export interface CardPaymentReport {
  organisationId: string;
  invoiceId: string;
  amountMinor: number;
  receivedOn: string;
  reference: string | null;
  checkoutSessionId: string;
  /** What was still owed when the news arrived: anything paid above it goes back to the card. */
  owedMinor: number;
}

/** Credit balances: what customers paid above what their invoices now ask for, still to go back, by customer, the most first. */
function owedBack(summaries: InvoiceSummary[]): AgedDebtReport['owedToCustomers'] {
  const byCustomer = new Map<string, AgedDebtReport['owedToCustomers']['customers'][number]>();
  for (const i of summaries) {
    const toRefund = i.account ? toRefundMinor(i.account) : 0;
    if (toRefund <= 0) continue;
    const key = i.customer?.id ?? 'none';
    const entry = byCustomer.get(key) ?? { customerId: i.customer?.id ?? null, name: i.customer?.name ?? 'No customer', totalMinor: 0, invoices: [] };
    entry.invoices.push({
      id: i.id,
      number: i.number!,
      jobId: i.jobId,
      jobReference: i.job.reference,
      grossMinor: i.grossMinor,
      paidMinor: i.account!.paidMinor,
      creditedMinor: i.account!.creditedMinor,
      refundedMinor: i.account!.refundedMinor,
      toRefundMinor: toRefund,
    });
    entry.totalMinor += toRefund;
    byCustomer.set(key, entry);
  }
  const customers = [...byCustomer.values()].sort((a, b) => b.totalMinor - a.totalMinor || a.name.localeCompare(b.name));
  return { totalMinor: customers.reduce((s, c) => s + c.totalMinor, 0), customers };
}

/** Money in against invoices, and what is still owed, by whom and for how long. */
@Injectable()
export class PaymentsService {
  constructor(
    private readonly queue: WriteQueue,
    private readonly owedChanges: OwedChanges,
    private readonly progress: JobProgress,
  ) {}

  /** Money taken on site or paid into the bank, recorded by the office; never more than is still owed. */
  async record(user: AuthUser, invoiceId: string, dto: RecordPaymentDto): Promise<InvoiceDetail> {
    const recorded = await this.queue.run(async (em) => {
      const invoice = await em.findOneBy(Invoice, { id: invoiceId, organisationId: user.organisationId });
      if (!invoice) throw new NotFoundException('No such invoice.');
      if (invoice.kind !== 'invoice' || invoice.status !== 'issued') throw new ConflictException('Payments are recorded against issued invoices only.');
      const today = await todayFor(em, user.organisationId);
      const problems: string[] = [];
      if (!isCalendarDate(dto.receivedOn)) problems.push('receivedOn must be a date that exists, written YYYY-MM-DD.');
      else if (dto.receivedOn > today) problems.push(`receivedOn must not be later than today (${today}).`);
      const account = (await accountsOf(em, [invoice], today)).get(invoice.id)!;
      if (account.owedMinor <= 0) problems.push(`Nothing is owed on ${invoice.number}.`);
      else if (dto.amountMinor > account.owedMinor) problems.push(`amountMinor: ${formatMoney(dto.amountMinor)} is more than the ${formatMoney(account.owedMinor)} still owed on ${invoice.number}.`);
      if (problems.length) throw new UnprocessableEntityException(problems);
      await em.save(
        em.create(Payment, {
          organisationId: user.organisationId,
          invoiceId: invoice.id,
          amountMinor: dto.amountMinor,
          method: dto.method,
          receivedOn: dto.receivedOn,
          reference: dto.reference ?? null,
          note: dto.note ?? null,
          recordedById: user.id,
          checkoutSessionId: null,
          refundMinor: 0,
          refundedAt: null,
          refundReference: null,
        }),
      );
      // The last money in may be what the job waited on to be done.
      await this.progress.follow(em, { userId: user.id, organisationId: user.organisationId, role: user.role }, [invoice.jobId]);
      return detail(em, invoice, today);
    });
    // A checkout opened for the old figure would take too much now.
    await this.owedChanges.changed(recorded.id);
    return recorded;
  }

  /**
   * A card payment, recorded inside the caller's transaction (the webhook's, with its event id). A checkout session
   * settles at most one payment, however many times its completion is reported. Money already taken is never
   * refused: what is above what was owed by now (paid another way or credited while the customer was at the
   * checkout) is recorded as to go back to the card, and the caller refunds it.
   */
  async recordCard(em: EntityManager, report: CardPaymentReport): Promise<Payment | null> {
    if (await em.findOneBy(Payment, { checkoutSessionId: report.checkoutSessionId })) return null;
    const payment = await em.save(
      em.create(Payment, {
        organisationId: report.organisationId,
        invoiceId: report.invoiceId,
        amountMinor: report.amountMinor,
        method: 'card',
        receivedOn: report.receivedOn,
        reference: report.reference,
        note: null,
        recordedById: null,
        checkoutSessionId: report.checkoutSessionId,
        refundMinor: Math.max(0, report.amountMinor - Math.max(0, report.owedMinor)),
        refundedAt: null,
        refundReference: null,
      }),
    );
    const invoice = await em.findOneBy(Invoice, { id: report.invoiceId, organisationId: report.organisationId });
    // Paid by the customer: the job moves on behalf of whoever issued the invoice.
    if (invoice) await this.progress.follow(em, { userId: invoice.issuedById ?? invoice.createdById, organisationId: invoice.organisationId, role: 'office' }, [invoice.jobId]);
    return payment;
  }

  /**
   * What is owed on each issued invoice with money outstanding, grouped by customer, in buckets of how late it is;
   * and beside it what the contractor owes customers (credit balances still to refund).
   */
  agedDebt(user: AuthUser, asOf?: string): Promise<AgedDebtReport> {
    if (asOf !== undefined && !isCalendarDate(asOf)) throw new UnprocessableEntityException(['asOf must be a date that exists, written YYYY-MM-DD.']);
    return this.queue.read(async (em) => {
      const day = asOf ?? (await todayFor(em, user.organisationId));
      const invoices = await em.find(Invoice, { where: { organisationId: user.organisationId, kind: 'invoice', status: 'issued' } });
      // Years of settled invoices owe nothing either way: only the rest need their jobs and customers read.
      const accounts = await accountsOf(em, invoices, day);
      const unsettled = invoices.filter((i) => (accounts.get(i.id)?.owedMinor ?? 0) !== 0);
      const summaries = await summarise(em, user.organisationId, unsettled, day);
      const owing = summaries.filter((i) => i.account && i.account.owedMinor > 0);
      const byCustomer = new Map<string, { customerId: string | null; name: string; invoices: AgedDebtInvoice[] }>();
      for (const i of owing) {
        const key = i.customer?.id ?? 'none';
        const entry = byCustomer.get(key) ?? { customerId: i.customer?.id ?? null, name: i.customer?.name ?? 'No customer', invoices: [] };
        entry.invoices.push({
          id: i.id,
          number: i.number!,
          jobId: i.jobId,
          jobReference: i.job.reference,
          issueDate: i.issueDate!,
          dueDate: i.dueDate!,
          grossMinor: i.grossMinor,
          owedMinor: i.account!.owedMinor,
          overdueDays: i.account!.overdueDays,
          bucket: agedDebtBucket(i.dueDate!, day),
          state: i.account!.state,
        });
        byCustomer.set(key, entry);
      }
      const debts = (list: AgedDebtInvoice[]) => list.map((i) => ({ owedMinor: i.owedMinor, dueDate: i.dueDate }));
      const customers = [...byCustomer.values()]
        .map((c) => ({
          ...c,
          invoices: c.invoices.sort((a, b) => a.dueDate.localeCompare(b.dueDate)),
          totals: agedDebtTotals(debts(c.invoices), day),
          oldestDays: Math.max(...c.invoices.map((i) => i.overdueDays)),
        }))
        // The longest owed first, then the most owed.
        .sort((a, b) => b.oldestDays - a.oldestDays || b.totals.total - a.totals.total || a.name.localeCompare(b.name));
      return {
        asOf: day,
        buckets: AGED_DEBT_BUCKETS.map((b) => ({ key: b.key, label: b.label })),
        totals: agedDebtTotals(debts(customers.flatMap((c) => c.invoices)), day),
        customers,
        owedToCustomers: owedBack(summaries),
      };
    });
  }
}
