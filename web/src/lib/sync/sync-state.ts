import { useSyncExternalStore } from 'react';

/** What the engine is doing right now; counts and times live in the database, where every tab sees them. */
export interface EngineState {
  syncing: boolean;
  /** When the next attempt after a failure is due (ms since epoch). */
  nextRetryAt: number | null;
}

let state: EngineState = { syncing: false, nextRetryAt: null };
const listeners = new Set<() => void>();

export function getEngineState(): EngineState {
  return state;
}

export function setEngineState(patch: Partial<EngineState>): void {
  state = { ...state, ...patch };
  listeners.forEach((l) => l());
}

export function subscribeEngineState(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useEngineState(): EngineState {
  return useSyncExternalStore(subscribeEngineState, getEngineState, getEngineState);
}
