import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export type ShareLinkState = 'active' | 'expired' | 'revoked';

export interface ShareLink {
  id: string;
  jobId: string;
  label: string | null;
  createdAt: string;
  expiresAt: string;
  revokedAt: string | null;
  lastOpenedAt: string | null;
  openCount: number;
  state: ShareLinkState;
}

export const jobShareLinksQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['share-links', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: ShareLink[] }>(`/jobs/${encodeURIComponent(jobId)}/share-links`, signal),
  });

export function useJobShareLinks(jobId: string) {
  return useQuery(jobShareLinksQueryOptions(jobId));
}
