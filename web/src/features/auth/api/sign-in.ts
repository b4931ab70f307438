import type { OrganisationOption, SignInAnswer } from '@wiretrail/core';
import { useState } from 'react';
import { apiRequest } from '@/lib/api-client';
import { type Session, setSession } from '@/lib/session';

export interface SignInInput {
  email: string;
  password: string;
  /** The organisation chosen, for a person who works for more than one. */
  organisationId?: string;
}

export function signIn(input: SignInInput): Promise<SignInAnswer> {
  return apiRequest<SignInAnswer>('/auth/sign-in', { method: 'POST', body: { ...input }, anonymous: true });
}

interface SignInState {
  isPending: boolean;
  error: unknown;
  /** The organisations to choose from, once the password was right and there is more than one. */
  choice: OrganisationOption[] | null;
}

/**
 * Signing in, with its progress, its refusal and, for someone who works for several organisations, the choice.
 * Plain state rather than the query client: the sign-in page is on the way to every first screen, and one request
 * does not need a cache. The office's cache empties itself when the user changes (`lib/react-query.ts`).
 */
export function useSignIn(onSignedIn: (session: Session) => void) {
  const [state, setState] = useState<SignInState>({ isPending: false, error: null, choice: null });
  async function submit(input: SignInInput): Promise<void> {
    setState((s) => ({ ...s, isPending: true, error: null }));
    try {
      const answer = await signIn(input);
      if ('chooseOrganisation' in answer) {
        setState({ isPending: false, error: null, choice: answer.chooseOrganisation });
        return;
      }
      setSession(answer);
      onSignedIn(answer);
    } catch (error) {
      setState((s) => ({ ...s, isPending: false, error }));
    }
  }
  const startAgain = () => setState({ isPending: false, error: null, choice: null });
  return { ...state, isError: state.error !== null, submit, startAgain };
}
