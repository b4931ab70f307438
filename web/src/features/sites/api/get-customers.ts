import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';

/** A customer as the office reads it: the registry's fields, with the customer's sites by name. */
export type Customer = RowOf<'customer'> & { sites?: { id: string; name: string }[] };

export interface RecordPage<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const customersQueryOptions = (search = '', page = 1, pageSize = 200) =>
  queryOptions({
    queryKey: ['customers', { search, page, pageSize }],
    queryFn: ({ signal }) => api.get<RecordPage<Customer>>(`/customers?page=${page}&pageSize=${pageSize}&search=${encodeURIComponent(search)}`, signal),
    placeholderData: keepPreviousData,
  });

export const customerQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['customers', id],
    queryFn: ({ signal }) => api.get<Customer>(`/customers/${encodeURIComponent(id)}`, signal),
  });

export function useCustomers(search = '', page = 1, pageSize = 200) {
  return useQuery(customersQueryOptions(search, page, pageSize));
}

export function useCustomer(id: string) {
  return useQuery({ ...customerQueryOptions(id), enabled: !!id });
}
