import { describe, expect, it } from 'vitest';
import type { SyncStatus } from '@/lib/sync/use-sync-status';
import { syncChipLook } from './sync-status-chip';

const status = (s: Partial<SyncStatus>): SyncStatus => ({
  ready: true, pending: 0, failed: 0, photosWaiting: 0, syncing: false, online: true, lastSyncAt: '2026-03-14T09:00:00.000Z', lastError: null, nextRetryAt: null, persisted: true, ...s,
});

describe('sync status chip', () => {
  it('says in a few words what has reached the office', () => {
    expect(syncChipLook(status({ online: false })).label).toBe('No signal — saving on this phone');
    expect(syncChipLook(status({ online: false, pending: 3 })).label).toBe('No signal — saving on this phone · 3 waiting');
    expect(syncChipLook(status({ pending: 3 })).label).toBe('Saved on phone · 3 waiting');
    expect(syncChipLook(status({ pending: 3, syncing: true })).label).toBe('Sending…');
    expect(syncChipLook(status({ failed: 1 })).label).toBe('1 not sent — see Sync');
    expect(syncChipLook(status({})).label).toBe('Up to date');
    expect(syncChipLook(status({ lastSyncAt: null })).label).toBe('Not synced yet');
    expect(syncChipLook(status({ photosWaiting: 2 })).label).toBe('2 photos waiting to send');
    expect(syncChipLook(status({ photosWaiting: 2, syncing: true })).label).toBe('Sending…');
    expect(syncChipLook(status({ online: false, pending: 1, photosWaiting: 2 })).label).toBe('No signal — saving on this phone · 1 waiting');
  });
});
