import { useLiveQuery } from 'dexie-react-hooks';
import { type CustomerRow, db, type JobRow, type SiteRow, type VisitRow } from '@/lib/db';
import { upcomingRange } from '../visit-format';

export interface VisitSummary {
  visit: VisitRow;
  job?: JobRow;
  site?: SiteRow;
  customer?: CustomerRow;
}

/** The visits a technician has today and in the next seven days, soonest first, with what is needed to find the place. */
export async function getUpcomingVisits(userId: string, now = new Date()): Promise<VisitSummary[]> {
  const { from, to } = upcomingRange(now);
  const visits = (await db.visit.where('technicianIds').equals(userId).toArray())
    .filter((v) => {
      // A visit still under way stays in view even if it started before today.
      if (v.status === 'on-site') return true;
      const start = v.plannedStart ? Date.parse(v.plannedStart) : NaN;
      return start >= from.getTime() && start < to.getTime();
    })
    .sort((a, b) => (a.plannedStart ?? '').localeCompare(b.plannedStart ?? ''));
  return withContext(visits);
}

export async function withContext(visits: VisitRow[]): Promise<VisitSummary[]> {
  const [jobs, sites] = await Promise.all([db.job.bulkGet(visits.map((v) => v.jobId)), db.site.bulkGet(visits.map((v) => v.siteId))]);
  const customerIds = visits.map((_v, i) => jobs[i]?.customerId ?? sites[i]?.customerId ?? '');
  const customers = await db.customer.bulkGet(customerIds);
  return visits.map((visit, i) => ({ visit, job: jobs[i], site: sites[i], customer: customers[i] }));
}

export function useUpcomingVisits(userId: string | undefined): VisitSummary[] | undefined {
  return useLiveQuery(() => (userId ? getUpcomingVisits(userId) : []), [userId]);
}
