import { QueryClientProvider } from '@tanstack/react-query';
import { Outlet } from 'react-router-dom';
import { queryClient } from '@/lib/react-query';

/**
 * Server-state caching for the screens that read the API. A route element of its own, loaded on demand, so the
 * technician's Today (which reads only the phone) does not download it; every scope shares the one client.
 */
export function Component() {
  return (
    <QueryClientProvider client={queryClient}>
      <Outlet />
    </QueryClientProvider>
  );
}
