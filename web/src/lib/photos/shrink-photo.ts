import { PHONE_PHOTO_LONG_EDGE, PHOTO_VARIANTS } from '@wiretrail/core';
// Served from our own origin (and kept by the service worker), so the compression worker also starts offline;
// the library would otherwise fetch its worker script from a public CDN.
import workerScriptUrl from 'browser-image-compression/dist/browser-image-compression.js?url';

export interface ShrunkPhoto {
  /** The photo as it is kept and sent: JPEG, long edge at most PHONE_PHOTO_LONG_EDGE. */
  bytes: ArrayBuffer;
  mime: string;
  /** A small JPEG for lists. */
  thumb: ArrayBuffer;
  thumbMime: string;
}

export type ShrinkPhoto = (file: File) => Promise<ShrunkPhoto>;

const FULL_QUALITY = 0.85;
const THUMB_QUALITY = 0.7;
/**
 * When the scaled photo comes out heavier than the file chosen (an already small, well-compressed photo), the library
 * lowers the quality step by step; a few steps are enough, and each one re-encodes the whole photo.
 */
const MAX_STEPS = 4;

/**
 * Scales a photo down on the phone with browser-image-compression (loaded only when the first photo is taken).
 * The library draws the photo upright (the browser applies the EXIF orientation while decoding) and, with
 * preserveExif, copies the camera's EXIF block with Orientation set to 1; so the server's auto-rotate finds it
 * already upright, and date and camera details travel with it.
 */
export const shrinkPhoto: ShrinkPhoto = async (file) => {
  const { default: imageCompression } = await import('browser-image-compression');
  const common = { useWebWorker: true, libURL: new URL(workerScriptUrl, globalThis.location?.href).href, fileType: 'image/jpeg', maxIteration: MAX_STEPS };
  let full: Blob;
  try {
    full = await imageCompression(file, { ...common, maxWidthOrHeight: PHONE_PHOTO_LONG_EDGE, initialQuality: FULL_QUALITY, preserveExif: true });
  } catch {
    // Copying EXIF throws on a few files (an Orientation tag of an unexpected type): keep the photo without it.
    full = await imageCompression(file, { ...common, maxWidthOrHeight: PHONE_PHOTO_LONG_EDGE, initialQuality: FULL_QUALITY });
  }
  const upright = new File([full], 'photo.jpg', { type: 'image/jpeg', lastModified: file.lastModified });
  const thumb = await imageCompression(upright, { ...common, maxWidthOrHeight: PHOTO_VARIANTS.thumb, initialQuality: THUMB_QUALITY });
  return { bytes: await full.arrayBuffer(), mime: 'image/jpeg', thumb: await thumb.arrayBuffer(), thumbMime: 'image/jpeg' };
};
