import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type LabourRate, labourRatesQueryOptions } from '@/lib/labour-rates';

export function useSaveLabourRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, fields }: { id?: string; fields: Partial<Omit<LabourRate, 'id'>> }) =>
      id ? api.patch<LabourRate>(`/labour-rates/${encodeURIComponent(id)}`, fields) : api.post<LabourRate>('/labour-rates', fields),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: labourRatesQueryOptions().queryKey }),
  });
}
