import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Role } from '@wiretrail/core';
import type { TeamMember } from './get-users';

export interface NewPerson {
  name: string;
  email: string;
  role: Role;
}

function useTeamMutation<V>(fn: (v: V) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['users'] }) });
}

export const useCreatePerson = () => useTeamMutation((p: NewPerson) => api.post<TeamMember>('/users', { ...p }));

export const useUpdatePerson = () =>
  useTeamMutation(({ id, changes }: { id: string; changes: Partial<Pick<TeamMember, 'role' | 'active' | 'name'>> }) => api.patch<TeamMember>(`/users/${id}`, changes));

export function useSendPasswordLink() {
  return useMutation({ mutationFn: (id: string) => api.post<{ sentTo: string; expiresAt: string }>(`/users/${id}/password-reset`) });
}
