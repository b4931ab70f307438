import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type InvoiceSummary, WHILE_SENDING_MS } from './get-invoice';

export const jobInvoicesQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['invoices', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: InvoiceSummary[] }>(`/jobs/${encodeURIComponent(jobId)}/invoices`, signal),
    refetchInterval: (query) => (query.state.data?.items.some((i) => i.emailState === 'queued') ? WHILE_SENDING_MS : false),
  });

export function useJobInvoices(jobId: string) {
  return useQuery(jobInvoicesQueryOptions(jobId));
}
