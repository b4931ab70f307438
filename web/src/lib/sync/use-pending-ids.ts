import type { SyncEntityName } from '@wiretrail/core';
import { useLiveQuery } from 'dexie-react-hooks';
import { db } from '@/lib/db';

const NONE = new Set<string>();

/** Ids of rows with changes still waiting on this phone, to mark them on screen. */
export function usePendingIds(entity: SyncEntityName): Set<string> {
  return useLiveQuery(async () => new Set((await db.outbox.toArray()).filter((e) => e.entity === entity).map((e) => e.id)), [entity], NONE);
}
