import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { getSession, type Session, setSession } from '@/lib/session';
import { queryClient } from '@/lib/react-query';

export interface SignInInput {
  email: string;
  password: string;
}

export function signIn(input: SignInInput): Promise<Session> {
  return apiRequest<Session>('/auth/sign-in', { method: 'POST', body: { ...input }, anonymous: true });
}

export function useSignIn(onSignedIn: (session: Session) => void) {
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      queryClient.clear();
      setSession(session);
      onSignedIn(session);
    },
  });
}

/** Ends the session on the server when it can be reached; the device forgets it either way. */
export async function signOut(): Promise<void> {
  const session = getSession();
  setSession(null);
  queryClient.clear();
  if (session) {
    await apiRequest('/auth/sign-out', { method: 'POST', body: { refreshToken: session.refreshToken }, anonymous: true }).catch(() => undefined);
  }
}
