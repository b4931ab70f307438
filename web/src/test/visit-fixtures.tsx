import { cleanup, render } from '@testing-library/react';
import { createMemoryRouter, matchRoutes, type RouteObject, RouterProvider } from 'react-router-dom';
import { technicianScreens } from '@/app/router';
import { db, type LocalRow } from '@/lib/db';
import { setSession } from '@/lib/session';

/** A technician's phone with one visit at one site, as a pull would have left it; for the visit screens' tests. */
export const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
export const ids = {
  customer: '01900000-0000-7000-8000-000000000001',
  site: '01900000-0000-7000-8000-000000000002',
  job: '01900000-0000-7000-8000-000000000003',
  visit: '01900000-0000-7000-8000-000000000004',
  otherVisit: '01900000-0000-7000-8000-000000000005',
  board: '01900000-0000-7000-8000-000000000006',
  circuit: '01900000-0000-7000-8000-000000000008',
  lounge: '01900000-0000-7000-8000-000000000009',
};
export const base = { _base: { version: 1, fieldVersions: {}, values: {} } } satisfies Pick<LocalRow, '_base'>;

export function at(hours: number, dayOffset = 0): string {
  const d = new Date();
  d.setDate(d.getDate() + dayOffset);
  d.setHours(hours, 0, 0, 0);
  return d.toISOString();
}

export async function resetPhone(): Promise<void> {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
  await db.customer.put({ id: ids.customer, name: 'Hannah Greaves', ...base });
  await db.site.put({ id: ids.site, customerId: ids.customer, address: '14 Orchard Rise, Wendmouth', postcode: 'WM2 4HD', earthing: 'TN-C-S', accessNotes: 'Key safe by the back door.', ...base });
  await db.job.put({ id: ids.job, siteId: ids.site, customerId: ids.customer, title: 'Move two lounge sockets', ...base });
  await db.area.put({ id: ids.lounge, siteId: ids.site, name: 'Lounge', ...base });
  await db.visit.bulkPut([
    { id: ids.visit, jobId: ids.job, siteId: ids.site, technicianIds: [USER.id], plannedStart: at(9), plannedEnd: at(12), status: 'planned', ...base },
    // Someone else's visit, and one of mine too far ahead: neither belongs on Today.
    { id: ids.otherVisit, jobId: ids.job, siteId: ids.site, technicianIds: ['someone-else'], plannedStart: at(9), status: 'planned', ...base },
    { id: '01900000-0000-7000-8000-000000000007', jobId: ids.job, siteId: ids.site, technicianIds: [USER.id], plannedStart: at(9, 20), ...base },
  ]);
}

export async function addRing(): Promise<void> {
  await db.board.put({ id: ids.board, siteId: ids.site, name: 'Consumer unit', ...base });
  await db.circuit.put({
    id: ids.circuit, siteId: ids.site, boardId: ids.board, number: '1', description: 'Sockets, ground floor', kind: 'ring',
    deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5, ...base,
  });
}

const screens: RouteObject[] = [{ HydrateFallback: () => null, children: technicianScreens }];

/**
 * Loads the lazy routes a path opens, as the router would. The first load compiles each screen's modules, which on
 * a busy machine takes longer than a query waits for the screen to appear; a hook that calls this first leaves the
 * queries waiting only for the phone's database.
 */
export async function loadScreens(path: string): Promise<void> {
  for (const { route } of matchRoutes(screens, path) ?? []) if (typeof route.lazy === 'function') await route.lazy();
}

/** The technician's own screens (lazy, as in the app), in memory, at a path; without the shell, so nothing syncs. */
export function show(path: string) {
  const router = createMemoryRouter(screens, { initialEntries: [path] });
  render(<RouterProvider router={router} />);
  return router;
}

export function tidyUp() {
  cleanup();
  setSession(null);
}
