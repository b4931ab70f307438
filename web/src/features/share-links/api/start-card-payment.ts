import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** Opens the payment provider's checkout for what the invoice still owes, and sends the browser there. */
export function useStartCardPayment(token: string) {
  return useMutation({
    mutationFn: (invoiceId: string) =>
      apiRequest<{ url: string; amountMinor: number }>(`/shared/${encodeURIComponent(token)}/invoices/${encodeURIComponent(invoiceId)}/checkout`, { method: 'POST', anonymous: true }),
    onSuccess: ({ url }) => window.location.assign(url),
  });
}
