import { afterAll, beforeAll } from '@jest/globals';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';
import { describePhotoStorage } from './photo-storage-suite.js';

/** The photo storage suite against the S3 driver, talking to s3rver (a local S3 fake) on a free port. */
const dir = mkdtempSync(join(tmpdir(), 'wiretrail-s3-'));
const BUCKET = 'wiretrail-photos';
const s3 = new S3rver({ address: '127.0.0.1', port: 0, directory: dir, silent: true, configureBuckets: [{ name: BUCKET }] });
let endpoint = '';

beforeAll(async () => {
  const { port } = await s3.run();
  endpoint = `http://127.0.0.1:${port}`;
});
afterAll(async () => {
  await s3.close();
  rmSync(dir, { recursive: true, force: true });
});

describePhotoStorage('S3-compatible storage (s3rver)', {
  env: () => ({
    PHOTO_STORAGE: 's3',
    S3_ENDPOINT: endpoint,
    S3_BUCKET: BUCKET,
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
  }),
  listKeys: async (organisationId) => {
    const client = new S3Client({ endpoint, region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } });
    const listed = await client.send(new ListObjectsV2Command({ Bucket: BUCKET, Prefix: `${organisationId}/` }));
    client.destroy();
    return (listed.Contents ?? []).map((o) => o.Key!);
  },
});
