import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface Conflict {
  id: string;
  entity: string;
  rowId: string;
  field: string;
  reason: 'later-edit-wins' | 'office-owned' | 'edit-beats-delete' | 'locked-by-document' | string;
  baseVersion: number;
  keptValue: unknown;
  keptById: string | null;
  keptHlc: string | null;
  discardedValue: unknown;
  discardedById: string | null;
  discardedHlc: string | null;
  resolvedAt: string | null;
  version: number;
}

export interface ConflictPage {
  items: Conflict[];
  total: number;
  page: number;
  pageSize: number;
}

/** Unsettled conflicts, newest first; with a job, only those about the job, its visits and what was recorded on them. */
export const conflictsQueryOptions = (page = 1, jobId?: string) =>
  queryOptions({
    queryKey: ['conflicts', { page, jobId }],
    queryFn: ({ signal }) => api.get<ConflictPage>(`/conflicts?page=${page}&pageSize=50${jobId ? `&jobId=${encodeURIComponent(jobId)}` : ''}`, signal),
  });

export function useConflicts(page = 1, jobId?: string) {
  return useQuery(conflictsQueryOptions(page, jobId));
}
