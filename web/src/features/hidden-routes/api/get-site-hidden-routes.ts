import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SiteHiddenRoutes } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export const siteHiddenRoutesQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: ['sites', siteId, 'hidden-routes'],
    queryFn: ({ signal }) => api.get<SiteHiddenRoutes>(`/sites/${encodeURIComponent(siteId)}/hidden-routes`, signal),
  });

export function useSiteHiddenRoutes(siteId: string) {
  return useQuery(siteHiddenRoutesQueryOptions(siteId));
}
