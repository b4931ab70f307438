import { useLiveQuery } from 'dexie-react-hooks';
import { db, type PhotoBlobRow } from '@/lib/db';

/** The full-size photo kept on this phone; null once freed (or never here), undefined while reading. */
export function usePhotoBytes(sha256: string | null | undefined): Pick<PhotoBlobRow, 'bytes' | 'mime'> | null | undefined {
  return useLiveQuery(async () => {
    const blob = sha256 ? await db.photoBlobs.get(sha256) : undefined;
    return blob && blob.state !== 'freed' && blob.bytes ? { bytes: blob.bytes, mime: blob.mime } : null;
  }, [sha256]);
}
