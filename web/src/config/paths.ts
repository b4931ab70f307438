import type { Role } from '@wiretrail/core';

/** Every route of the app in one place; links are built from here, never typed inline. */
export const paths = {
  signIn: { path: '/sign-in', href: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in') },
  resetPassword: { path: '/reset-password' },
  home: { path: '/' },
  today: { path: '/today', label: 'Today' },
  visit: { path: '/visits/:visitId', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}` },
  visitCables: { path: 'cables', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}/cables` },
  visitCableResults: { path: 'cables/:cableId/results', href: (visitId: string, cableId: string) => `/visits/${encodeURIComponent(visitId)}/cables/${encodeURIComponent(cableId)}/results` },
  visitCable: { path: 'cables/:cableId', href: (visitId: string, cableId: string | 'new') => `/visits/${encodeURIComponent(visitId)}/cables/${encodeURIComponent(cableId)}` },
  visitPoints: { path: 'points', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}/points` },
  visitPoint: { path: 'points/:pointId', href: (visitId: string, pointId: string | 'new') => `/visits/${encodeURIComponent(visitId)}/points/${encodeURIComponent(pointId)}` },
  visitCircuits: { path: 'tests', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}/tests` },
  visitCircuit: { path: 'tests/:circuitId', href: (visitId: string, circuitId: string) => `/visits/${encodeURIComponent(visitId)}/tests/${encodeURIComponent(circuitId)}` },
  /** The schedule of circuits an installation certificate carries, one card per circuit. */
  visitSchedule: { path: 'schedule', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}/schedule` },
  /** A photo with the cable routes drawn over it, and its drilling check. */
  visitPhotoRoutes: { path: 'photos/:photoId/routes', href: (visitId: string, photoId: string) => `/visits/${encodeURIComponent(visitId)}/photos/${encodeURIComponent(photoId)}/routes` },
  /** The visit's site's map of hidden routes, on the phone. */
  visitHiddenRoutes: { path: 'hidden-routes', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}/hidden-routes` },
  visitSignOff: { path: 'sign-off', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}/sign-off` },
  cableLabels: { path: '/visits/:visitId/labels', href: (visitId: string) => `/visits/${encodeURIComponent(visitId)}/labels` },
  /** Where a cable label's QR code points: sends a technician to the record on the phone, the office to the job's schedule. */
  cable: { path: '/cables/:cableId', href: (cableId: string) => `/cables/${encodeURIComponent(cableId)}` },
  cableOnSite: { path: '/cables/:cableId/on-site', href: (cableId: string) => `/cables/${encodeURIComponent(cableId)}/on-site` },
  /** One visit at the desk: everything recorded on it, in time order. */
  visitRecord: { path: '/jobs/:jobId/visits/:visitId', href: (jobId: string, visitId: string) => `/jobs/${encodeURIComponent(jobId)}/visits/${encodeURIComponent(visitId)}` },
  cableAtDesk: { path: '/cables/:cableId/desk', href: (cableId: string) => `/cables/${encodeURIComponent(cableId)}/desk` },
  sync: { path: '/sync', label: 'Sync' },
  me: { path: '/me', label: 'Me' },
  jobs: { path: '/jobs', label: 'Jobs' },
  job: { path: '/jobs/:jobId', href: (jobId: string, tab?: string) => `/jobs/${encodeURIComponent(jobId)}${tab ? `?tab=${encodeURIComponent(tab)}` : ''}` },
  schedule: { path: '/schedule', label: 'Schedule' },
  customers: { path: '/customers', label: 'Customers & sites' },
  site: { path: '/sites/:siteId', href: (siteId: string) => `/sites/${encodeURIComponent(siteId)}` },
  /** The office's map of a site's hidden routes. */
  siteHiddenRoutes: { path: '/sites/:siteId/hidden-routes', href: (siteId: string) => `/sites/${encodeURIComponent(siteId)}/hidden-routes` },
  conflicts: { path: '/conflicts', label: 'Conflicts', href: (jobId?: string) => (jobId ? `/conflicts?jobId=${encodeURIComponent(jobId)}` : '/conflicts') },
  invoices: { path: '/invoices', label: 'Invoices' },
  /** One job's quotes, invoices and credit notes, reached from the invoices screen. */
  jobInvoices: { path: '/invoices/jobs/:jobId', href: (jobId: string) => `/invoices/jobs/${encodeURIComponent(jobId)}` },
  /** Work to notify under the Building Regulations, overdue first. */
  notifiableWork: { path: '/notifiable-work', label: 'Notifications' },
  priceList: { path: '/price-list', label: 'Price list' },
  team: { path: '/team', label: 'Team' },
  account: { path: '/account', label: 'My account' },
  /** A customer's read-only view of one job, opened from a share link; no account. */
  shared: { path: '/shared/:token', href: (token: string) => `/shared/${encodeURIComponent(token)}` },
} as const;

/** Where each role lands after signing in. */
export function homeFor(role: Role): string {
  return role === 'technician' ? paths.today.path : paths.jobs.path;
}

/** Only same-app paths are followed after sign-in, so a crafted link cannot send the user elsewhere. */
export function safeNext(next: string | null): string | null {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith(paths.signIn.path) ? next : null;
}
