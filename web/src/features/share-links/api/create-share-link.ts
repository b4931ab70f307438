import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { NewShareLink } from '@wiretrail/core';
import { jobShareLinksQueryOptions } from './get-job-share-links';

/** The answer is the only time the link's address is known: the server keeps just a fingerprint of it. */
export type { NewShareLink };

export function useCreateShareLink(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { days: number; label?: string }) => api.post<NewShareLink>(`/jobs/${encodeURIComponent(jobId)}/share-links`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobShareLinksQueryOptions(jobId).queryKey }),
  });
}
