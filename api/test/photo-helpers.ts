import { expect } from '@jest/globals';
import { createHash, randomBytes } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { crc32 } from 'node:zlib';
import sharp from 'sharp';
import type { Response } from 'supertest';
import type { Session } from './sync-helpers.js';
import type { TestApp } from './test-app.js';

/** Photo fixtures are made here with sharp; no image file is kept in the repository. */

export const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
export const bearer = (s: Session) => ({ authorization: `Bearer ${s.accessToken}` });

/** A JPEG of random pixels: every call gives different bytes, and noise keeps it large enough for several chunks. */
export function noisyJpeg(width = 600, height = 400): Promise<Buffer> {
  return sharp(randomBytes(width * height * 3), { raw: { width, height, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
}

/** A landscape photo taken with the phone turned: stored 1200 × 800, shown upright as 800 × 1200. */
export function turnedJpeg(): Promise<Buffer> {
  const [r, g, b] = randomBytes(3);
  return sharp({ create: { width: 1200, height: 800, channels: 3, background: { r: r!, g: g!, b: b! } } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** A photo that says where it was taken. */
export function jpegWithLocation(): Promise<Buffer> {
  const [r, g, b] = randomBytes(3);
  return sharp({ create: { width: 640, height: 480, channels: 3, background: { r: r!, g: g!, b: b! } } })
    .jpeg()
    .withExif({ IFD0: { Make: 'Wiretrail test' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' } })
    .toBuffer();
}

/** Whether EXIF holds a pointer to GPS data (tag 0x8825), in either byte order. */
export function hasLocation(exif: Buffer | undefined): boolean {
  return !!exif && (exif.includes(Buffer.from([0x25, 0x88])) || exif.includes(Buffer.from([0x88, 0x25])));
}

/** A tiny PNG whose header claims 9000 × 9000 pixels (81 megapixels): a decompression bomb in miniature. */
export async function pixelBomb(): Promise<Buffer> {
  const png = Buffer.from(await sharp({ create: { width: 8, height: 8, channels: 3, background: '#ffffff' } }).png().toBuffer());
  png.writeUInt32BE(9000, 16);
  png.writeUInt32BE(9000, 20);
  png.writeUInt32BE(crc32(png.subarray(12, 29)), 29);
  return png;
}

function tusMetadata(values: Record<string, string>): string {
  return Object.entries(values)
    .map(([k, v]) => `${k} ${Buffer.from(v).toString('base64')}`)
    .join(',');
}

export interface UploadOutcome {
  location: string;
  /** The answer to the last request made: 204 when the upload finished and was kept. */
  last: Response;
  patches: number;
}

export async function createUpload(t: TestApp, s: Session, length: number, metadata: Record<string, string>): Promise<Response> {
  return t.http
    .post('/api/uploads')
    .set(bearer(s))
    .set('Tus-Resumable', '1.0.0')
    .set('Upload-Length', String(length))
    .set('Upload-Metadata', tusMetadata(metadata));
}

export function patchUpload(t: TestApp, s: Session, location: string, offset: number, chunk: Buffer): Promise<Response> {
  return t.http
    .patch(location)
    .set(bearer(s))
    .set('Tus-Resumable', '1.0.0')
    .set('Upload-Offset', String(offset))
    .set('Content-Type', 'application/offset+octet-stream')
    .send(chunk) as unknown as Promise<Response>;
}

export async function headUpload(t: TestApp, s: Session, location: string): Promise<number> {
  const res = await t.http.head(location).set(bearer(s)).set('Tus-Resumable', '1.0.0').expect(200);
  return Number(res.headers['upload-offset']);
}

/** Sends bytes the way the app does: create, then PATCH chunk by chunk from the offset the server reports. */
export async function upload(t: TestApp, s: Session, bytes: Buffer, opts: { sha256?: string; chunk?: number; from?: { location: string; offset: number } } = {}): Promise<UploadOutcome> {
  let location = opts.from?.location;
  if (!location) {
    const created = await createUpload(t, s, bytes.length, { sha256: opts.sha256 ?? sha256(bytes), filetype: 'image/jpeg', filename: 'photo.jpg' });
    expect([created.status, created.text]).toEqual([201, '']);
    location = created.headers.location as string;
  }
  let offset = opts.from?.offset ?? 0;
  let patches = 0;
  let last: Response | undefined;
  while (offset < bytes.length) {
    last = await patchUpload(t, s, location, offset, bytes.subarray(offset, offset + (opts.chunk ?? 64 * 1024)));
    patches++;
    if (last.status !== 204) break;
    offset = Number(last.headers['upload-offset']);
  }
  return { location, last: last!, patches };
}

/**
 * Starts a PATCH that promises the whole chunk, sends only part of it and drops the connection, as a phone
 * losing signal does. Needs the app listening on a port.
 */
export function cutPatch(t: TestApp, s: Session, location: string, offset: number, chunk: Buffer, sent: number): Promise<void> {
  const { port } = t.app.getHttpServer().address() as AddressInfo;
  return new Promise((resolve) => {
    const req = http.request({
      host: '127.0.0.1',
      port,
      method: 'PATCH',
      path: location,
      headers: {
        ...bearer(s),
        'tus-resumable': '1.0.0',
        'upload-offset': String(offset),
        'content-type': 'application/offset+octet-stream',
        'content-length': String(chunk.length),
      },
    });
    req.on('error', () => resolve());
    req.on('response', (res) => {
      res.resume();
      resolve();
    });
    req.write(chunk.subarray(0, sent), () => {
      setTimeout(() => {
        req.destroy();
        resolve();
      }, 150);
    });
  });
}

/** Waits until HEAD reports the same offset twice: the server has finished with the dropped request. */
export async function settledOffset(t: TestApp, s: Session, location: string): Promise<number> {
  let last = -1;
  for (let i = 0; i < 50; i++) {
    const now = await headUpload(t, s, location);
    if (now === last) return now;
    last = now;
    await new Promise((r) => setTimeout(r, 100));
  }
  return last;
}
