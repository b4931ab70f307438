import type { PreviousUpload, UrlStorage } from 'tus-js-client';
import { v4 as uuidv4 } from 'uuid';
import type { PhotoUploadRow, WiretrailDb } from '@/lib/db';

const toPrevious = (row: PhotoUploadRow): PreviousUpload => ({
  size: row.size,
  metadata: row.metadata,
  creationTime: row.creationTime,
  urlStorageKey: row.key,
  uploadUrl: row.uploadUrl,
  parallelUploadUrls: row.parallelUploadUrls,
});

/**
 * Where tus keeps unfinished uploads, in IndexedDB rather than localStorage: it survives with the photos it
 * belongs to, and a reload finds the upload URL to ask the server for its offset and carry on from there.
 */
export class DexieUrlStorage implements UrlStorage {
  constructor(private readonly db: WiretrailDb) {}

  async findAllUploads(): Promise<PreviousUpload[]> {
    return (await this.db.photoUploads.toArray()).map(toPrevious);
  }

  async findUploadsByFingerprint(fingerprint: string): Promise<PreviousUpload[]> {
    const rows = await this.db.photoUploads.where('fingerprint').equals(fingerprint).toArray();
    // The newest first: that is the one to carry on with.
    return rows.sort((a, b) => Date.parse(b.creationTime) - Date.parse(a.creationTime)).map(toPrevious);
  }

  async removeUpload(urlStorageKey: string): Promise<void> {
    await this.db.photoUploads.delete(urlStorageKey);
  }

  async addUpload(fingerprint: string, upload: PreviousUpload): Promise<string> {
    const key = `tus::${fingerprint}::${uuidv4()}`;
    await this.db.photoUploads.put({
      key,
      fingerprint,
      uploadUrl: upload.uploadUrl ?? null,
      parallelUploadUrls: upload.parallelUploadUrls ?? null,
      size: upload.size ?? null,
      metadata: upload.metadata ?? {},
      creationTime: upload.creationTime ?? new Date().toISOString(),
      offset: 0,
    });
    return key;
  }

  /** Notes how far the server has got, for the badge after a reload. */
  async noteOffset(fingerprint: string, offset: number): Promise<void> {
    await this.db.photoUploads.where('fingerprint').equals(fingerprint).modify({ offset });
  }

  async forget(fingerprint: string): Promise<void> {
    await this.db.photoUploads.where('fingerprint').equals(fingerprint).delete();
  }
}
