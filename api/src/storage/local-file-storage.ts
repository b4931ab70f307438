import { createReadStream } from 'node:fs';
import { access, mkdir, readFile, rename, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import type { Readable } from 'node:stream';
import { v7 as uuidv7 } from 'uuid';
import { type FileStorage, type KeySpace, StoredFileMissing } from './file-storage.js';

/** Files under one directory (by default `photos/`, `documents/` or `invoices/` beside the database). */
export class LocalFileStorage implements FileStorage {
  constructor(
    readonly directory: string,
    private readonly keys: KeySpace,
  ) {}

  private path(key: string): string {
    if (!this.keys.pattern.test(key)) throw new Error(`Not a key this store keeps: ${key}`);
    return join(this.directory, ...key.split('/'));
  }

  /** The type is not kept: files are served with the type recorded for the photo or the PDF. */
  async put(key: string, body: Buffer, _contentType?: string): Promise<void> {
    const path = this.path(key);
    await mkdir(dirname(path), { recursive: true });
    // Written aside and renamed, so that a crash never leaves half a file under the real name.
    const partial = `${path}.${uuidv7()}.partial`;
    await writeFile(partial, body);
    await rename(partial, path);
  }

  async get(key: string): Promise<Buffer> {
    try {
      return await readFile(this.path(key));
    } catch (err) {
      throw isMissing(err) ? new StoredFileMissing(key) : err;
    }
  }

  async exists(key: string): Promise<boolean> {
    try {
      await access(this.path(key));
      return true;
    } catch {
      return false;
    }
  }

  async stream(key: string): Promise<Readable> {
    const stream = createReadStream(this.path(key));
    // Opening is asynchronous: wait for it, so that a missing file is an answer and not a broken response.
    await new Promise<void>((resolve, reject) => {
      stream.once('open', () => resolve());
      stream.once('error', (err) => reject(isMissing(err) ? new StoredFileMissing(key) : err));
    });
    return stream;
  }
}

// Not `instanceof Error`: Node's errors may come from another realm (a test runner's, say).
const isMissing = (err: unknown) => typeof err === 'object' && err !== null && 'code' in err && err.code === 'ENOENT';
