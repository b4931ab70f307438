import { useLiveQuery } from 'dexie-react-hooks';
import { db, type VisitRow } from '@/lib/db';

/** The technician's open visit at a site: the one on site now, else the next planned. */
export async function getOpenVisitAt(siteId: string, userId: string): Promise<VisitRow | null> {
  const visits = await db.visit.where('siteId').equals(siteId).toArray();
  const mine = visits.filter((v) => (v.technicianIds ?? []).includes(userId) && v.status !== 'cancelled' && v.status !== 'finished');
  return mine.find((v) => v.status === 'on-site') ?? mine.sort((a, b) => (a.plannedStart ?? '').localeCompare(b.plannedStart ?? ''))[0] ?? null;
}

/** undefined while reading; null when there is no site yet or no open visit of the technician's there. */
export function useOpenVisitAt(siteId: string | undefined, userId: string): VisitRow | null | undefined {
  return useLiveQuery(async () => (siteId ? getOpenVisitAt(siteId, userId) : null), [siteId, userId]);
}
