import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';
import type { RecordPage } from './get-customers';

/** A site as the office reads it: the registry's fields, with its customer's name. */
export type Site = RowOf<'site'> & { customerName?: string | null };

export interface SiteListQuery {
  search?: string;
  customerId?: string;
  page?: number;
  pageSize?: number;
}

const query = (q: SiteListQuery) => new URLSearchParams(Object.entries(q).filter(([, v]) => v !== undefined && v !== '').map(([k, v]) => [k, String(v)]));

export const sitesQueryOptions = (q: SiteListQuery = { pageSize: 200 }) =>
  queryOptions({
    queryKey: ['sites', q],
    queryFn: ({ signal }) => api.get<RecordPage<Site>>(`/sites?${query(q)}`, signal),
    placeholderData: keepPreviousData,
  });

export const siteQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['sites', id],
    queryFn: ({ signal }) => api.get<Site>(`/sites/${id}`, signal),
  });

export function useSites(q?: SiteListQuery) {
  return useQuery(sitesQueryOptions(q));
}

export function useSite(id: string) {
  return useQuery(siteQueryOptions(id));
}
