import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface JobVisit {
  id: string;
  jobId: string;
  technicianIds: string[] | null;
  plannedStart: string | null;
  plannedEnd: string | null;
  status: string | null;
  actualStart?: string | null;
  actualEnd?: string | null;
  signedByName?: string | null;
  signedAt?: string | null;
}

export const jobVisitsQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['visits', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: JobVisit[]; total: number }>(`/visits?pageSize=200&jobId=${encodeURIComponent(jobId)}`, signal),
  });

export function useJobVisits(jobId: string) {
  return useQuery(jobVisitsQueryOptions(jobId));
}
