import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { SyncedRow } from '@wiretrail/core';
import { appendFileSync } from 'node:fs';
import type { Server } from 'node:http';
import { join } from 'node:path';
import { v7 as uuidv7 } from 'uuid';
import { auditPhotoStore, photosOnDisk } from './photo-store-audit.js';
import { bearer, createUpload, cutPatch, noisyJpeg, patchUpload, settledOffset, sha256 } from './photo-helpers.js';
import { seededRandom } from './seeded-random.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';
import { openProbe } from './test-database.js';

/**
 * Phones lose signal in the middle of a chunk. Each cut here drops the connection after a random number of the
 * chunk's bytes; the phone asks the server how much it has (HEAD) and carries on from there, and the finished
 * photo must hash to what the phone took. `UPLOAD_CUTS` sets the number of cuts (`npm run soak:uploads -w api`),
 * `UPLOAD_SEED` repeats a run.
 */
const CUTS = Number(process.env.UPLOAD_CUTS ?? 50);

describe('uploads cut off mid-chunk', () => {
  const random = seededRandom('UPLOAD_SEED');
  let t: TestApp;
  let tech1: Session;
  let visit: SyncedRow;

  const listen = (app: TestApp) => new Promise<void>((resolve) => (app.app.getHttpServer() as Server).listen(0, '127.0.0.1', resolve));

  beforeAll(async () => {
    t = await createTestApp();
    await listen(t);
    tech1 = await signIn(t, 'tech1@larkfield.example');
    const view = new DeviceMirror('cut-look');
    await view.pullAll(t, tech1);
    const job = view.one('job', (r) => r.title === 'Move two lounge sockets and add a fused spur for an electric fire');
    visit = view.one('visit', (r) => r.jobId === job.id);
  });
  afterAll(() => t?.close());

  async function pushPhoto(bytes: Buffer): Promise<string> {
    const id = uuidv7();
    const [result] = await push(t, tech1, 'cut-phone', [
      mutation('photo', id, { visitId: visit.id, siteId: visit.siteId as string, sha256: sha256(bytes), sizeBytes: bytes.length, uploadState: 'waiting' }),
    ]);
    expect(result!.status).toBe('applied');
    return id;
  }

  it(`resumes from the server's offset after ${CUTS} cuts at random bytes, to the photo's own hash`, async () => {
    const figures = { cuts: 0, photos: 0, bytesResent: 0, lastChunkCuts: 0 };
    const photoIds: Array<[string, Buffer]> = [];
    while (figures.cuts < CUTS) {
      const bytes = await noisyJpeg(random.int(500, 1400), random.int(400, 1000));
      const hash = sha256(bytes);
      photoIds.push([await pushPhoto(bytes), bytes]);
      const created = await createUpload(t, tech1, bytes.length, { sha256: hash, filetype: 'image/jpeg' });
      expect(created.status).toBe(201);
      const location = created.headers.location as string;
      let offset = 0;
      let last: { status: number } | null = null;
      while (offset < bytes.length) {
        const chunk = bytes.subarray(offset, offset + random.int(16, 128) * 1024);
        if (figures.cuts < CUTS && random.chance(0.6)) {
          const sent = random.int(0, chunk.length);
          await cutPatch(t, tech1, location, offset, chunk, sent);
          figures.cuts++;
          if (offset + chunk.length === bytes.length) figures.lastChunkCuts++;
          const now = await settledOffset(t, tech1, location).catch(() => null);
          if (now === null) {
            // The cut came after the last byte and the server finished the photo: nothing left to resume.
            expect(sent).toBe(chunk.length);
            last = { status: 204 };
            break;
          }
          // The server keeps what it got, never more than was sent, and the phone goes on from there.
          expect(now).toBeGreaterThanOrEqual(offset);
          expect(now).toBeLessThanOrEqual(offset + sent);
          figures.bytesResent += offset + sent - now;
          offset = now;
          continue;
        }
        const res = await patchUpload(t, tech1, location, offset, chunk);
        expect(res.status).toBe(204);
        last = res;
        offset = Number(res.headers['upload-offset']);
      }
      expect(last?.status).toBe(204);
      expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [hash] }).expect(200)).body).toEqual({ missing: [] });
      figures.photos++;
    }

    for (const [id, bytes] of photoIds) {
      const original = await t.http.get(`/api/photos/${id}/original`).set(bearer(tech1)).buffer(true).expect(200);
      expect(sha256(original.body as Buffer)).toBe(sha256(bytes));
    }
    const db = await openProbe(process.env);
    try {
      const audit = await auditPhotoStore(db, photosOnDisk(join(t.directory, 'photos')), join(t.directory, 'uploads'));
      expect(audit.problems).toEqual([]);
      expect(audit.unfinishedUploads).toBe(0);
      console.log(
        `interrupted uploads: seed ${random.seed}; ${figures.cuts} cuts (${figures.lastChunkCuts} in a photo's last chunk), ${figures.photos} photos resumed to their hash, ` +
          `${figures.bytesResent} bytes sent again, ${audit.originals} originals re-hashed; losses found: 0`,
      );
    } finally {
      await db.close();
    }
  }, 60_000 + CUTS * 2_000);

  it('keeps at the next start an upload whose bytes all arrived before the server stopped', async () => {
    const bytes = await noisyJpeg(400, 300);
    const id = await pushPhoto(bytes);
    const created = await createUpload(t, tech1, bytes.length, { sha256: sha256(bytes), filetype: 'image/jpeg' });
    const location = created.headers.location as string;
    // What a process killed while it checked the last chunk leaves: every byte on disk, nothing kept.
    appendFileSync(join(t.directory, 'uploads', location.split('/').pop()!), bytes);
    expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [sha256(bytes)] }).expect(200)).body.missing).toHaveLength(1);

    await t.close({ keepFiles: true });
    t = await createTestApp({}, { directory: t.directory });
    tech1 = await signIn(t, 'tech1@larkfield.example');
    expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [sha256(bytes)] }).expect(200)).body).toEqual({ missing: [] });
    await t.http.head(location).set(bearer(tech1)).set('Tus-Resumable', '1.0.0').expect(404);
    const view = new DeviceMirror('cut-check');
    await view.pullAll(t, tech1);
    expect(view.one('photo', (r) => r.id === id)).toMatchObject({ uploadState: 'ready', width: 400, height: 300 });
  });
});
