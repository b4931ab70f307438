import { useLiveQuery } from 'dexie-react-hooks';
import { useSyncExternalStore } from 'react';
import { db } from '@/lib/db';
import { useSession } from '@/lib/session';
import { useEngineState } from './sync-state';

function subscribeOnline(cb: () => void) {
  window.addEventListener('online', cb);
  window.addEventListener('offline', cb);
  return () => {
    window.removeEventListener('online', cb);
    window.removeEventListener('offline', cb);
  };
}

export function useOnline(): boolean {
  return useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);
}

export interface SyncStatus {
  /** False until the counts have been read from the phone. */
  ready: boolean;
  pending: number;
  failed: number;
  /** Photos whose bytes have not reached the server yet. */
  photosWaiting: number;
  syncing: boolean;
  online: boolean;
  lastSyncAt: string | null;
  /** Why the last sync stopped, in plain words; null when it went through. */
  lastError: string | null;
  nextRetryAt: number | null;
  /** The browser's answer when asked to keep this phone's records (null: not asked yet). */
  persisted: boolean | null;
}

/** Everything the status chip and the Sync page show; live across tabs, since it is read from the database. */
export function useSyncStatus(): SyncStatus {
  const userId = useSession()?.user.id ?? '';
  const engine = useEngineState();
  const online = useOnline();
  const stored = useLiveQuery(
    async () => {
      const [pending, failed, photosWaiting, meta] = await Promise.all([
        db.outbox.where('userId').equals(userId).count(),
        db.failed.where('userId').equals(userId).count(),
        db.photoBlobs.where('state').equals('waiting').count(),
        db.meta.bulkGet(['lastSyncAt', 'lastError', 'persisted']),
      ]);
      return {
        pending,
        failed,
        photosWaiting,
        lastSyncAt: (meta[0]?.value as string | undefined) ?? null,
        lastError: (meta[1]?.value as string | null | undefined) ?? null,
        persisted: (meta[2]?.value as boolean | undefined) ?? null,
      };
    },
    [userId],
  );
  return {
    ready: stored !== undefined,
    pending: stored?.pending ?? 0,
    failed: stored?.failed ?? 0,
    photosWaiting: stored?.photosWaiting ?? 0,
    syncing: engine.syncing,
    online,
    lastSyncAt: stored?.lastSyncAt ?? null,
    lastError: stored?.lastError ?? null,
    nextRetryAt: engine.nextRetryAt,
    persisted: stored?.persisted ?? null,
  };
}
