import { useLiveQuery } from 'dexie-react-hooks';
import { db, type NoteRow } from '@/lib/db';

/** Newest first: the last thing written is what the technician wants to check. Ids are UUIDv7, so they sort by time too. */
export async function getVisitNotes(visitId: string): Promise<NoteRow[]> {
  const notes = await db.note.where('visitId').equals(visitId).toArray();
  return notes.sort((a, b) => (b.createdAt ?? '').localeCompare(a.createdAt ?? '') || b.id.localeCompare(a.id));
}

export function useVisitNotes(visitId: string): NoteRow[] | undefined {
  return useLiveQuery(() => getVisitNotes(visitId), [visitId]);
}
