import type { Readable } from 'node:stream';
import type { PhotosConfig } from '../../config/photos.config.js';

/**
 * Where stored files (the bytes of photos, issued documents) live, by key. Keys are made by `photoKey` and
 * `documentKey` only, and each store refuses any key outside its own key space, so a driver never sees a path
 * from outside. Writes are whole: a reader never sees half an object.
 */
export interface FileStorage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  exists(key: string): Promise<boolean>;
  /** Rejects with PhotoObjectMissing when there is nothing under the key. */
  stream(key: string): Promise<Readable>;
}

export type PhotoStorage = FileStorage;

export const PHOTO_STORAGE = Symbol('PhotoStorage');

/** The keys one store accepts, and where they go in a bucket that several kinds of file share. */
export interface KeySpace {
  readonly pattern: RegExp;
  /** Put before every key in S3, so that photos and documents can share one bucket. */
  readonly prefix: string;
}

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

export const PHOTO_KEYS: KeySpace = { pattern: PHOTO_KEY, prefix: '' };

/** Where a kind of file is kept: the driver, its local directory and its bucket. */
export type FileStorageConfig = Pick<PhotosConfig, 'storage' | 'directory' | 's3'>;

export async function createFileStorage(config: FileStorageConfig, keys: KeySpace): Promise<FileStorage> {
  if (config.storage === 's3') {
    // Loaded only when used: the SDK is large and the default install never needs it.
    const { S3PhotoStorage } = await import('./s3-photo-storage.js');
    return new S3PhotoStorage(config.s3, keys);
  }
  const { LocalPhotoStorage } = await import('./local-photo-storage.js');
  return new LocalPhotoStorage(config.directory, keys);
}

export const createPhotoStorage = (config: PhotosConfig): Promise<PhotoStorage> => createFileStorage(config, PHOTO_KEYS);
