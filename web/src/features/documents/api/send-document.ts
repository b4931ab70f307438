import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type JobDocument, jobDocumentsQueryOptions } from './get-job-documents';

export interface SendDocument {
  documentId: string;
  to: string;
  linkDays: number;
}

export function useSendDocument(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ documentId, to, linkDays }: SendDocument) =>
      api.post<{ document: JobDocument; shareLink: { id: string; expiresAt: string } }>(`/documents/${encodeURIComponent(documentId)}/send`, { to, linkDays }),
    // The e-mail brings a new share link with it, so the job's links change too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobDocumentsQueryOptions(jobId).queryKey }),
        queryClient.invalidateQueries({ queryKey: ['share-links', { jobId }] }),
      ]),
  });
}
