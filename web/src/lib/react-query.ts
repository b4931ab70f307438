import { QueryClient } from '@tanstack/react-query';
import { ApiError, OfflineError } from './api-client';
import { getSession, subscribe } from './session';

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      // A 4xx will not get better by asking again; a dropped connection might.
      retry: (count, err) => !(err instanceof ApiError && err.status < 500) && !(err instanceof OfflineError) && count < 2,
      refetchOnWindowFocus: true,
    },
    mutations: { retry: false },
  },
});

// What one user fetched is never shown to the next: the cache empties when the signed-in user changes, by signing
// in or out here or in another tab (a refreshed token for the same user keeps it).
let cachedFor = getSession()?.user.id;
subscribe(() => {
  const userId = getSession()?.user.id;
  if (userId !== cachedFor) {
    cachedFor = userId;
    queryClient.clear();
  }
});
