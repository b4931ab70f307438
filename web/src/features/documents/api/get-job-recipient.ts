import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Who documents of a job go to by default: its customer, if the office has their e-mail address. */
export function useJobRecipient(jobId: string) {
  const job = useQuery({
    queryKey: ['jobs', jobId],
    queryFn: ({ signal }) => api.get<{ customerId: string }>(`/jobs/${encodeURIComponent(jobId)}`, signal),
  });
  const customerId = job.data?.customerId ?? '';
  const customer = useQuery({
    queryKey: ['customers', customerId],
    queryFn: ({ signal }) => api.get<{ name: string; email: string | null }>(`/customers/${encodeURIComponent(customerId)}`, signal),
    enabled: !!customerId,
  });
  return { name: customer.data?.name ?? null, email: customer.data?.email ?? null, isPending: job.isPending || (!!customerId && customer.isPending) };
}
