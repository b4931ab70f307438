import type { WiretrailDb } from '@/lib/db';

export const DEFAULT_KEEP_ORIGINALS_DAYS = 14;
const DAY_MS = 86_400_000;

export async function keepOriginalsDays(db: WiretrailDb): Promise<number> {
  return (await db.getMeta('keepOriginalsDays')) ?? DEFAULT_KEEP_ORIGINALS_DAYS;
}

/**
 * Drops the full-size bytes of photos the server has confirmed and that were taken on this phone longer ago than
 * the setting; their thumbnails stay for lists. A photo the server has not confirmed is never touched.
 * Returns how many were freed.
 */
export async function freeOriginals(db: WiretrailDb, now = Date.now()): Promise<number> {
  const days = await keepOriginalsDays(db);
  const cutoff = new Date(now - days * DAY_MS).toISOString();
  const due = await db.photoBlobs.where('[state+createdAt]').between(['confirmed', ''], ['confirmed', cutoff], true, true).primaryKeys();
  const at = new Date(now).toISOString();
  let freed = 0;
  for (const sha256 of due) {
    await db.transaction('rw', db.photoBlobs, async () => {
      const row = await db.photoBlobs.get(sha256);
      if (row?.state !== 'confirmed') return;
      await db.photoBlobs.put({ ...row, bytes: null, state: 'freed', freedAt: at });
      freed++;
    });
  }
  return freed;
}

export async function setKeepOriginalsDays(db: WiretrailDb, days: number, now = Date.now()): Promise<number> {
  await db.setMeta('keepOriginalsDays', days);
  return freeOriginals(db, now);
}
