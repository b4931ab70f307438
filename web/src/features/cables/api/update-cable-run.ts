import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CableRun } from './get-cable-runs';

export type CableRunCorrection = Partial<Pick<CableRun, 'label' | 'endADescription' | 'endATermination' | 'endBDescription' | 'endBTermination'>>;

/** The office's correction of a cable run's label or end descriptions; it reaches the phones like any change. */
export function useCorrectCableRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: CableRunCorrection }) => api.patch<CableRun>(`/cable-runs/${encodeURIComponent(id)}`, changes),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['cable-runs'] }),
  });
}
