import { PHOTO_TAGS } from '@wiretrail/core';
import { useQuery } from '@tanstack/react-query';
import { useLiveQuery } from 'dexie-react-hooks';
import { useEffect } from 'react';
import { api } from '@/lib/api-client';
import { db } from '@/lib/db';

interface OrganisationTags {
  photoTags?: string[] | null;
}

/** Our tags first, then the office's own, once each. */
export function mergeTags(extra: readonly string[] | null | undefined): string[] {
  const seen = new Set<string>();
  const out: string[] = [];
  for (const tag of [...PHOTO_TAGS, ...(extra ?? [])]) {
    const t = typeof tag === 'string' ? tag.trim() : '';
    if (t && !seen.has(t.toLowerCase())) {
      seen.add(t.toLowerCase());
      out.push(t);
    }
  }
  return out;
}

const fetchOrganisation = (signal?: AbortSignal) => api.get<OrganisationTags>('/organisations/current', signal);

/**
 * The tags offered on the phone: kept in the local database so they are there with no signal, refreshed from the
 * organisation whenever the form opens online.
 */
export function usePhoneTags(): string[] {
  const stored = useLiveQuery(() => db.getMeta('photoTags'), []);
  useEffect(() => {
    const controller = new AbortController();
    fetchOrganisation(controller.signal)
      .then((org) => (Array.isArray(org?.photoTags) ? db.setMeta('photoTags', org.photoTags) : undefined))
      .catch(() => undefined);
    return () => controller.abort();
  }, []);
  return mergeTags(stored);
}

/** The tags the office filters by; the same query the office layout reads the organisation's name from. */
export function useOfficeTags(): string[] {
  const org = useQuery({ queryKey: ['organisations', 'current'], queryFn: ({ signal }) => fetchOrganisation(signal), staleTime: 5 * 60_000 });
  return mergeTags(org.data?.photoTags);
}
