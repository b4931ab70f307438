import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type DocumentKind, type JobDocument, jobDocumentsQueryOptions } from './get-job-documents';

export function useIssueDocument(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (kind: DocumentKind) => api.post<JobDocument>(`/jobs/${encodeURIComponent(jobId)}/documents`, { kind }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobDocumentsQueryOptions(jobId).queryKey }),
  });
}
