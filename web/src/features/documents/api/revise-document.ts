import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { heldChangesQueryOptions } from './get-held-changes';
import { type IssuedDocument, jobDocumentsQueryOptions } from './get-job-documents';

export interface ReviseDocumentInput {
  documentId: string;
  reason: string;
  /** The held changes to make before the revision is issued. */
  take: string[];
}

export function useReviseDocument(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ documentId, reason, take }: ReviseDocumentInput) =>
      api.post<IssuedDocument>(`/documents/${encodeURIComponent(documentId)}/revisions`, { reason, take }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobDocumentsQueryOptions(jobId).queryKey }),
        queryClient.invalidateQueries({ queryKey: heldChangesQueryOptions(jobId).queryKey }),
      ]),
  });
}
