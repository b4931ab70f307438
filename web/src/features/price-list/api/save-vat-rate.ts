import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type VatRate, vatRatesQueryOptions } from '@/lib/vat-rates';

/** A new rate, or a change to one: its name, its per cent, whether it is offered. The code never changes. */
export function useSaveVatRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, fields }: { id?: string; fields: Partial<Omit<VatRate, 'id'>> }) =>
      id ? api.patch<VatRate>(`/vat-rates/${encodeURIComponent(id)}`, fields) : api.post<VatRate>('/vat-rates', fields),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: vatRatesQueryOptions().queryKey }),
  });
}
