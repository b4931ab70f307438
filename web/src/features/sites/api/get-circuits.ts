import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RecordPage } from './get-customers';

export interface Board {
  id: string;
  siteId: string;
  areaId: string | null;
  name: string;
  description: string | null;
}

export interface Circuit {
  id: string;
  siteId: string;
  boardId: string;
  number: string;
  description: string | null;
  kind: string | null;
  deviceType: string | null;
  deviceRatingA: number | null;
  rcdRatingMa: number | null;
  rcdType: string | null;
  liveCsaMm2: number | null;
  cpcCsaMm2: number | null;
}

export const siteBoardsQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: ['boards', { siteId }],
    queryFn: ({ signal }) => api.get<RecordPage<Board>>(`/boards?pageSize=200&siteId=${siteId}`, signal),
  });

export const siteCircuitsQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: ['circuits', { siteId }],
    queryFn: ({ signal }) => api.get<RecordPage<Circuit>>(`/circuits?pageSize=200&siteId=${siteId}`, signal),
  });

export function useSiteBoards(siteId: string) {
  return useQuery(siteBoardsQueryOptions(siteId));
}

export function useSiteCircuits(siteId: string) {
  return useQuery(siteCircuitsQueryOptions(siteId));
}
