import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JobVisit } from '@wiretrail/core';
import { api } from '@/lib/api-client';

// The shape is core's, shared with the API that gives it.
export type { JobVisit } from '@wiretrail/core';

export const jobVisitsQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['visits', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: JobVisit[]; total: number }>(`/visits?pageSize=200&jobId=${encodeURIComponent(jobId)}`, signal),
  });

export function useJobVisits(jobId: string) {
  return useQuery(jobVisitsQueryOptions(jobId));
}
