import { useLiveQuery } from 'dexie-react-hooks';
import { db, type PhotoMarkupRow } from '@/lib/db';

/** The routes drawn over a photo, to show over it in the viewer; null when none are drawn. */
export async function getPhotoRoutes(photoId: string): Promise<PhotoMarkupRow | null> {
  const rows = (await db.photoMarkup.where('photoId').equals(photoId).toArray()).filter((m) => !m.voidedAt && (m.routes ?? []).length > 0);
  rows.sort((a, b) => (a.createdAt ?? '').localeCompare(b.createdAt ?? '') || a.id.localeCompare(b.id));
  return rows[0] ?? null;
}

export function usePhotoRoutes(photoId: string): PhotoMarkupRow | null | undefined {
  return useLiveQuery(() => getPhotoRoutes(photoId), [photoId]);
}
