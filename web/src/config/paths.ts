import type { Role } from '@/lib/session';

/** Every route of the app in one place; links are built from here, never typed inline. */
export const paths = {
  signIn: { path: '/sign-in', href: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in') },
  resetPassword: { path: '/reset-password' },
  home: { path: '/' },
  today: { path: '/today', label: 'Today' },
  visit: { path: '/visits/:visitId', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}` },
  sync: { path: '/sync', label: 'Sync' },
  me: { path: '/me', label: 'Me' },
  jobs: { path: '/jobs', label: 'Jobs' },
  job: { path: '/jobs/:jobId', href: (jobId: string, tab?: string) => `/jobs/${encodeURIComponent(jobId)}${tab ? `?tab=${encodeURIComponent(tab)}` : ''}` },
  schedule: { path: '/schedule', label: 'Schedule' },
  customers: { path: '/customers', label: 'Customers & sites' },
  site: { path: '/sites/:siteId', href: (siteId: string) => `/sites/${encodeURIComponent(siteId)}` },
  conflicts: { path: '/conflicts', label: 'Conflicts', href: (jobId?: string) => (jobId ? `/conflicts?jobId=${encodeURIComponent(jobId)}` : '/conflicts') },
  team: { path: '/team', label: 'Team' },
  account: { path: '/account', label: 'My account' },
} as const;

/** Where each role lands after signing in. */
export function homeFor(role: Role): string {
  return role === 'technician' ? paths.today.path : paths.jobs.path;
}

/** Only same-app paths are followed after sign-in, so a crafted link cannot send the user elsewhere. */
export function safeNext(next: string | null): string | null {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith(paths.signIn.path) ? next : null;
}
