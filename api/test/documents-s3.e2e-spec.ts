import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';
import { bearer, downloadPdf, jobByReference, sha256 } from './document-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

/** Issued PDFs on the S3 driver, in the photos' bucket under documents/, against s3rver (a local S3 fake). */
describe('documents in S3-compatible storage', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wiretrail-s3-documents-'));
  const BUCKET = 'wiretrail-files';
  const s3 = new S3rver({ address: '127.0.0.1', port: 0, directory: dir, silent: true, configureBuckets: [{ name: BUCKET }] });
  let client: S3Client;
  let t: TestApp;

  beforeAll(async () => {
    const { port } = await s3.run();
    const endpoint = `http://127.0.0.1:${port}`;
    const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
    client = new S3Client({ endpoint, region: 'us-east-1', forcePathStyle: true, credentials });
    t = await createTestApp({ PHOTO_STORAGE: 's3', S3_ENDPOINT: endpoint, S3_BUCKET: BUCKET, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' });
  });
  afterAll(async () => {
    await t.close();
    client.destroy();
    await s3.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('stores the issued PDF as an object and serves it back unchanged', async () => {
    const office = await signIn(t, 'office@larkfield.example');
    const job = await jobByReference(t, office, 'LED-0033');
    // The photo record reads the photos' display sizes from the same bucket.
    const doc = (await t.http.post(`/api/jobs/${job.id}/documents`).set(bearer(office)).send({ kind: 'photo-record' }).expect(201)).body;
    const key = `documents/${office.user.organisationId}/${doc.id}.pdf`;
    const listed = await client.send(new ListObjectsV2Command({ Bucket: BUCKET, Prefix: 'documents/' }));
    expect((listed.Contents ?? []).map((o) => o.Key)).toEqual([key]);
    const object = await client.send(new GetObjectCommand({ Bucket: BUCKET, Key: key }));
    const stored = Buffer.from(await object.Body!.transformToByteArray());
    expect(sha256(stored)).toBe(doc.pdfSha256);
    expect(object.ContentType).toBe('application/pdf');
    expect(sha256((await downloadPdf(t, office, doc.id)).bytes)).toBe(doc.pdfSha256);
  });
});
