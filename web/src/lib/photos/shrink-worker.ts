// Scales photos off the page, so a 12-megapixel picture never freezes the screen while it is decoded and encoded.
import { keepCameraExif } from './camera-exif';

export interface ShrinkRequest {
  id: number;
  file: Blob;
  longEdge: number;
  thumbEdge: number;
  quality: number;
  thumbQuality: number;
}

export type ShrinkAnswer = { id: number; bytes: ArrayBuffer; thumb: ArrayBuffer } | { id: number; error: string };

/** Cameras put EXIF near the start of the file; this much is plenty. */
const EXIF_READ_BYTES = 256 * 1024;
/** A photo already small and well compressed may come out heavier: lower the quality this many times at most. */
const MAX_STEPS = 4;
const STEP = 0.1;

function draw(source: ImageBitmap, edge: number): OffscreenCanvas {
  const scale = Math.min(1, edge / Math.max(source.width, source.height));
  const canvas = new OffscreenCanvas(Math.max(1, Math.round(source.width * scale)), Math.max(1, Math.round(source.height * scale)));
  const context = canvas.getContext('2d');
  if (!context) throw new Error('this phone cannot draw the photo off screen');
  context.imageSmoothingQuality = 'high';
  context.drawImage(source, 0, 0, canvas.width, canvas.height);
  return canvas;
}

async function shrink({ file, longEdge, thumbEdge, quality, thumbQuality }: ShrinkRequest): Promise<{ bytes: ArrayBuffer; thumb: ArrayBuffer }> {
  // Decoded upright: the browser applies the EXIF orientation.
  const [picture, head] = await Promise.all([createImageBitmap(file, { imageOrientation: 'from-image' }), file.slice(0, EXIF_READ_BYTES).arrayBuffer()]);
  try {
    const full = draw(picture, longEdge);
    let encoded = await full.convertToBlob({ type: 'image/jpeg', quality });
    for (let step = 1; step <= MAX_STEPS && encoded.size > file.size && quality - step * STEP > 0.3; step++) {
      encoded = await full.convertToBlob({ type: 'image/jpeg', quality: quality - step * STEP });
    }
    const thumb = await draw(picture, thumbEdge).convertToBlob({ type: 'image/jpeg', quality: thumbQuality });
    return { bytes: keepCameraExif(head, await encoded.arrayBuffer()), thumb: await thumb.arrayBuffer() };
  } finally {
    picture.close();
  }
}

globalThis.addEventListener('message', async (event: MessageEvent<ShrinkRequest>) => {
  const { id } = event.data;
  try {
    const { bytes, thumb } = await shrink(event.data);
    globalThis.postMessage({ id, bytes, thumb } satisfies ShrinkAnswer, { transfer: [bytes, thumb] });
  } catch (err) {
    globalThis.postMessage({ id, error: (err as Error)?.message ?? String(err) } satisfies ShrinkAnswer);
  }
});
