import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { NotifiableJob, NotificationChange } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export function useRecordNotification() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ jobId, change }: { jobId: string; change: NotificationChange }) => api.patch<NotifiableJob>(`/notifiable-work/${jobId}`, change as unknown as Record<string, unknown>),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['notifiable-work'] }),
  });
}
