import { queryOptions, useQuery } from '@tanstack/react-query';
import type { VisitRecord } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export type { VisitRecord } from '@wiretrail/core';

export const visitRecordQueryOptions = (visitId: string) =>
  queryOptions({
    queryKey: ['visits', visitId, 'record'],
    queryFn: ({ signal }) => api.get<VisitRecord>(`/visits/${encodeURIComponent(visitId)}/record`, signal),
  });

export function useVisitRecord(visitId: string) {
  return useQuery(visitRecordQueryOptions(visitId));
}
