import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';

/** A visit as the schedule reads it. */
export type Visit = Pick<RowOf<'visit'>, 'id' | 'jobId' | 'siteId' | 'technicianIds' | 'plannedStart' | 'plannedEnd' | 'status'>;

export type Job = Pick<RowOf<'job'>, 'id' | 'siteId' | 'reference' | 'title' | 'status'>;


interface Page<T> {
  items: T[];
  total: number;
}

export const weekVisitsQueryOptions = (from: string, to: string) =>
  queryOptions({
    queryKey: ['visits', { from, to }],
    queryFn: ({ signal }) => api.get<Page<Visit>>(`/visits?pageSize=200&from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`, signal),
  });

export const jobsQueryOptions = () =>
  queryOptions({ queryKey: ['jobs', { all: true }], queryFn: ({ signal }) => api.get<Page<Job>>('/jobs?pageSize=200', signal) });


export function useWeekVisits(from: string, to: string) {
  return useQuery(weekVisitsQueryOptions(from, to));
}

export function useJobs() {
  return useQuery(jobsQueryOptions());
}


export type VisitChanges = Partial<Pick<Visit, 'technicianIds' | 'plannedStart' | 'plannedEnd' | 'status'>>;

/** Books a visit or changes one; technicians' phones receive it on their next sync. */
export function useSaveVisit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes, jobId, siteId }: { id?: string; changes: VisitChanges; jobId?: string; siteId?: string }) =>
      id ? api.patch<Visit>(`/visits/${id}`, changes) : api.post<Visit>('/visits', { jobId, siteId, status: 'planned', ...changes }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['visits'] }),
  });
}
