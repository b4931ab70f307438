import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SharedInvoiceList as SharedInvoices } from '@wiretrail/core';
import { ApiError, apiRequest } from '@/lib/api-client';

/** The job's issued quotes, invoices and credit notes on a customer's link. */
export type { SharedInvoiceList as SharedInvoices } from '@wiretrail/core';

/** While a card payment is being confirmed, the list is asked for again every 2 s, for up to a minute. */
export const CONFIRMING_MS = 2000;
export const CONFIRMING_TRIES = 30;

/** Whether the invoice just paid by card still shows money owed: its confirmation has not arrived yet. */
export const stillOwing = (data: SharedInvoices | undefined, invoiceId: string | null) => (data?.items.find((i) => i.id === invoiceId)?.owedMinor ?? 0) > 0;

export const sharedInvoicesQueryOptions = (token: string, paidInvoiceId: string | null = null) =>
  queryOptions({
    queryKey: ['shared', token, 'invoices'],
    queryFn: ({ signal }) => apiRequest<SharedInvoices>(`/shared/${encodeURIComponent(token)}/invoices`, { signal, anonymous: true }),
    retry: (count, err) => !(err instanceof ApiError) && count < 2,
    refetchOnWindowFocus: false,
    refetchInterval: (query) => (stillOwing(query.state.data, paidInvoiceId) && query.state.dataUpdateCount < CONFIRMING_TRIES ? CONFIRMING_MS : false),
  });

export function useSharedInvoices(token: string, paidInvoiceId: string | null = null) {
  return useQuery(sharedInvoicesQueryOptions(token, paidInvoiceId));
}
