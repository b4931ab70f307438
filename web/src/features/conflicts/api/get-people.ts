import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface Person {
  id: string;
  name: string;
  role: string;
}

export const peopleQueryOptions = () =>
  queryOptions({
    queryKey: ['users', 'directory'],
    queryFn: ({ signal }) => api.get<Person[]>('/users/directory', signal),
    staleTime: 5 * 60_000,
  });

export function usePeople() {
  return useQuery(peopleQueryOptions());
}
