import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface Job {
  id: string;
  siteId: string;
  customerId: string;
  reference: string | null;
  title: string;
  status: string | null;
  description: string | null;
}

export interface JobPage {
  items: Job[];
  total: number;
  page: number;
  pageSize: number;
}

export const jobsQueryOptions = () =>
  queryOptions({
    queryKey: ['jobs', { pageSize: 200 }],
    queryFn: ({ signal }) => api.get<JobPage>('/jobs?pageSize=200', signal),
  });

export const jobQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['jobs', id],
    queryFn: ({ signal }) => api.get<Job>(`/jobs/${encodeURIComponent(id)}`, signal),
  });

export function useJobs() {
  return useQuery(jobsQueryOptions());
}

export function useJob(id: string) {
  return useQuery(jobQueryOptions(id));
}
