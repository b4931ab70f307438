import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvoiceLineInput, OfficePaymentMethod, RefundMethod } from '@wiretrail/core';
import type { InvoiceDetail, InvoiceKind } from './get-invoice';

/** Every change to an invoice changes lists, totals and the aged debt: all of ['invoices'] is asked for again. */
function useInvoiceMutation<A, R>(call: (args: A) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: call, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['invoices'] }) });
}

export type { InvoiceLineInput as LineInput } from '@wiretrail/core';

/** A new draft for the job: built from its visits (labour and parts), copied from an issued quote, or blank. */
export const useCreateInvoice = (jobId: string) =>
  useInvoiceMutation((body: { kind: Exclude<InvoiceKind, 'credit-note'>; from?: 'job' | 'quote' | 'blank'; quoteId?: string }) =>
    api.post<InvoiceDetail & { warnings: string[]; leftOut: string[] }>(`/jobs/${encodeURIComponent(jobId)}/invoices`, body),
  );

export const useUpdateInvoice = () =>
  useInvoiceMutation(({ id, ...body }: { id: string; lines?: InvoiceLineInput[]; notes?: string | null; termDays?: number }) =>
    api.patch<InvoiceDetail>(`/invoices/${encodeURIComponent(id)}`, body),
  );

export const useDeleteInvoice = () => useInvoiceMutation((id: string) => api.delete<void>(`/invoices/${encodeURIComponent(id)}`));

export const useIssueInvoice = () => useInvoiceMutation((id: string) => api.post<InvoiceDetail>(`/invoices/${encodeURIComponent(id)}/issue`));

/** A draft credit note taking back the invoice's lines; an existing draft one is found again. */
export const useRaiseCreditNote = () => useInvoiceMutation((invoiceId: string) => api.post<InvoiceDetail>(`/invoices/${encodeURIComponent(invoiceId)}/credit-note`));

export const useRecordPayment = () =>
  useInvoiceMutation(({ id, ...body }: { id: string; amountMinor: number; method: OfficePaymentMethod; receivedOn: string; reference?: string; note?: string }) =>
    api.post<InvoiceDetail>(`/invoices/${encodeURIComponent(id)}/payments`, body),
  );

/** Money given back; the request id makes a second click (or a retry) record it, and refund a card, once. */
export const useRecordRefund = () =>
  useInvoiceMutation(
    ({ id, ...body }: { id: string; amountMinor: number; method: RefundMethod; paymentId?: string; refundedOn?: string; reference?: string; note?: string; requestId: string }) =>
      api.post<InvoiceDetail>(`/invoices/${encodeURIComponent(id)}/refunds`, body),
  );

export const useSendInvoice = () =>
  useInvoiceMutation(({ id, ...body }: { id: string; to: string; linkDays: number; cc?: string; message?: string }) =>
    api.post<{ invoice: InvoiceDetail; shareLink: { id: string; expiresAt: string } }>(`/invoices/${encodeURIComponent(id)}/send`, body),
  );
