import { useLiveQuery } from 'dexie-react-hooks';
import { type AreaRow, type CableRunRow, db } from '@/lib/db';

export interface SiteCables {
  cables: CableRunRow[];
  areas: AreaRow[];
  areaNames: Map<string, string>;
}

const byLabel = (a: CableRunRow, b: CableRunRow) => a.label.localeCompare(b.label, 'en-GB', { numeric: true });

/** A site's cable runs (they outlive visits) in label order, with the areas their ends are in. */
export async function getSiteCables(siteId: string): Promise<SiteCables> {
  const [cables, areas] = await Promise.all([db.cableRun.where('siteId').equals(siteId).toArray(), db.area.where('siteId').equals(siteId).toArray()]);
  areas.sort((a, b) => a.name.localeCompare(b.name, 'en-GB'));
  return { cables: cables.sort(byLabel), areas, areaNames: new Map(areas.map((a) => [a.id, a.name])) };
}

export function useSiteCables(siteId: string): SiteCables | undefined {
  return useLiveQuery(() => getSiteCables(siteId), [siteId]);
}

/** undefined while reading, null when the cable is not on this phone. */
export function useCable(cableId: string | undefined): CableRunRow | null | undefined {
  return useLiveQuery(async () => (cableId ? ((await db.cableRun.get(cableId)) ?? null) : null), [cableId]);
}
