import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRef } from 'react';
import type { RowOf } from '@wiretrail/core';
import { api } from '@/lib/api-client';
import type { Job } from './get-jobs';

/** Who the job can be for, with their sites, as the new-job form offers them. */
export type CustomerChoice = Pick<RowOf<'customer'>, 'id' | 'name'> & { sites?: { id: string; name: string }[] };

export function useCustomerChoices() {
  return useQuery({
    queryKey: ['customers', { search: '', page: 1, pageSize: 200 }],
    queryFn: ({ signal }) => api.get<{ items: CustomerChoice[] }>('/customers?page=1&pageSize=200&search=', signal),
  });
}

export interface NewJob {
  customer: { id: string } | { name: string; phone: string | null; email: string | null };
  site: { id: string } | { address: string; postcode: string | null; accessNotes: string | null };
  title: string;
  description: string | null;
}

/**
 * Makes the customer and the site first where they are new, then the job. What was made is remembered, so that
 * trying again after a refusal never makes the customer or the site twice.
 */
export function useCreateJob() {
  const queryClient = useQueryClient();
  const made = useRef<{ customerId?: string; siteId?: string }>({}).current;
  return useMutation({
    mutationFn: async (job: NewJob): Promise<Job> => {
      const customerId = 'id' in job.customer ? job.customer.id : (made.customerId ??= (await api.post<{ id: string }>('/customers', job.customer)).id);
      const siteId = 'id' in job.site ? job.site.id : (made.siteId ??= (await api.post<{ id: string }>('/sites', { ...job.site, customerId })).id);
      return api.post<Job>('/jobs', { customerId, siteId, title: job.title, description: job.description, status: 'enquiry' });
    },
    onSuccess: () => Promise.all(['jobs', 'customers', 'sites'].map((key) => queryClient.invalidateQueries({ queryKey: [key] }))),
  });
}
