import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { JobStatusCounts } from '@wiretrail/core';
import { api } from '@/lib/api-client';
import { type JobQuery, jobSearchParams } from './get-jobs';

export type { JobStatusCounts } from '@wiretrail/core';

export type JobFilters = Pick<JobQuery, 'search' | 'customerId' | 'technicianId' | 'from' | 'to'>;

/** How many jobs are in each status under the board's filters. */
export const jobStatusCountsQueryOptions = (filters: JobFilters) =>
  queryOptions({
    queryKey: ['jobs', 'status-counts', filters],
    queryFn: ({ signal }) => api.get<JobStatusCounts>(`/jobs/status-counts?${jobSearchParams(filters)}`, signal),
    placeholderData: keepPreviousData,
  });

export function useJobStatusCounts(filters: JobFilters) {
  return useQuery(jobStatusCountsQueryOptions(filters));
}
