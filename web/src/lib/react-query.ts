import { QueryClient } from '@tanstack/react-query';
import { ApiError, OfflineError } from './api-client';

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
