import type { SessionTokens } from '@wiretrail/core';
import { apiRequest } from './api-client';
import { getSession, type Session, setSession } from './session';

/**
 * Ends this session and begins one in another organisation the person works for, without the password: the refresh
 * token vouches for them. The phone's rows belong to the membership, so the next sync starts it afresh.
 */
export async function switchOrganisation(organisationId: string): Promise<Session> {
  const session = getSession();
  if (!session) throw new Error('Sign in first.');
  const next = await apiRequest<SessionTokens>('/auth/refresh', { method: 'POST', body: { refreshToken: session.refreshToken, organisationId }, anonymous: true });
  setSession(next);
  return next;
}
