import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ConflictPage } from '@wiretrail/core';
import { api } from '@/lib/api-client';

// The shapes are core's, shared with the API that gives them.
export type { Conflict, ConflictPage } from '@wiretrail/core';

/**
 * Conflicts newest first: those to settle, or (`settled`) those already settled; with a job, only those about the
 * job, its visits and what was recorded on them.
 */
export const conflictsQueryOptions = (page = 1, jobId?: string, settled = false) =>
  queryOptions({
    queryKey: ['conflicts', { page, jobId, settled }],
    queryFn: ({ signal }) =>
      api.get<ConflictPage>(`/conflicts?page=${page}&pageSize=50${settled ? '&resolved=true' : ''}${jobId ? `&jobId=${encodeURIComponent(jobId)}` : ''}`, signal),
  });

export function useConflicts(page = 1, jobId?: string, settled = false) {
  return useQuery(conflictsQueryOptions(page, jobId, settled));
}
