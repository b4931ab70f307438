import type { PHOTO_SUBJECTS } from '@wiretrail/core';
import { db, type PhotoBlobRow, type PhotoRow } from '@/lib/db';
import { type Alongside, deleteRecordWith, type Fields, LocalWriteError, replaceRecordsWith } from '@/lib/sync/local-write';
import { exifDateTaken, jpegSize, sha256Hex } from './photo-bytes';
import type { ShrinkPhoto } from './shrink-photo';

export type PhotoSubjectType = (typeof PHOTO_SUBJECTS)[number];

/** What the technician says about a photo. */
export interface PhotoDetails {
  visitId: string;
  siteId: string;
  areaId?: string | null;
  subjectType?: PhotoSubjectType | null;
  subjectId?: string | null;
  caption?: string | null;
  tags?: string[];
}

/** A photo made ready on the phone: its final bytes, their hash, a thumbnail and when it was taken. */
export interface PreparedPhoto {
  sha256: string;
  mime: string;
  bytes: ArrayBuffer;
  thumb: ArrayBuffer;
  thumbMime: string;
  width: number | null;
  height: number | null;
  takenAt: string;
}

/** Cameras put EXIF near the start of the file; this much is plenty. */
const EXIF_READ_BYTES = 256 * 1024;

export const OUT_OF_SPACE =
  'This phone is out of space for photos. Let the photos waiting on the Sync page reach the office, or free space on the phone; nothing saved before is lost.';

export async function preparePhoto(file: File, shrink: ShrinkPhoto): Promise<PreparedPhoto> {
  const [shrunk, head] = await Promise.all([shrink(file), file.slice(0, EXIF_READ_BYTES).arrayBuffer()]);
  // The hash is of the bytes that will be sent, not of the file as chosen.
  const sha256 = await sha256Hex(shrunk.bytes);
  const size = jpegSize(shrunk.bytes);
  const takenAt = exifDateTaken(head) ?? new Date(file.lastModified || Date.now()).toISOString();
  return { sha256, mime: shrunk.mime, bytes: shrunk.bytes, thumb: shrunk.thumb, thumbMime: shrunk.thumbMime, width: size?.width ?? null, height: size?.height ?? null, takenAt };
}

/**
 * Keeps the photo on the phone: its bytes (keyed by hash), its thumbnail, the photo row and the row's outbox entry,
 * all in one transaction. Returns the new photo's id. With `replaces`, the new photo takes that one's place (taken
 * again after the server refused it): the old row is deleted in the same transaction and its bytes freed.
 */
export async function savePhoto(photo: PreparedPhoto, details: PhotoDetails, userId: string, replaces?: PhotoRow): Promise<string> {
  const fields: Fields = {
    visitId: details.visitId,
    siteId: details.siteId,
    takenAt: photo.takenAt,
    sha256: photo.sha256,
    sizeBytes: photo.bytes.byteLength,
    tags: details.tags ?? [],
    uploadState: 'waiting',
  };
  if (details.areaId) fields.areaId = details.areaId;
  if (details.subjectType && details.subjectId) {
    fields.subjectType = details.subjectType;
    fields.subjectId = details.subjectId;
  }
  if (details.caption?.trim()) fields.caption = details.caption.trim();
  if (photo.width && photo.height) {
    fields.width = photo.width;
    fields.height = photo.height;
  }
  const thumbSize = jpegSize(photo.thumb);
  try {
    const [id] = await replaceRecordsWith([{ entity: 'photo', fields }], replaces ? [{ entity: 'photo', id: replaces.id }] : [], {
      tables: [db.photoBlobs, db.photoThumbs, db.photo],
      write: async () => {
        if (replaces) await freeBytesOf(replaces, photo.sha256);
        // The same picture chosen twice: one copy of its bytes serves both photos.
        if (!(await db.photoBlobs.get(photo.sha256))) {
          const blob: PhotoBlobRow = {
            sha256: photo.sha256,
            mime: photo.mime,
            bytes: photo.bytes,
            size: photo.bytes.byteLength,
            createdAt: new Date().toISOString(),
            userId,
            state: 'waiting',
          };
          await db.photoBlobs.add(blob);
        }
        await db.photoThumbs.put({ sha256: photo.sha256, mime: photo.thumbMime, bytes: photo.thumb, width: thumbSize?.width ?? 0, height: thumbSize?.height ?? 0 });
      },
    });
    return id!;
  } catch (err) {
    if (err instanceof LocalWriteError && err.reason === 'quota') throw new LocalWriteError(OUT_OF_SPACE, 'quota');
    throw err;
  }
}

/** Drops a photo's bytes and thumbnail from the phone when no other photo row shows them. */
async function freeBytesOf(photo: PhotoRow, keep?: string): Promise<void> {
  const sha = photo.sha256;
  if (!sha || sha === keep) return;
  const others = await db.photo.where('sha256').equals(sha).filter((p) => p.id !== photo.id).count();
  if (others > 0) return;
  await db.photoBlobs.delete(sha);
  await db.photoThumbs.delete(sha);
}

/**
 * Removes a photo the server refused, with its bytes: nothing of it is on the server to keep, and the technician
 * has said it is not wanted.
 */
export async function removeRefusedPhoto(photo: PhotoRow): Promise<void> {
  const alongside: Alongside = { tables: [db.photoBlobs, db.photoThumbs, db.photo], write: () => freeBytesOf(photo) };
  await deleteRecordWith('photo', photo.id, alongside);
}

/** Prepares and keeps one photo. */
export async function addPhoto(file: File, details: PhotoDetails, userId: string, shrink: ShrinkPhoto): Promise<string> {
  return savePhoto(await preparePhoto(file, shrink), details, userId);
}
