import type { APIRequestContext, BrowserContext, Page, Route } from '@playwright/test';
import { createHash } from 'node:crypto';
import { noisyPhoto } from '../camera-photos.js';
import { apiSession, bookVisit, expect, officeRows, PHONE, ROLE_USERS, type PulledChange, test } from '../fixtures.js';
import { TechnicianVisitPage } from '../pages/technician-visit-page.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/**
 * The phone's tab is reloaded, then closed, while a sync is under way: each time a request is held open with
 * page.route so that the reload or the close lands while it is outstanding (and, the first time, after the server
 * has already taken it). Reopened, the app must still show everything typed, and the server must hold it once.
 */

/**
 * Holds requests to a route, one phase at a time: 'forward' lets the server take the next one and keeps its answer
 * from the app, 'hold' keeps the next one from the server too, 'pass' lets requests through. `held` resolves with the
 * held request's offset header (for uploads) once the app has sent it.
 */
async function holdRequests(page: Page, url: string, method: string) {
  let phase: 'forward' | 'hold' | 'pass' = 'pass';
  let release!: (offset: number) => void;
  const state = {
    held: Promise.resolve(0),
    next(p: 'forward' | 'hold') {
      phase = p;
      state.held = new Promise<number>((r) => (release = r));
    },
  };
  await page.route(url, async (route: Route) => {
    if (route.request().method() !== method || phase === 'pass') return route.continue();
    const now = phase;
    phase = 'pass';
    if (now === 'forward') await route.fetch();
    // Never answered: the reload or the close lands while the app still waits for it.
    release(Number(route.request().headers()['upload-offset'] ?? 0));
  });
  return state;
}

async function openOwnVisit(visitPage: TechnicianVisitPage, title: string): Promise<string> {
  await visitPage.openToday();
  return visitPage.openFromToday(title);
}

/** The tab closed and the app opened again in a new one, on the same phone (the same browser profile). */
async function reopen(context: BrowserContext, page: Page, visitId: string, title: string): Promise<TechnicianVisitPage> {
  await page.close();
  const again = new TechnicianVisitPage(await context.newPage());
  await again.page.goto(`/visits/${visitId}`);
  await again.expectVisit(title);
  return again;
}

/** A synced row as the office reads it, with a check that it was written once and never again since. */
function writtenOnce(row: PulledChange): boolean {
  const versions = Object.values((row.row?.fieldVersions ?? {}) as Record<string, number>);
  return versions.length > 0 && versions.every((v) => v === row.row!.version);
}

test('notes typed while a push is in flight survive a reload and a closed tab, and reach the server once', async ({ page, context, request, technicianVisit: visitPage }) => {
  test.setTimeout(120_000);
  const stamp = Date.now().toString(36);
  const title = `Sockets moved in the hall (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title });
  const visitId = await openOwnVisit(visitPage, title);
  const notes = [`Hall socket moved 300 mm left (${stamp})`, `Cable clipped in the safe zone (${stamp})`, `Old back box filled (${stamp})`];

  // First push: the server takes it and applies it, but its answer never reaches the phone; the page reloads.
  const pushes = await holdRequests(page, '**/api/sync/push', 'POST');
  pushes.next('forward');
  await visitPage.addNote(notes[0]!);
  await pushes.held;
  await visitPage.addNote(notes[1]!);
  await page.reload();
  for (const text of notes.slice(0, 2)) await expect(visitPage.trail.getByText(text)).toBeVisible();
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 30_000 });

  // Second push: held before it reaches the server, and the tab is closed under it.
  pushes.next('hold');
  await visitPage.addNote(notes[2]!);
  await pushes.held;
  const reopened = await reopen(context, page, visitId, title);

  for (const text of notes) await expect(reopened.trail.getByText(text)).toBeVisible();
  await expect(reopened.page.getByText('Up to date')).toBeVisible({ timeout: 30_000 });
  const rows = (await officeRows(request)).filter((c) => c.entity === 'note' && !c.deleted && notes.includes(c.row?.text as string));
  expect(rows.map((r) => r.row!.text).sort()).toEqual([...notes].sort());
  for (const r of rows) {
    expect(r.row).toMatchObject({ visitId });
    expect(writtenOnce(r)).toBe(true);
  }
});

async function photoOnServer(request: APIRequestContext, caption: string): Promise<{ row: Record<string, unknown>; original: Buffer }> {
  const { accessToken } = await apiSession(request, 'office@larkfield.example');
  const headers = { authorization: `Bearer ${accessToken}` };
  const page = (await (await request.get(`/api/photos?search=${encodeURIComponent(caption)}&pageSize=50`, { headers })).json()) as { items: Array<Record<string, unknown>> };
  expect(page.items).toHaveLength(1);
  const original = await request.get(`/api/photos/${page.items[0]!.id}/original`, { headers });
  expect(original.status()).toBe(200);
  return { row: page.items[0]!, original: await original.body() };
}

test('a photo survives a reload and a closed tab while its chunks are in flight, resumes, and arrives once with its own hash', async ({ page, context, request, technicianVisit: visitPage }) => {
  // A large photo is scaled in the browser on a small machine: give it time.
  test.setTimeout(180_000);
  const stamp = Date.now().toString(36);
  const title = `Photos of the consumer unit (${stamp})`;
  const caption = `Consumer unit before the new RCBO (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title });
  const visitId = await openOwnVisit(visitPage, title);

  // The first chunk reaches the server; its answer does not reach the phone, and the page reloads under it.
  const chunks = await holdRequests(page, '**/api/uploads/**', 'PATCH');
  chunks.next('forward');
  await page.getByLabel('Take or add photos').setInputFiles({ name: 'IMG_0301.jpg', mimeType: 'image/jpeg', buffer: await noisyPhoto() });
  const form = page.getByRole('dialog', { name: 'Add one photo' });
  await form.getByLabel('Caption').fill(caption);
  await form.getByRole('button', { name: 'Save photo' }).click();
  await expect(form).toBeHidden({ timeout: 90_000 });
  await chunks.held;
  // After the reload the upload carries on from the server's offset; that chunk is held and the tab closed.
  chunks.next('hold');
  await page.reload();
  await expect(visitPage.trailEntry(caption)).toContainText('Waiting');
  // Resumed, not started again: the first chunk is not sent twice.
  expect(await chunks.held).toBeGreaterThan(0);
  const reopened = await reopen(context, page, visitId, title);

  await expect(reopened.trailEntry(caption)).toContainText('On server', { timeout: 60_000 });
  await expect(reopened.page.getByText('Up to date')).toBeVisible({ timeout: 30_000 });
  const { row, original } = await photoOnServer(request, caption);
  expect(row).toMatchObject({ visitId, uploadState: 'ready', caption });
  expect(createHash('sha256').update(original).digest('hex')).toBe(row.sha256);
  expect(original.length).toBe(row.sizeBytes);
  const rows = (await officeRows(request)).filter((c) => c.entity === 'photo' && !c.deleted && c.row?.caption === caption);
  expect(rows).toHaveLength(1);
});
