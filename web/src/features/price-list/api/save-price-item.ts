import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceItem } from '@/lib/price-list';

export type PriceItemFields = Omit<PriceItem, 'id' | 'version'>;

/** Adds an item, or changes the fields given of an existing one. */
export function useSavePriceItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, fields }: { id?: string; fields: Partial<PriceItemFields> }) =>
      id ? api.patch<PriceItem>(`/price-items/${encodeURIComponent(id)}`, fields) : api.post<PriceItem>('/price-items', fields),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['price-items'] }),
  });
}
