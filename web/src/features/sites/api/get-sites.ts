import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RecordPage } from './get-customers';

export interface Site {
  id: string;
  customerId: string;
  name: string | null;
  address: string;
  postcode: string | null;
  earthing: string | null;
  zeOhm: number | null;
  pfcKa: number | null;
  accessNotes: string | null;
  customerName?: string | null;
}

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
