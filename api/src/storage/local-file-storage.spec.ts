import { afterAll, describe, expect, it } from '@jest/globals';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { StoredFileMissing } from './file-storage.js';
import { PHOTO_KEYS, photoKey } from './file-stores.js';
import { LocalFileStorage } from './local-file-storage.js';

const ORG = '01890000-0000-7000-8000-000000000001';
const SHA = 'ab'.repeat(32);

describe('LocalFileStorage', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wiretrail-photos-'));
  const storage = new LocalFileStorage(dir, PHOTO_KEYS);
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('keeps bytes under their key and hands them back whole', async () => {
    const key = photoKey(ORG, SHA, 'thumb');
    expect(await storage.exists(key)).toBe(false);
    await storage.put(key, Buffer.from('thumb bytes'), 'image/webp');
    expect(await storage.exists(key)).toBe(true);
    expect((await storage.get(key)).toString()).toBe('thumb bytes');
    const chunks: Buffer[] = [];
    for await (const chunk of await storage.stream(key)) chunks.push(chunk as Buffer);
    expect(Buffer.concat(chunks).toString()).toBe('thumb bytes');
    // Written aside and renamed: nothing half-written is left behind.
    expect(readdirSync(join(dir, ORG, SHA))).toEqual(['thumb.webp']);
  });

  it('says when nothing is stored under a key', async () => {
    await expect(storage.get(photoKey(ORG, SHA, 'display'))).rejects.toBeInstanceOf(StoredFileMissing);
    await expect(storage.stream(photoKey(ORG, SHA, 'original'))).rejects.toBeInstanceOf(StoredFileMissing);
  });

  it('refuses keys it did not make', async () => {
    await expect(storage.put(`${ORG}/../../escape`, Buffer.from('x'), 'text/plain')).rejects.toThrow('Not a key this store keeps');
    await expect(storage.get('../etc/passwd')).rejects.toThrow('Not a key this store keeps');
  });
});
