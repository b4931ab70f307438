import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InstallationCertificatePreview } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export type { InstallationCertificatePreview } from '@wiretrail/core';

/** Which certificate the job's signed work needs, the particulars to start from, and what the records still lack. */
export const installationCertificateQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['installation-certificate', { jobId }],
    queryFn: ({ signal }) => api.get<InstallationCertificatePreview>(`/jobs/${encodeURIComponent(jobId)}/installation-certificate`, signal),
  });

export function useInstallationCertificate(jobId: string, enabled = true) {
  return useQuery({ ...installationCertificateQueryOptions(jobId), enabled });
}
