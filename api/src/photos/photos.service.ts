import { Inject, Injectable, NotFoundException, type OnModuleInit } from '@nestjs/common';
import type { Mutation, SyncedRow } from '@wiretrail/core';
import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import { type EntityManager, In, IsNull } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { User } from '../users/entities/user.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { ScopeService, type TechnicianScope } from '../sync/scope.service.js';
import { type Actor, SyncEngine, type Verdict } from '../sync/sync-engine.service.js';
import { toSyncedRow } from '../sync/sync.service.js';
import type { ListPhotosQueryDto } from './dto/list-photos-query.dto.js';
import { PhotoBlob } from './entities/photo-blob.entity.js';
import { PhotoSender } from './entities/photo-sender.entity.js';
import { PhotoRefused, processPhoto } from './image-processing.js';
import { type FileStorage, StoredFileMissing } from '../storage/file-storage.js';
import { PHOTO_STORAGE, photoKey, type StoredVariant } from '../storage/file-stores.js';
import { jsonListHas, textLike } from '../database/sql.js';

export interface PhotoPage {
  items: Array<SyncedRow & { visitPlannedStart: string | null; createdByName: string | null }>;
  total: number;
  page: number;
  pageSize: number;
}

/** What the controller needs to answer a request for one size of a photo. */
export interface PhotoFile {
  key: string;
  etag: string;
  contentType: string;
  bytes?: number;
  /** For the original: the name it downloads under. */
  filename?: string;
}

const EXTENSIONS: Record<string, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp', 'image/heic': 'heic', 'image/avif': 'avif' };
const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);
const sha256Of = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

@Injectable()
export class PhotosService implements OnModuleInit {
  constructor(
    private readonly queue: WriteQueue,
    private readonly engine: SyncEngine,
    private readonly scopes: ScopeService,
    @Inject(PHOTO_STORAGE) private readonly storage: FileStorage,
  ) {}

  onModuleInit(): void {
    this.engine.judgeWrites('photo', (em, actor, scope, mutations) => this.judgeHashes(em, actor, scope, mutations));
    // Devices send a photo's bytes before its row, so the row usually arrives to find them already here.
    this.engine.afterCreate('photo', async (em, actor, row) => {
      if (typeof row.sha256 !== 'string') return;
      const blob = await em.findOneBy(PhotoBlob, { organisationId: actor.organisationId, sha256: row.sha256 });
      if (blob) await this.markReady(em, actor, blob, [row]);
    });
  }

  /**
   * The hashes, of those asked about, that the server does not hold for this user yet; in the order asked. For a
   * technician, bytes held only outside their sites count as missing: whether they exist there is not theirs to
   * learn, and sending them proves they hold them.
   */
  async missing(user: AuthUser, hashes: string[]): Promise<{ missing: string[] }> {
    const unique = [...new Set(hashes)];
    if (!unique.length) return { missing: [] };
    const have = await this.queue.read(async (em) => {
      const held = await em.find(PhotoBlob, { where: { organisationId: user.organisationId, sha256: In(unique) }, select: { sha256: true } });
      const hashes = held.map((b) => b.sha256);
      if (user.role !== 'technician' || !hashes.length) return new Set(hashes);
      const scope = await this.scopes.technicianScope(em, user.organisationId, user.id);
      return this.shownTo(em, user.organisationId, user.id, scope.siteIds, hashes);
    });
    return { missing: unique.filter((h) => !have.has(h)) };
  }

  /** Of the given hashes, those a user has sent, or that a photo on one of the given sites already names. */
  private async shownTo(em: EntityManager, organisationId: string, userId: string, siteIds: ReadonlySet<string>, hashes: string[]): Promise<Set<string>> {
    const sent = await em.find(PhotoSender, { where: { organisationId, userId, sha256: In(hashes) }, select: { sha256: true } });
    const shown = new Set(sent.map((s) => s.sha256));
    const rest = hashes.filter((h) => !shown.has(h));
    if (rest.length && siteIds.size) {
      const rows = await em.getRepository<SyncRecord>('photo').find({
        where: { organisationId, sha256: In(rest), siteId: In([...siteIds]), deletedAt: IsNull() }, select: { id: true, sha256: true },
      });
      for (const r of rows) if (typeof r.sha256 === 'string') shown.add(r.sha256);
    }
    return shown;
  }

  /**
   * A technician's photo row may name bytes the server holds only if they sent them or a photo on one of their
   * sites already shows them: otherwise a hash seen elsewhere would open a photo from outside their sites. Bytes not
   * held yet are fine; the row waits for them. Read once for the whole batch.
   */
  private async judgeHashes(em: EntityManager, actor: Actor, scope: TechnicianScope | null, mutations: Mutation[]): Promise<Verdict> {
    if (!scope) return () => null;
    const hashes = [...new Set(mutations.map((m) => m.set?.sha256).filter((h): h is string => typeof h === 'string'))];
    if (!hashes.length) return () => null;
    const held = await em.find(PhotoBlob, { where: { organisationId: actor.organisationId, sha256: In(hashes) }, select: { sha256: true } });
    const heldHashes = held.map((b) => b.sha256);
    const shown = heldHashes.length ? await this.shownTo(em, actor.organisationId, actor.userId, scope.siteIds, heldHashes) : new Set<string>();
    const refused = new Set(heldHashes.filter((h) => !shown.has(h)));
    return ({ set }) =>
      typeof set.sha256 === 'string' && refused.has(set.sha256) ? 'That photo has not been sent from this phone. Send the photo itself, then its record.' : null;
  }

  /**
   * Keeps the bytes of a finished upload: checks them, stores the original and its sizes under the organisation,
   * records the blob and marks every photo row with this hash ready. Bytes already held are not stored again.
   * Throws PhotoRefused with a message for the phone.
   */
  async acceptUpload(user: AuthUser, claimedSha256: string, bytes: Buffer): Promise<void> {
    if (sha256Of(bytes) !== claimedSha256) {
      throw new PhotoRefused(422, 'The photo did not arrive intact: its contents do not match its fingerprint. Send it again.');
    }
    const actor: Actor = { userId: user.id, organisationId: user.organisationId, role: user.role, deviceId: 'server' };
    const { held, keepLocation } = await this.queue.read(async (em) => ({
      held: await em.findOneBy(PhotoBlob, { organisationId: user.organisationId, sha256: claimedSha256 }),
      keepLocation: (await em.findOneBy(Organisation, { id: user.organisationId }))?.keepPhotoLocation ?? false,
    }));
    if (held) {
      await this.queue.run(async (em) => {
        await this.recordSender(em, user, claimedSha256);
        await this.markReady(em, actor, held);
      });
      return;
    }
    const photo = await processPhoto(bytes, { keepLocation });
    // Stored before the blob row is written, so a blob row always means its bytes are there.
    await Promise.all([
      this.storage.put(photoKey(user.organisationId, claimedSha256, 'original'), bytes, photo.mime),
      this.storage.put(photoKey(user.organisationId, claimedSha256, 'thumb'), photo.thumb, 'image/webp'),
      this.storage.put(photoKey(user.organisationId, claimedSha256, 'display'), photo.display, 'image/webp'),
    ]);
    await this.queue.run(async (em) => {
      // Two uploads of the same bytes may finish together; the first row stands.
      await em
        .createQueryBuilder()
        .insert()
        .into(PhotoBlob)
        .values({ organisationId: user.organisationId, sha256: claimedSha256, mime: photo.mime, bytes: bytes.length, width: photo.width, height: photo.height })
        .orIgnore()
        .execute();
      await this.recordSender(em, user, claimedSha256);
      await this.markReady(em, actor, await em.findOneByOrFail(PhotoBlob, { organisationId: user.organisationId, sha256: claimedSha256 }));
    });
  }

  private async recordSender(em: EntityManager, user: AuthUser, sha256: string): Promise<void> {
    await em.createQueryBuilder().insert().into(PhotoSender).values({ organisationId: user.organisationId, sha256, userId: user.id }).orIgnore().execute();
  }

  /**
   * Marks photo rows ready (and fills in sizes the device did not give) as a numbered change, so that every device
   * learns of it on its next pull. The fields' own versions move too: a device that still holds the old value
   * cannot then overwrite the server's word without the merge rules seeing it.
   */
  private async markReady(em: EntityManager, actor: Actor, blob: PhotoBlob, rows?: SyncRecord[]): Promise<void> {
    const photos = rows ?? (await syncRepository(em, 'photo').findBy({ organisationId: blob.organisationId, sha256: blob.sha256, deletedAt: IsNull() }));
    const writes: Array<{ row: SyncRecord; changes: Record<string, unknown> }> = [];
    for (const row of photos) {
      const changes: Record<string, unknown> = {};
      if (row.uploadState !== 'ready') changes.uploadState = 'ready';
      if (row.width == null || row.height == null) Object.assign(changes, { width: blob.width, height: blob.height });
      if (row.sizeBytes == null) changes.sizeBytes = blob.bytes;
      if (Object.keys(changes).length) writes.push({ row, changes });
    }
    await this.engine.serverWrite(em, actor, 'photo', writes);
  }

  /** The office's view of photos, in the order they were taken, with their visit's planned start and who took them. */
  async list(user: AuthUser, q: ListPhotosQueryDto): Promise<PhotoPage> {
    const params: Record<string, unknown> = { org: user.organisationId };
    const where = ['r.organisationId = :org', 'r.deletedAt IS NULL'];
    const equal = { visitId: q.visitId, siteId: q.siteId, areaId: q.areaId, subjectType: q.subjectType, subjectId: q.subjectId, createdById: q.technicianId };
    for (const [field, value] of Object.entries(equal)) {
      if (value === undefined) continue;
      where.push(`r.${field} = :${field}`);
      params[field] = value;
    }
    if (q.jobId !== undefined) {
      where.push('r.visitId IN (SELECT "v"."id" FROM "visit" AS "v" WHERE "v"."organisationId" = :org AND "v"."jobId" = :jobId)');
      params.jobId = q.jobId;
    }
    if (q.tag !== undefined) {
      where.push(jsonListHas('r.tags', 'tag'));
      params.tag = q.tag;
    }
    if (q.search) {
      where.push(textLike('r.caption', 'like'));
      params.like = `%${escapeLike(q.search)}%`;
    }
    const { rows, total, visits, people } = await this.queue.read(async (em) => {
      const [rows, total] = await syncRepository(em, 'photo')
        .createQueryBuilder('r')
        .where(where.join(' AND '), params)
        .orderBy('r.takenAt', 'ASC', 'NULLS LAST')
        .addOrderBy('r.id', 'ASC')
        .offset((q.page - 1) * q.pageSize)
        .limit(q.pageSize)
        .getManyAndCount();
      const visitIds = [...new Set(rows.map((r) => r.visitId))];
      const visits = visitIds.length
        ? await syncRepository(em, 'visit').find({ where: { id: In(visitIds), organisationId: user.organisationId }, select: { id: true, plannedStart: true }, withDeleted: true })
        : [];
      const userIds = [...new Set(rows.map((r) => r.createdById).filter((id): id is string => !!id))];
      const people = userIds.length ? await em.find(User, { where: { id: In(userIds), organisationId: user.organisationId }, select: { id: true, name: true } }) : [];
      return { rows, total, visits, people };
    });
    const plannedStart = new Map(visits.map((v) => [v.id, v.plannedStart ?? null]));
    const names = new Map(people.map((p) => [p.id, p.name]));
    return {
      items: rows.map((r) => ({
        ...toSyncedRow(r),
        visitPlannedStart: plannedStart.get(r.visitId) ?? null,
        createdByName: (r.createdById && names.get(r.createdById)) || null,
      })),
      total,
      page: q.page,
      pageSize: q.pageSize,
    };
  }

  /**
   * One size of a photo the caller may see. Another organisation's photo, or one outside a technician's sites,
   * is not found, exactly like a photo that does not exist.
   */
  async file(user: AuthUser, id: string, variant: StoredVariant): Promise<PhotoFile> {
    const { row, blob } = await this.queue.read(async (em) => {
      const row = await syncRepository(em, 'photo').findOneBy({ id, organisationId: user.organisationId, deletedAt: IsNull() });
      if (!row) return { row: null, blob: null };
      if (user.role === 'technician') {
        const scope = await this.scopes.technicianScope(em, user.organisationId, user.id);
        if (!scope.siteIds.has(row.siteId)) return { row: null, blob: null };
      }
      const blob = typeof row.sha256 === 'string' ? await em.findOneBy(PhotoBlob, { organisationId: user.organisationId, sha256: row.sha256 }) : null;
      return { row, blob };
    });
    return this.describe(row, blob, user.organisationId, variant);
  }

  /**
   * One size of a photo taken on a visit of the given job: what a customer's share link may show. Any other photo,
   * of this organisation or another, is not found.
   */
  async fileOnJob(organisationId: string, jobId: string, id: string, variant: Exclude<StoredVariant, 'original'>): Promise<PhotoFile> {
    const { row, blob } = await this.queue.read(async (em) => {
      const row = await syncRepository(em, 'photo')
        .createQueryBuilder('p')
        // A photo voided on site is not the customer's to see, even by someone who kept its address.
        .where('p.id = :id AND p.organisationId = :org AND p.deletedAt IS NULL AND p.voidedAt IS NULL', { id, org: organisationId })
        .andWhere('p.visitId IN (SELECT "v"."id" FROM "visit" AS "v" WHERE "v"."organisationId" = :org AND "v"."jobId" = :jobId AND "v"."deletedAt" IS NULL)', { jobId })
        .getOne();
      const blob = row && typeof row.sha256 === 'string' ? await em.findOneBy(PhotoBlob, { organisationId, sha256: row.sha256 }) : null;
      return { row, blob };
    });
    return this.describe(row, blob, organisationId, variant);
  }

  private describe(row: SyncRecord | null, blob: PhotoBlob | null, organisationId: string, variant: StoredVariant): PhotoFile {
    if (!row) throw new NotFoundException('No such photo.');
    if (!blob) throw new NotFoundException('This photo has not reached the server yet. It appears once the phone that took it has sent it.');
    const key = photoKey(organisationId, blob.sha256, variant);
    const etag = `"${blob.sha256}-${variant}"`;
    if (variant !== 'original') return { key, etag, contentType: 'image/webp' };
    return { key, etag, contentType: blob.mime, bytes: blob.bytes, filename: `wiretrail-photo-${row.id}.${EXTENSIONS[blob.mime] ?? 'img'}` };
  }

  async open(file: PhotoFile): Promise<Readable> {
    try {
      return await this.storage.stream(file.key);
    } catch (err) {
      if (err instanceof StoredFileMissing) throw new NotFoundException('The file of this photo is missing from storage.');
      throw err;
    }
  }
}
