import { GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import { Readable } from 'node:stream';
import type { StorageConfig } from '../config/storage.config.js';
import { type FileStorage, type KeySpace, StoredFileMissing } from './file-storage.js';

/** Files as objects in an S3-compatible bucket (AWS, MinIO, Garage, R2 and the like). */
export class S3FileStorage implements FileStorage {
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(
    options: StorageConfig['s3'],
    private readonly keys: KeySpace,
  ) {
    this.bucket = options.bucket;
    this.client = new S3Client({
      endpoint: options.endpoint,
      region: options.region,
      // Self-hosted stores answer at one host with the bucket in the path.
      forcePathStyle: true,
      credentials: options.accessKeyId && options.secretAccessKey ? { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey } : undefined,
      // Many S3-compatible stores refuse the SDK's newer default checksums; ask for them only where S3 requires them.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
  }

  private check(key: string): string {
    if (!this.keys.pattern.test(key)) throw new Error(`Not a key this store keeps: ${key}`);
    return `${this.keys.prefix}${key}`;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: this.check(key), Body: body, ContentType: contentType }));
  }

  async get(key: string): Promise<Buffer> {
    const body = await this.open(key);
    const chunks: Buffer[] = [];
    for await (const chunk of body) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk));
    return Buffer.concat(chunks);
  }

  async exists(key: string): Promise<boolean> {
    try {
      await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: this.check(key) }));
      return true;
    } catch (err) {
      if (isMissing(err)) return false;
      throw err;
    }
  }

  stream(key: string): Promise<Readable> {
    return this.open(key);
  }

  private async open(key: string): Promise<Readable> {
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: this.check(key) }));
      // In Node.js the body is a readable stream; the SDK's type covers the browser's bodies too.
      if (!(res.Body instanceof Readable)) throw new Error(`The bucket answered ${key} without a readable body.`);
      return res.Body;
    } catch (err) {
      throw isMissing(err) ? new StoredFileMissing(key) : err;
    }
  }
}

const isMissing = (err: unknown) =>
  err instanceof S3ServiceException && (err.$metadata.httpStatusCode === 404 || err.name === 'NoSuchKey' || err.name === 'NotFound');
