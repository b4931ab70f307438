import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** A change an issued document keeps back, beside the value the document printed. */
export interface HeldChange {
  conflictId: string;
  documentId: string;
  number: string;
  entity: string;
  rowId: string;
  record: string;
  field: string;
  issuedValue: unknown;
  pendingValue: unknown;
  changedById: string | null;
  changedHlc: string | null;
}

export const heldChangesQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['held-changes', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: HeldChange[] }>(`/jobs/${encodeURIComponent(jobId)}/held-changes`, signal),
  });

export function useHeldChanges(jobId: string) {
  return useQuery(heldChangesQueryOptions(jobId));
}
