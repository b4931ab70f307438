import { MAX_PHOTO_BYTES, MAX_PHOTO_PIXELS, PHOTO_VARIANTS } from '@wiretrail/core';
import sharp, { type Metadata, type Sharp } from 'sharp';

/** A photo the server will not keep, with the status to answer and a sentence the phone can show as it is. */
export class PhotoRefused extends Error {
  constructor(
    readonly status: 400 | 413 | 415 | 422,
    message: string,
  ) {
    super(message);
  }
}

const MB = 1024 * 1024;
export const REFUSALS = {
  tooLarge: `This photo is larger than ${MAX_PHOTO_BYTES / MB} MB, the most the server accepts.`,
  notAPhoto: 'This file is not a photo the server can read. Send a JPEG, PNG, WebP or HEIF image.',
  heic: 'The server cannot read this HEIC photo. Send it as a JPEG.',
  damaged: 'This photo is damaged or incomplete and cannot be opened. Take it again if you can.',
  tooManyPixels: (w: number, h: number) =>
    `This photo has too many pixels (${w} × ${h}); the server accepts up to ${MAX_PHOTO_PIXELS / 1_000_000} megapixels.`,
};

export interface ProcessedPhoto {
  /** Of the original, read from its content, never from what the device said. */
  mime: string;
  /** As displayed, with the camera's orientation applied. */
  width: number;
  height: number;
  thumb: Buffer;
  display: Buffer;
}

function mimeOf(meta: Metadata): string | null {
  switch (meta.format) {
    case 'jpeg':
      return 'image/jpeg';
    case 'png':
      return 'image/png';
    case 'webp':
      return 'image/webp';
    case 'heif':
      return meta.compression === 'av1' ? 'image/avif' : 'image/heic';
    default:
      return null;
  }
}

/**
 * Checks an uploaded photo by its content and makes the sizes the app shows: WebP, upright, long edge at most
 * PHOTO_VARIANTS, and with no metadata unless the organisation keeps location (then the camera's EXIF, GPS
 * included, is kept). Throws PhotoRefused for anything that is not a readable photo within the limits.
 */
export async function processPhoto(bytes: Buffer, options: { keepLocation: boolean }): Promise<ProcessedPhoto> {
  if (bytes.length > MAX_PHOTO_BYTES) throw new PhotoRefused(413, REFUSALS.tooLarge);
  let meta: Metadata;
  try {
    // Reads the header only, so no pixel limit yet: the count is checked next, with a message that says so.
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    throw new PhotoRefused(415, REFUSALS.notAPhoto);
  }
  const mime = mimeOf(meta);
  if (!mime) throw new PhotoRefused(415, REFUSALS.notAPhoto);
  if (!meta.width || !meta.height) throw new PhotoRefused(422, REFUSALS.damaged);
  if (meta.width * meta.height > MAX_PHOTO_PIXELS) throw new PhotoRefused(413, REFUSALS.tooManyPixels(meta.width, meta.height));

  try {
    const { thumb, display } = await makeSizes(bytes, options.keepLocation);
    const upright = meta.autoOrient ?? { width: meta.width, height: meta.height };
    return { mime, width: upright.width, height: upright.height, thumb, display };
  } catch (err) {
    if (/pixel limit/i.test(String(typeof err === 'object' && err !== null && 'message' in err ? err.message : err))) throw new PhotoRefused(413, REFUSALS.tooManyPixels(meta.width, meta.height));
    if (meta.format === 'heif') throw new PhotoRefused(415, REFUSALS.heic);
    throw new PhotoRefused(422, REFUSALS.damaged);
  }
}

const inside = (image: Sharp, edge: number) => image.resize(edge, edge, { fit: 'inside', withoutEnlargement: true });

/**
 * The two sizes, from a decode of the whole image, so a truncated or corrupt file fails here; the pixel limit guards
 * the decoder too, in case the header understated the size.
 */
async function makeSizes(bytes: Buffer, keepLocation: boolean): Promise<{ thumb: Buffer; display: Buffer }> {
  const source = sharp(bytes, { limitInputPixels: MAX_PHOTO_PIXELS, failOn: 'error' }).rotate();
  if (keepLocation) {
    // EXIF passes only from a decoded file to what is made from it, so each size decodes the photo itself.
    const size = (edge: number, quality: number) => inside(source.clone(), edge).keepExif().webp({ quality }).toBuffer();
    const [thumb, display] = await Promise.all([size(PHOTO_VARIANTS.thumb, 72), size(PHOTO_VARIANTS.display, 82)]);
    return { thumb, display };
  }
  // Decoded once, at the display size; the thumbnail is made from those pixels instead of a second decode.
  const { data, info } = await inside(source, PHOTO_VARIANTS.display).raw().toBuffer({ resolveWithObject: true });
  const pixels = () => sharp(data, { raw: { width: info.width, height: info.height, channels: info.channels } });
  const [thumb, display] = await Promise.all([inside(pixels(), PHOTO_VARIANTS.thumb).webp({ quality: 72 }).toBuffer(), pixels().webp({ quality: 82 }).toBuffer()]);
  return { thumb, display };
}
