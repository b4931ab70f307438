import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InstallationParticulars } from '@wiretrail/core';
import { api } from '@/lib/api-client';
import { type DocumentCoverage, type DocumentKind, type IssuedDocument, jobDocumentsQueryOptions } from './get-job-documents';

export interface IssueDocumentInput {
  kind: DocumentKind;
  /** For a cabling report only. */
  coverage?: DocumentCoverage;
  /** For an installation certificate only: what the office fills in. */
  particulars?: InstallationParticulars;
}

export function useIssueDocument(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ kind, coverage, particulars }: IssueDocumentInput) =>
      api.post<IssuedDocument>(`/jobs/${encodeURIComponent(jobId)}/documents`, {
        kind,
        ...(kind === 'cabling-report' && coverage ? { coverage } : {}),
        ...(kind === 'installation-certificate' && particulars ? { particulars } : {}),
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobDocumentsQueryOptions(jobId).queryKey }),
  });
}
