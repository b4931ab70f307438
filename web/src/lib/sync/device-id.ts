import type { Table } from 'dexie';
import { v4 as uuidv4 } from 'uuid';
import type { MetaEntry, MetaKey } from '../db';

/**
 * The id this phone syncs under for one person. The server gives a device id to the first person who uses it, so
 * two people signing in on one phone each get their own; the id made before ids were per person stays with the
 * person it was made for. Call inside a transaction that includes `meta`.
 */
export async function deviceIdFor(meta: Table<MetaEntry, MetaKey>, userId: string): Promise<string> {
  const ids = ((await meta.get('deviceIds'))?.value ?? {}) as Record<string, string>;
  if (ids[userId]) return ids[userId];
  const legacy = (await meta.get('deviceId'))?.value as string | undefined;
  const legacyOwner = (await meta.get('userId'))?.value as string | undefined;
  const taken = new Set(Object.values(ids));
  const id = legacy && (legacyOwner === undefined || legacyOwner === userId) && !taken.has(legacy) ? legacy : uuidv4();
  await meta.put({ key: 'deviceIds', value: { ...ids, [userId]: id } } as MetaEntry);
  return id;
}
