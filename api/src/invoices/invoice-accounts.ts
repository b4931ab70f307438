import { documentTotals, type InvoiceAccount, type InvoiceDetail, type InvoiceSummary, invoiceStanding, localDate } from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { Invoice } from './entities/invoice.entity.js';
import { InvoiceLine } from './entities/invoice-line.entity.js';
import { Payment } from './entities/payment.entity.js';
import { Refund } from './entities/refund.entity.js';
import { inTurn } from '../common/in-turn.js';

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** Today's date where the organisation is: what "overdue" is judged against. */
export async function todayFor(em: EntityManager, organisationId: string): Promise<string> {
  const org = await em.findOneByOrFail(Organisation, { id: organisationId });
  return localDate(new Date(), org.timeZone);
}

/** Payments and issued credit notes of these invoices, added up once for the lot. */
export async function accountsOf(em: EntityManager, invoices: Invoice[], asOf: string): Promise<Map<string, InvoiceAccount>> {
  const issued = invoices.filter((i) => i.kind === 'invoice' && i.status === 'issued');
  const ids = issued.map((i) => i.id);
  if (!ids.length) return new Map();
  const [payments, credits, refunds] = await inTurn(
    () => em.find(Payment, { where: { invoiceId: In(ids) } }),
    () => em.find(Invoice, { where: { creditsInvoiceId: In(ids), status: 'issued', kind: 'credit-note' } }),
    // A card refund on its way counts as given: the money is no longer the office's to give twice.
    () => em.find(Refund, { where: { invoiceId: In(ids), state: In(['made', 'pending']) } }),
  );
  const sum = <T>(rows: T[], key: (r: T) => string, value: (r: T) => number) => {
    const m = new Map<string, number>();
    for (const r of rows) m.set(key(r), (m.get(key(r)) ?? 0) + value(r));
    return m;
  };
  // What goes back to a card was never the contractor's to keep.
  const paid = sum(payments, (p) => p.invoiceId, (p) => p.amountMinor - p.refundMinor);
  // A credit note's total is negative; what it takes off the invoice is that, the other way round.
  const credited = sum(credits, (c) => c.creditsInvoiceId!, (c) => -c.grossMinor);
  const refunded = sum(refunds, (r) => r.invoiceId, (r) => r.amountMinor);
  return new Map(
    issued.map((i) => {
      const paidMinor = paid.get(i.id) ?? 0;
      const creditedMinor = credited.get(i.id) ?? 0;
      const refundedMinor = refunded.get(i.id) ?? 0;
      const standing = invoiceStanding({ grossMinor: i.grossMinor, creditedMinor, paidMinor, refundedMinor, dueDate: i.dueDate!, asOf });
      return [i.id, { paidMinor, creditedMinor, refundedMinor, ...standing }];
    }),
  );
}

/** Summaries for lists: each with its job, customer and account, read in a handful of queries whatever the count. */
export async function summarise(em: EntityManager, organisationId: string, invoices: Invoice[], asOf: string): Promise<InvoiceSummary[]> {
  const jobIds = [...new Set(invoices.map((i) => i.jobId))];
  const jobs = jobIds.length ? await syncRepository(em, 'job').find({ where: { id: In(jobIds), organisationId }, withDeleted: true }) : [];
  const customerIds = [...new Set(jobs.map((j) => j.customerId))];
  const customers = customerIds.length ? await syncRepository(em, 'customer').find({ where: { id: In(customerIds), organisationId }, withDeleted: true }) : [];
  const creditedIds = [...new Set(invoices.map((i) => i.creditsInvoiceId).filter((id): id is string => !!id))];
  const credited = creditedIds.length ? await em.find(Invoice, { where: { id: In(creditedIds), organisationId }, select: { id: true, number: true } }) : [];
  const accounts = await accountsOf(em, invoices, asOf);
  const jobOf = new Map(jobs.map((j) => [j.id, j]));
  const customerOf = new Map(customers.map((c) => [c.id, c]));
  const numberOf = new Map(credited.map((c) => [c.id, c.number]));
  return invoices.map((i) => {
    const job = jobOf.get(i.jobId);
    const customer = job ? customerOf.get(job.customerId) : undefined;
    return {
      id: i.id,
      jobId: i.jobId,
      kind: i.kind,
      status: i.status,
      number: i.number,
      issueDate: i.issueDate,
      dueDate: i.dueDate,
      issuedAt: iso(i.issuedAt),
      netMinor: i.netMinor,
      vatMinor: i.vatMinor,
      grossMinor: i.grossMinor,
      creditsInvoiceId: i.creditsInvoiceId,
      creditsNumber: i.creditsInvoiceId ? (numberOf.get(i.creditsInvoiceId) ?? null) : null,
      fromQuoteId: i.fromQuoteId,
      emailState: i.emailState,
      emailedTo: i.emailedTo,
      emailedAt: iso(i.emailedAt),
      emailError: i.emailError,
      createdAt: i.createdAt.toISOString(),
      job: { reference: job?.reference ?? null, title: job?.title ?? '' },
      customer: customer ? { id: customer.id, name: customer.name, email: customer.email || null } : null,
      account: accounts.get(i.id) ?? null,
      lapsed: i.kind === 'quote' && i.status === 'issued' && !!i.dueDate && i.dueDate < asOf,
    };
  });
}

export async function detail(em: EntityManager, invoice: Invoice, asOf: string): Promise<InvoiceDetail> {
  const [[summary], lines, payments, credits, refunds] = await inTurn(
    () => summarise(em, invoice.organisationId, [invoice], asOf),
    () => em.find(InvoiceLine, { where: { invoiceId: invoice.id }, order: { position: 'ASC' } }),
    () => em.find(Payment, { where: { invoiceId: invoice.id }, order: { receivedOn: 'ASC', createdAt: 'ASC' } }),
    () => em.find(Invoice, { where: { creditsInvoiceId: invoice.id, kind: 'credit-note' }, order: { createdAt: 'ASC' } }),
    () => em.find(Refund, { where: { invoiceId: invoice.id }, order: { createdAt: 'ASC' } }),
  );
  return {
    ...summary!,
    termDays: invoice.termDays,
    notes: invoice.notes,
    vatNumber: invoice.vatNumber,
    terms: invoice.terms,
    paymentInstructions: invoice.paymentInstructions,
    pdfSha256: invoice.pdfSha256,
    pdfBytes: invoice.pdfBytes,
    lines: lines.map((l) => ({
      id: l.id, position: l.position, kind: l.kind, description: l.description, quantity: l.quantity, unit: l.unit, unitPriceMinor: l.unitPriceMinor,
      vatRateCode: l.vatRateCode, vatBasisPoints: l.vatBasisPoints, netMinor: l.netMinor, vatMinor: l.vatMinor, grossMinor: l.grossMinor,
      visitId: l.visitId, priceItemId: l.priceItemId, labourRateId: l.labourRateId, partUseIds: l.partUseIds ?? [],
    })),
    byRate: documentTotals(lines).byRate.map((r) => ({ ...r })),
    payments: payments.map((p) => ({
      id: p.id, amountMinor: p.amountMinor, method: p.method, receivedOn: p.receivedOn, reference: p.reference, note: p.note, recordedById: p.recordedById, createdAt: p.createdAt.toISOString(),
      refundMinor: p.refundMinor, refundedAt: iso(p.refundedAt),
    })),
    refunds: refunds.map((r) => ({
      id: r.id, amountMinor: r.amountMinor, method: r.method, paymentId: r.paymentId, refundedOn: r.refundedOn, reference: r.reference, note: r.note,
      state: r.state, failure: r.failure, recordedById: r.recordedById, createdAt: r.createdAt.toISOString(),
    })),
    credits: credits.map((c) => ({ id: c.id, number: c.number, status: c.status, grossMinor: c.grossMinor, issueDate: c.issueDate })),
  };
}

/** A job of the organisation that is still there, or nothing. */
export function liveJob(em: EntityManager, organisationId: string, jobId: string): Promise<SyncRecord | null> {
  return syncRepository(em, 'job').findOneBy({ id: jobId, organisationId, deletedAt: IsNull() });
}
