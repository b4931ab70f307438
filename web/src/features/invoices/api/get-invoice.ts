import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvoiceDetail } from '@wiretrail/core';
import { api } from '@/lib/api-client';

// The shapes are core's, shared with the API that gives them.
export type {
  InvoiceAccount as Account,
  InvoiceDetail,
  InvoiceKind,
  InvoiceLineView as InvoiceLine,
  InvoiceState,
  InvoiceSummary,
  LineKind,
  PaymentMethod,
  PaymentView as Payment,
  RefundMethod,
  RefundView as Refund,
} from '@wiretrail/core';

/** While its e-mail is on its way, the invoice is asked for again every few seconds so the state moves on by itself. */
export const WHILE_SENDING_MS = 3000;

export const invoiceQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['invoices', id],
    queryFn: ({ signal }) => api.get<InvoiceDetail & { warnings?: string[] }>(`/invoices/${encodeURIComponent(id)}`, signal),
    refetchInterval: (query) => (query.state.data?.emailState === 'queued' ? WHILE_SENDING_MS : false),
  });

export function useInvoice(id: string | null) {
  return useQuery({ ...invoiceQueryOptions(id ?? ''), enabled: !!id });
}
