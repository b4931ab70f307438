import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { type BillingTerms, billingTermsQueryOptions } from './get-billing-terms';

export function useUpdateBillingTerms() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (terms: Partial<BillingTerms>) => api.patch<BillingTerms>('/billing-terms', terms),
    onSuccess: (saved) => queryClient.setQueryData(billingTermsQueryOptions().queryKey, saved),
  });
}
