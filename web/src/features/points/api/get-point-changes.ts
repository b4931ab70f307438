import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ChecksBeforeWork, RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';

/** A point added, moved, removed or replaced on a visit, with the names of its circuit and areas. */
export type PointChange = Omit<RowOf<'pointChange'>, 'beforeR1Ohm' | 'beforeRnOhm' | 'beforeR2Ohm'> & {
  fromAreaName: string | null;
  toAreaName: string | null;
  circuitLabel: string | null;
  visitPlannedStart: string | null;
  /** The server's checks before the work, worked out by core's rule as the phone does. */
  beforeWork: ChecksBeforeWork;
};

export const jobPointChangesQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['point-changes', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: PointChange[]; total: number }>(`/point-changes?jobId=${encodeURIComponent(jobId)}&pageSize=200`, signal),
  });

export function useJobPointChanges(jobId: string) {
  return useQuery(jobPointChangesQueryOptions(jobId));
}
