import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobShareLinksQueryOptions, type ShareLink } from './get-job-share-links';

export function useRevokeShareLink(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.post<ShareLink>(`/share-links/${encodeURIComponent(id)}/revoke`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobShareLinksQueryOptions(jobId).queryKey }),
  });
}
