import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FieldValue, JudgedLinkTest, LinkTestImport } from '@wiretrail/core';
import { api } from '@/lib/api-client';

/** The performance results of a job's site's links, judged by the server, by cable label. */
export const linkTestsQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['link-tests', jobId],
    queryFn: ({ signal }) => api.get<JudgedLinkTest[]>(`/jobs/${encodeURIComponent(jobId)}/link-tests`, signal),
  });

export function useLinkTests(jobId: string) {
  return useQuery(linkTestsQueryOptions(jobId));
}

/** A file in our link test template, imported whole or not at all. */
export function useImportLinkTests(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (csv: string) => api.post<LinkTestImport>(`/jobs/${encodeURIComponent(jobId)}/link-tests/import`, { csv }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['link-tests', jobId] }),
  });
}

/** One link's results typed at the desk. */
export function useRecordLinkTest(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { cableRunId: string; fields: Record<string, FieldValue> }) => api.post<JudgedLinkTest>(`/jobs/${encodeURIComponent(jobId)}/link-tests`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['link-tests', jobId] }),
  });
}
