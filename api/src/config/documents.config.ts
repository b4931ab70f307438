import { registerAs } from '@nestjs/config';
import { dirname, join, resolve } from 'node:path';
import { photosConfig } from './photos.config.js';

/**
 * Where issued documents' PDFs live: the same kind of store as photos (local disk, or the same S3-compatible
 * bucket under `documents/`), in a directory of their own on disk.
 */
export const documentsConfig = registerAs('documents', () => {
  const photos = photosConfig();
  const dataDir = dirname(resolve(process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite'));
  return {
    storage: photos.storage,
    directory: resolve(process.env.DOCUMENT_STORAGE_DIR || join(dataDir, 'documents')),
    s3: photos.s3,
  };
});

export type DocumentsConfig = ReturnType<typeof documentsConfig>;
