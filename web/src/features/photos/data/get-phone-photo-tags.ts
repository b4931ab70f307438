import { useLiveQuery } from 'dexie-react-hooks';
import { useEffect } from 'react';
import { db } from '@/lib/db';
import { fetchOrganisationTags, mergeTags } from '../photo-tags';

/**
 * The tags offered on the phone: kept in the local database so they are there with no signal, refreshed from the
 * organisation whenever the form opens online. Apart from the office's query, so the desk never loads the phone's
 * database.
 */
export function usePhoneTags(): string[] {
  const stored = useLiveQuery(() => db.getMeta('photoTags'), []);
  useEffect(() => {
    const controller = new AbortController();
    fetchOrganisationTags(controller.signal)
      .then((org) => (Array.isArray(org?.photoTags) ? db.setMeta('photoTags', org.photoTags) : undefined))
      .catch(() => undefined);
    return () => controller.abort();
  }, []);
  return mergeTags(stored);
}
