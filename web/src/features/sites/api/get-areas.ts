import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RecordPage } from './get-customers';

export interface Area {
  id: string;
  siteId: string;
  name: string;
  level: string | null;
}

export const siteAreasQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: ['areas', { siteId }],
    queryFn: ({ signal }) => api.get<RecordPage<Area>>(`/areas?pageSize=200&siteId=${encodeURIComponent(siteId)}`, signal),
  });

export function useSiteAreas(siteId: string) {
  return useQuery(siteAreasQueryOptions(siteId));
}
