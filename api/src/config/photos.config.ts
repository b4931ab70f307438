import { registerAs } from '@nestjs/config';
import { dirname, join, resolve } from 'node:path';

/**
 * Where uploads in progress wait: always on disk (UPLOAD_DIR) until they are complete and checked; the photo's
 * bytes then go to storage (storage.config.ts).
 */
export const photosConfig = registerAs('photos', () => {
  const dataDir = dirname(resolve(process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite'));
  return {
    // Several API instances share it (or the balancer keeps each upload's requests on one instance): see the README.
    uploadDirectory: resolve(process.env.UPLOAD_DIR || join(dataDir, 'uploads')),
  };
});

export type PhotosConfig = ReturnType<typeof photosConfig>;
