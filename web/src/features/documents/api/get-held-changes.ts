import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HeldChange } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export type { HeldChange } from '@wiretrail/core';

export const heldChangesQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['held-changes', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: HeldChange[] }>(`/jobs/${encodeURIComponent(jobId)}/held-changes`, signal),
  });

export function useHeldChanges(jobId: string) {
  return useQuery(heldChangesQueryOptions(jobId));
}
