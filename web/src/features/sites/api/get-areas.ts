import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';
import type { RecordPage } from './get-customers';

/** An area as the office reads it: the registry's fields. */
export type Area = RowOf<'area'>;

export const siteAreasQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: ['areas', { siteId }],
    queryFn: ({ signal }) => api.get<RecordPage<Area>>(`/areas?pageSize=200&siteId=${encodeURIComponent(siteId)}`, signal),
  });

export function useSiteAreas(siteId: string) {
  return useQuery(siteAreasQueryOptions(siteId));
}
