import { registerAs } from '@nestjs/config';
import { dirname, join, resolve } from 'node:path';

export type PhotoStorageKind = 'local' | 's3';

/**
 * Where photo bytes live. Local disk by default, beside the database; any S3-compatible object store otherwise.
 * Uploads in progress always wait on disk (UPLOAD_DIR) until they are complete and checked.
 */
export const photosConfig = registerAs('photos', () => {
  const dataDir = dirname(resolve(process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite'));
  return {
    storage: (process.env.PHOTO_STORAGE ?? 'local') as PhotoStorageKind,
    directory: resolve(process.env.PHOTO_STORAGE_DIR || join(dataDir, 'photos')),
    // Several API instances share it (or the balancer keeps each upload's requests on one instance): see the README.
    uploadDirectory: resolve(process.env.UPLOAD_DIR || join(dataDir, 'uploads')),
    s3: {
      endpoint: process.env.S3_ENDPOINT || undefined,
      bucket: process.env.S3_BUCKET ?? '',
      region: process.env.S3_REGION || 'us-east-1',
      accessKeyId: process.env.S3_ACCESS_KEY_ID || undefined,
      secretAccessKey: process.env.S3_SECRET_ACCESS_KEY || undefined,
    },
  };
});

export type PhotosConfig = ReturnType<typeof photosConfig>;
