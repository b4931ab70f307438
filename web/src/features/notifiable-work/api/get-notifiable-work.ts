import { queryOptions, useQuery } from '@tanstack/react-query';
import type { NotifiableWorkList } from '@wiretrail/core';
import { api } from '@/lib/api-client';

// The shapes are core's, shared with the API that gives them.
export type { NotifiableJob, NotifiableWorkList } from '@wiretrail/core';

export const NOTIFIABLE_FILTERS = ['all', 'overdue', 'to-notify', 'notified', 'certificate-received'] as const;
export type NotifiableFilter = (typeof NOTIFIABLE_FILTERS)[number];

/** The jobs whose work may need notifying, overdue first; `filter` narrows them to one state. */
export const notifiableWorkQueryOptions = (filter: NotifiableFilter = 'all') =>
  queryOptions({
    queryKey: ['notifiable-work', filter],
    queryFn: ({ signal }) => api.get<NotifiableWorkList>(`/notifiable-work${filter === 'all' ? '' : `?state=${filter}`}`, signal),
  });

export function useNotifiableWork(filter: NotifiableFilter = 'all') {
  return useQuery(notifiableWorkQueryOptions(filter));
}
