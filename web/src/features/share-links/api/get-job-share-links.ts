import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShareLinkView } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export type { ShareLinkState } from '@wiretrail/core';
/** A share link as the office lists it; core's, shared with the API. */
export type ShareLink = ShareLinkView;

export const jobShareLinksQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['share-links', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: ShareLink[] }>(`/jobs/${encodeURIComponent(jobId)}/share-links`, signal),
  });

export function useJobShareLinks(jobId: string) {
  return useQuery(jobShareLinksQueryOptions(jobId));
}
