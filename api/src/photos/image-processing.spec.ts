import { describe, expect, it } from '@jest/globals';
import { MAX_PHOTO_BYTES } from '@wiretrail/core';
import sharp from 'sharp';
import { PhotoRefused, processPhoto } from './image-processing.js';

const plain = (format: 'jpeg' | 'png' | 'webp' | 'avif' | 'gif', width = 900, height = 600) =>
  sharp({ create: { width, height, channels: 3, background: '#5a7d9a' } }).toFormat(format).toBuffer();

async function refusal(bytes: Buffer): Promise<PhotoRefused> {
  try {
    await processPhoto(bytes, { keepLocation: false });
  } catch (err) {
    if (err instanceof PhotoRefused) return err;
    throw err;
  }
  throw new Error('the photo was kept');
}

describe('processPhoto', () => {
  it.each([
    ['jpeg', 'image/jpeg'],
    ['png', 'image/png'],
    ['webp', 'image/webp'],
    ['avif', 'image/avif'],
  ] as const)('reads a %s by its content and makes WebP sizes no larger than the photo', async (format, mime) => {
    const photo = await processPhoto(await plain(format), { keepLocation: false });
    expect({ mime: photo.mime, width: photo.width, height: photo.height }).toEqual({ mime, width: 900, height: 600 });
    expect(await sharp(photo.thumb).metadata()).toMatchObject({ format: 'webp', width: 320, height: 213 });
    expect(await sharp(photo.display).metadata()).toMatchObject({ format: 'webp', width: 900, height: 600 });
  });

  it('keeps the colour and transparency of the photo in both sizes', async () => {
    const png = await sharp({ create: { width: 2400, height: 1800, channels: 4, background: { r: 200, g: 10, b: 40, alpha: 0.5 } } }).png().toBuffer();
    const photo = await processPhoto(png, { keepLocation: false });
    for (const size of [photo.thumb, photo.display]) {
      const means = (await sharp(size).stats()).channels.map((c) => c.mean);
      [200, 10, 40, 128].forEach((expected, i) => expect(Math.abs(means[i]! - expected)).toBeLessThan(5));
    }
  });

  it('refuses drawings and animations it does not take as photos', async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10"/></svg>');
    expect((await refusal(svg)).status).toBe(415);
    expect((await refusal(await plain('gif'))).status).toBe(415);
  });

  it('refuses more bytes than the limit before reading them', async () => {
    const refused = await refusal(Buffer.alloc(MAX_PHOTO_BYTES + 1));
    expect([refused.status, refused.message]).toEqual([413, 'This photo is larger than 25 MB, the most the server accepts.']);
  });

  it('strips metadata from the sizes unless location is kept', async () => {
    const withExif = await sharp(await plain('jpeg')).withExif({ IFD0: { Copyright: 'Larkfield' } }).jpeg().toBuffer();
    expect((await sharp((await processPhoto(withExif, { keepLocation: false })).thumb).metadata()).exif).toBeUndefined();
    expect((await sharp((await processPhoto(withExif, { keepLocation: true })).thumb).metadata()).exif).toBeDefined();
  });
});
