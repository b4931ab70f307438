import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvoiceKind, InvoiceSummary } from './get-invoice';

export type InvoiceFilter = 'draft' | 'unpaid' | 'overdue' | 'paid';

export interface InvoiceQuery {
  state?: InvoiceFilter;
  kind?: InvoiceKind;
  search?: string;
  page: number;
  pageSize: number;
}

export const invoicesQueryOptions = (q: InvoiceQuery) =>
  queryOptions({
    queryKey: ['invoices', q],
    queryFn: ({ signal }) => {
      const params = new URLSearchParams({ page: String(q.page), pageSize: String(q.pageSize) });
      if (q.state) params.set('state', q.state);
      if (q.kind) params.set('kind', q.kind);
      if (q.search) params.set('search', q.search);
      return api.get<{ items: InvoiceSummary[]; total: number; page: number; pageSize: number }>(`/invoices?${params}`, signal);
    },
    placeholderData: keepPreviousData,
  });

export function useInvoices(q: InvoiceQuery) {
  return useQuery(invoicesQueryOptions(q));
}
