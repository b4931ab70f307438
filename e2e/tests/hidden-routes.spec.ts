import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Locator, Page } from '@playwright/test';
import sharp from 'sharp';
import { cameraJpeg, exifToday } from '../camera-photos.js';
import { apiSession, bookVisit, DESK, expect, PHONE, ROLE_USERS, signedInAtDesk, test } from '../fixtures.js';
import { OfficeJobPage } from '../pages/office-job-page.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/** A finger on the photo: down, along and up, at fractions of the shown photo. */
async function stroke(page: Page, drawing: Locator, from: [number, number], to: [number, number]): Promise<void> {
  // Mid-screen, clear of the bar at the top and the navigation at the bottom.
  await drawing.evaluate((el) => el.scrollIntoView({ block: 'center', behavior: 'instant' }));
  // Measured once the page has stopped moving, so the finger lands where it is aimed.
  let box = (await drawing.boundingBox())!;
  await expect.poll(async () => {
    const now = (await drawing.boundingBox())!;
    const still = now.y === box.y && now.x === box.x;
    box = now;
    return still;
  }).toBe(true);
  const at = ([fx, fy]: [number, number]) => [box.x + fx * box.width, box.y + fy * box.height] as const;
  await page.mouse.move(...at(from));
  await page.mouse.down();
  await page.mouse.move(...at([(from[0] + to[0]) / 2, (from[1] + to[1]) / 2]), { steps: 4 });
  await page.mouse.move(...at(to), { steps: 4 });
  await page.mouse.up();
}
const tap = (page: Page, drawing: Locator, at: [number, number]) => stroke(page, drawing, at, at);

async function chooseOption(page: Page, label: string, option: string): Promise<void> {
  await page.getByRole('combobox', { name: label }).click();
  await page.getByRole('listbox').getByRole('option', { name: option }).click();
  // The list's backdrop takes taps until the list has gone.
  await expect(page.getByRole('listbox')).toBeHidden();
}

/** How many pixels of the image are close to a colour: a drawn route shows as its own colour. */
async function pixelsNear(png: Buffer, hex: string): Promise<number> {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
  const { data, info } = await sharp(png).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  let n = 0;
  for (let i = 0; i < info.width * info.height * 3; i += 3) if (Math.abs(data[i]! - r!) < 40 && Math.abs(data[i + 1]! - g!) < 40 && Math.abs(data[i + 2]! - b!) < 40) n++;
  return n;
}

test('offline on a phone, two routes drawn over a photographed chase reach the office’s site map and print over the photo on the hidden routes record', async ({
  page,
  context,
  request,
  browser,
  technicianVisit: visitPage,
}, testInfo) => {
  test.setTimeout(300_000);
  const stamp = Date.now().toString(36);
  const title = `Chase the kitchen wall for two data points (${stamp})`;
  const caption = `Open chase before plastering (${stamp})`;
  const wall = `Chase wall by the back door (${stamp})`;
  const { jobId } = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 10, endHour: 12 });

  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });
  await card.getByRole('link', { name: /^Open / }).click();
  await visitPage.expectVisit(title);
  await visitPage.goOffline(context);

  // The open chase photographed: a wall with a back box and a cable dropping to it (camera-photos.ts draws them).
  await page.getByLabel('Take or add photos').setInputFiles([{ name: 'IMG_4410.jpg', mimeType: 'image/jpeg', buffer: await cameraJpeg('Chase', '#8c8275', exifToday(10, 5)) }]);
  const form = visitPage.photoForm;
  await expect(form.getByRole('img', { name: 'The photo' })).toBeVisible({ timeout: 60_000 });
  await form.getByLabel('Caption').fill(caption);
  await form.getByRole('button', { name: /^Save/ }).click();
  await expect(form).toBeHidden({ timeout: 60_000 });

  await visitPage.trail.getByRole('button', { name: `Open photo: ${caption}` }).click();
  await page.getByRole('dialog').getByRole('link', { name: 'Mark cable routes' }).click();
  const drawing = page.getByRole('img', { name: /drawn$/ });
  await expect(drawing).toBeVisible();

  // Route 1 down the drawn cable to the top of the back box; a little off plumb, as a finger is.
  await stroke(page, drawing, [0.5, 0.07], [0.51, 0.4]);
  await page.getByRole('button', { name: 'Finish route' }).click();
  await chooseOption(page, 'Cable or circuit', 'Cable OR-01');
  await page.getByLabel('Depth below the surface (mm)').fill('30');
  await page.getByRole('button', { name: 'Add route' }).click();
  // Route 2 along the top of the wall, then down the left-hand corner: two strokes, one corner.
  await stroke(page, drawing, [0.9, 0.05], [0.08, 0.06]);
  await stroke(page, drawing, [0.08, 0.06], [0.09, 0.7]);
  await page.getByRole('button', { name: 'Finish route' }).click();
  await chooseOption(page, 'Cable or circuit', 'Cable OR-02');
  await page.getByLabel('Depth below the surface (mm)').fill('20');
  await page.getByRole('button', { name: 'Add route' }).click();
  const legend = page.getByRole('list', { name: 'Routes on this photo' });
  await expect(legend.getByText('Route 1: Cable OR-01')).toBeVisible();
  await expect(legend.getByText('Route 2: Cable OR-02')).toBeVisible();

  // The datums: 1200 mm from the left-hand corner to the drop, and 1100 mm up from the floor to the top of the box.
  await page.getByRole('button', { name: 'Measure' }).click();
  await tap(page, drawing, [0.02, 0.5]);
  await tap(page, drawing, [0.5, 0.5]);
  await page.getByLabel('Distance (mm)').fill('1200');
  await page.getByRole('button', { name: 'Add distance' }).click();
  await chooseOption(page, 'Measured from', 'Floor');
  // The first tap after the list closes can land before the page takes taps again: tapped until the photo shows it.
  await expect(async () => {
    await tap(page, drawing, [0.5, 0.98]);
    await expect(page.getByText('Now tap the point you measured to: the cable, or the edge of a box.')).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  await tap(page, drawing, [0.5, 0.4]);
  await page.getByLabel('Distance (mm)').fill('1100');
  await page.getByRole('button', { name: 'Add distance' }).click();
  await expect(page.getByRole('list', { name: 'Distances measured' }).getByText('1100 mm from the floor')).toBeVisible();
  await page.getByLabel('Which wall').fill(wall);
  await page.getByLabel('Wall width (mm)').fill('2500');
  await page.getByLabel('Wall height (mm)').fill('1900');
  // A typing slip is refused as the server would.
  await page.getByLabel('Wall thickness (mm)').fill('5');
  await expect(page.getByText(/Wall thickness \(mm\) must be at least 25/)).toBeVisible();
  await page.getByLabel('Wall thickness (mm)').fill('100');
  await page.getByRole('button', { name: 'Save routes' }).click();
  await expect(page.getByText(/Routes saved on this phone/)).toBeVisible();
  await expect(legend.getByRole('button', { name: /Safe zones, route 1/ })).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('phone-routes-drawn.png'), fullPage: true });

  // The site's map on the phone, with no signal.
  await page.getByRole('link', { name: 'Hidden routes on this site' }).click();
  const onPhone = page.getByRole('region', { name: new RegExp(wall.replace(/[()]/g, '.')) });
  await expect(onPhone.getByRole('article', { name: caption })).toContainText('Cable OR-01');
  await expect(onPhone.getByRole('article', { name: caption })).toContainText('Cable OR-02');
  await chooseOption(page, 'Show', 'Only Cable OR-02');
  await expect(onPhone.getByRole('article', { name: caption })).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('phone-site-map.png'), fullPage: true });
  // No sideways scroll at phone size.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);

  // Drilling check on the photo: tapped right beside the drop.
  await onPhone.getByRole('link', { name: 'Open and check a drilling point' }).first().click();
  await page.getByRole('button', { name: 'Drilling check' }).click();
  await tap(page, page.getByRole('img', { name: /drawn$/ }), [0.52, 0.3]);
  await expect(page.getByRole('button', { name: /Drilling check: Fail/ })).toBeVisible();
  await expect(page.getByText(/cable detector and isolate safely before drilling/)).toBeVisible();
  await page.getByRole('link', { name: 'Hidden routes', exact: true }).click();
  await page.getByRole('link', { name: 'Trail', exact: true }).click();

  // Finished on site, then back in signal: everything goes to the office.
  await visitPage.section('Sign-off');
  await page.getByLabel('Work done and its extent').fill('Two Cat6 runs chased in and marked on the photo before plastering.');
  await visitPage.sign();
  await page.getByRole('button', { name: 'Finish visit' }).click();
  const asked = page.getByRole('dialog', { name: /^Finish with/ });
  const signed = page.getByText(/Signed off .* by Sam Brannigan/);
  await expect(signed.or(asked)).toBeVisible();
  if (await asked.isVisible()) await asked.getByRole('button', { name: 'Finish anyway' }).click();
  await expect(signed).toBeVisible();
  await context.setOffline(false);
  await visitPage.section('Trail');
  await expect(visitPage.trailEntry(caption)).toContainText('On server', { timeout: 90_000 });
  await visitPage.openSync();
  await expect(page.getByText('Nothing waiting')).toBeVisible({ timeout: 60_000 });

  // The office sees the routes on the site's map, then issues the record from the job.
  const { accessToken } = await apiSession(request, 'office@larkfield.example');
  const headers = { authorization: `Bearer ${accessToken}` };
  const { siteId } = (await (await request.get(`/api/jobs/${jobId}`, { headers })).json()) as { siteId: string };
  const desk = await signedInAtDesk(browser, 'office');
  try {
    await desk.page.setViewportSize(DESK);
    await desk.page.goto(`/sites/${siteId}/hidden-routes`);
    const atDesk = desk.page.getByRole('region', { name: new RegExp(wall.replace(/[()]/g, '.')) });
    const marked = atDesk.getByRole('article', { name: caption });
    await expect(marked).toContainText('Cable OR-01', { timeout: 20_000 });
    await expect(marked).toContainText('Cable OR-02');
    await expect.poll(() => marked.getByRole('img', { name: caption, exact: true }).evaluate((el) => (el as HTMLImageElement).naturalWidth), { timeout: 20_000 }).toBeGreaterThan(0);
    await desk.page.screenshot({ path: testInfo.outputPath('desk-site-map.png'), fullPage: true });

    const job = new OfficeJobPage(desk.page);
    await desk.page.goto(`/jobs/${jobId}`);
    await job.expectJob(title);
    // The job's photo trail draws the same routes over the photo in its viewer.
    await job.tab('Photo trail');
    await desk.page.getByRole('button', { name: `Open photo: ${caption}` }).click();
    const viewer = desk.page.getByRole('dialog', { name: caption });
    await expect(viewer.getByRole('img', { name: `${caption}: 2 cable routes drawn over it` })).toBeVisible({ timeout: 20_000 });
    await desk.page.screenshot({ path: testInfo.outputPath('desk-photo-viewer.png') });
    await viewer.getByRole('button', { name: 'Close' }).click();
    await expect(viewer).toHaveCount(0);
    await job.issueHiddenRoutesRecord();
    const row = job.documentRow('Hidden routes record');
    await expect(row).toBeVisible({ timeout: 30_000 });
    const number = (await row.getByRole('cell').first().innerText()).trim();
    expect(number).toMatch(/^HR-\d{4}$/);

    // The PDF, rendered to PNG with Debian's pdftoppm: the routes' colours lie over the photo's page.
    const docs = (await (await request.get(`/api/jobs/${jobId}/documents`, { headers })).json()) as { items: Array<{ id: string; number: string }> };
    const doc = docs.items.find((d) => d.number === number)!;
    const pdf = Buffer.from(await (await request.get(`/api/documents/${doc.id}/pdf`, { headers })).body());
    const dir = mkdtempSync(join(tmpdir(), 'hidden-routes-'));
    writeFileSync(join(dir, 'record.pdf'), pdf);
    execFileSync('pdftoppm', ['-png', '-r', '90', join(dir, 'record.pdf'), join(dir, 'page')]);
    const pages = readdirSync(dir).filter((f) => f.endsWith('.png')).sort();
    expect(pages.length).toBeGreaterThan(0);
    const counts = await Promise.all(
      pages.map(async (f) => {
        const png = await sharp(join(dir, f)).toBuffer();
        // Kept beside the run's screenshots, to be looked at.
        writeFileSync(testInfo.outputPath(`record-${f}`), png);
        // Route 1 is drawn in #d81b60, route 2 in #1565c0 (core's ROUTE_COLOURS).
        return [await pixelsNear(png, '#d81b60'), await pixelsNear(png, '#1565c0')] as const;
      }),
    );
    expect(counts.some(([one, two]) => one > 200 && two > 200)).toBe(true);
  } finally {
    await desk.context.close();
  }
});
