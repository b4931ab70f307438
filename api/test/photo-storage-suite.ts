import { afterAll, beforeAll, describe, expect, it, jest } from '@jest/globals';
import { MAX_PHOTO_BYTES, type SyncedRow } from '@wiretrail/core';
import type { Server } from 'node:http';
import sharp from 'sharp';
import { v7 as uuidv7 } from 'uuid';
import type { FileStorage } from '../src/storage/file-storage.js';
import { PHOTO_STORAGE, photoKey } from '../src/storage/file-stores.js';
import {
  bearer,
  createUpload,
  cutPatch,
  headUpload,
  noisyJpeg,
  patchUpload,
  pixelBomb,
  settledOffset,
  sha256,
  turnedJpeg,
  upload,
} from './photo-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';
import { PhotoBlob } from '../src/photos/entities/photo-blob.entity.js';

/** The app and sign-ins a suite runs on, for tests that share them (filled in before the first test). */
export interface PhotoSuiteContext {
  t: TestApp;
  office: Session;
  admin: Session;
  tech1: Session;
  tech2: Session;
  oakmere: Session;
  officeView: DeviceMirror;
}

export interface StorageUnderTest {
  /** What createTestApp needs for the driver. */
  env: () => Record<string, string>;
  /** Every key the driver holds for an organisation, looked up behind the app's back. */
  listKeys: (organisationId: string) => Promise<string[]>;
}

/**
 * Everything about a photo's bytes, from upload to serving, run once per storage driver (local disk and S3).
 * `more` adds tests on the same app (Jest isolates modules per file, so one app per file).
 */
export function describePhotoStorage(driver: string, under: StorageUnderTest, more?: (ctx: PhotoSuiteContext) => void): void {
  const ctx = {} as PhotoSuiteContext;
  describe(`photos stored on ${driver}`, () => {
    let t: TestApp;
    let office: Session;
    let tech1: Session;
    let tech2: Session;
    let oakmere: Session;
    let storage: FileStorage;
    let officeView: DeviceMirror;
    /** The demo visit of that job that the technician is booked on. */
    const visitOf = (title: string, s: Session) => {
      const job = officeView.one('job', (r) => r.title === title);
      return officeView.one('visit', (r) => r.jobId === job.id && (r.technicianIds as string[]).includes(s.user.id));
    };
    /** A photo row as a phone pushes it: waiting for its bytes. */
    async function pushPhoto(s: Session, visit: SyncedRow, bytes: Buffer, extra: Record<string, unknown> = {}): Promise<string> {
      const id = uuidv7();
      const [result] = await push(t, s, `${s.user.id.slice(-8)}-phone`, [
        mutation('photo', id, {
          visitId: visit.id, siteId: visit.siteId as string, sha256: sha256(bytes), sizeBytes: bytes.length, uploadState: 'waiting',
          takenAt: new Date().toISOString(), caption: 'Test photo', tags: ['route'], ...extra,
        } as never),
      ]);
      expect(result!.status).toBe('applied');
      return id;
    }
    async function pulledPhoto(s: Session, id: string): Promise<SyncedRow> {
      const view = new DeviceMirror(`${s.user.id.slice(-8)}-check-${uuidv7().slice(-6)}`);
      await view.pullAll(t, s);
      return view.one('photo', (r) => r.id === id);
    }

    beforeAll(async () => {
      t = await createTestApp(under.env());
      // Listening on a real port, so that a test can drop a connection half way.
      await new Promise<void>((resolve) => (t.app.getHttpServer() as Server).listen(0, '127.0.0.1', resolve));
      office = await signIn(t, 'office@larkfield.example');
      tech1 = await signIn(t, 'tech1@larkfield.example');
      tech2 = await signIn(t, 'tech2@larkfield.example');
      oakmere = await signIn(t, 'admin@oakmere.example');
      storage = t.app.get<FileStorage>(PHOTO_STORAGE);
      officeView = new DeviceMirror('office-photo-desk');
      await officeView.pullAll(t, office);
      Object.assign(ctx, { t, office, admin: await signIn(t, 'admin@larkfield.example'), tech1, tech2, oakmere, officeView });
    });
    afterAll(() => t.close());

    it('serves the demo photos the seed stored', async () => {
      const demo = officeView.one('photo', (r) => r.caption === 'Patch panel labelled RC-01 to RC-12; RC-01 and RC-02 patched to the switch');
      expect(demo).toMatchObject({ uploadState: 'ready', width: 1280, height: 960 });
      const res = await t.http.get(`/api/photos/${demo.id}/thumb`).set(bearer(office)).buffer(true).expect(200);
      expect(res.headers['content-type']).toBe('image/webp');
      expect(await sharp(res.body as Buffer).metadata()).toMatchObject({ format: 'webp', width: 320, height: 240 });
    });

    it('takes a photo in several chunks, marks its row ready and serves its sizes with long caching', async () => {
      const visit = visitOf('Move two lounge sockets and add a fused spur for an electric fire', tech1);
      const bytes = await noisyJpeg();
      const id = await pushPhoto(tech1, visit, bytes);
      const before = await pulledPhoto(tech1, id);
      expect(before.uploadState).toBe('waiting');

      const { last, patches } = await upload(t, tech1, bytes, { chunk: 64 * 1024 });
      expect(last.status).toBe(204);
      expect(patches).toBeGreaterThanOrEqual(3);
      expect(Number(last.headers['upload-offset'])).toBe(bytes.length);

      const after = await pulledPhoto(tech1, id);
      expect(after).toMatchObject({ uploadState: 'ready', width: 600, height: 400 });
      expect(after.version).toBeGreaterThan(before.version);
      expect(after.fieldVersions.uploadState).toBe(after.version);

      const thumb = await t.http.get(`/api/photos/${id}/thumb`).set(bearer(tech1)).buffer(true).expect(200);
      expect(thumb.headers).toMatchObject({ 'content-type': 'image/webp', 'cache-control': 'private, max-age=31536000, immutable' });
      expect(thumb.headers.etag).toContain(sha256(bytes));
      expect(await sharp(thumb.body as Buffer).metadata()).toMatchObject({ width: 320, height: 213 });
      await t.http.get(`/api/photos/${id}/thumb`).set(bearer(tech1)).set('If-None-Match', thumb.headers.etag!).expect(304);

      const display = await t.http.get(`/api/photos/${id}/display`).set(bearer(office)).buffer(true).expect(200);
      expect(display.headers.etag).not.toBe(thumb.headers.etag);
      // Never enlarged: the display size of a small photo is the photo's own size.
      expect(await sharp(display.body as Buffer).metadata()).toMatchObject({ format: 'webp', width: 600, height: 400 });

      const original = await t.http.get(`/api/photos/${id}/original`).set(bearer(office)).buffer(true).expect(200);
      expect(original.headers['content-type']).toBe('image/jpeg');
      expect(original.headers['content-disposition']).toBe(`attachment; filename="wiretrail-photo-${id}.jpg"`);
      expect(sha256(original.body as Buffer)).toBe(sha256(bytes));
    });

    it('resumes an upload cut off mid-chunk from the offset the server reports', async () => {
      const bytes = await noisyJpeg(700, 500);
      const created = await createUpload(t, tech1, bytes.length, { sha256: sha256(bytes) });
      expect(created.status).toBe(201);
      const location = created.headers.location as string;
      const first = await patchUpload(t, tech1, location, 0, bytes.subarray(0, 50_000));
      expect([first.status, first.headers['upload-offset']]).toEqual([204, '50000']);

      await cutPatch(t, tech1, location, 50_000, bytes.subarray(50_000, 150_000), 30_000);
      const offset = await settledOffset(t, tech1, location);
      expect(offset).toBeGreaterThanOrEqual(50_000);
      expect(offset).toBeLessThanOrEqual(80_000);

      // Resuming from anywhere else is refused, with words a phone can show.
      const wrong = await patchUpload(t, tech1, location, 0, bytes.subarray(0, 1000));
      expect(wrong.status).toBe(409);
      expect(wrong.text).toMatch(/resumed from the wrong place/);
      expect(await headUpload(t, tech1, location)).toBe(offset);

      const { last } = await upload(t, tech1, bytes, { from: { location, offset } });
      expect(last.status).toBe(204);
      expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [sha256(bytes)] }).expect(200)).body).toEqual({ missing: [] });
      // The finished upload is gone from the upload area; the photo lives on under /api/photos.
      await t.http.head(location).set(bearer(tech1)).set('Tus-Resumable', '1.0.0').expect(404);
    });

    it('stores the same bytes once, and a photo row pushed after its bytes is ready at once', async () => {
      const bytes = await noisyJpeg(300, 200);
      const hash = sha256(bytes);
      expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [hash, hash] }).expect(200)).body).toEqual({ missing: [hash] });
      const put = jest.spyOn(storage, 'put');
      try {
        expect((await upload(t, tech1, bytes)).last.status).toBe(204);
        expect(put).toHaveBeenCalledTimes(3);
        expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [hash] }).expect(200)).body).toEqual({ missing: [] });
        expect((await upload(t, tech2, bytes)).last.status).toBe(204);
        expect(put).toHaveBeenCalledTimes(3);
      } finally {
        put.mockRestore();
      }
      for (const variant of ['original', 'thumb', 'display'] as const) expect(await storage.exists(photoKey(tech1.user.organisationId, hash, variant))).toBe(true);

      const visit = visitOf('Cat6 to reception and Surgery 1; trace the unlabelled runs', tech1);
      const id = await pushPhoto(tech1, visit, bytes, { uploadState: 'waiting' });
      expect(await pulledPhoto(tech1, id)).toMatchObject({ uploadState: 'ready', width: 300, height: 200, sizeBytes: bytes.length });
      // Another organisation is told nothing about these bytes: they are missing as far as it knows.
      expect((await t.http.post('/api/blobs/missing').set(bearer(oakmere)).send({ hashes: [hash] }).expect(200)).body).toEqual({ missing: [hash] });
    });

    it('makes upright sizes of a photo taken with the phone turned', async () => {
      const bytes = await turnedJpeg();
      expect((await upload(t, tech1, bytes)).last.status).toBe(204);
      const visit = visitOf('Move two lounge sockets and add a fused spur for an electric fire', tech1);
      const id = await pushPhoto(tech1, visit, bytes);
      expect(await pulledPhoto(tech1, id)).toMatchObject({ width: 800, height: 1200 });
      const thumb = await t.http.get(`/api/photos/${id}/thumb`).set(bearer(tech1)).buffer(true).expect(200);
      const meta = await sharp(thumb.body as Buffer).metadata();
      expect({ width: meta.width, height: meta.height, exif: meta.exif }).toEqual({ width: 213, height: 320, exif: undefined });
      const display = await sharp((await t.http.get(`/api/photos/${id}/display`).set(bearer(tech1)).buffer(true).expect(200)).body as Buffer).metadata();
      expect([display.width, display.height]).toEqual([800, 1200]);
    });

    it.each([
      ['a wrong hash', async () => ({ bytes: await noisyJpeg(200, 150), sha256: sha256(Buffer.from('other bytes')) }), 422, /do not match its fingerprint/],
      ['a file that is not a photo', async () => ({ bytes: Buffer.from('Meter reading 04512, not a photo.\n'.repeat(200)) }), 415, /not a photo the server can read/],
      ['a truncated JPEG', async () => {
        const whole = await noisyJpeg(400, 300);
        return { bytes: whole.subarray(0, Math.floor(whole.length * 0.6)) };
      }, 422, /damaged or incomplete/],
      ['a pixel bomb', async () => ({ bytes: await pixelBomb() }), 413, /too many pixels \(9000 × 9000\)/],
    ])('refuses %s with a message the phone can show, and keeps nothing', async (_what, make, status, message) => {
      const { bytes, sha256: claimed } = (await make()) as { bytes: Buffer; sha256?: string };
      const { last, location } = await upload(t, tech1, bytes, { sha256: claimed });
      expect(last.status).toBe(status);
      expect(last.headers['content-type']).toMatch(/^text\/plain/);
      expect(last.text).toMatch(message);
      expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [claimed ?? sha256(bytes)] }).expect(200)).body.missing).toHaveLength(1);
      await t.http.head(location).set(bearer(tech1)).set('Tus-Resumable', '1.0.0').expect(404);
    });

    it('refuses an upload larger than the limit before any byte is sent', async () => {
      const res = await createUpload(t, tech1, MAX_PHOTO_BYTES + 1, { sha256: 'b'.repeat(64) });
      expect(res.status).toBe(413);
      expect(res.text).toBe('This photo is larger than 25 MB, the most the server accepts.');
      const created = await createUpload(t, tech1, 10, { sha256: 'b'.repeat(64) });
      const tooMuch = await patchUpload(t, tech1, created.headers.location as string, 0, Buffer.alloc(20));
      expect(tooMuch.status).toBe(413);
    });

    it('takes uploads only from a signed-in user, and each upload only from its owner', async () => {
      const bytes = await noisyJpeg(100, 100);
      const anonymous = await t.http.post('/api/uploads').set('Tus-Resumable', '1.0.0').set('Upload-Length', String(bytes.length)).set('Upload-Metadata', `sha256 ${Buffer.from(sha256(bytes)).toString('base64')}`);
      expect([anonymous.status, anonymous.text]).toEqual([401, 'Sign in to continue.']);
      const forged = await t.http.post('/api/uploads').set('Authorization', 'Bearer not-a-token').set('Tus-Resumable', '1.0.0').set('Upload-Length', '10');
      expect(forged.status).toBe(401);
      const noHash = await createUpload(t, tech1, 10, { filetype: 'image/jpeg' });
      expect([noHash.status, noHash.text]).toEqual([400, 'Upload-Metadata must carry sha256: the photo’s sha256 as 64 lowercase hex digits.']);

      const created = await createUpload(t, tech1, bytes.length, { sha256: sha256(bytes) });
      const location = created.headers.location as string;
      expect(location).toMatch(/^\/api\/uploads\/[0-9a-f]{32}$/);
      expect((await patchUpload(t, tech2, location, 0, bytes)).status).toBe(404);
      expect((await patchUpload(t, oakmere, location, 0, bytes)).status).toBe(404);
      await t.http.get(location).set(bearer(tech1)).expect(404);
      expect((await patchUpload(t, tech1, location, 0, bytes)).status).toBe(204);
    });

    it("answers 404 for another organisation's photo, a photo outside a technician's sites, and one not yet sent", async () => {
      // Fernhill is tech2's site only.
      const visit = visitOf('Power and AV points behind the new lounge TV', tech2);
      const bytes = await noisyJpeg(200, 200);
      const id = await pushPhoto(tech2, visit, bytes);
      const waiting = await t.http.get(`/api/photos/${id}/thumb`).set(bearer(tech2)).expect(404);
      expectErrorBody(waiting.body, 404);
      expect(waiting.body.message).toMatch(/not reached the server yet/);

      expect((await upload(t, tech2, bytes)).last.status).toBe(204);
      await t.http.get(`/api/photos/${id}/thumb`).set(bearer(tech2)).expect(200);
      await t.http.get(`/api/photos/${id}/display`).set(bearer(office)).expect(200);
      for (const variant of ['thumb', 'display', 'original']) {
        const outside = await t.http.get(`/api/photos/${id}/${variant}`).set(bearer(tech1)).expect(404);
        const foreign = await t.http.get(`/api/photos/${id}/${variant}`).set(bearer(oakmere)).expect(404);
        expect(foreign.body).toEqual(outside.body);
        expect(foreign.body.message).toBe('No such photo.');
      }
      await t.http.get(`/api/photos/${uuidv7()}/thumb`).set(bearer(office)).expect(404);
      await t.http.get('/api/photos/not-an-id/thumb').set(bearer(office)).expect(400);
      await t.http.get(`/api/photos/${id}/thumb`).expect(401);
    });

    it('holds the original and two sizes of each photo it took, and nothing of what it refused', async () => {
      const org = office.user.organisationId;
      const blobs = await t.dataSource.getRepository(PhotoBlob).find({ where: { organisationId: org }, select: { sha256: true } });
      const expected = blobs.flatMap((b) => (['original', 'thumb', 'display'] as const).map((v) => photoKey(org, b.sha256, v)));
      expect((await under.listKeys(org)).sort()).toEqual(expected.sort());
      expect(await under.listKeys(oakmere.user.organisationId)).toEqual([]);
    });

    more?.(ctx);
  });
}
