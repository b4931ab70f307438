import { useLiveQuery } from 'dexie-react-hooks';
import { db, type PhotoThumbRow } from '@/lib/db';

/** undefined while reading; null when this phone has no thumbnail of those bytes (someone else took the photo). */
export function usePhotoThumb(sha256: string): PhotoThumbRow | null | undefined {
  return useLiveQuery(async () => (sha256 ? ((await db.photoThumbs.get(sha256)) ?? null) : null), [sha256]);
}
