import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type JobDocument, jobDocumentsQueryOptions } from './get-job-documents';

export interface SendDocument {
  /** The first is the one the office chose to send; the others go in the same e-mail. */
  documentIds: string[];
  to: string;
  linkDays: number;
  cc?: string;
  message?: string;
}

/** The documents as queued, and the share link the e-mail carries. */
export interface Sent {
  documents: JobDocument[];
  shareLink: { id: string; expiresAt: string };
}

export function useSendDocument(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    // One document goes by its own route; several go together, in one e-mail, by the job's.
    mutationFn: async ({ documentIds, ...body }: SendDocument): Promise<Sent> => {
      if (documentIds.length > 1) return api.post<Sent>(`/jobs/${encodeURIComponent(jobId)}/documents/send`, { documentIds, ...body });
      const one = await api.post<{ document: JobDocument; shareLink: Sent['shareLink'] }>(`/documents/${encodeURIComponent(documentIds[0]!)}/send`, body);
      return { documents: [one.document], shareLink: one.shareLink };
    },
    // The e-mail brings a new share link with it, so the job's links change too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: jobDocumentsQueryOptions(jobId).queryKey }),
        queryClient.invalidateQueries({ queryKey: ['share-links', { jobId }] }),
      ]),
  });
}
