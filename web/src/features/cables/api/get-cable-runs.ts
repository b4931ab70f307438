import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CableRunAssessment, RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';

/** A cable run as the office reads it: the synced row, its ends' area names and the server's judgement of its test. */
export type CableRun = Omit<RowOf<'cableRun'>, 'wiremap'> & {
  version: number;
  endAAreaName: string | null;
  endBAreaName: string | null;
  assessment: CableRunAssessment;
};

interface CableRunPage {
  items: CableRun[];
  total: number;
}

export interface CableScheduleQuery {
  siteId: string;
  /** Only the runs last recorded on this job's visits. */
  jobId?: string;
}

const PAGE = 200;

/** The whole schedule, page by page: the table sorts it and the export writes every run, not one page. */
export async function getCableSchedule(q: CableScheduleQuery, signal?: AbortSignal): Promise<CableRun[]> {
  const all: CableRun[] = [];
  for (let page = 1; ; page++) {
    const params = new URLSearchParams({ siteId: q.siteId, page: String(page), pageSize: String(PAGE), ...(q.jobId ? { jobId: q.jobId } : {}) });
    const got = await api.get<CableRunPage>(`/cable-runs?${params}`, signal);
    all.push(...got.items);
    if (all.length >= got.total || got.items.length === 0) return all;
  }
}

export const cableScheduleQueryOptions = (q: CableScheduleQuery) =>
  queryOptions({
    queryKey: ['cable-runs', q],
    queryFn: ({ signal }) => getCableSchedule(q, signal),
  });

export function useCableSchedule(q: CableScheduleQuery) {
  return useQuery({ ...cableScheduleQueryOptions(q), enabled: !!q.siteId });
}
