import type { OrganisationOption, Role } from '@wiretrail/core';
import { useSyncExternalStore } from 'react';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  organisationId: string;
  /** Absent from sessions kept before organisations were named in them. */
  organisationName?: string;
}

export interface Session {
  accessToken: string;
  refreshToken: string;
  user: SessionUser;
  /** Every organisation this person may sign in to; more than one offers a switch. */
  organisations?: OrganisationOption[];
}

const KEY = 'wiretrail.session';
const listeners = new Set<() => void>();

/**
 * The signed-in session, kept in localStorage so the app opens with no network.
 * A technician must be able to start the phone in a cellar and see their work.
 */
let current: Session | null = read();

function read(): Session | null {
  try {
    const raw = globalThis.localStorage?.getItem(KEY);
    const parsed = raw ? (JSON.parse(raw) as Session) : null;
    return parsed?.accessToken && parsed.refreshToken && parsed.user?.role ? parsed : null;
  } catch {
    return null;
  }
}

export function getSession(): Session | null {
  return current;
}

export function setSession(next: Session | null): void {
  current = next;
  try {
    if (next) localStorage.setItem(KEY, JSON.stringify(next));
    else localStorage.removeItem(KEY);
  } catch {
    // Private mode or full storage: the session still lives for this tab.
  }
  listeners.forEach((l) => l());
}

export function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

// Another tab signed in or out: follow it.
globalThis.addEventListener?.('storage', (e: StorageEvent) => {
  if (e.key === KEY) {
    current = read();
    listeners.forEach((l) => l());
  }
});

export function useSession(): Session | null {
  return useSyncExternalStore(subscribe, getSession, getSession);
}
