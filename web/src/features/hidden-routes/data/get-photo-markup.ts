import { useLiveQuery } from 'dexie-react-hooks';
import { type CableRunRow, type CircuitRow, db, type PhotoMarkupRow, type PhotoRow } from '@/lib/db';

export interface PhotoMarkupOnPhone {
  photo: PhotoRow | null;
  /** The routes drawn on it, or null before any are saved. */
  markup: PhotoMarkupRow | null;
  cables: CableRunRow[];
  circuits: CircuitRow[];
  /** The photo's bytes where this phone still keeps them. */
  bytes: { bytes: ArrayBuffer; mime: string } | null;
}

const live = <T extends { voidedAt?: string | null }>(rows: T[]) => rows.filter((r) => !r.voidedAt);

export async function getPhotoMarkup(photoId: string): Promise<PhotoMarkupOnPhone> {
  const photo = (await db.photo.get(photoId)) ?? null;
  if (!photo) return { photo: null, markup: null, cables: [], circuits: [], bytes: null };
  const [markups, cables, circuits, blob] = await Promise.all([
    db.photoMarkup.where('photoId').equals(photoId).toArray(),
    db.cableRun.where('siteId').equals(photo.siteId).toArray(),
    db.circuit.where('siteId').equals(photo.siteId).toArray(),
    photo.sha256 ? db.photoBlobs.get(photo.sha256) : undefined,
  ]);
  // One markup per photo; should two phones each have started one, the first made is the one shown and edited.
  const markup = live(markups).sort((a, b) => (a.createdAt ?? '').localeCompare(b.createdAt ?? '') || a.id.localeCompare(b.id))[0] ?? null;
  return {
    photo,
    markup,
    cables: live(cables).sort((a, b) => a.label.localeCompare(b.label, 'en-GB', { numeric: true })),
    circuits: circuits.sort((a, b) => a.number.localeCompare(b.number, 'en-GB', { numeric: true })),
    bytes: blob && blob.state !== 'freed' && blob.bytes ? { bytes: blob.bytes, mime: blob.mime } : null,
  };
}

export function usePhotoMarkup(photoId: string): PhotoMarkupOnPhone | undefined {
  return useLiveQuery(() => getPhotoMarkup(photoId), [photoId]);
}
