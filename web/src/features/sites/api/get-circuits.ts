import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';
import type { RecordPage } from './get-customers';

/** A board as the office reads it: the registry's fields. */
export type Board = RowOf<'board'>;

/** A circuit as the office reads it: the registry's fields. */
export type Circuit = RowOf<'circuit'>;

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
