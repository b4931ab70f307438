import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { homeFor, paths } from '@/config/paths';
import type { Role } from '@wiretrail/core';
import { useSession } from '@/lib/session';
import { NotForRole } from './not-for-role';

/** Sends anyone without a session to sign-in, remembering where they were going. */
export function RequireSession() {
  const session = useSession();
  const location = useLocation();
  if (!session) return <Navigate to={paths.signIn.href(location.pathname + location.search)} replace />;
  return <Outlet />;
}

/** A signed-in user whose role may not see this screen gets a plain refusal, not a blank page. */
export function RequireRole({ roles }: { roles: Role[] }) {
  const session = useSession();
  if (session && !roles.includes(session.user.role)) return <NotForRole />;
  return <Outlet />;
}

export function HomeRedirect() {
  const session = useSession();
  return <Navigate to={session ? homeFor(session.user.role) : paths.signIn.path} replace />;
}
