import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from './api-client';

/** Who is who in the organisation, by name: readable by the office, unlike the admin's full team list. */
export interface Person {
  id: string;
  name: string;
  role: string;
  active: boolean;
}

export const directoryQueryOptions = () =>
  queryOptions({
    queryKey: ['users', 'directory'],
    queryFn: ({ signal }) => api.get<Person[]>('/users/directory', signal),
    staleTime: 5 * 60_000,
  });

export function useDirectory() {
  return useQuery(directoryQueryOptions());
}
