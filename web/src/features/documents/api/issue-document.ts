import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type DocumentCoverage, type DocumentKind, type IssuedDocument, jobDocumentsQueryOptions } from './get-job-documents';

export interface IssueDocumentInput {
  kind: DocumentKind;
  /** For a cabling report only. */
  coverage?: DocumentCoverage;
}

export function useIssueDocument(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ kind, coverage }: IssueDocumentInput) =>
      api.post<IssuedDocument>(`/jobs/${encodeURIComponent(jobId)}/documents`, { kind, ...(kind === 'cabling-report' && coverage ? { coverage } : {}) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobDocumentsQueryOptions(jobId).queryKey }),
  });
}
