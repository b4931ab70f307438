import { BadRequestException, ConflictException, Inject, Injectable, Logger, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { type InvoiceDetail, INVOICE_NAMES, type InvoiceSummary, localDate, type SharedInvoiceList } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { paymentsConfig } from '../config/payments.config.js';
import { JobProgress } from '../jobs/job-progress.js';
import { loadJobFile } from '../paperwork/job-file.js';
import type { FileStorage } from '../storage/file-storage.js';
import { INVOICE_STORAGE } from '../storage/file-stores.js';
import { loadRateBook } from '../pricing/rate-book.js';
import { ShareLinksService } from '../share-links/share-links.service.js';
import type { CreateInvoiceDto } from './dto/create-invoice.dto.js';
import type { ListInvoicesQueryDto } from './dto/list-invoices-query.dto.js';
import type { UpdateInvoiceDto } from './dto/update-invoice.dto.js';
import { Invoice } from './entities/invoice.entity.js';
import { detail, liveJob, summarise, todayFor } from './invoice-accounts.js';
import { draftOf, issueDraft, linesOf, saveDraft, signOf, withCreditRates, writeLines } from './invoice-issue.js';
import { type LineDraft, priceLines } from './invoice-lines.js';
import { linesFromJob } from './job-billing.js';
import { OwedChanges } from './owed-changes.js';

/**
 * Quotes, invoices and credit notes for a job. Drafts are edited freely and have no number; issuing numbers one in
 * the same transaction that freezes it (so numbers have no gaps and never repeat), re-prices its lines at the VAT
 * rates in force on the day of issue, prints and stores its PDF. Nothing changes an issued one: a credit note,
 * whose lines are the negatives of the invoice's, corrects an invoice and reduces what is owed on it.
 */
@Injectable()
export class InvoicesService {
  private readonly logger = new Logger('Invoices');

  constructor(
    private readonly queue: WriteQueue,
    private readonly shareLinks: ShareLinksService,
    @Inject(INVOICE_STORAGE) private readonly storage: FileStorage,
    @Inject(paymentsConfig.KEY) private readonly payments: ConfigType<typeof paymentsConfig>,
    private readonly owedChanges: OwedChanges,
    private readonly progress: JobProgress,
  ) {}

  forJob(user: AuthUser, jobId: string): Promise<{ items: InvoiceSummary[] }> {
    return this.queue.read(async (em) => {
      if (!(await liveJob(em, user.organisationId, jobId))) throw new NotFoundException('No such job.');
      const rows = await em.find(Invoice, { where: { organisationId: user.organisationId, jobId }, order: { createdAt: 'ASC', id: 'ASC' } });
      return { items: await summarise(em, user.organisationId, rows, await todayFor(em, user.organisationId)) };
    });
  }

  /** Every quote, invoice and credit note of the organisation: drafts first, then the newest issued. */
  async list(user: AuthUser, q: ListInvoicesQueryDto): Promise<{ items: InvoiceSummary[]; total: number; page: number; pageSize: number }> {
    const all = await this.queue.read(async (em) => {
      const rows = await em.find(Invoice, { where: { organisationId: user.organisationId, ...(q.kind ? { kind: q.kind } : {}) } });
      return summarise(em, user.organisationId, rows, await todayFor(em, user.organisationId));
    });
    const text = q.search?.trim().toLowerCase();
    const wanted = all.filter((i) => {
      if (q.state === 'draft' && i.status !== 'draft') return false;
      if (q.state === 'unpaid' && !(i.account && i.account.owedMinor > 0)) return false;
      if (q.state === 'overdue' && !(i.account && i.account.overdueDays > 0)) return false;
      if (q.state === 'paid' && !(i.account && i.account.owedMinor <= 0)) return false;
      return !text || [i.number, i.job.reference, i.job.title, i.customer?.name].some((v) => v?.toLowerCase().includes(text));
    });
    const order = (i: InvoiceSummary) => (i.status === 'draft' ? `1${i.createdAt}` : `0${i.issuedAt ?? ''}`);
    wanted.sort((a, b) => order(b).localeCompare(order(a)) || b.id.localeCompare(a.id));
    return { items: wanted.slice((q.page - 1) * q.pageSize, q.page * q.pageSize), total: wanted.length, page: q.page, pageSize: q.pageSize };
  }

  findOne(user: AuthUser, id: string): Promise<InvoiceDetail> {
    return this.queue.read(async (em) => detail(em, await this.own(em, user, id), await todayFor(em, user.organisationId)));
  }

  /** The issued row, for its PDF. */
  issued(user: AuthUser, id: string): Promise<Invoice> {
    return this.queue.read(async (em) => {
      const invoice = await this.own(em, user, id);
      if (invoice.status !== 'issued') throw new NotFoundException('This is a draft: it has no PDF until it is issued.');
      return invoice;
    });
  }

  /** A new draft for the job, built from its visits, copied from an issued quote, or empty; warnings say what could not be priced. */
  create(user: AuthUser, jobId: string, dto: CreateInvoiceDto): Promise<InvoiceDetail & { warnings: string[]; leftOut: string[] }> {
    return this.queue.run(async (em) => {
      const file = await loadJobFile(em, user.organisationId, jobId);
      const book = await loadRateBook(em, user.organisationId);
      let drafts: LineDraft[] = [];
      let warnings: string[] = [];
      let leftOut: string[] = [];
      let fromQuoteId: string | null = null;
      const from = dto.from ?? 'job';
      if (from === 'job') ({ lines: drafts, warnings, leftOut } = await linesFromJob(em, file, book));
      if (from === 'quote') {
        const quote = await em.findOneBy(Invoice, { id: dto.quoteId!, organisationId: user.organisationId, jobId, kind: 'quote', status: 'issued' });
        if (!quote) throw new BadRequestException('quoteId must be the id of an issued quote of this job.');
        drafts = (await linesOf(em, quote.id)).map(draftOf);
        fromQuoteId = quote.id;
      }
      const invoice = await saveDraft(em, {
        organisationId: user.organisationId,
        jobId,
        kind: dto.kind,
        createdById: user.id,
        drafts,
        termDays: dto.kind === 'quote' ? file.organisation.quoteValidDays : file.organisation.paymentTermsDays,
        fromQuoteId,
      });
      return { ...(await detail(em, invoice, localDate(new Date(), file.organisation.timeZone))), warnings, leftOut };
    });
  }

  /** Changes a draft; an issued document refuses every change. */
  update(user: AuthUser, id: string, dto: UpdateInvoiceDto): Promise<InvoiceDetail> {
    if (dto.lines === undefined && dto.notes === undefined && dto.termDays === undefined) throw new BadRequestException('Nothing to change: send lines, notes or termDays.');
    if (dto.termDays === null) throw new BadRequestException(['termDays cannot be emptied']);
    return this.queue.run(async (em) => {
      const invoice = await this.draft(em, user, id);
      if (dto.notes !== undefined) invoice.notes = dto.notes;
      if (dto.termDays !== undefined) invoice.termDays = dto.termDays;
      if (dto.lines) {
        const drafts: LineDraft[] = dto.lines.map((l) => ({ ...l, unit: l.unit ?? null, visitId: l.visitId ?? null, priceItemId: l.priceItemId ?? null, labourRateId: l.labourRateId ?? null, partUseIds: l.partUseIds ?? null }));
        const { lines } = priceLines(await withCreditRates(em, invoice, drafts), await loadRateBook(em, user.organisationId), signOf(invoice.kind));
        await writeLines(em, invoice, lines);
      }
      await em.save(invoice);
      return detail(em, invoice, await todayFor(em, user.organisationId));
    });
  }

  /** A draft that was never issued goes without trace: it has no number, so no gap is left. */
  remove(user: AuthUser, id: string): Promise<void> {
    return this.queue.run(async (em) => {
      const invoice = await this.draft(em, user, id);
      await writeLines(em, invoice, []);
      await em.delete(Invoice, { id: invoice.id });
    });
  }

  /** A draft credit note taking back every line of an issued invoice; the office removes or reduces lines before issuing it. */
  creditNote(user: AuthUser, invoiceId: string): Promise<InvoiceDetail> {
    return this.queue.run(async (em) => {
      const invoice = await this.own(em, user, invoiceId);
      if (invoice.kind !== 'invoice' || invoice.status !== 'issued') throw new ConflictException('Only an issued invoice can be credited.');
      const waiting = await em.findOneBy(Invoice, { organisationId: user.organisationId, creditsInvoiceId: invoice.id, kind: 'credit-note', status: 'draft' });
      if (waiting) return detail(em, waiting, await todayFor(em, user.organisationId));
      const drafts = (await linesOf(em, invoice.id)).map((l) => ({ ...draftOf(l), quantity: l.quantity.startsWith('-') ? l.quantity.slice(1) : `-${l.quantity}` }));
      const credit = await saveDraft(em, {
        organisationId: user.organisationId,
        jobId: invoice.jobId,
        kind: 'credit-note',
        createdById: user.id,
        drafts,
        termDays: 0,
        creditsInvoiceId: invoice.id,
      });
      return detail(em, credit, await todayFor(em, user.organisationId));
    });
  }

  /** Numbers, prints and freezes a draft, in one transaction: a refusal or a failure uses no number. */
  async issue(user: AuthUser, id: string): Promise<InvoiceDetail> {
    const issued = await this.queue.run(async (em) => {
      const invoice = await this.draft(em, user, id);
      await issueDraft(em, { invoice, issuer: user, now: new Date(), storage: this.storage, cardPayments: !!this.payments.apiKey });
      // An invoice issued, or one credited, may be what the job waited on; a quote moves nothing.
      if (invoice.kind !== 'quote') await this.progress.follow(em, { userId: user.id, organisationId: user.organisationId, role: user.role }, [invoice.jobId]);
      return detail(em, invoice, invoice.issueDate!);
    });
    this.logger.log(`Issued ${issued.number} for job ${issued.jobId}`);
    // A credit note lowers what its invoice owes.
    if (issued.creditsInvoiceId) await this.owedChanges.changed(issued.creditsInvoiceId);
    return issued;
  }

  private async own(em: EntityManager, user: AuthUser, id: string): Promise<Invoice> {
    const invoice = await em.findOneBy(Invoice, { id, organisationId: user.organisationId });
    if (!invoice) throw new NotFoundException('No such quote, invoice or credit note.');
    return invoice;
  }

  private async draft(em: EntityManager, user: AuthUser, id: string): Promise<Invoice> {
    const invoice = await this.own(em, user, id);
    if (invoice.status !== 'draft') {
      throw new ConflictException(
        invoice.kind === 'invoice'
          ? `Invoice ${invoice.number} is issued and cannot be changed: raise a credit note to correct it.`
          : `${INVOICE_NAMES[invoice.kind]} ${invoice.number} is issued and cannot be changed.`,
      );
    }
    return invoice;
  }

  /** Issued quotes, invoices and credit notes of the link's job, for the customer: what each asks and what is still owed. */
  async shared(token: string): Promise<SharedInvoiceList> {
    const link = await this.shareLinks.open(token);
    const items = await this.queue.read(async (em) => {
      const rows = await em.find(Invoice, { where: { organisationId: link.organisationId, jobId: link.jobId, status: 'issued' }, order: { issuedAt: 'ASC', id: 'ASC' } });
      return summarise(em, link.organisationId, rows, await todayFor(em, link.organisationId));
    });
    const base = `/api/shared/${token}/invoices`;
    const card = !!this.payments.apiKey;
    return {
      cardPayments: card,
      items: items.map((i) => ({
        id: i.id,
        kind: i.kind,
        number: i.number!,
        issueDate: i.issueDate!,
        dueDate: i.dueDate!,
        grossMinor: i.grossMinor,
        creditsNumber: i.creditsNumber,
        owedMinor: i.account?.owedMinor ?? null,
        state: i.account?.state ?? null,
        overdueDays: i.account?.overdueDays ?? 0,
        lapsed: i.lapsed,
        payByCard: card && !!i.account && i.account.owedMinor > 0,
        pdfUrl: `${base}/${i.id}/pdf`,
      })),
    };
  }

  /** An issued quote, invoice or credit note of the link's job; anything else is not found. */
  async sharedIssued(token: string, id: string): Promise<Invoice> {
    const link = await this.shareLinks.open(token);
    const invoice = await this.queue.read((em) => em.findOneBy(Invoice, { id, organisationId: link.organisationId, jobId: link.jobId, status: 'issued' }));
    if (!invoice) throw new NotFoundException('No such invoice on this job.');
    return invoice;
  }
}
