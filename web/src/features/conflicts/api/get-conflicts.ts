import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ConflictPage } from '@wiretrail/core';
import { api } from '@/lib/api-client';

// The shapes are core's, shared with the API that gives them.
export type { Conflict, ConflictPage } from '@wiretrail/core';

/** Unsettled conflicts, newest first; with a job, only those about the job, its visits and what was recorded on them. */
export const conflictsQueryOptions = (page = 1, jobId?: string) =>
  queryOptions({
    queryKey: ['conflicts', { page, jobId }],
    queryFn: ({ signal }) => api.get<ConflictPage>(`/conflicts?page=${page}&pageSize=50${jobId ? `&jobId=${encodeURIComponent(jobId)}` : ''}`, signal),
  });

export function useConflicts(page = 1, jobId?: string) {
  return useQuery(conflictsQueryOptions(page, jobId));
}
