import { useSyncExternalStore } from 'react';

/** What the photo uploader is doing right now; what has reached the server is kept in the database. */
export interface UploadProgress {
  /** Bytes the server has of each photo being sent in this round, by sha256. */
  bySha: Readonly<Record<string, { sent: number; total: number }>>;
  /** This round's photos: bytes to send, and bytes sent so far. */
  roundTotal: number;
  roundSent: number;
  active: boolean;
  /** Why the last round could not ask the server about photos (shown on the Sync page); null when it could. */
  lastError: string | null;
}

const EMPTY: UploadProgress = { bySha: {}, roundTotal: 0, roundSent: 0, active: false, lastError: null };
let state: UploadProgress = EMPTY;
const listeners = new Set<() => void>();

export function getUploadProgress(): UploadProgress {
  return state;
}

export function setUploadProgress(patch: Partial<UploadProgress>): void {
  state = { ...state, ...patch };
  listeners.forEach((l) => l());
}

export function notePhotoProgress(sha256: string, sent: number, total: number): void {
  setUploadProgress({ bySha: { ...state.bySha, [sha256]: { sent, total } } });
}

export function clearPhotoProgress(sha256: string): void {
  if (!(sha256 in state.bySha)) return;
  const { [sha256]: _gone, ...rest } = state.bySha;
  setUploadProgress({ bySha: rest });
}

export function resetUploadProgress(): void {
  state = EMPTY;
  listeners.forEach((l) => l());
}

export function subscribeUploadProgress(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useUploadProgress(): UploadProgress {
  return useSyncExternalStore(subscribeUploadProgress, getUploadProgress, getUploadProgress);
}
