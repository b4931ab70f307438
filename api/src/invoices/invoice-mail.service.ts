import { ConflictException, Inject, Injectable, Logger, NotFoundException, type OnModuleInit } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { formatMoney, type InvoiceDetail, INVOICE_NAMES } from '@wiretrail/core';
import { type EntityManager, IsNull, Not } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { mailConfig } from '../config/app.config.js';
import { paymentsConfig } from '../config/payments.config.js';
import type { OutboxMessage } from '../mail/entities/outbox-message.entity.js';
import { MailOutbox } from '../mail/mail-outbox.service.js';
import type { MailAttachment } from '../mail/mail.service.js';
import { type CoveringLetter, coveringLetter, theWork } from '../paperwork/covering-letter.js';
import { mailTemplate } from '../mail/mail-template.js';
import { documentTitle } from '../paperwork/document-titles.js';
import type { SendDocumentDto } from '../paperwork/dto/send-document.dto.js';
import { type IssuedFile, issuedPdfAttachment } from '../paperwork/issued-pdf.js';
import { type JobFile, loadJobFile } from '../paperwork/job-file.js';
import { isLatestMessage, mailState } from '../paperwork/mail-state.js';
import { dateWords } from '../paperwork/pdf/document-words.js';
import { ShareLinksService } from '../share-links/share-links.service.js';
import type { FileStorage } from '../storage/file-storage.js';
import { DOCUMENT_STORAGE, INVOICE_STORAGE } from '../storage/file-stores.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { Invoice } from './entities/invoice.entity.js';
import { detail, todayFor } from './invoice-accounts.js';

export const INVOICE_MAIL = 'invoice';

const day = (date: string | null, timeZone: string) => (date ? dateWords(`${date}T12:00:00Z`, timeZone) : '');

interface InvoiceLetter extends CoveringLetter {
  kind: { invoice: boolean; quote: boolean; credit: boolean };
  number: string;
  amount: string;
  work: string;
  due: string;
  documents: string[];
  card: boolean;
  until: string;
  url: string;
  instructions: string | null;
}

/** The letter that goes with a quote, an invoice or a credit note; both parts of the e-mail come from it. */
const INVOICE_LETTER = mailTemplate<InvoiceLetter>(`{{#> covering}}
{{#if kind.invoice}}
Attached is invoice {{number}} for {{amount}} for {{work}}. Please pay by {{due}}.
{{/if}}
{{#if kind.quote}}
Attached is our quote {{number}} for {{amount}} for {{work}}. It stands until {{due}}.
{{/if}}
{{#if kind.credit}}
Attached is credit note {{number}}, which takes {{amount}} off what is owed for {{work}}.
{{/if}}
{{#if documents.length}}

The job’s documents are attached too: {{list documents}}.
{{/if}}

You can see the job's record, with its photos and documents{{#if card}}, and pay by card{{/if}}, at this link until {{until}}:
{{link url}}
{{#if instructions}}

To pay by bank transfer or cheque: {{instructions}} Please give {{number}} as the reference.
{{/if}}
{{/covering}}`);

/**
 * E-mails an issued quote, invoice or credit note through the mail outbox, with a new share link to the job's
 * record (where an invoice can be paid by card). An invoice goes with the job's issued certificates and reports
 * attached. The outbox's news is written back to the invoice (queued, sent, or failed with the reason).
 */
@Injectable()
export class InvoiceMailService implements OnModuleInit {
  private readonly logger = new Logger('InvoiceMail');

  constructor(
    private readonly queue: WriteQueue,
    private readonly outbox: MailOutbox,
    private readonly shareLinks: ShareLinksService,
    @Inject(DOCUMENT_STORAGE) private readonly documents: FileStorage,
    @Inject(INVOICE_STORAGE) private readonly invoices: FileStorage,
    @Inject(mailConfig.KEY) private readonly mail: ConfigType<typeof mailConfig>,
    @Inject(paymentsConfig.KEY) private readonly payments: ConfigType<typeof paymentsConfig>,
  ) {}

  onModuleInit(): void {
    this.outbox.register(INVOICE_MAIL, {
      attachments: (message) => this.attachments(message),
      settled: (em, message) => this.recordMailState(em, message),
    });
  }

  async send(user: AuthUser, id: string, dto: SendDocumentDto): Promise<{ invoice: InvoiceDetail; shareLink: { id: string; expiresAt: string } }> {
    return this.queue.run(async (em) => {
      const invoice = await em.findOneBy(Invoice, { id, organisationId: user.organisationId });
      if (!invoice) throw new NotFoundException('No such quote, invoice or credit note.');
      if (invoice.status !== 'issued' || !invoice.pdfSha256) throw new ConflictException('Only an issued quote, invoice or credit note can be e-mailed.');
      const file = await loadJobFile(em, user.organisationId, invoice.jobId);
      const documents = invoice.kind === 'invoice' ? await this.jobDocuments(em, invoice) : [];
      const link = await this.shareLinks.createIn(em, user, invoice.jobId, { days: dto.linkDays, label: `E-mailed with ${invoice.number} to ${dto.to}` });
      await this.outbox.enqueue(em, {
        organisationId: user.organisationId,
        purpose: INVOICE_MAIL,
        subjectId: invoice.id,
        to: dto.to,
        cc: dto.cc ?? null,
        createdById: user.id,
        ...this.letter(file, invoice, documents, dto, link.url, link.expiresAt),
      });
      Object.assign(invoice, { emailState: 'queued', emailedTo: dto.to, emailedAt: null, emailError: null });
      await em.save(invoice);
      return { invoice: await detail(em, invoice, await todayFor(em, user.organisationId)), shareLink: { id: link.id, expiresAt: link.expiresAt } };
    });
  }

  private jobDocuments(em: EntityManager, invoice: Invoice): Promise<SyncRecord<'document'>[]> {
    return syncRepository(em, 'document').find({
      where: { jobId: invoice.jobId, organisationId: invoice.organisationId, deletedAt: IsNull(), issuedAt: Not(IsNull()), pdfSha256: Not(IsNull()) },
      order: { issuedAt: 'ASC' },
    });
  }

  private letter(file: JobFile, invoice: Invoice, documents: SyncRecord<'document'>[], dto: SendDocumentDto, url: string, expiresAt: string): { subject: string; text: string; html: string } {
    const org = file.organisation;
    const tz = org.timeZone;
    const subject = `${INVOICE_NAMES[invoice.kind]} ${invoice.number} from ${org.name}`;
    return {
      subject,
      ...INVOICE_LETTER(subject, {
        ...coveringLetter(file, dto.to, dto.message),
        kind: { invoice: invoice.kind === 'invoice', quote: invoice.kind === 'quote', credit: invoice.kind === 'credit-note' },
        number: invoice.number ?? '',
        amount: formatMoney(Math.abs(invoice.grossMinor)),
        work: theWork(file),
        due: day(invoice.dueDate, tz),
        documents: documents.map((d) => `${documentTitle(d.kind, d.title)} ${d.number}`),
        card: invoice.kind === 'invoice' && !!this.payments.apiKey,
        until: dateWords(expiresAt, tz),
        url,
        instructions: invoice.kind === 'invoice' ? invoice.paymentInstructions : null,
      }),
    };
  }

  /** The invoice's PDF and, with an invoice, the job's documents: each exactly as issued, checked by its fingerprint. */
  private async attachments(message: OutboxMessage): Promise<MailAttachment[]> {
    const { invoice, documents } = await this.queue.read(async (em) => {
      const invoice = await em.findOneBy(Invoice, { id: message.subjectId ?? '', organisationId: message.organisationId });
      return { invoice, documents: invoice?.kind === 'invoice' ? await this.jobDocuments(em, invoice) : [] };
    });
    if (!invoice?.pdfSha256) throw new Error('The invoice is no longer on the server.');
    const attached: MailAttachment[] = [];
    // The invoice from the invoices' store, the job's documents from theirs.
    const files: Array<[FileStorage, IssuedFile]> = [[this.invoices, invoice], ...documents.map((d): [FileStorage, IssuedFile] => [this.documents, d])];
    for (const [storage, f] of files) attached.push(await issuedPdfAttachment(storage, f));
    return attached;
  }

  private async recordMailState(em: EntityManager, message: OutboxMessage): Promise<void> {
    const invoice = await em.findOneBy(Invoice, { id: message.subjectId ?? '', organisationId: message.organisationId });
    if (!invoice) return;
    if (!(await isLatestMessage(em, message))) return;
    const set = mailState(message, this.mail.maxAttempts);
    await em.update(Invoice, { id: invoice.id }, set);
    if (set.emailState === 'failed') this.logger.warn(`${invoice.number} was not e-mailed: ${set.emailError}`);
  }
}
