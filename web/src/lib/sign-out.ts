import { apiRequest } from './api-client';
import { getSession, setSession } from './session';

/**
 * Ends the session on the server when it can be reached; the device forgets it either way. Here rather than beside
 * sign-in because the shared office layout offers it, and shared code imports no feature.
 */
export async function signOut(): Promise<void> {
  const session = getSession();
  setSession(null);
  if (session) {
    await apiRequest('/auth/sign-out', { method: 'POST', body: { refreshToken: session.refreshToken }, anonymous: true }).catch(() => undefined);
  }
}
