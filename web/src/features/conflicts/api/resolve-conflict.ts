import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Conflict, ConflictResolution as Resolution } from '@wiretrail/core';

export type { Resolution };

export function resolveConflict(id: string, resolution: Resolution): Promise<Conflict> {
  return api.post<Conflict>(`/conflicts/${id}/resolve`, resolution as Record<string, unknown>);
}

export function useResolveConflict() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, resolution }: { id: string; resolution: Resolution }) => resolveConflict(id, resolution),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['conflicts'] }),
  });
}
