import type { JobWork } from '../jobs/job-progress.js';
import type { JOB_STATUSES } from '../sync/entities.js';
import type { RecordPage, RecordReply } from './records.js';

/** How the office's job list may be sorted (`GET /api/jobs?sort=`). */
export const JOB_SORTS = ['reference', 'title', 'status', 'customer', 'nextVisit', 'created'] as const;
export type JobSort = (typeof JOB_SORTS)[number];

/** A job as the office's lists read it: the job, and what the server adds about its customer, site and visits. */
export type JobListing = RecordReply<'job'> & {
  customerName?: string | null;
  siteName?: string | null;
  /** The earliest visit neither finished nor cancelled. */
  nextVisitStart?: string | null;
  visitCount?: number;
  /** Who is booked on the job's visits that are not cancelled. */
  technicianIds?: string[];
  /** What the job's visits and paperwork have reached: the board says from it what a column asks for. */
  work?: JobWork;
};

export type JobPage = RecordPage<JobListing>;

/** The number of jobs in each status under the board's filters (`GET /api/jobs/status-counts`). */
export interface JobStatusCounts {
  counts: Record<(typeof JOB_STATUSES)[number], number>;
  total: number;
}
