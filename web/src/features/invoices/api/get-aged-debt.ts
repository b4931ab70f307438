import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AgedDebtReport } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export type { AgedDebtReport as AgedDebt } from '@wiretrail/core';

export const agedDebtQueryOptions = () =>
  queryOptions({
    queryKey: ['invoices', 'aged-debt'],
    queryFn: ({ signal }) => api.get<AgedDebtReport>('/invoices/aged-debt', signal),
  });

export function useAgedDebt() {
  return useQuery(agedDebtQueryOptions());
}
