import { isVoided } from '@wiretrail/core';
import { useLiveQuery } from 'dexie-react-hooks';
import { db, type LinkTestRow } from '@/lib/db';

const latestFirst = (a: LinkTestRow, b: LinkTestRow) => String(b.testedAt ?? b.recordedAt ?? '').localeCompare(String(a.testedAt ?? a.recordedAt ?? '')) || b.id.localeCompare(a.id);

/** A cable's performance tests on this phone, latest first; voided ones left out. */
export async function getLinkTests(cableRunId: string): Promise<LinkTestRow[]> {
  const rows = await db.linkTest.where('cableRunId').equals(cableRunId).toArray();
  return rows.filter((r) => !isVoided(r)).sort(latestFirst);
}

export function useLinkTests(cableRunId: string | undefined): LinkTestRow[] | undefined {
  return useLiveQuery(async () => (cableRunId ? getLinkTests(cableRunId) : []), [cableRunId]);
}

/** The latest test of each of a site's cables, for the cable list. */
export function useSiteLinkTests(siteId: string): Map<string, LinkTestRow> | undefined {
  return useLiveQuery(async () => {
    const rows = (await db.linkTest.where('siteId').equals(siteId).toArray()).filter((r) => !isVoided(r)).sort(latestFirst);
    const latest = new Map<string, LinkTestRow>();
    for (const r of rows) if (!latest.has(r.cableRunId)) latest.set(r.cableRunId, r);
    return latest;
  }, [siteId]);
}
