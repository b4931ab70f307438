import { useLiveQuery } from 'dexie-react-hooks';
import { db, type FailedEntry } from '@/lib/db';

/** The technician's refused changes, newest first. */
export function useFailedChanges(userId: string): FailedEntry[] | undefined {
  return useLiveQuery(() => db.failed.where('userId').equals(userId).reverse().sortBy('seq'), [userId]);
}

/** Read and understood: the refusal leaves the phone. */
export const dismissFailedChange = (seq: number): Promise<void> => db.failed.delete(seq);
