import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SharedJob } from '@wiretrail/core';
import { ApiError, apiRequest } from '@/lib/api-client';

// The reply's shape is core's, shared with the API that gives it.
export type { SharedJob } from '@wiretrail/core';

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
