import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ChecksBeforeWork, CircuitTestAssessment, RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';

/** A circuit's test results as the office reads them: the readings, the circuit as recorded, and the server's verdicts. */
export type TestResult = Omit<RowOf<'testResult'>, 'verdicts'> & {
  circuit: {
    id: string;
    number: string;
    description: string | null;
    kind: string | null;
    deviceType: string | null;
    deviceRatingA: number | null;
    rcdRatingMa: number | null;
    lengthM: number | null;
    boardName: string | null;
    label: string | null;
  } | null;
  earthing: string | null;
  assessment: CircuitTestAssessment;
  /** The checks before the work of each point change made on this circuit on the same visit. */
  beforeWork: Array<ChecksBeforeWork & { pointChangeId: string; accessoryKind: string | null }>;
};

export const jobTestResultsQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['test-results', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: TestResult[]; total: number }>(`/test-results?jobId=${encodeURIComponent(jobId)}&pageSize=200`, signal),
  });

export function useJobTestResults(jobId: string) {
  return useQuery(jobTestResultsQueryOptions(jobId));
}
