import { queryOptions, useQuery } from '@tanstack/react-query';
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
}

export const sitesQueryOptions = () =>
  queryOptions({
    queryKey: ['sites'],
    queryFn: ({ signal }) => api.get<RecordPage<Site>>('/sites?pageSize=200', signal),
  });

export const siteQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['sites', id],
    queryFn: ({ signal }) => api.get<Site>(`/sites/${id}`, signal),
  });

export function useSites() {
  return useQuery(sitesQueryOptions());
}

export function useSite(id: string) {
  return useQuery(siteQueryOptions(id));
}
