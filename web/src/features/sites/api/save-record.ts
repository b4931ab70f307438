import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Area } from './get-areas';
import type { Board, Circuit } from './get-circuits';
import type { Customer } from './get-customers';
import type { Site } from './get-sites';

type Resource = 'customers' | 'sites' | 'areas' | 'boards' | 'circuits';

export interface SaveRecord {
  /** Given to change a record; without it a new one is made. */
  id?: string;
  values: Record<string, unknown>;
}

/** Creates or changes one record of the site's installation; the lists that show it load again. */
function useSaveRecord<T>(resource: Resource) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, values }: SaveRecord) => (id ? api.patch<T>(`/${resource}/${encodeURIComponent(id)}`, values) : api.post<T>(`/${resource}`, values)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [resource] }),
  });
}

export const useSaveCustomer = () => useSaveRecord<Customer>('customers');
export const useSaveSite = () => useSaveRecord<Site>('sites');
export const useSaveArea = () => useSaveRecord<Area>('areas');
export const useSaveBoard = () => useSaveRecord<Board>('boards');
export const useSaveCircuit = () => useSaveRecord<Circuit>('circuits');
