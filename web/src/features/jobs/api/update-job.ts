import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Job } from './get-jobs';

export type JobChanges = Partial<Pick<Job, 'status' | 'title' | 'reference' | 'description'>>;

export function updateJob(id: string, changes: JobChanges): Promise<Job> {
  return api.patch<Job>(`/jobs/${encodeURIComponent(id)}`, changes);
}

/** Changes a job (moving it to another status, say); the board, the table and the job page load again. */
export function useUpdateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: string; changes: JobChanges }) => updateJob(id, changes),
    onSuccess: (job) => {
      queryClient.setQueryData(['jobs', job.id], job);
      return queryClient.invalidateQueries({ queryKey: ['jobs'] });
    },
  });
}
