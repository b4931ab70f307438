import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { OfflineError } from '@/lib/api-client';
import { db, type PhotoBlobRow } from '@/lib/db';
import { setSession } from '@/lib/session';
import { preparePhoto, savePhoto } from './add-photo';
import { FakeTusServer } from './fake-tus-server';
import { freeOriginals, setKeepOriginalsDays } from './free-originals';
import { photoFingerprint, PhotoUploader, type PhotoUploaderOptions } from './photo-uploader';
import { fakeJpeg } from './test-photos';

const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000001';
const VISIT = '01900000-0000-7000-8000-000000000002';
const CHUNK = 16 * 1024;
const DAY = 86_400_000;

const buffer = (u: Uint8Array) => u.buffer.slice(u.byteOffset, u.byteOffset + u.byteLength) as ArrayBuffer;

/** Keeps a photo of `bytes` bytes on the phone as the capture screen does; returns its hash. */
async function takePhoto(bytes: number, seed: number): Promise<string> {
  const jpeg = fakeJpeg({ width: 2560, height: 1920, bytes, seed });
  const file = new File([jpeg], `IMG_${seed}.jpg`, { type: 'image/jpeg' });
  const prepared = await preparePhoto(file, async () => ({ bytes: buffer(jpeg), mime: 'image/jpeg', thumb: buffer(fakeJpeg({ width: 320, height: 240, seed })), thumbMime: 'image/jpeg' }));
  await savePhoto(prepared, { visitId: VISIT, siteId: SITE, caption: `Photo ${seed}` }, USER.id);
  return prepared.sha256;
}

let server: FakeTusServer;
let token: string;

function uploader(extra: Partial<PhotoUploaderOptions> = {}): PhotoUploader {
  return new PhotoUploader({
    db,
    userId: USER.id,
    missing: (hashes) => server.missing(hashes),
    endpoint: `${server.origin}/api/uploads`,
    accessToken: () => token,
    refresh: async () => {
      token = 'renewed';
      return true;
    },
    httpStack: server,
    chunkSize: CHUNK,
    retryDelays: null,
    ...extra,
  });
}

const state = async (sha256: string) => (await db.photoBlobs.get(sha256))?.state;
const requests = () => server.log.map((r) => `${r.method} ${r.path.replace(/\/api\/uploads\/?/, '/u/')}${r.offset !== undefined ? ` @${r.offset / CHUNK}` : ''}`);

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
  server = new FakeTusServer();
  token = 'first';
});

afterEach(() => setSession(null));

describe('photo uploader', () => {
  it('confirms what the server already has and sends the rest in chunks, with the access token', async () => {
    const known = await takePhoto(3000, 1);
    const fresh = await takePhoto(CHUNK * 2 + 500, 2);
    server.stored.add(known);

    const round = await uploader().run();

    expect(round).toMatchObject({ confirmed: 2, sent: 1, refused: 0, failed: 0, more: false });
    expect(requests()).toEqual(['POST /u/', 'PATCH /u/u1 @0', 'PATCH /u/u1 @1', 'PATCH /u/u1 @2']);
    expect(server.log.every((r) => r.auth === 'Bearer first')).toBe(true);
    const upload = server.uploads.get('u1')!;
    expect(upload.metadata).toMatchObject({ sha256: fresh, filetype: 'image/jpeg' });
    expect(upload.metadata.photoId).toBe((await db.photo.where('sha256').equals(fresh).first())!.id);
    expect(await state(known)).toBe('confirmed');
    expect(await state(fresh)).toBe('confirmed');
    // Nothing left to resume.
    expect(await db.photoUploads.count()).toBe(0);
  });

  it('carries on from the offset the server reports after the connection was cut and the app reloaded', async () => {
    const sha256 = await takePhoto(CHUNK * 4 + 100, 3);
    server.cutAfterPatches = 2;

    await expect(uploader().run()).rejects.toBeInstanceOf(OfflineError);
    // Not confirmed: the server does not have the whole photo.
    expect(await state(sha256)).toBe('waiting');
    const kept = await db.photoUploads.where('fingerprint').equals(photoFingerprint(sha256)).toArray();
    expect(kept).toHaveLength(1);
    expect(kept[0]).toMatchObject({ uploadUrl: `${server.origin}/api/uploads/u1`, offset: CHUNK * 2 });

    // A reload: a new uploader with nothing in memory, only what IndexedDB kept.
    server.log.length = 0;
    const round = await uploader().run();

    expect(requests()).toEqual(['HEAD /u/u1', 'PATCH /u/u1 @2', 'PATCH /u/u1 @3', 'PATCH /u/u1 @4']);
    expect(round).toMatchObject({ sent: 1, confirmed: 1 });
    expect(server.stored.has(sha256)).toBe(true);
    expect(await state(sha256)).toBe('confirmed');
  });

  it('counts a photo as confirmed only when the server says it has it', async () => {
    const sha256 = await takePhoto(2000, 4);
    // The upload goes through, but the server still lists it as missing (lost, or not yet stored).
    const round = await uploader({ missing: async (hashes) => hashes }).run();
    expect(round).toMatchObject({ sent: 1, confirmed: 0 });
    expect(await state(sha256)).toBe('waiting');
    expect((await db.photoBlobs.get(sha256))!.bytes).not.toBeNull();
  });

  it("marks a refused photo refused with the server's words and does not send it again", async () => {
    const bad = await takePhoto(2000, 5);
    const good = await takePhoto(2000, 6);
    server.refuse.set(bad, { status: 415, message: 'This file is not a photo we can read (JPEG, PNG, WebP or HEIC).' });

    const round = await uploader().run();

    expect(round).toMatchObject({ refused: 1, sent: 1, confirmed: 1 });
    expect(await db.photoBlobs.get(bad)).toMatchObject({ state: 'refused', refusedReason: 'This file is not a photo we can read (JPEG, PNG, WebP or HEIC).' });
    expect(await state(good)).toBe('confirmed');
    server.log.length = 0;
    await uploader().run();
    expect(server.log).toHaveLength(0);
  });

  it('renews an expired token once and carries on', async () => {
    const sha256 = await takePhoto(2000, 7);
    server.expireTokens = 1;
    await uploader().run();
    expect(server.log.map((r) => r.auth)).toEqual(['Bearer first', 'Bearer renewed', 'Bearer renewed']);
    expect(await state(sha256)).toBe('confirmed');
  });

  it("sends only the signed-in user's photos", async () => {
    const mine = await takePhoto(2000, 8);
    const theirs = await takePhoto(2000, 9);
    await db.photoBlobs.update(theirs, { userId: 'someone-else' });
    await uploader().run();
    expect(await state(mine)).toBe('confirmed');
    expect(await state(theirs)).toBe('waiting');
  });

  it('stops after its time budget and asks for another round', async () => {
    await takePhoto(2000, 10);
    await takePhoto(2000, 11);
    // Each request takes 20 s on this slow line; the budget is 30 s.
    let clock = 0;
    server.onRequest = () => (clock += 20_000);
    const round = await uploader({ budgetMs: 30_000, now: () => clock }).run();
    expect(round).toMatchObject({ sent: 1, more: true });
  });
});

describe('freeing originals', () => {
  const now = Date.UTC(2026, 2, 30, 12);
  const blob = (sha256: string, state: PhotoBlobRow['state'], daysAgo: number): PhotoBlobRow => ({
    sha256,
    mime: 'image/jpeg',
    bytes: new ArrayBuffer(10),
    size: 10,
    createdAt: new Date(now - daysAgo * DAY).toISOString(),
    userId: USER.id,
    state,
  });

  it('frees only confirmed photos older than the setting, keeping their thumbnails', async () => {
    await db.photoBlobs.bulkPut([blob('a'.repeat(64), 'confirmed', 20), blob('b'.repeat(64), 'confirmed', 3), blob('c'.repeat(64), 'waiting', 30), blob('d'.repeat(64), 'refused', 30)]);
    await db.photoThumbs.put({ sha256: 'a'.repeat(64), mime: 'image/jpeg', bytes: new ArrayBuffer(4), width: 320, height: 240 });

    expect(await freeOriginals(db, now)).toBe(1);
    expect(await db.photoBlobs.get('a'.repeat(64))).toMatchObject({ state: 'freed', bytes: null, freedAt: new Date(now).toISOString() });
    expect(await db.photoThumbs.get('a'.repeat(64))).toBeTruthy();
    for (const kept of ['b', 'c', 'd']) expect((await db.photoBlobs.get(kept.repeat(64)))!.bytes).not.toBeNull();

    // Keep for no time at all: the confirmed one goes too; never the unconfirmed ones.
    expect(await setKeepOriginalsDays(db, 0, now)).toBe(1);
    expect(await state('b'.repeat(64))).toBe('freed');
    expect(await state('c'.repeat(64))).toBe('waiting');
    expect(await state('d'.repeat(64))).toBe('refused');
    expect((await db.photoBlobs.get('c'.repeat(64)))!.bytes).not.toBeNull();
  });

  it('keeps originals for 14 days unless told otherwise', async () => {
    await db.photoBlobs.bulkPut([blob('e'.repeat(64), 'confirmed', 13), blob('f'.repeat(64), 'confirmed', 15)]);
    expect(await freeOriginals(db, now)).toBe(1);
    expect(await state('e'.repeat(64))).toBe('confirmed');
    expect(await state('f'.repeat(64))).toBe('freed');
  });
});
