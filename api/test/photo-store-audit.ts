import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { PHOTO_VARIANTS } from '@wiretrail/core';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import sharp from 'sharp';
import type { DatabaseProbe } from './test-database.js';

export interface PhotoStoreAudit {
  originals: number;
  readyRows: number;
  /** Files written aside by a process killed before it could rename them; never under a real name. */
  leftovers: string[];
  /** Uploads in progress, waiting for their owner to resume them. */
  unfinishedUploads: number;
  problems: string[];
}

/** The photo store as the audit reads it, behind the server's back: every name it holds, and one file's bytes. */
export interface StoredPhotoFiles {
  /** Names relative to the store (`<organisation>/<sha256>/original`), files written aside included. */
  names(): Promise<string[]>;
  read(name: string): Promise<Buffer | null>;
}

function filesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? filesUnder(join(dir, e.name)) : [join(dir, e.name)]));
}

/** The local disk driver's photo directory. */
export function photosOnDisk(dir: string): StoredPhotoFiles {
  return {
    names: async () => filesUnder(dir).map((file) => relative(dir, file)),
    read: async (name) => (existsSync(join(dir, name)) ? readFileSync(join(dir, name)) : null),
  };
}

export interface S3Place {
  endpoint: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
}

/** A bucket the S3 driver writes to, read with a client of the audit's own. */
export function photosOnS3(place: S3Place): StoredPhotoFiles & { close(): void } {
  const client = new S3Client({ endpoint: place.endpoint, region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: place.accessKeyId, secretAccessKey: place.secretAccessKey } });
  return {
    async names() {
      const names: string[] = [];
      let token: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket: place.bucket, ContinuationToken: token }));
        names.push(...(page.Contents ?? []).map((o) => o.Key!));
        token = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (token);
      // The bucket holds documents and invoices too; the photo store is only what its keys look like.
      return names.filter((n) => /^[0-9a-f-]{36}\/[0-9a-f]{64}\//.test(n));
    },
    async read(name) {
      try {
        const res = await client.send(new GetObjectCommand({ Bucket: place.bucket, Key: name }));
        return Buffer.from(await res.Body!.transformToByteArray());
      } catch (err) {
        if ((err as { name?: string }).name === 'NoSuchKey') return null;
        throw err;
      }
    },
    close: () => client.destroy(),
  };
}

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/**
 * Reads what the server stored, behind its back: every original re-hashes to its name, every blob row has its
 * original and both sizes (decodable, no larger than they should be), every photo row marked ready has its bytes and
 * its sizes, and no upload whose bytes all arrived was left without being kept or refused.
 */
export async function auditPhotoStore(db: DatabaseProbe, photos: StoredPhotoFiles, uploadDir: string): Promise<PhotoStoreAudit> {
  const problems: string[] = [];
  const leftovers: string[] = [];
  let originals = 0;
  const names = await photos.names();
  for (const name of names) {
    if (name.endsWith('.partial')) {
      leftovers.push(name);
      continue;
    }
    const [, hash, variant] = name.split('/');
    if (variant !== 'original') continue;
    originals++;
    const bytes = await photos.read(name);
    if (!bytes || sha256(bytes) !== hash) problems.push(`${name} does not hash to its name`);
  }

  const blobs = await db.all<{ organisationId: string; sha256: string; bytes: number; width: number; height: number }>('SELECT "organisationId", "sha256", "bytes", "width", "height" FROM "photo_blob"');
  for (const b of blobs) {
    const folder = `${b.organisationId}/${b.sha256}`;
    const original = await photos.read(`${folder}/original`);
    if (!original) {
      problems.push(`blob ${b.sha256} has no original`);
      continue;
    }
    if (original.length !== b.bytes) problems.push(`blob ${b.sha256} records ${b.bytes} bytes, its original has ${original.length}`);
    const meta = await sharp(original).metadata();
    const upright = meta.autoOrient ?? { width: meta.width, height: meta.height };
    if (upright.width !== b.width || upright.height !== b.height) problems.push(`blob ${b.sha256} records ${b.width}×${b.height}, its original is ${upright.width}×${upright.height}`);
    for (const variant of ['thumb', 'display'] as const) {
      const bytes = await photos.read(`${folder}/${variant}.webp`);
      if (!bytes) {
        problems.push(`blob ${b.sha256} has no ${variant}`);
        continue;
      }
      try {
        // Decoding every pixel, so that a file cut short shows.
        const { info } = await sharp(bytes, { failOn: 'error' }).raw().toBuffer({ resolveWithObject: true });
        if (Math.max(info.width, info.height) > PHOTO_VARIANTS[variant]) problems.push(`${variant} of ${b.sha256} is ${info.width}×${info.height}`);
      } catch (err) {
        problems.push(`${variant} of ${b.sha256} does not decode: ${(err as Error).message}`);
      }
    }
  }
  const held = new Set(blobs.map((b) => `${b.organisationId}/${b.sha256}`));

  const ready = await db.all<{ id: string; organisationId: string; sha256: string; sizeBytes: number | null; width: number | null; height: number | null }>(
    `SELECT "id", "organisationId", "sha256", "sizeBytes", "width", "height" FROM "photo" WHERE "uploadState" = 'ready' AND "deletedAt" IS NULL`,
  );
  for (const p of ready) {
    if (!held.has(`${p.organisationId}/${p.sha256}`)) problems.push(`photo ${p.id} is marked ready without its bytes`);
    if (p.sizeBytes == null || p.width == null || p.height == null) problems.push(`photo ${p.id} is marked ready without its sizes`);
  }

  let unfinishedUploads = 0;
  for (const file of existsSync(uploadDir) ? readdirSync(uploadDir) : []) {
    if (!file.endsWith('.json')) continue;
    const id = file.slice(0, -'.json'.length);
    let info: { size?: number };
    try {
      info = JSON.parse(readFileSync(join(uploadDir, file), 'utf8')) as { size?: number };
    } catch {
      // Cut short while being created: the phone never got its address and started another.
      continue;
    }
    const received = existsSync(join(uploadDir, id)) ? statSync(join(uploadDir, id)).size : 0;
    if (info.size !== undefined && received >= info.size) problems.push(`upload ${id} holds all its ${info.size} bytes but was never kept or refused`);
    else unfinishedUploads++;
  }
  return { originals, readyRows: ready.length, leftovers, unfinishedUploads, problems };
}
