import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';

/** What a customer's link shows; see the API's SharedJob. */
export interface SharedJob {
  expiresAt: string;
  contractor: { name: string; phone: string | null; email: string | null };
  job: { reference: string | null; title: string; status: string | null; customerName: string | null; siteAddress: string };
  photos: Array<{ id: string; caption: string | null; area: string | null; takenAt: string | null; thumbUrl: string; displayUrl: string }>;
  documents: Array<{ id: string; number: string; kind: string; title: string | null; issuedAt: string; pdfUrl: string }>;
}

export const sharedJobQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['shared', token],
    // No account: the token in the address is the only key, so the request goes without a session.
    queryFn: ({ signal }) => apiRequest<SharedJob>(`/shared/${encodeURIComponent(token)}`, { signal, anonymous: true }),
    retry: (count, err) => !(err instanceof ApiError) && count < 2,
    refetchOnWindowFocus: false,
  });

export function useSharedJob(token: string) {
  return useQuery(sharedJobQueryOptions(token));
}
