import { useQuery } from '@tanstack/react-query';
import { fetchOrganisationTags, mergeTags } from '../photo-tags';

/** The tags the office filters by; the same query the office layout reads the organisation's name from. */
export function useOfficeTags(): string[] {
  const org = useQuery({ queryKey: ['organisations', 'current'], queryFn: ({ signal }) => fetchOrganisationTags(signal), staleTime: 5 * 60_000 });
  return mergeTags(org.data?.photoTags);
}
