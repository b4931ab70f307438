import { PHONE_PHOTO_LONG_EDGE, PHOTO_VARIANTS } from '@wiretrail/core';
import type { ShrinkAnswer, ShrinkRequest } from './shrink-worker';

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

let worker: Worker | null = null;
let lastId = 0;
const pending = new Map<number, { resolve: (p: ShrunkPhoto) => void; reject: (e: Error) => void }>();

/**
 * One worker for the session, started with the first photo: a same-origin script (the content security policy
 * allows workers from our own origin only), kept by the service worker so it also starts offline.
 */
function shrinker(): Worker {
  if (worker) return worker;
  const started = new Worker(new URL('./shrink-worker.ts', import.meta.url), { type: 'module', name: 'photo-shrinker' });
  started.addEventListener('message', (event: MessageEvent<ShrinkAnswer>) => {
    const answer = event.data;
    const waiting = pending.get(answer.id);
    pending.delete(answer.id);
    if (!waiting) return;
    if ('error' in answer) waiting.reject(new Error(answer.error));
    else waiting.resolve({ bytes: answer.bytes, mime: 'image/jpeg', thumb: answer.thumb, thumbMime: 'image/jpeg' });
  });
  started.addEventListener('error', (event) => {
    // The worker could not start (or died): the photos it held fail and the next photo starts a fresh one.
    event.preventDefault();
    const reason = new Error(event.message || 'the photo worker could not start');
    for (const waiting of pending.values()) waiting.reject(reason);
    pending.clear();
    started.terminate();
    if (worker === started) worker = null;
  });
  worker = started;
  return started;
}

/**
 * Scales a photo down in a worker: drawn upright (the browser applies the EXIF orientation while decoding), long
 * edge PHONE_PHOTO_LONG_EDGE, with the camera's EXIF kept and its Orientation set to 1, plus a thumbnail.
 */
export const shrinkPhoto: ShrinkPhoto = (file) =>
  new Promise((resolve, reject) => {
    const id = ++lastId;
    pending.set(id, { resolve, reject });
    const request: ShrinkRequest = { id, file, longEdge: PHONE_PHOTO_LONG_EDGE, thumbEdge: PHOTO_VARIANTS.thumb, quality: FULL_QUALITY, thumbQuality: THUMB_QUALITY };
    shrinker().postMessage(request);
  });
