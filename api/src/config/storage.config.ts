import { registerAs } from '@nestjs/config';
import { dirname, join, resolve } from 'node:path';

export type StorageDriver = 'local' | 's3';

/**
 * Where stored files live: photo bytes and issued PDFs. Local disk by default, beside the database, each kind in a
 * directory of its own; or one S3-compatible bucket for all, each kind under a prefix of its own (see file-stores.ts).
 * The variables keep the names they had when photos were the only files (PHOTO_STORAGE chooses the driver for all).
 */
export const storageConfig = registerAs('storage', () => {
  const dataDir = dirname(resolve(process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite'));
  // Checked at boot (env.validation.ts): local or s3.
  const driver: StorageDriver = process.env.PHOTO_STORAGE === 's3' ? 's3' : 'local';
  const documents = resolve(process.env.DOCUMENT_STORAGE_DIR || join(dataDir, 'documents'));
  return {
    driver,
    directories: {
      photos: resolve(process.env.PHOTO_STORAGE_DIR || join(dataDir, 'photos')),
      documents,
      // Quotes, invoices and credit notes sit beside the documents, wherever those were put.
      invoices: join(dirname(documents), 'invoices'),
    },
    s3: {
      endpoint: process.env.S3_ENDPOINT || undefined,
      bucket: process.env.S3_BUCKET ?? '',
      region: process.env.S3_REGION || 'us-east-1',
      accessKeyId: process.env.S3_ACCESS_KEY_ID || undefined,
      secretAccessKey: process.env.S3_SECRET_ACCESS_KEY || undefined,
    },
  };
});

export type StorageConfig = ReturnType<typeof storageConfig>;
