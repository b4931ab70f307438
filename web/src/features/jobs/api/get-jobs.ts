import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface Job {
  id: string;
  version: number;
  siteId: string;
  customerId: string;
  reference: string | null;
  title: string;
  status: string | null;
  description: string | null;
  createdAt?: string;
  /** Added by the server for the office's lists. */
  customerName?: string | null;
  siteName?: string | null;
  /** The earliest visit neither finished nor cancelled. */
  nextVisitStart?: string | null;
  visitCount?: number;
  /** Who is booked on the job's visits that are not cancelled. */
  technicianIds?: string[];
}

export interface JobPage {
  items: Job[];
  total: number;
  page: number;
  pageSize: number;
}

export const JOB_SORTS = ['reference', 'title', 'status', 'customer', 'nextVisit', 'created'] as const;
export type JobSort = (typeof JOB_SORTS)[number];

/** What the board and the table ask the server for; `from` and `to` are ISO times with their zone. */
export interface JobQuery {
  search?: string;
  status?: string;
  customerId?: string;
  technicianId?: string;
  from?: string;
  to?: string;
  sort?: JobSort;
  direction?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

export function jobSearchParams(q: Omit<JobQuery, 'page' | 'pageSize'> & { page?: number; pageSize?: number }): URLSearchParams {
  return new URLSearchParams(Object.entries(q).filter(([, v]) => v !== undefined && v !== '').map(([k, v]) => [k, String(v)]));
}

export const jobsQueryOptions = (q: JobQuery = {}) =>
  queryOptions({
    queryKey: ['jobs', q],
    queryFn: ({ signal }) => api.get<JobPage>(`/jobs?${jobSearchParams(q)}`, signal),
    placeholderData: keepPreviousData,
  });

export const jobQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['jobs', id],
    queryFn: ({ signal }) => api.get<Job>(`/jobs/${encodeURIComponent(id)}`, signal),
  });

export function useJobs(q: JobQuery = {}) {
  return useQuery(jobsQueryOptions(q));
}

export function useJob(id: string) {
  return useQuery(jobQueryOptions(id));
}
