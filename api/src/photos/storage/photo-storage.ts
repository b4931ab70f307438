import type { Readable } from 'node:stream';
import type { PhotosConfig } from '../../config/photos.config.js';

/**
 * Where the bytes of photos live, by key. Keys are made by `photoKeys` only, so a driver never sees a path
 * from outside. Writes are whole: a reader never sees half an object.
 */
export interface PhotoStorage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  exists(key: string): Promise<boolean>;
  /** Rejects with PhotoObjectMissing when there is nothing under the key. */
  stream(key: string): Promise<Readable>;
}

export const PHOTO_STORAGE = Symbol('PhotoStorage');

export class PhotoObjectMissing extends Error {
  constructor(key: string) {
    super(`Nothing is stored under ${key}.`);
  }
}

export type StoredVariant = 'original' | 'thumb' | 'display';

/** One folder per organisation, one per photo's sha256: the same bytes are stored once per organisation. */
export function photoKey(organisationId: string, sha256: string, variant: StoredVariant): string {
  return `${organisationId}/${sha256}/${variant === 'original' ? 'original' : `${variant}.webp`}`;
}

/** Keys are organisation id / sha256 / file name; anything else is refused before it reaches a driver. */
export const PHOTO_KEY = /^[0-9a-f-]{36}\/[0-9a-f]{64}\/(original|thumb\.webp|display\.webp)$/;

export async function createPhotoStorage(config: PhotosConfig): Promise<PhotoStorage> {
  if (config.storage === 's3') {
    // Loaded only when used: the SDK is large and the default install never needs it.
    const { S3PhotoStorage } = await import('./s3-photo-storage.js');
    return new S3PhotoStorage(config.s3);
  }
  const { LocalPhotoStorage } = await import('./local-photo-storage.js');
  return new LocalPhotoStorage(config.directory);
}
