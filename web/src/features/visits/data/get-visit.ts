import { useLiveQuery } from 'dexie-react-hooks';
import { db } from '@/lib/db';
import { type VisitSummary, withContext } from './get-upcoming-visits';

export async function getVisit(visitId: string): Promise<VisitSummary | null> {
  const visit = await db.visit.get(visitId);
  if (!visit) return null;
  const [summary] = await withContext([visit]);
  return summary ?? null;
}

/** undefined while reading, null when the visit is not on this phone. */
export function useVisit(visitId: string | undefined): VisitSummary | null | undefined {
  return useLiveQuery(() => (visitId ? getVisit(visitId) : null), [visitId]);
}
