import type { PullResponse, PushResponse } from '@wiretrail/core';
import { env } from '@/config/env';
import { api, apiRequest, refreshSession } from '@/lib/api-client';
import { db } from '@/lib/db';
import type { PhotoUploader } from '@/lib/photos/photo-uploader';
import { resetUploadProgress } from '@/lib/photos/upload-progress';
import { getSession } from '@/lib/session';
import { subscribeLocalWrites } from './local-write';
import { SyncEngine, type SyncOutcome, type SyncTransport } from './sync-engine';

export const httpTransport: SyncTransport = {
  push: ({ deviceId, mutations }) => apiRequest<PushResponse>('/sync/push', { method: 'POST', body: { deviceId, mutations } }),
  pull: ({ checkpoint, limit, deviceId }) =>
    api.get<PullResponse>(`/sync/pull?${new URLSearchParams({ checkpoint: String(checkpoint), limit: String(limit), deviceId })}`),
};

const EVERY_MS = 3 * 60_000;
const AFTER_WRITE_MS = 1_500;

/** One tab syncs at a time; the others wait their turn (their changes are in the shared outbox anyway). */
function acrossTabs(run: () => Promise<void>): Promise<void> {
  const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
  return locks?.request ? locks.request('wiretrail-sync', run) : run();
}

const visible = () => typeof document === 'undefined' || document.visibilityState === 'visible';
// navigator.onLine = false is reliable (true is not): skip attempts that cannot succeed and wait for 'online'.
const offline = () => typeof navigator !== 'undefined' && navigator.onLine === false;

let engine: SyncEngine | null = null;

/** Asks once, after the first sign-in, that the browser never clears this phone's records to free space. */
async function askForPersistentStorage(): Promise<void> {
  if (await db.getMeta('persistAsked')) return;
  const storage = typeof navigator !== 'undefined' ? navigator.storage : undefined;
  if (!storage?.persist) return;
  const granted = await storage.persist().catch(() => false);
  await db.meta.bulkPut([
    { key: 'persistAsked', value: true },
    { key: 'persisted', value: granted },
  ]);
}

/** Sends and fetches now, unless there is plainly no connection. */
export function syncNow(): Promise<SyncOutcome> {
  if (!engine) return Promise.resolve('stopped');
  if (offline()) return Promise.resolve('offline');
  return engine.syncNow();
}

/**
 * Runs sync for the signed-in user: at once, when the connection returns, when the app comes back into view,
 * every few minutes while in view, and shortly after anything is recorded. Returns the function that stops it.
 */
export function startSync(userId: string): () => void {
  engine?.stop();
  // The uploader (and tus with it) loads only once there is a photo to send, keeping the first screen small.
  let uploader: PhotoUploader | null = null;
  let stopped = false;
  const sendPhotos = async (): Promise<boolean> => {
    if (!uploader && (await db.photoBlobs.where('state').equals('waiting').count()) === 0) return false;
    if (!uploader) {
      const { PhotoUploader: Uploader } = await import('@/lib/photos/photo-uploader');
      if (stopped) return false;
      uploader = new Uploader({
        db,
        userId,
        missing: async (hashes) => (await api.post<{ missing: string[] }>('/blobs/missing', { hashes })).missing,
        endpoint: new URL(`${env.apiBase}/uploads`, window.location.origin).href,
        accessToken: () => getSession()?.accessToken,
        refresh: async () => !!(await refreshSession()),
      });
    }
    return (await uploader.run()).more;
  };
  // Photo bytes first, then the rows that point at them, then what others changed.
  const current = new SyncEngine({ db, transport: httpTransport, userId, lock: acrossTabs, beforePush: sendPhotos });
  engine = current;
  let debounce: ReturnType<typeof setTimeout> | null = null;

  const onOnline = () => {
    current.resetBackoff();
    void syncNow();
  };
  const onVisible = () => {
    if (visible()) void syncNow();
  };
  const timer = setInterval(() => {
    if (visible()) void syncNow();
  }, EVERY_MS);
  const unsubscribe = subscribeLocalWrites(() => {
    if (debounce) clearTimeout(debounce);
    debounce = setTimeout(() => void syncNow(), AFTER_WRITE_MS);
  });
  window.addEventListener('online', onOnline);
  document.addEventListener('visibilitychange', onVisible);
  void askForPersistentStorage().catch(() => undefined);
  void syncNow();

  return () => {
    current.stop();
    stopped = true;
    uploader?.stop();
    resetUploadProgress();
    if (engine === current) engine = null;
    if (debounce) clearTimeout(debounce);
    clearInterval(timer);
    unsubscribe();
    window.removeEventListener('online', onOnline);
    document.removeEventListener('visibilitychange', onVisible);
  };
}
