import { ConflictException, Inject, Injectable, Logger, NotFoundException, type OnModuleInit, UnprocessableEntityException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import {
  certificateThatApplies,
  DEFAULT_RULE_SET,
  defaultParticulars,
  type DocumentCoverage,
  type HeldChange,
  type InstallationCertificatePreview,
  type InstallationParticulars,
  type IssuedDocument,
  isSyncEntity,
  readParticulars,
  type SyncedRow,
} from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { officeActor, officeMutation } from '../records/records.service.js';
import { WriteQueue } from '../common/write-queue.js';
import { mailConfig } from '../config/app.config.js';
import { OutboxMessage } from '../mail/entities/outbox-message.entity.js';
import { MailOutbox } from '../mail/mail-outbox.service.js';
import { type CoveringLetter, coveringLetter, theWork } from '../paperwork/covering-letter.js';
import { mailTemplate } from '../mail/mail-template.js';
import { CABLING_REPORT_TITLE, documentTitle, HIDDEN_ROUTES_TITLE, INSTALLATION_CERTIFICATE_TITLE, MINOR_WORKS_TITLE, PHOTO_RECORD_TITLE } from '../paperwork/document-titles.js';
import { takeNextNumber } from '../paperwork/document-numbers.js';
import type { SendDocumentDto } from '../paperwork/dto/send-document.dto.js';
import { PrintedRecord } from '../paperwork/entities/printed-record.entity.js';
import { fingerprint, issuedPdfAttachment } from '../paperwork/issued-pdf.js';
import { type JobFile, jobVisits, loadJobFile } from '../paperwork/job-file.js';
import { isLatestMessage, mailState } from '../paperwork/mail-state.js';
import { dateWords } from '../paperwork/pdf/document-words.js';
import type { Issue } from '../paperwork/pdf/job-heading.js';
import { ShareLinksService } from '../share-links/share-links.service.js';
import { type FileStorage, StoredFileMissing } from '../storage/file-storage.js';
import { DOCUMENT_STORAGE, documentKey, PHOTO_STORAGE, photoKey } from '../storage/file-stores.js';
import { insertMany } from '../sync/bulk-write.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { type Actor, type RecordKey, SyncEngine } from '../sync/sync-engine.service.js';
import { toPulledRow, toSyncedRow } from '../sync/sync.service.js';
import { User } from '../users/entities/user.entity.js';
import {
  cableNotices,
  installationCertificatePrints,
  loadCableSchedule,
  loadInstallationCertificate,
  loadMinorWorks,
  loadPhotoRecord,
  minorWorksPrints,
} from './document-content.js';
import type { DocumentKind } from './dto/issue-document.dto.js';
import { DOCUMENT_LOCK } from './document-lock.js';
import type { ReviseDocumentDto } from './dto/revise-document.dto.js';
import { heldChangesOf } from './held-changes.js';
import { cablingReportPdf, cablingReportTitle } from './pdf/cabling-report-pdf.js';
import { installationCertificatePdf } from './pdf/installation-certificate-pdf.js';
import { minorWorksPdf } from './pdf/minor-works-pdf.js';
import { photoRecordPdf } from './pdf/photo-record-pdf.js';
import { hiddenRoutesOnPaper, hiddenRoutesPdf } from './pdf/hidden-routes-pdf.js';
import { loadSiteHiddenRoutes } from '../hidden-routes/site-hidden-routes.js';
import { signatureImage } from './signature-image.js';
import sharp from 'sharp';

const KINDS: Record<DocumentKind, { prefix: string; title: string }> = {
  'minor-works': { prefix: 'MW', title: MINOR_WORKS_TITLE },
  'cabling-report': { prefix: 'CR', title: CABLING_REPORT_TITLE },
  'photo-record': { prefix: 'PR', title: PHOTO_RECORD_TITLE },
  'installation-certificate': { prefix: 'EIC', title: INSTALLATION_CERTIFICATE_TITLE },
  'hidden-routes': { prefix: 'HR', title: HIDDEN_ROUTES_TITLE },
};

export const DOCUMENT_MAIL = 'document';


/** The letter that goes with one or several of a job's documents; both parts of the e-mail come from it. */
const DOCUMENT_LETTER = mailTemplate<CoveringLetter & { papers: string[]; several: boolean; work: string; until: string; url: string }>(`{{#> covering}}
{{#if several}}Attached are {{list papers}} for {{work}}.{{else}}Attached is {{list papers}} for {{work}}.{{/if}}

You can also see the job's record, with its photos and documents, at this link until {{until}}:
{{link url}}
{{/covering}}`);

/** What a document kind puts into the PDF, rendered inside the issuing transaction. */
interface Rendered {
  pdf: Buffer;
  visitId: string | null;
  signerName: string;
}

/** A document checked and ready to number: how to render it, the records it prints (which its lock holds), and what to tell the office. */
interface Prepared {
  render: (issue: Issue) => Promise<Rendered>;
  /** The document's title where its content decides it (a cabling report that certifies every link). */
  title?: string;
  printed: RecordKey[];
  notices: string[];
  /** An installation certificate's particulars as checked, kept on its row for its revisions. */
  particulars?: InstallationParticulars;
}


/** An issue or revision as answered: the synced row, and what the office should know about it now (core's IssuedDocument). */
type IssuedAnswer = SyncedRow & Pick<IssuedDocument, 'notices'>;

/** What a revision brings: the document it supersedes, why, and its new row's id (which the old one names). */
interface Revision {
  old: SyncRecord<'document'>;
  reason: string;
  id: string;
}

/**
 * Issues the office's documents: numbered per organisation without gaps, rendered to PDF from the records as
 * they stand (every verdict worked out again here), stored, and recorded as a synced row whose `issuedAt` locks
 * the records behind it. Nothing changes an issued PDF; sending it by e-mail goes through the mail outbox.
 */
@Injectable()
export class DocumentsService implements OnModuleInit {
  private readonly logger = new Logger('Documents');

  constructor(
    private readonly queue: WriteQueue,
    private readonly engine: SyncEngine,
    private readonly outbox: MailOutbox,
    private readonly shareLinks: ShareLinksService,
    @Inject(DOCUMENT_STORAGE) private readonly storage: FileStorage,
    @Inject(PHOTO_STORAGE) private readonly photoStorage: FileStorage,
    @Inject(mailConfig.KEY) private readonly mail: ConfigType<typeof mailConfig>,
  ) {}

  onModuleInit(): void {
    this.engine.lockRule('document', DOCUMENT_LOCK);
    this.outbox.register(DOCUMENT_MAIL, {
      attachments: (message) => this.attachment(message),
      settled: (em, message) => this.recordMailState(em, message),
    });
  }

  async issue(user: AuthUser, jobId: string, kind: DocumentKind, coverage?: DocumentCoverage, particulars?: unknown): Promise<IssuedAnswer> {
    // Photos are made print-ready before the transaction: their bytes never change, and the write queue should not wait on them.
    const images = await this.printablePhotos(user.organisationId, jobId, kind);
    const { row, notices } = await this.queue.run((em) => this.issueIn(em, user, jobId, kind, images, coverage ?? null, null, particulars));
    this.logger.log(`Issued ${row.number} for job ${jobId}`);
    return { ...toPulledRow(row), notices };
  }

  /**
   * A correction: a new document of the same kind for the same job, with a new number, naming the one it supersedes
   * and why. The old one stays, marked superseded, and its lock lifts so that the pending changes the office takes
   * (kept conflicts of its records) are made before the new one prints the records and locks them again. All in one
   * transaction: a refused revision changes nothing and uses no number.
   */
  async revise(user: AuthUser, id: string, dto: ReviseDocumentDto): Promise<IssuedAnswer> {
    const first = await this.row(user, id);
    const images = await this.printablePhotos(user.organisationId, first.jobId, first.kind);
    const { row, notices } = await this.queue.run(async (em) => {
      const old = await this.documentOf(em, user.organisationId, id);
      if (!old.issuedAt) throw new ConflictException(`${old.number} was never issued, so there is nothing to revise.`);
      if (old.supersededAt) throw new ConflictException(`${old.number} is already superseded; revise the document that superseded it.`);
      const actor = officeActor(user);
      const revision: Revision = { old, reason: dto.reason.trim(), id: uuidv7() };
      await this.engine.serverWrite(em, actor, 'document', [{ row: old, changes: { supersededAt: new Date().toISOString(), supersededById: revision.id } }]);
      await this.takeChanges(em, actor, old, dto.take ?? []);
      // A revised installation certificate keeps the particulars the office gave, unless it gives them again.
      return this.issueIn(em, user, old.jobId, old.kind as DocumentKind, images, (old.coverage as DocumentCoverage | null) ?? null, revision, dto.particulars ?? old.particulars);
    });
    this.logger.log(`Issued ${row.number}, superseding ${first.number}`);
    return { ...toPulledRow(row), notices };
  }

  /** The changes kept back by a document's lock that the office takes into its revision, made as the office's own edits. */
  private async takeChanges(em: EntityManager, actor: Actor, old: SyncRecord<'document'>, conflictIds: string[]): Promise<void> {
    if (!conflictIds.length) return;
    const conflicts = await syncRepository(em, 'conflict').findBy({ id: In(conflictIds), organisationId: actor.organisationId });
    const printed = await em.findBy(PrintedRecord, { documentId: old.id });
    const prints = new Set(printed.map((p) => `${p.entity}:${p.rowId}`));
    for (const conflictId of conflictIds) {
      const c = conflicts.find((x) => x.id === conflictId);
      if (!c || c.resolvedAt || c.reason !== DOCUMENT_LOCK.reason || !prints.has(`${c.entity}:${c.rowId}`)) {
        throw new UnprocessableEntityException([`Conflict ${conflictId} is not a change waiting behind ${old.number}.`]);
      }
      const entity = c.entity;
      const row = isSyncEntity(entity) ? await syncRepository(em, entity).findOne({ where: { id: c.rowId }, withDeleted: true }) : null;
      if (!row) throw new UnprocessableEntityException([`The record of conflict ${conflictId} no longer exists.`]);
      const set = c.field === '*' ? null : { [c.field]: c.discardedValue };
      const base = officeMutation(entity, row.id, row.version, set ?? {});
      const mutation = set ? base : { mutationId: base.mutationId, entity, id: row.id, baseVersion: row.version, hlc: base.hlc, delete: true as const };
      const [result] = await this.engine.applyAll(em, actor, [mutation]);
      if (result?.status === 'rejected') throw new UnprocessableEntityException([result.error ?? 'The change could not be made.']);
      if (result?.status === 'merged') {
        throw new ConflictException(`The change to this ${entity} is held by ${result.heldBy ?? 'another issued document'} too; revise that one first.`);
      }
      await this.engine.serverWrite(em, actor, 'conflict', [{
        row: c,
        changes: { resolvedAt: new Date(), resolvedById: actor.userId, resolution: { choice: 'discarded', revisedFrom: old.number } },
      }]);
    }
  }

  private async issueIn(
    em: EntityManager, user: AuthUser, jobId: string, kind: DocumentKind, images: Map<string, Buffer>, coverage: DocumentCoverage | null, revision: Revision | null,
    particulars?: unknown,
  ): Promise<{ row: SyncRecord; notices: string[] }> {
    const file = await loadJobFile(em, user.organisationId, jobId);
    const issuedAt = new Date();
    const id = revision?.id ?? uuidv7();
    // Numbered last, after every refusal, and in this transaction: a refused issue uses no number.
    const prepared = await this.prepare(em, kind, file, images, coverage ?? 'job', particulars);
    const number = await takeNextNumber(em, user.organisationId, kind, KINDS[kind].prefix);
    const supersedes = revision ? { number: revision.old.number ?? '', reason: revision.reason } : undefined;
    const rendered = await prepared.render({ number, issuedAt, issuedBy: user.name, supersedes });
    await this.storage.put(documentKey(user.organisationId, id), rendered.pdf, 'application/pdf');
    const printed = [...new Map(prepared.printed.map((r) => [`${r.entity}:${r.id}`, r])).values()];
    for (let i = 0; i < printed.length; i += 200) {
      await insertMany(em, PrintedRecord, printed.slice(i, i + 200).map((r) => ({ documentId: id, entity: r.entity, rowId: r.id, organisationId: user.organisationId })));
    }
    const set = {
      jobId: file.job.id,
      siteId: file.site.id,
      kind,
      visitId: rendered.visitId,
      number,
      title: `${prepared.title ?? KINDS[kind].title}: ${file.job.title}`.slice(0, 200),
      signerName: rendered.signerName,
      pdfSha256: fingerprint(rendered.pdf),
      pdfBytes: rendered.pdf.length,
      issuedAt: issuedAt.toISOString(),
      issuedById: user.id,
      ...(kind === 'cabling-report' ? { coverage: coverage ?? 'job' } : {}),
      ...(prepared.particulars ? { particulars: prepared.particulars } : {}),
      ...(revision ? { supersedesId: revision.old.id, revisionReason: revision.reason } : {}),
    };
    const row = await this.engine.serverCreate(em, officeActor(user), 'document', id, set);
    return { row, notices: prepared.notices };
  }

  /** Loads and checks what the document needs (refusing with every reason at once), and returns how to render it. */
  private async prepare(em: EntityManager, kind: DocumentKind, file: JobFile, images: Map<string, Buffer>, coverage: DocumentCoverage, given?: unknown): Promise<Prepared> {
    const rules = DEFAULT_RULE_SET;
    switch (kind) {
      case 'installation-certificate': {
        const read = readParticulars(given);
        const content = await loadInstallationCertificate(em, file, read.particulars);
        // The records' reasons first, then what the office's particulars lack.
        const problems = read.particulars ? content.problems : [...content.problems, ...read.problems];
        if (problems.length || !content.rules || !read.particulars) throw new UnprocessableEntityException(problems);
        const signer = content.visits[content.visits.length - 1]!;
        const signature = await signatureImage(signer.signatureSvg as string);
        const inForce = content.rules;
        const particulars = read.particulars;
        return {
          render: async (issue) => ({
            pdf: await installationCertificatePdf({ issue, file, content, rules: inForce, signature, particulars }),
            visitId: signer.id,
            signerName: signer.signedByName as string,
          }),
          printed: installationCertificatePrints(content),
          notices: [],
          particulars,
        };
      }
      case 'minor-works': {
        const content = await loadMinorWorks(em, file);
        if (content.problems.length || !content.rules) throw new UnprocessableEntityException(content.problems);
        const signer = content.visits[content.visits.length - 1]!;
        const signature = await signatureImage(signer.signatureSvg as string);
        const inForce = content.rules;
        return {
          render: async (issue) => ({
            pdf: await minorWorksPdf({ issue, file, content, rules: inForce, signature }),
            visitId: signer.id,
            signerName: signer.signedByName as string,
          }),
          printed: minorWorksPrints(file, content),
          notices: [],
        };
      }
      case 'cabling-report': {
        const cables = await loadCableSchedule(em, file, rules, coverage);
        if (!cables.length) {
          throw new UnprocessableEntityException([
            coverage === 'site'
              ? 'This site has no cable runs recorded, so there is no cable schedule to report.'
              : 'No cable was recorded or tested on this job’s visits. Choose the site’s whole cable schedule to report on the cables already there.',
          ]);
        }
        return {
          render: async (issue) => ({ pdf: await cablingReportPdf({ issue, file, cables, rules, coverage }), visitId: null, signerName: issue.issuedBy }),
          title: cablingReportTitle(cables),
          // The performance results printed are held with their cables.
          printed: [...cables.map((c) => ({ entity: 'cableRun' as const, id: c.run.id })), ...cables.flatMap((c) => (c.linkTest ? [{ entity: 'linkTest' as const, id: c.linkTest.id }] : []))],
          notices: cableNotices(cables),
        };
      }
      case 'photo-record': {
        const content = await loadPhotoRecord(em, file);
        if (!content.photos.length) {
          throw new UnprocessableEntityException([
            content.waiting
              ? 'None of this job’s photos has reached the office yet. Issue the photo record once the phones have sent them.'
              : 'This job has no photos to put in a photo record.',
          ]);
        }
        for (const { photo } of content.photos) {
          const sha = photo.sha256;
          if (!images.has(sha)) images.set(sha, await this.printable(file.organisation.id, sha));
        }
        return {
          render: async (issue) => ({ pdf: await photoRecordPdf({ issue, file, content, images }), visitId: null, signerName: issue.issuedBy }),
          printed: content.photos.map(({ photo }) => ({ entity: 'photo', id: photo.id })),
          notices: [],
        };
      }
      case 'hidden-routes': {
        const content = await loadSiteHiddenRoutes(em, file.organisation.id, file.site.id, true);
        if (!content.entries.length) {
          throw new UnprocessableEntityException([
            content.waiting
              ? 'None of this site’s marked photos has reached the office yet. Issue the record once the phones have sent them.'
              : 'No photo of this site has a route drawn on it, so there are no hidden routes to record.',
          ]);
        }
        for (const { photo } of content.entries) {
          const sha = photo.sha256 as string;
          if (!images.has(sha)) images.set(sha, await this.printable(file.organisation.id, sha));
        }
        const checked = hiddenRoutesOnPaper(content, rules);
        return {
          render: async (issue) => ({ pdf: await hiddenRoutesPdf({ issue, file, content: checked, images }), visitId: null, signerName: issue.issuedBy }),
          // The record holds the markups and the photos under them; the ties' cables and circuits may change their names.
          printed: content.entries.flatMap(({ photo, markup }) => [{ entity: 'photoMarkup' as const, id: markup.id }, { entity: 'photo' as const, id: photo.id }]),
          notices: checked.notices,
        };
      }
    }
  }

  /**
   * What the office's issue dialog starts from: which certificate the job's signed work needs and why, the
   * particulars as the site's records and the signer give them, and what the records still lack.
   */
  installationPreview(user: AuthUser, jobId: string): Promise<InstallationCertificatePreview> {
    return this.queue.read(async (em) => {
      const file = await loadJobFile(em, user.organisationId, jobId);
      const content = await loadInstallationCertificate(em, file, null);
      // What the work needs follows from what was recorded on any of the job's visits, signed or not yet.
      const visitIds = (await jobVisits(em, file)).map((v) => v.id);
      const circuits = await syncRepository(em, 'circuit').find({ where: { siteId: file.site.id, organisationId: user.organisationId, deletedAt: IsNull() } });
      const boards = await syncRepository(em, 'board').find({ where: { siteId: file.site.id, organisationId: user.organisationId, deletedAt: IsNull() } });
      const choice = certificateThatApplies({ visitIds, circuits, boards });
      const signer = content.visits.at(-1);
      const comments = content.visits.map((v) => (typeof v.existingInstallationComments === 'string' ? v.existingInstallationComments.trim() : '')).filter(Boolean);
      return {
        choice,
        defaults: defaultParticulars({
          site: file.site,
          signer: signer?.signedByName ?? '',
          choice,
          boardReplaced: boards.some((b) => visitIds.includes(b.replacedOnVisitId ?? '')),
          existingComments: comments,
        }),
        problems: content.problems,
        circuits: content.schedule.map((s) => `${s.board.name}: circuit ${s.circuit.number}${s.circuit.description ? ` (${s.circuit.description})` : ''}`),
      };
    });
  }

  /** Changes kept back by the job's standing documents, each beside the value as issued. */
  heldChanges(user: AuthUser, jobId: string): Promise<{ items: HeldChange[] }> {
    return this.queue.read(async (em) => {
      const job = await syncRepository(em, 'job').findOneBy({ id: jobId, organisationId: user.organisationId, deletedAt: IsNull() });
      if (!job) throw new NotFoundException('No such job.');
      return { items: await heldChangesOf(em, user.organisationId, jobId) };
    });
  }

  private async printablePhotos(organisationId: string, jobId: string, kind: DocumentKind): Promise<Map<string, Buffer>> {
    if (kind !== 'photo-record' && kind !== 'hidden-routes') return new Map();
    const hashes = await this.queue.read(async (em) => {
      const file = await loadJobFile(em, organisationId, jobId);
      if (kind === 'photo-record') return (await loadPhotoRecord(em, file)).photos.map((p) => p.photo.sha256);
      return (await loadSiteHiddenRoutes(em, organisationId, file.site.id, true)).entries.map((e) => e.photo.sha256 ?? '');
    });
    const images = new Map<string, Buffer>();
    // A few at a time: sharp works in its own threads, so the cores share a photo record of fifty.
    const queue = [...new Set(hashes)];
    const worker = async () => {
      for (let sha = queue.shift(); sha !== undefined; sha = queue.shift()) images.set(sha, await this.printable(organisationId, sha));
    };
    await Promise.all([worker(), worker(), worker(), worker()]);
    return images;
  }

  /**
   * The server-made display size, as a JPEG (PDFs carry JPEG and PNG, not WebP), small enough for a page of six.
   * Plain libjpeg, not mozjpeg: a tenth larger, three times quicker, and fifty photos had taken twenty seconds.
   */
  private async printable(organisationId: string, sha: string): Promise<Buffer> {
    try {
      const display = await this.photoStorage.get(photoKey(organisationId, sha, 'display'));
      return await sharp(display).resize({ width: 1100, height: 1100, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 78 }).toBuffer();
    } catch (err) {
      if (err instanceof StoredFileMissing) throw new ConflictException('A photo of this job is missing from storage; it cannot be printed.');
      throw err;
    }
  }

  async list(user: AuthUser, jobId: string): Promise<{ items: SyncedRow[] }> {
    const rows = await this.queue.read(async (em) => {
      const job = await syncRepository(em, 'job').findOneBy({ id: jobId, organisationId: user.organisationId, deletedAt: IsNull() });
      if (!job) throw new NotFoundException('No such job.');
      return syncRepository(em, 'document').find({
        where: { jobId, organisationId: user.organisationId, deletedAt: IsNull() },
        order: { issuedAt: 'DESC', id: 'DESC' },
      });
    });
    return { items: rows.map(toSyncedRow) };
  }

  async findOne(user: AuthUser, id: string): Promise<SyncedRow> {
    return toSyncedRow(await this.queue.read((em) => this.documentOf(em, user.organisationId, id)));
  }

  /** The stored row, for the PDF download. */
  row(user: AuthUser, id: string): Promise<SyncRecord<'document'>> {
    return this.queue.read((em) => this.documentOf(em, user.organisationId, id));
  }

  /**
   * Queues the document to be e-mailed with a new share link to the job's record, and marks it queued; the outbox
   * sends it and writes sent or failed (with the reason) back to the document, so every device sees how it went.
   */
  async send(user: AuthUser, id: string, dto: SendDocumentDto): Promise<{ document: SyncedRow; shareLink: { id: string; expiresAt: string } }> {
    const doc = await this.queue.read((em) => this.documentOf(em, user.organisationId, id));
    const { documents, shareLink } = await this.sendAll(user, doc.jobId, [id], dto);
    return { document: documents[0]!, shareLink };
  }

  /**
   * Several issued documents of one job in one e-mail, in the order named, with the office's own message and a copy
   * to another address if it gives them; each document's e-mail state follows the one message.
   */
  async sendAll(user: AuthUser, jobId: string, ids: string[], dto: SendDocumentDto): Promise<{ documents: SyncedRow[]; shareLink: { id: string; expiresAt: string } }> {
    const { rows, link } = await this.queue.run(async (em) => {
      const docs: SyncRecord<'document'>[] = [];
      for (const id of ids) {
        const doc = await syncRepository(em, 'document').findOneBy({ id, organisationId: user.organisationId, deletedAt: IsNull() });
        if (!doc || doc.jobId !== jobId) throw new NotFoundException(`documentIds: ${id} is not a document of this job.`);
        if (!doc.issuedAt || !doc.pdfSha256) throw new ConflictException(`documentIds: ${doc.number} is not issued, and only an issued document can be e-mailed.`);
        docs.push(doc);
      }
      const file = await loadJobFile(em, user.organisationId, jobId);
      const numbers = docs.map((d) => d.number).join(', ');
      const link = await this.shareLinks.createIn(em, user, file.job.id, { days: dto.linkDays, label: `E-mailed with ${numbers} to ${dto.to}`.slice(0, 200) });
      await this.outbox.enqueue(em, {
        organisationId: user.organisationId,
        purpose: DOCUMENT_MAIL,
        subjectId: docs[0]!.id,
        ...(docs.length > 1 ? { subjectIds: docs.map((d) => d.id) } : {}),
        to: dto.to,
        cc: dto.cc ?? null,
        createdById: user.id,
        ...this.letter(file, docs, dto, link.url, link.expiresAt),
      });
      await this.engine.serverWrite(
        em,
        officeActor(user),
        'document',
        docs.map((row) => ({ row, changes: { emailState: 'queued', emailedTo: dto.to, emailedAt: null, emailError: null } })),
      );
      return { rows: await syncRepository(em, 'document').findBy({ id: In(docs.map((d) => d.id)) }), link };
    });
    const byId = new Map(rows.map((r) => [r.id, r]));
    return { documents: ids.map((id) => toSyncedRow(byId.get(id)!)), shareLink: { id: link.id, expiresAt: link.expiresAt } };
  }

  private letter(file: JobFile, docs: SyncRecord<'document'>[], dto: SendDocumentDto, url: string, expiresAt: string): { subject: string; text: string; html: string } {
    const org = file.organisation;
    const papers = docs.map((d) => `${documentTitle(d.kind, d.title).toLowerCase()} ${d.number}`);
    const subject =
      docs.length === 1
        ? `${documentTitle(docs[0]!.kind, docs[0]!.title)} ${docs[0]!.number} from ${org.name}`
        : `${docs.map((d) => d.number).join(', ')} from ${org.name}`;
    return {
      subject,
      ...DOCUMENT_LETTER(subject, {
        ...coveringLetter(file, dto.to, dto.message),
        papers,
        several: docs.length > 1,
        work: theWork(file),
        until: dateWords(expiresAt, org.timeZone),
        url,
      }),
    };
  }

  /** Every document the message carries, each exactly as issued (checked by its fingerprint), in the order named. */
  private async attachment(message: OutboxMessage) {
    const ids = message.subjectIds?.length ? message.subjectIds : [message.subjectId ?? ''];
    const docs = await this.queue.read((em) => syncRepository(em, 'document').findBy({ id: In(ids), organisationId: message.organisationId }));
    const byId = new Map(docs.map((d) => [d.id, d]));
    const attached = [];
    for (const id of ids) {
      const doc = byId.get(id);
      if (!doc?.pdfSha256) throw new Error('A document of this e-mail is no longer on the server.');
      attached.push(await issuedPdfAttachment(this.storage, doc));
    }
    return attached;
  }

  /** Writes the outbox's news to each document the message carried, through the engine, so every device pulls it. */
  private async recordMailState(em: EntityManager, message: OutboxMessage): Promise<void> {
    if (!(await isLatestMessage(em, message))) return;
    const ids = message.subjectIds?.length ? message.subjectIds : [message.subjectId ?? ''];
    const docs = await syncRepository(em, 'document').findBy({ id: In(ids), organisationId: message.organisationId });
    if (!docs.length) return;
    const { emailedAt, ...state } = mailState(message, this.mail.maxAttempts);
    const set = { ...state, ...(emailedAt ? { emailedAt: emailedAt.toISOString() } : {}) };
    const sender = await em.findOneBy(User, { id: message.createdById, organisationId: message.organisationId });
    const actor = { id: message.createdById, organisationId: message.organisationId, role: sender?.role ?? 'office', email: sender?.email ?? '', name: sender?.name ?? '' };
    await this.engine.serverWrite(em, officeActor(actor, 'mail-outbox'), 'document', docs.map((row) => ({ row, changes: set })));
  }

  private async documentOf(em: EntityManager, organisationId: string, id: string): Promise<SyncRecord<'document'>> {
    const doc = await syncRepository(em, 'document').findOneBy({ id, organisationId, deletedAt: IsNull() });
    if (!doc) throw new NotFoundException('No such document.');
    return doc;
  }
}
