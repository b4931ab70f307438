import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { formatHlc, type Mutation, type MutationResult, type PullResponse, type SyncedRow } from '@wiretrail/core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';
import { v7 as uuidv7 } from 'uuid';
import { ApiProcess, signInTo } from './api-process.js';
import { auditPhotoStore, photosOnDisk, photosOnS3, type StoredPhotoFiles } from './photo-store-audit.js';
import { noisyJpeg, sha256 } from './photo-helpers.js';
import { seededRandom } from './seeded-random.js';

/**
 * The API process is killed (SIGKILL) at random moments while a phone pushes batches and uploads photos, then
 * started again on the same database, photo and upload directories. The phone does what the app does: resends
 * every batch it had no answer for, and carries each photo on from the offset the server reports (or starts it
 * again when the server no longer knows the upload). Nothing may be lost, applied twice, or stored half.
 * Runs the built server (dist/), once with photos on the local disk and once on S3 (s3rver, a local S3 fake, which
 * lives on in this process while the API dies). `CRASH_KILLS` sets the number of kills on disk, and a fifth as many
 * on S3 (the disk run is what finds kills at awkward moments; the S3 run proves the store and the audit) (`npm run soak:crash -w api`); `CRASH_SEED` repeats a run.
 */
const KILLS = Number(process.env.CRASH_KILLS ?? 50);
const DEVICE = 'crash-phone';
const CHUNK = 64 * 1024;

interface PhotoOnPhone {
  bytes: Buffer;
  sha256: string;
  id: string;
  location: string | null;
}

/** Where the killed server keeps its photos, and how the audit reads them behind its back. */
interface CrashStorage {
  name: string;
  kills: number;
  /** Starts what the store needs before the API does; answers the API's environment. */
  open(): Promise<Record<string, string>>;
  photos(api: ApiProcess): StoredPhotoFiles;
  close(): Promise<void>;
}

const onDisk: CrashStorage = {
  name: 'photos on the local disk',
  kills: KILLS,
  open: async () => ({}),
  photos: (api) => photosOnDisk(join(api.directory, 'photos')),
  close: async () => undefined,
};

function onS3(): CrashStorage {
  const dir = mkdtempSync(join(tmpdir(), 'wiretrail-crash-s3-'));
  const bucket = 'wiretrail-crash';
  const s3 = new S3rver({ address: '127.0.0.1', port: 0, directory: dir, silent: true, configureBuckets: [{ name: bucket }] });
  let endpoint = '';
  let reader: ReturnType<typeof photosOnS3> | null = null;
  return {
    name: 'photos on S3',
    kills: Math.ceil(KILLS / 5),
    async open() {
      endpoint = `http://127.0.0.1:${(await s3.run()).port}`;
      return { PHOTO_STORAGE: 's3', S3_ENDPOINT: endpoint, S3_BUCKET: bucket, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' };
    },
    photos: () => (reader = photosOnS3({ endpoint, bucket, accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' })),
    async close() {
      reader?.close();
      await s3.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

describe.each([onDisk, onS3()])('a killed server loses nothing and applies nothing twice, $name', (storage) => {
  const KILLS = storage.kills;
  const random = seededRandom('CRASH_SEED');
  let api: ApiProcess;
  let headers: Record<string, string>;
  let visit: SyncedRow;

  beforeAll(async () => {
    api = await ApiProcess.create(await storage.open());
    await api.prepareBeside();
    await api.start();
    ({ headers } = await signInTo(api, 'tech1@larkfield.example'));
    const pulled = (await api.request('GET', '/api/sync/pull?checkpoint=0&limit=1000&deviceId=crash-look', { headers })).body as PullResponse;
    const job = pulled.changes.find((c) => c.entity === 'job' && c.row!.title === 'Move two lounge sockets and add a fused spur for an electric fire')!;
    visit = pulled.changes.find((c) => c.entity === 'visit' && c.row!.jobId === job.id)!.row!;
    // The demo data's photos are rendered and stored before the first start.
  }, 120_000);

  afterAll(async () => {
    await api.remove();
    await storage.close();
  });

  it(`survives ${KILLS} kills at random moments of pushes and photo uploads`, async () => {
    // Photos of different weights, so that kills land while bytes travel and while the server sizes them.
    const photos: PhotoOnPhone[] = await Promise.all(
      Array.from({ length: Math.ceil(KILLS * 0.6) + 2 }, async (_, i) => {
        const bytes = await noisyJpeg(400 + (i % 5) * 300, 300 + (i % 4) * 250);
        return { bytes, sha256: sha256(bytes), id: uuidv7(), location: null };
      }),
    );
    const figures = { kills: 0, duringPush: 0, duringUpload: 0, resent: 0, batches: 0, mutations: 0, resumed: 0, restarted: 0, keptAtRestart: 0 };

    let clock = 0;
    const hlc = () => formatHlc({ ms: Date.parse('2026-12-02T12:00:00.000Z') + clock++, counter: 0, deviceId: DEVICE });
    const photoRow = (p: PhotoOnPhone): Mutation => ({
      mutationId: uuidv7(), entity: 'photo', id: p.id, baseVersion: 0, hlc: hlc(),
      set: { visitId: visit.id, siteId: visit.siteId as string, sha256: p.sha256, sizeBytes: p.bytes.length, uploadState: 'waiting', caption: 'Crash test photo', takenAt: '2026-12-02T12:00:00.000Z' },
    });
    // Photo rows go out with the next batch after the photo is taken: before, during or after its bytes.
    const rowsToSend: Mutation[] = [];
    const sent: Mutation[][] = [];
    const answers = new Map<number, MutationResult[]>();
    let unanswered: number | null = null;
    const nextBatch = () => {
      const b = sent.length;
      const notes = Array.from({ length: random.int(5, 40) }, (_, i): Mutation => ({
        mutationId: uuidv7(), entity: 'note', id: uuidv7(), baseVersion: 0, hlc: hlc(),
        set: { visitId: visit.id, siteId: visit.siteId as string, text: `batch ${b} note ${i}` },
      }));
      sent.push([...rowsToSend.splice(0), ...notes]);
      return b;
    };

    let inFlight = { push: 0, upload: 0 };
    const track = async <T>(kind: 'push' | 'upload', request: Promise<T>): Promise<T> => {
      inFlight[kind]++;
      try {
        return await request;
      } finally {
        inFlight[kind]--;
      }
    };

    /** Pushes until the server dies or `until` says stop; a batch counts as sent only once its answer is read. */
    async function pushing(until: () => boolean): Promise<void> {
      while (!until()) {
        const b = unanswered ?? nextBatch();
        if (unanswered === b) figures.resent++;
        unanswered = b;
        const res = await track('push', api.request('POST', '/api/sync/push', { headers, body: { deviceId: DEVICE, mutations: sent[b] } }));
        expect(res.status).toBe(200);
        answers.set(b, (res.body as { results: MutationResult[] }).results);
        unanswered = null;
      }
    }

    const uploadHeaders = { ...headers, 'tus-resumable': '1.0.0' };
    const missing = async (hash: string) => (await api.request('POST', '/api/blobs/missing', { headers, body: { hashes: [hash] } })).body.missing.length > 0;

    /** One photo, the way the app sends it; resolves once the server says it holds the bytes. */
    async function sendPhoto(p: PhotoOnPhone): Promise<void> {
      for (;;) {
        let offset = 0;
        if (p.location) {
          const head = await track('upload', api.request('HEAD', p.location, { headers: uploadHeaders }));
          const gone = head.status === 404;
          if (!gone) {
            expect(head.status).toBe(200);
            offset = Number(head.headers['upload-offset']);
          }
          // Gone (finished, refused or lost with the process), or all its bytes there (the reply to the last chunk
          // was lost, and tus asks nothing more): the app asks the server about the bytes, and starts the photo again
          // while they are missing.
          if (gone || offset === p.bytes.length) {
            p.location = null;
            if (!(await missing(p.sha256))) {
              figures.keptAtRestart++;
              return;
            }
            figures.restarted++;
            continue;
          }
          if (offset > 0) figures.resumed++;
        } else {
          const created = await track('upload', api.request('POST', '/api/uploads', {
            headers: { ...uploadHeaders, 'upload-length': String(p.bytes.length), 'upload-metadata': `sha256 ${Buffer.from(p.sha256).toString('base64')},filetype ${Buffer.from('image/jpeg').toString('base64')}` },
          }));
          expect(created.status).toBe(201);
          p.location = created.headers.location!;
        }
        while (offset < p.bytes.length) {
          const res = await track('upload', api.request('PATCH', p.location, {
            headers: { ...uploadHeaders, 'upload-offset': String(offset), 'content-type': 'application/offset+octet-stream' },
            body: p.bytes.subarray(offset, offset + CHUNK),
          }));
          expect([res.status, res.text]).toEqual([204, '']);
          offset = Number(res.headers['upload-offset']);
        }
        expect(await missing(p.sha256)).toBe(false);
        p.location = null;
        return;
      }
    }

    let nextPhoto = 0;
    let current: PhotoOnPhone | null = null;
    async function uploading(until: () => boolean): Promise<void> {
      while (!until()) {
        if (!current) {
          if (nextPhoto >= photos.length) return;
          current = photos[nextPhoto++]!;
          rowsToSend.push(photoRow(current));
        }
        await sendPhoto(current);
        current = null;
      }
    }

    for (let k = 0; k < KILLS; k++) {
      const doPush = random.chance(0.75);
      const doUpload = !doPush || random.chance(0.6);
      let dead = false;
      const work = [doPush ? pushing(() => dead) : null, doUpload ? uploading(() => dead) : null].filter(Boolean).map((w) => w!.catch((err: unknown) => (dead && !(err as { matcherResult?: unknown }).matcherResult ? null : Promise.reject(err))));
      await new Promise((r) => setTimeout(r, random.int(5, 700)));
      dead = true;
      if (inFlight.push) figures.duringPush++;
      if (inFlight.upload) figures.duringUpload++;
      await api.kill();
      figures.kills++;
      // Whatever the server did, the phone has no answer it can trust for what was outstanding.
      await Promise.all(work);
      inFlight = { push: 0, upload: 0 };
      await api.start();
    }

    // Signal steady again: the phone sends what it still holds.
    await uploading(() => false);
    await pushing(() => !rowsToSend.length && unanswered === null);
    await api.kill();

    const db = await api.probe();
    try {
      expect(await db.integrity()).toBe('ok');
      const all = sent.flat();
      figures.batches = sent.length;
      figures.mutations = all.length;
      const applied = (await db.get<{ n: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS n FROM "applied_mutation" WHERE "deviceId" = ?`, [DEVICE]))!;
      expect(applied.n).toBe(all.length);

      const notes = await db.all<{ id: string; version: number }>(`SELECT "id", "version" FROM "note" WHERE "text" LIKE 'batch %'`);
      expect(notes).toHaveLength(all.filter((m) => m.entity === 'note').length);
      // Each row kept the version its answer reported: nothing ran again after it was acknowledged.
      const versionOf = new Map(notes.map((n) => [n.id, n.version]));
      for (const [b, results] of answers) {
        results.forEach((r, i) => {
          expect(r.status).toBe('applied');
          if (sent[b]![i]!.entity === 'note') expect(versionOf.get(sent[b]![i]!.id)).toBe(r.version);
        });
      }
      const seqs = (await db.get<{ n: number; total: number }>(`SELECT CAST(COUNT(DISTINCT "seq") AS INTEGER) AS n, CAST(COUNT(*) AS INTEGER) AS total FROM "sync_change"`))!;
      expect(seqs.n).toBe(seqs.total);

      // Every photo the phone took is on the server once, ready, with the bytes it sent.
      const rows = await db.all<{ id: string; sha256: string; uploadState: string; sizeBytes: number }>(`SELECT "id", "sha256", "uploadState", "sizeBytes", "width", "height" FROM "photo" WHERE "caption" = 'Crash test photo'`);
      expect(rows).toHaveLength(photos.length);
      const byId = new Map(rows.map((r) => [r.id, r]));
      for (const p of photos) expect(byId.get(p.id)).toMatchObject({ sha256: p.sha256, uploadState: 'ready', sizeBytes: p.bytes.length });

      const audit = await auditPhotoStore(db, storage.photos(api), join(api.directory, 'uploads'));
      expect(audit.problems).toEqual([]);
      expect(audit.originals).toBeGreaterThanOrEqual(photos.length);
      console.log(
        `crash, ${storage.name}: seed ${random.seed}; ${figures.kills} kills (${figures.duringPush} with a push outstanding, ${figures.duringUpload} with an upload outstanding), ` +
          `${figures.batches} batches (${figures.resent} resent), ${figures.mutations} mutations, ${photos.length} photos uploaded ` +
          `(${figures.resumed} resumed from the server's offset, ${figures.restarted} started again, ${figures.keptAtRestart} found already kept after a restart), ` +
          `${audit.originals} originals re-hashed, ${audit.readyRows} ready rows checked, ${audit.unfinishedUploads} abandoned uploads waiting to expire, ` +
          `${audit.leftovers.length} files written aside; losses found: 0`,
      );
    } finally {
      await db.close();
    }
  }, 60_000 + KILLS * 6_000);
});
