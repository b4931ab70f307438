import { GoneException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { createHash, randomBytes } from 'node:crypto';
import { isVoided, type NewShareLink, type SharedJob, type ShareLinkState, type ShareLinkView } from '@wiretrail/core';
import { type EntityManager, In, IsNull, Not } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { mailConfig } from '../config/app.config.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import type { CreateShareLinkDto } from './dto/create-share-link.dto.js';
import { SHARE_LINK_DAYS } from './dto/create-share-link.dto.js';
import { ShareLink } from './entities/share-link.entity.js';
import { inTurn } from '../common/in-turn.js';

/** 32 random bytes in base64url: the whole token, 43 characters. */
const TOKEN = /^[A-Za-z0-9_-]{43}$/;
const DAY_MS = 24 * 60 * 60 * 1000;
const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

const NOT_VALID = 'This link is not valid. Check that it was copied whole, or ask the contractor for a new one.';
const EXPIRED = 'This link has expired. Ask the contractor for a new one if you still need it.';
const REVOKED = 'This link has been withdrawn by the contractor. Ask them for a new one if you still need it.';

const stateOf = (link: ShareLink, now = Date.now()): ShareLinkState => (link.revokedAt ? 'revoked' : link.expiresAt.getTime() <= now ? 'expired' : 'active');
const iso = (d: Date | null) => (d ? d.toISOString() : null);

function viewOf(link: ShareLink): ShareLinkView {
  return {
    id: link.id,
    jobId: link.jobId,
    label: link.label,
    createdAt: link.createdAt.toISOString(),
    createdById: link.createdById,
    expiresAt: link.expiresAt.toISOString(),
    revokedAt: iso(link.revokedAt),
    lastOpenedAt: iso(link.lastOpenedAt),
    openCount: link.openCount,
    state: stateOf(link),
  };
}

/**
 * Links that let a customer read one job's record without an account: expiring, revocable, scoped to their job.
 * The token is random and only its sha256 is stored, so the database alone never lets anyone open a link.
 */
@Injectable()
export class ShareLinksService {
  constructor(
    private readonly queue: WriteQueue,
    @Inject(mailConfig.KEY) private readonly mail: ConfigType<typeof mailConfig>,
  ) {}

  create(user: AuthUser, jobId: string, dto: CreateShareLinkDto): Promise<NewShareLink> {
    return this.queue.run((em) => this.createIn(em, user, jobId, dto));
  }

  /** Makes a link inside the caller's transaction (an e-mailed document brings one with it). */
  async createIn(em: EntityManager, user: AuthUser, jobId: string, dto: CreateShareLinkDto): Promise<NewShareLink> {
    await this.jobOf(em, user.organisationId, jobId);
    const token = randomBytes(32).toString('base64url');
    const link = em.create(ShareLink, {
      organisationId: user.organisationId,
      jobId,
      tokenHash: sha256(token),
      label: dto.label || null,
      expiresAt: new Date(Date.now() + (dto.days ?? SHARE_LINK_DAYS.default) * DAY_MS),
      revokedAt: null,
      revokedById: null,
      createdById: user.id,
      lastOpenedAt: null,
      openCount: 0,
    });
    await em.save(link);
    return { ...viewOf(link), url: `${this.mail.publicUrl}/shared/${token}` };
  }

  async list(user: AuthUser, jobId: string): Promise<{ items: ShareLinkView[] }> {
    const links = await this.queue.read(async (em) => {
      await this.jobOf(em, user.organisationId, jobId);
      return em.find(ShareLink, { where: { organisationId: user.organisationId, jobId }, order: { createdAt: 'DESC', id: 'DESC' } });
    });
    return { items: links.map(viewOf) };
  }

  /** Stops a link at once; revoking one already revoked changes nothing. */
  async revoke(user: AuthUser, id: string): Promise<ShareLinkView> {
    const link = await this.queue.run(async (em) => {
      const link = await em.findOneBy(ShareLink, { id, organisationId: user.organisationId });
      if (!link) throw new NotFoundException('No such share link.');
      if (!link.revokedAt) {
        Object.assign(link, { revokedAt: new Date(), revokedById: user.id });
        await em.save(link);
      }
      return link;
    });
    return viewOf(link);
  }

  /** The job a valid token opens, or a refusal that says only whether the link is unknown, expired or withdrawn. */
  async open(token: string): Promise<ShareLink> {
    return this.queue.read((em) => this.linkFor(em, token));
  }

  async view(token: string): Promise<SharedJob> {
    return this.queue.run(async (em) => {
      const link = await this.linkFor(em, token);
      const org = link.organisationId;
      const job = await this.jobOf(em, org, link.jobId);
      const [organisation, site, customer, visits, documents] = await inTurn(
        () => em.findOneByOrFail(Organisation, { id: org }),
        () => syncRepository(em, 'site').findOne({ where: { id: job.siteId, organisationId: org }, withDeleted: true }),
        () => syncRepository(em, 'customer').findOne({ where: { id: job.customerId, organisationId: org }, withDeleted: true }),
        () => syncRepository(em, 'visit').find({ where: { jobId: job.id, organisationId: org, deletedAt: IsNull() }, select: { id: true } }),
        () => syncRepository(em, 'document').find({
          where: { jobId: job.id, organisationId: org, deletedAt: IsNull(), issuedAt: Not(IsNull()), pdfSha256: Not(IsNull()) },
          order: { issuedAt: 'ASC' },
        }),
      );
      const photos = visits.length
        ? await syncRepository(em, 'photo').find({ where: { visitId: In(visits.map((v) => v.id)), organisationId: org, deletedAt: IsNull() }, order: { takenAt: 'ASC', id: 'ASC' } })
        : [];
      // Only photos whose bytes are here can be shown.
      const hashes = [...new Set(photos.map((p) => p.sha256).filter((h): h is string => typeof h === 'string'))];
      const held = hashes.length ? new Set((await em.find(PhotoBlob, { where: { organisationId: org, sha256: In(hashes) }, select: { sha256: true } })).map((b) => b.sha256)) : new Set();
      const areas = site ? await syncRepository(em, 'area').find({ where: { siteId: site.id, organisationId: org }, select: { id: true, name: true } }) : [];
      const areaName = new Map<string | null, string>(areas.map((a) => [a.id, a.name]));
      await em.update(ShareLink, { id: link.id }, { openCount: link.openCount + 1, lastOpenedAt: new Date() });
      const base = `/api/shared/${token}`;
      return {
        expiresAt: link.expiresAt.toISOString(),
        contractor: { name: organisation.name, phone: organisation.phone, email: organisation.email },
        job: {
          reference: job.reference ?? null,
          title: job.title,
          status: job.status ?? null,
          customerName: customer?.name ?? null,
          siteAddress: [site?.address, site?.postcode].filter((p) => typeof p === 'string' && p).join(', '),
        },
        // A photo voided on site (the wrong board) is not the customer's to see.
        photos: photos
          .filter((p) => held.has(p.sha256) && !isVoided(p))
          .map((p) => ({
            id: p.id,
            caption: p.caption ?? null,
            area: areaName.get(p.areaId) ?? null,
            takenAt: p.takenAt ?? null,
            thumbUrl: `${base}/photos/${p.id}/thumb`,
            displayUrl: `${base}/photos/${p.id}/display`,
          })),
        // Issued documents all carry a number and a time of issue; the query asked for issued ones only.
        documents: documents.flatMap(({ id, number, kind, title, issuedAt }) =>
          number !== null && issuedAt !== null ? [{ id, number, kind, title: title ?? null, issuedAt, pdfUrl: `${base}/documents/${id}/pdf` }] : [],
        ),
      };
    });
  }

  /** An issued document of the link's job; any other document is not found. */
  async document(token: string, documentId: string): Promise<SyncRecord<'document'>> {
    return this.queue.read(async (em) => {
      const link = await this.linkFor(em, token);
      const doc = await syncRepository(em, 'document').findOneBy({ id: documentId, organisationId: link.organisationId, jobId: link.jobId, deletedAt: IsNull(), issuedAt: Not(IsNull()) });
      if (!doc) throw new NotFoundException('No such document on this job.');
      return doc;
    });
  }

  private async linkFor(em: EntityManager, token: string): Promise<ShareLink> {
    const link = TOKEN.test(token) ? await em.findOneBy(ShareLink, { tokenHash: sha256(token) }) : null;
    if (!link) throw new NotFoundException(NOT_VALID);
    const state = stateOf(link);
    if (state !== 'active') {
      // A link that once worked belongs to a customer of this contractor: say how to reach them for a new one.
      const org = await em.findOne(Organisation, { where: { id: link.organisationId }, select: { id: true, name: true, phone: true, email: true } });
      const contact = org ? ` ${org.name}: ${[org.phone, org.email].filter(Boolean).join(' · ') || 'ask them directly'}.` : '';
      throw new GoneException(`${state === 'revoked' ? REVOKED : EXPIRED}${contact}`);
    }
    return link;
  }

  private async jobOf(em: EntityManager, organisationId: string, jobId: string): Promise<SyncRecord<'job'>> {
    const job = await syncRepository(em, 'job').findOneBy({ id: jobId, organisationId, deletedAt: IsNull() });
    if (!job) throw new NotFoundException('No such job.');
    return job;
  }
}
