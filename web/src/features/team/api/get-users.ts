import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Role } from '@wiretrail/core';

export interface TeamMember {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const usersQueryOptions = (page = 1) =>
  queryOptions({
    queryKey: ['users', { page }],
    queryFn: ({ signal }) => api.get<Page<TeamMember>>(`/users?page=${page}&pageSize=100`, signal),
  });

export function useUsers(page = 1) {
  return useQuery(usersQueryOptions(page));
}
