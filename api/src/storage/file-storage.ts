import type { Readable } from 'node:stream';
import type { StorageConfig } from '../config/storage.config.js';

/**
 * Where stored files (the bytes of photos, issued PDFs) live, by key. Keys are made by `photoKey` and
 * `documentKey` only, and each store refuses any key outside its own key space, so a driver never sees a path
 * from outside. Writes are whole: a reader never sees half an object.
 */
export interface FileStorage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  exists(key: string): Promise<boolean>;
  /** Rejects with StoredFileMissing when there is nothing under the key. */
  stream(key: string): Promise<Readable>;
}

/** The keys one store accepts, and where they go in a bucket that several kinds of file share. */
export interface KeySpace {
  readonly pattern: RegExp;
  /** Put before every key in S3, so that photos and issued PDFs can share one bucket. */
  readonly prefix: string;
}

export class StoredFileMissing extends Error {
  constructor(key: string) {
    super(`Nothing is stored under ${key}.`);
  }
}

/** Where one kind of file is kept: the driver, its local directory and the bucket. */
export interface FileStorageConfig {
  driver: StorageConfig['driver'];
  directory: string;
  s3: StorageConfig['s3'];
}

export async function createFileStorage(config: FileStorageConfig, keys: KeySpace): Promise<FileStorage> {
  if (config.driver === 's3') {
    // Loaded only when used: the SDK is large and the default install never needs it.
    const { S3FileStorage } = await import('./s3-file-storage.js');
    return new S3FileStorage(config.s3, keys);
  }
  const { LocalFileStorage } = await import('./local-file-storage.js');
  return new LocalFileStorage(config.directory, keys);
}
