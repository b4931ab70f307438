import 'fake-indexeddb/auto';
import { createHash } from 'node:crypto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { setSession } from '@/lib/session';
import { LocalWriteError } from '@/lib/sync/local-write';
import { addPhoto, OUT_OF_SPACE } from './add-photo';
import { exifDateTaken, jpegSize } from './photo-bytes';
import type { ShrinkPhoto } from './shrink-photo';
import { fakeJpeg } from './test-photos';

const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000001';
const VISIT = '01900000-0000-7000-8000-000000000002';
const AREA = '01900000-0000-7000-8000-000000000003';
const CIRCUIT = '01900000-0000-7000-8000-000000000004';

const hex = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');
const buffer = (u: Uint8Array) => u.buffer.slice(u.byteOffset, u.byteOffset + u.byteLength) as ArrayBuffer;

/** Stands in for the browser's scaling: returns fixed "scaled" bytes and thumbnail. */
function shrinkTo(full: Uint8Array, thumb = fakeJpeg({ width: 320, height: 240, bytes: 400, seed: 9 })): ShrinkPhoto {
  return async () => ({ bytes: buffer(full), mime: 'image/jpeg', thumb: buffer(thumb), thumbMime: 'image/jpeg' });
}

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
});

afterEach(() => setSession(null));

describe('photo bytes', () => {
  it('reads the pixel size and the EXIF date without decoding', () => {
    const jpeg = fakeJpeg({ width: 2560, height: 1920, taken: '2026:03:14 09:12:30' });
    expect(jpegSize(buffer(jpeg))).toEqual({ width: 2560, height: 1920 });
    expect(exifDateTaken(buffer(jpeg))).toBe(new Date(2026, 2, 14, 9, 12, 30).toISOString());
    expect(exifDateTaken(buffer(fakeJpeg({ width: 10, height: 10 })))).toBeNull();
    expect(jpegSize(new Uint8Array([1, 2, 3, 4]).buffer)).toBeNull();
  });
});

describe('adding a photo', () => {
  it('keeps the final bytes as an ArrayBuffer keyed by their hash, with a thumbnail, the row and its outbox entry', async () => {
    const chosen = fakeJpeg({ width: 4032, height: 3024, bytes: 9000, seed: 1, taken: '2026:03:14 09:12:30' });
    const scaled = fakeJpeg({ width: 2560, height: 1920, bytes: 5000, seed: 2 });
    const file = new File([chosen], 'IMG_0412.jpg', { type: 'image/jpeg', lastModified: Date.UTC(2026, 2, 14, 12) });

    const id = await addPhoto(
      file,
      { visitId: VISIT, siteId: SITE, areaId: AREA, subjectType: 'circuit', subjectId: CIRCUIT, caption: '  Back box, cable entry from below ', tags: ['route', 'connection'] },
      USER.id,
      shrinkTo(scaled),
    );

    // The hash is of what is sent, not of the file as chosen.
    const sha256 = hex(scaled);
    expect(sha256).not.toBe(hex(chosen));
    const blob = await db.photoBlobs.get(sha256);
    expect(blob).toMatchObject({ sha256, mime: 'image/jpeg', size: 5000, state: 'waiting', userId: USER.id });
    expect(blob!.bytes).toBeInstanceOf(ArrayBuffer);
    expect(hex(new Uint8Array(blob!.bytes!))).toBe(sha256);
    const thumb = await db.photoThumbs.get(sha256);
    expect(thumb!.bytes).toBeInstanceOf(ArrayBuffer);
    expect(thumb).toMatchObject({ width: 320, height: 240 });

    const row = await db.photo.get(id);
    expect(row).toMatchObject({
      visitId: VISIT,
      siteId: SITE,
      areaId: AREA,
      subjectType: 'circuit',
      subjectId: CIRCUIT,
      caption: 'Back box, cable entry from below',
      tags: ['route', 'connection'],
      takenAt: new Date(2026, 2, 14, 9, 12, 30).toISOString(),
      sha256,
      sizeBytes: 5000,
      width: 2560,
      height: 1920,
      uploadState: 'waiting',
    });
    const outbox = await db.outbox.toArray();
    expect(outbox).toHaveLength(1);
    expect(outbox[0]).toMatchObject({ entity: 'photo', id, userId: USER.id, set: { sha256, uploadState: 'waiting', visitId: VISIT } });
  });

  it('falls back to the file time without an EXIF date, and keeps one copy of bytes chosen twice', async () => {
    const scaled = fakeJpeg({ width: 1200, height: 1600, seed: 3 });
    const file = new File([fakeJpeg({ width: 1200, height: 1600, seed: 4 })], 'a.jpg', { type: 'image/jpeg', lastModified: Date.UTC(2026, 2, 14, 10, 5) });
    const first = await addPhoto(file, { visitId: VISIT, siteId: SITE }, USER.id, shrinkTo(scaled));
    await addPhoto(file, { visitId: VISIT, siteId: SITE, caption: 'Same again' }, USER.id, shrinkTo(scaled));
    expect((await db.photo.get(first))!.takenAt).toBe('2026-03-14T10:05:00.000Z');
    expect(await db.photo.count()).toBe(2);
    expect(await db.photoBlobs.count()).toBe(1);
    expect(await db.outbox.count()).toBe(2);
  });

  it('says plainly when the phone is out of space, and keeps nothing half-saved', async () => {
    const full = () => {
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    };
    db.photoBlobs.hook('creating', full);
    try {
      const file = new File([fakeJpeg({ width: 10, height: 10 })], 'a.jpg', { type: 'image/jpeg' });
      const saving = addPhoto(file, { visitId: VISIT, siteId: SITE }, USER.id, shrinkTo(fakeJpeg({ width: 10, height: 10, seed: 5 })));
      await expect(saving).rejects.toBeInstanceOf(LocalWriteError);
      await expect(saving).rejects.toThrow(OUT_OF_SPACE);
    } finally {
      db.photoBlobs.hook('creating').unsubscribe(full);
    }
    expect(await db.photo.count()).toBe(0);
    expect(await db.photoThumbs.count()).toBe(0);
    expect(await db.outbox.count()).toBe(0);
  });
});
