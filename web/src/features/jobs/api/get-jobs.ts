import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { JobListing as Job, JobPage, JobSort } from '@wiretrail/core';
import { api } from '@/lib/api-client';

// The shapes are core's, shared with the API that gives them.
export type { JobListing as Job, JobPage, JobSort } from '@wiretrail/core';
export { JOB_SORTS } from '@wiretrail/core';

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
