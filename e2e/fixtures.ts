import { fileURLToPath } from 'node:url';
import { v7 as uuidv7 } from 'uuid';
import { type APIRequestContext, type Browser, type BrowserContext, type Page, test as base } from '@playwright/test';
import { OfficeJobPage } from './pages/office-job-page.js';
import { DEMO_PASSWORD, SignInPage } from './pages/sign-in-page.js';
import { TechnicianVisitPage } from './pages/technician-visit-page.js';

export { waitForServiceWorker } from './pages/technician-visit-page.js';

export const PHONE = { width: 390, height: 844 };
export const DESK = { width: 1440, height: 900 };

/** The demo user who stands for each role; `tests/auth.setup.ts` signs each in once per run. */
export const ROLE_USERS = {
  admin: 'admin@larkfield.example',
  office: 'office@larkfield.example',
  technician: 'tech1@larkfield.example',
} as const;
export type Role = keyof typeof ROLE_USERS;

/** Where the setup keeps a role's signed-in browser state (its session in localStorage). */
export function signedInState(role: Role): string {
  return fileURLToPath(new URL(`./.auth/${role}.json`, import.meta.url));
}

/**
 * A browser of someone else's with nothing in it. Contexts a test makes take the test's options, its saved session
 * included, so a customer's phone or a newcomer's device says it has none.
 */
export const SIGNED_OUT = { cookies: [], origins: [] };

interface Fixtures {
  /** Opens every page of the test already signed in as this role; null (the default) starts signed out. */
  signedInAs: Role | null;
  signInPage: SignInPage;
  technicianVisit: TechnicianVisitPage;
  officeJob: OfficeJobPage;
}

export const test = base.extend<Fixtures>({
  signedInAs: [null, { option: true }],
  storageState: async ({ signedInAs, storageState }, use) => {
    await use(signedInAs ? signedInState(signedInAs) : storageState);
  },
  signInPage: async ({ page }, use) => {
    await use(new SignInPage(page));
  },
  technicianVisit: async ({ page }, use) => {
    await use(new TechnicianVisitPage(page));
  },
  officeJob: async ({ page }, use) => {
    await use(new OfficeJobPage(page));
  },
});

export { expect } from '@playwright/test';

/** Signs in through the API, as a device would, and returns the session. */
export async function apiSession(request: APIRequestContext, email: string, password = DEMO_PASSWORD): Promise<{ accessToken: string; user: { id: string } }> {
  const res = await request.post('/api/auth/sign-in', { data: { email, password } });
  if (!res.ok()) throw new Error(`sign-in as ${email} answered ${res.status()}`);
  return res.json();
}

/** A second person at a desk-sized browser, already signed in as the role, on their start screen; close the context when done. */
export async function signedInAtDesk(browser: Browser, role: Role): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: DESK, serviceWorkers: 'block', storageState: signedInState(role) });
  const page = await context.newPage();
  await page.goto('/');
  return { context, page };
}

export interface PulledChange {
  entity: string;
  id: string;
  deleted: boolean;
  row: Record<string, unknown> | null;
}

/** Everything the office can see, read the way any device reads it: pull from the start until there is no more. */
export async function officeRows(request: APIRequestContext): Promise<PulledChange[]> {
  const { accessToken } = await apiSession(request, 'office@larkfield.example');
  const deviceId = `office-e2e-${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
  const changes: PulledChange[] = [];
  let checkpoint = 0;
  for (;;) {
    const res = await request.get(`/api/sync/pull?checkpoint=${checkpoint}&limit=1000&deviceId=${deviceId}`, { headers: { authorization: `Bearer ${accessToken}` } });
    if (!res.ok()) throw new Error(`pull answered ${res.status()}`);
    const page = (await res.json()) as { changes: PulledChange[]; checkpoint: number; hasMore: boolean };
    changes.push(...page.changes);
    checkpoint = page.checkpoint;
    if (!page.hasMore) return changes;
  }
}

/** The office books a job and a visit for a technician through the API, so a test has a visit of its own. */
export async function bookVisit(
  request: APIRequestContext,
  opts: { technicianEmail: string; siteName: string; title: string; startHour?: number; endHour?: number; /** Days from today; 0 unless said. */ dayOffset?: number },
): Promise<{ jobId: string; visitId: string }> {
  const { accessToken } = await apiSession(request, 'office@larkfield.example');
  const headers = { authorization: `Bearer ${accessToken}` };
  const sites = (await (await request.get(`/api/sites?search=${encodeURIComponent(opts.siteName)}`, { headers })).json()) as { items: { id: string; customerId: string; name: string }[] };
  const site = sites.items.find((s) => s.name === opts.siteName);
  if (!site) throw new Error(`no site called ${opts.siteName}`);
  const tech = await apiSession(request, opts.technicianEmail);
  const job = await request.post('/api/jobs', { headers, data: { siteId: site.id, customerId: site.customerId, title: opts.title, status: 'booked' } });
  if (!job.ok()) throw new Error(`booking the job answered ${job.status()}: ${await job.text()}`);
  const jobId = ((await job.json()) as { id: string }).id;
  const at = (h: number) => {
    const d = new Date();
    d.setDate(d.getDate() + (opts.dayOffset ?? 0));
    d.setHours(h, 0, 0, 0);
    return d.toISOString();
  };
  const visit = await request.post('/api/visits', {
    headers,
    data: { jobId, siteId: site.id, technicianIds: [tech.user.id], plannedStart: at(opts.startHour ?? 13), plannedEnd: at(opts.endHour ?? 16), status: 'planned' },
  });
  if (!visit.ok()) throw new Error(`booking the visit answered ${visit.status()}: ${await visit.text()}`);
  return { jobId, visitId: ((await visit.json()) as { id: string }).id };
}

/**
 * A technician's phone recording a visit done, through the sync API as the app does it: pulled first (the server
 * takes no base version above what the device was sent), then the arrival, the departure and the parts used pushed.
 */
export async function recordVisitDone(
  request: APIRequestContext,
  opts: { technicianEmail: string; visitId: string; arrived: string; left: string; parts: Array<{ name: string; quantity: number }> },
): Promise<void> {
  const tech = await apiSession(request, opts.technicianEmail);
  const headers = { authorization: `Bearer ${tech.accessToken}` };
  const deviceId = `phone-e2e-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
  const rows = new Map<string, Record<string, unknown>>();
  for (let checkpoint = 0; ;) {
    const res = await request.get(`/api/sync/pull?checkpoint=${checkpoint}&limit=1000&deviceId=${deviceId}`, { headers });
    if (!res.ok()) throw new Error(`pull answered ${res.status()}`);
    const page = (await res.json()) as { changes: PulledChange[]; checkpoint: number; hasMore: boolean };
    for (const c of page.changes) if (c.row) rows.set(`${c.entity}:${c.id}`, c.row);
    checkpoint = page.checkpoint;
    if (!page.hasMore) break;
  }
  const visit = rows.get(`visit:${opts.visitId}`);
  if (!visit) throw new Error(`the visit ${opts.visitId} did not reach ${opts.technicianEmail}'s phone`);
  const items = [...rows.values()].filter((r) => typeof r.sellMinor === 'number' || (typeof r.name === 'string' && 'vatRateCode' in r));
  let counter = 0;
  const hlc = () => `${new Date().toISOString()}-${(counter++).toString(16).padStart(4, '0')}-${deviceId}`;
  const mutations = [
    { mutationId: uuidv7(), entity: 'visit', id: opts.visitId, baseVersion: visit.version, set: { status: 'finished', actualStart: opts.arrived, actualEnd: opts.left }, hlc: hlc() },
    ...opts.parts.map((p) => {
      const item = items.find((i) => i.name === p.name);
      if (!item) throw new Error(`no price item called ${p.name}`);
      return {
        mutationId: uuidv7(), entity: 'materialLine', id: uuidv7(), baseVersion: 0,
        set: { visitId: opts.visitId, siteId: visit.siteId, priceItemId: item.id, description: p.name, quantity: p.quantity, unit: item.unit ?? null }, hlc: hlc(),
      };
    }),
  ];
  const pushed = await request.post('/api/sync/push', { headers, data: { deviceId, mutations } });
  if (!pushed.ok()) throw new Error(`push answered ${pushed.status()}: ${await pushed.text()}`);
  const results = ((await pushed.json()) as { results: Array<{ status: string; error?: string }> }).results;
  if (results.some((r) => r.status !== 'applied')) throw new Error(`push not applied: ${JSON.stringify(results)}`);
}
