import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JobDocument } from '@wiretrail/core';
import { api } from '@/lib/api-client';

// The shapes are core's, shared with the API that gives them.
export type { DocumentCoverage, DocumentEmailState as EmailState, DocumentKind, IssuedDocument, JobDocument } from '@wiretrail/core';

/** While an e-mail is on its way, the list asks again every few seconds so the state moves on by itself. */
const WHILE_SENDING_MS = 3000;

export const jobDocumentsQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['documents', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: JobDocument[] }>(`/jobs/${encodeURIComponent(jobId)}/documents`, signal),
    refetchInterval: (query) => (query.state.data?.items.some((d) => d.emailState === 'queued') ? WHILE_SENDING_MS : false),
  });

export function useJobDocuments(jobId: string) {
  return useQuery(jobDocumentsQueryOptions(jobId));
}
