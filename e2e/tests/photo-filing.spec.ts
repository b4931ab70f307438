import type { ConsoleMessage, Page } from '@playwright/test';
import { cameraJpeg, exifToday } from '../camera-photos.js';
import { apiSession, bookVisit, expect, PHONE, ROLE_USERS, signedInAtDesk, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/** Watches the page for the content security policy refusing anything, and for the photo worker starting. */
function watchPolicy(page: Page) {
  const refused: string[] = [];
  const workers: string[] = [];
  page.on('console', (m: ConsoleMessage) => {
    if (/Content Security Policy|Refused to (create|load|execute)/i.test(m.text())) refused.push(m.text());
  });
  page.on('worker', (w) => workers.push(w.url()));
  return { refused, workers };
}

test('three photos added together are filed each to its own area, one is re-captioned from the trail, and the desk shows it all', async ({
  page,
  context,
  request,
  browser,
  technicianVisit: visitPage,
}, testInfo) => {
  test.setTimeout(180_000);
  const stamp = Date.now().toString(36);
  const title = `Photograph the kitchen, hall and bedroom sockets (${stamp})`;
  const { jobId } = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 10, endHour: 12 });
  const policy = watchPolicy(page);
  const photos = [
    { caption: `Kitchen socket behind the fridge (${stamp})`, area: 'Kitchen', wall: '#6b7f5a', taken: exifToday(9, 10) },
    { caption: `Cupboard under the stairs, meter tails (${stamp})`, area: 'Cupboard under stairs', wall: '#7a5c4a', taken: exifToday(9, 20) },
    { caption: `Front bedroom socket before moving (${stamp})`, area: 'Front bedroom', wall: '#4f6a7a', taken: exifToday(9, 30) },
  ];
  const files = await Promise.all(photos.map(async (p, i) => ({ name: `IMG_31${i}.jpg`, mimeType: 'image/jpeg', buffer: await cameraJpeg(`Photo ${i + 1}`, p.wall, p.taken) })));

  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });
  await card.getByRole('link', { name: /^Open / }).click();
  await visitPage.expectVisit(title);
  await visitPage.goOffline(context);

  await page.getByLabel('Take or add photos').setInputFiles(files);
  const form = visitPage.photoForm;
  await expect(form.getByRole('heading', { name: '3 photos' })).toBeVisible();
  // Each photo's own thumbnail appears as the worker makes it ready, while the form is being filled in.
  for (const i of [1, 2, 3]) await expect(form.getByRole('img', { name: `Photo ${i}` })).toBeVisible({ timeout: 60_000 });
  for (const [i, p] of photos.entries()) {
    await form.getByLabel(`Caption for photo ${i + 1}`).fill(p.caption);
    if (i === 0) continue;
    await form.getByRole('button', { name: `File photo ${i + 1} on its own` }).click();
    await form.getByLabel(`Area of photo ${i + 1}`).selectOption({ label: p.area });
  }
  // The first follows the filing for the others.
  await form.getByLabel('Area', { exact: true }).selectOption({ label: photos[0]!.area });
  await form.getByRole('group', { name: 'Tags of photo 3' }).getByRole('button', { name: 'defect' }).click();
  await page.screenshot({ path: testInfo.outputPath('phone-photos-filed-each.png'), fullPage: true });
  await form.getByRole('button', { name: 'Save 3 photos' }).click();
  await expect(form).toBeHidden({ timeout: 60_000 });
  await expect(page.getByText('3 photos saved on this phone.')).toBeVisible();
  for (const p of photos) await expect(visitPage.trailEntry(p.caption)).toContainText(p.area);
  await expect(visitPage.trailEntry(photos[2]!.caption)).toContainText('defect');

  // The photos were made ready in the app's own worker, which the content security policy let start.
  expect(policy.workers.some((url) => /\/assets\/shrink-worker-[\w-]+\.js$/.test(url))).toBe(true);
  expect(policy.refused).toEqual([]);

  // Opened from the trail, enlarged, stepped through, and re-captioned with no signal.
  await visitPage.trail.getByRole('button', { name: `Open photo: ${photos[1]!.caption}` }).click();
  const viewer = page.getByRole('dialog', { name: 'Photo 2 of 3' });
  await expect(viewer).toBeVisible();
  await expect.poll(() => viewer.getByRole('img', { name: photos[1]!.caption }).evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBe(2560);
  await page.keyboard.press('ArrowRight');
  await expect(page.getByRole('dialog', { name: 'Photo 3 of 3' })).toBeVisible();
  await page.getByRole('dialog').getByRole('button', { name: 'Previous photo' }).click();
  await expect(viewer).toBeVisible();
  const newCaption = `Meter tails and main switch, labelled (${stamp})`;
  const filing = viewer.getByRole('form', { name: 'Caption and filing' });
  await filing.getByLabel('Caption').fill(newCaption);
  await filing.getByRole('button', { name: 'label' }).click();
  await filing.getByRole('button', { name: 'Save changes' }).click();
  await expect(filing.getByText(/Changes saved on this phone/)).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('phone-photo-viewer.png'), fullPage: true });
  await viewer.getByRole('button', { name: 'Back to the trail' }).click();
  await expect(visitPage.trailEntry(newCaption)).toContainText('label');

  await context.setOffline(false);
  for (const caption of [photos[0]!.caption, newCaption, photos[2]!.caption]) await expect(visitPage.trailEntry(caption)).toContainText('On server', { timeout: 60_000 });
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });

  const { context: desk, page: office } = await signedInAtDesk(browser, 'office');
  try {
    await office.goto(`/jobs/${jobId}`);
    await office.getByRole('tab', { name: 'Photo trail' }).click();
    const trail = office.getByRole('region', { name: 'Photo trail' });
    await expect(trail.getByRole('list', { name: /^Kitchen .*photos$/ })).toContainText(photos[0]!.caption);
    await expect(trail.getByRole('list', { name: /^Cupboard under stairs .*photos$/ })).toContainText(newCaption);
    await expect(trail.getByRole('list', { name: /^Front bedroom .*photos$/ })).toContainText(photos[2]!.caption);
    await expect(trail).not.toContainText(photos[1]!.caption);
    await office.screenshot({ path: testInfo.outputPath('office-trail-filed.png'), fullPage: true });
  } finally {
    await desk.close();
  }
});

test('a photo the office system refused is taken again from the trail and reaches the office', async ({ page, request, technicianVisit: visitPage }, testInfo) => {
  test.setTimeout(120_000);
  const stamp = Date.now().toString(36);
  const title = `Photograph the consumer unit (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 10, endHour: 12 });
  const caption = `Consumer unit, cover off (${stamp})`;
  const refusal = 'This photo could not be read: its contents are not an image.';
  // The first upload of this photo is refused as the server refuses a photo it cannot read; the retake is not.
  let refusedOnce = false;
  await page.route('**/api/uploads', async (route) => {
    if (refusedOnce || route.request().method() !== 'POST') return route.fallback();
    refusedOnce = true;
    await route.fulfill({ status: 422, contentType: 'application/json', body: JSON.stringify({ statusCode: 422, message: refusal, error: 'Unprocessable Entity' }) });
  });

  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });
  await card.getByRole('link', { name: /^Open / }).click();
  await visitPage.expectVisit(title);
  await page.getByLabel('Take or add photos').setInputFiles({ name: 'IMG_0401.jpg', mimeType: 'image/jpeg', buffer: await cameraJpeg('Photo 1', '#5a5a5a', exifToday(9, 0)) });
  await visitPage.photoForm.getByLabel('Caption').fill(caption);
  await visitPage.photoForm.getByLabel('Area').selectOption({ label: 'Cupboard under stairs' });
  await visitPage.photoForm.getByRole('button', { name: 'Save photo' }).click();
  await expect(visitPage.trailEntry(caption)).toContainText(`Refused: ${refusal}`, { timeout: 60_000 });

  await visitPage.trail.getByRole('button', { name: `Open photo: ${caption}` }).click();
  const viewer = page.getByRole('dialog', { name: 'Photo 1 of 1' });
  const notAccepted = viewer.getByRole('group', { name: 'Photo not accepted' });
  await expect(notAccepted).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('phone-photo-refused.png'), fullPage: true });
  await notAccepted.getByLabel('Retake photo').setInputFiles({ name: 'IMG_0402.jpg', mimeType: 'image/jpeg', buffer: await cameraJpeg('Photo 1 again', '#6a6a6a', exifToday(9, 5)) });
  await expect(notAccepted).toBeHidden({ timeout: 60_000 });
  await viewer.getByRole('button', { name: 'Back to the trail' }).click();
  // One photo in the trail, with the caption and area kept, and this time the office has it.
  await expect(visitPage.trail.getByRole('button', { name: /^Open photo:/ })).toHaveCount(1);
  await expect(visitPage.trailEntry(caption)).toContainText('Cupboard under stairs');
  await expect(visitPage.trailEntry(caption)).toContainText('On server', { timeout: 60_000 });
  const { accessToken } = await apiSession(request, ROLE_USERS.office);
  const listed = await request.get(`/api/photos?search=${encodeURIComponent(stamp)}&pageSize=10`, { headers: { authorization: `Bearer ${accessToken}` } });
  const { items } = (await listed.json()) as { items: { caption: string; uploadState: string }[] };
  expect(items).toEqual([expect.objectContaining({ caption, uploadState: 'ready' })]);
});
