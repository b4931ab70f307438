import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface Customer {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  address: string | null;
}

export interface RecordPage<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const customersQueryOptions = (search = '') =>
  queryOptions({
    queryKey: ['customers', { search }],
    queryFn: ({ signal }) => api.get<RecordPage<Customer>>(`/customers?pageSize=200&search=${encodeURIComponent(search)}`, signal),
  });

export function useCustomers(search = '') {
  return useQuery(customersQueryOptions(search));
}
