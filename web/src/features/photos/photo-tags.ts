import { PHOTO_TAGS } from '@wiretrail/core';
import { api } from '@/lib/api-client';

export interface OrganisationTags {
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

export const fetchOrganisationTags = (signal?: AbortSignal) => api.get<OrganisationTags>('/organisations/current', signal);
