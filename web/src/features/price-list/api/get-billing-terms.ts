import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BillingTerms } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export type { BillingTerms } from '@wiretrail/core';

export const billingTermsQueryOptions = () =>
  queryOptions({
    queryKey: ['billing-terms'],
    queryFn: ({ signal }) => api.get<BillingTerms>('/billing-terms', signal),
  });

export function useBillingTerms() {
  return useQuery(billingTermsQueryOptions());
}
