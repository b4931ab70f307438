import { useState } from 'react';
import { apiRequest } from '@/lib/api-client';
import { type Session, setSession } from '@/lib/session';

export interface SignInInput {
  email: string;
  password: string;
}

export function signIn(input: SignInInput): Promise<Session> {
  return apiRequest<Session>('/auth/sign-in', { method: 'POST', body: { ...input }, anonymous: true });
}

/**
 * Signing in, with its progress and its refusal. Plain state rather than the query client: the sign-in page is on
 * the way to every first screen, and one request does not need a cache. The office's cache empties itself when the
 * user changes (`lib/react-query.ts`).
 */
export function useSignIn(onSignedIn: (session: Session) => void) {
  const [state, setState] = useState<{ isPending: boolean; error: unknown }>({ isPending: false, error: null });
  async function submit(input: SignInInput): Promise<void> {
    setState({ isPending: true, error: null });
    try {
      const session = await signIn(input);
      setSession(session);
      onSignedIn(session);
    } catch (error) {
      setState({ isPending: false, error });
    }
  }
  return { ...state, isError: state.error !== null, submit };
}
