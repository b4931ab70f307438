import type { Locator } from '@playwright/test';
import { cameraJpeg, exifToday } from '../camera-photos.js';
import { expect, PHONE, signedInAtDesk, test } from '../fixtures.js';
import { OfficeJobPage } from '../pages/office-job-page.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/** The image has been decoded and drawn (not a broken or empty picture). */
async function expectDrawn(img: Locator): Promise<void> {
  await expect(img).toBeVisible();
  await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth > 0)).toBe(true);
}

test('a technician adds photos with no signal; they upload once online, and the office sees them in the job’s photo trail', async ({
  page,
  context,
  technicianVisit: visitPage,
  browser,
}, testInfo) => {
  // Three camera-sized photos are scaled in the browser on a small machine: give it time.
  test.setTimeout(180_000);
  const stamp = Date.now().toString(36);
  // Chosen out of time order: the office must see them by when they were taken.
  const photos = [
    { caption: `Chase to the new socket position (${stamp})`, wall: '#6b7f5a', taken: exifToday(9, 20), orientation: 1 },
    { caption: `Back box before boxing in (${stamp})`, wall: '#7a5c4a', taken: exifToday(9, 10), orientation: 6 },
    { caption: `Finished double socket (${stamp})`, wall: '#4f6a7a', taken: exifToday(9, 30), orientation: 1 },
  ];
  const inTimeOrder = [photos[1]!, photos[0]!, photos[2]!];
  const files = await Promise.all(
    photos.map(async (p, i) => ({ name: `IMG_20${i}.jpg`, mimeType: 'image/jpeg', buffer: await cameraJpeg(`Photo ${i + 1}`, p.wall, p.taken, p.orientation) })),
  );

  await visitPage.openToday();
  await visitPage.openFromToday(/Move two lounge sockets/);
  await expect(page.getByRole('heading', { level: 2, name: 'Trail' })).toBeVisible();

  await visitPage.goOffline(context);

  await page.getByLabel('Take or add photos').setInputFiles(files);
  const form = visitPage.photoForm;
  await expect(form.getByRole('heading', { name: '3 photos' })).toBeVisible();
  for (const [i, p] of photos.entries()) await form.getByLabel(`Caption for photo ${i + 1}`).fill(p.caption);
  await form.getByLabel('Area').selectOption({ label: 'Lounge' });
  await form.getByLabel('Shows').selectOption({ label: 'Circuit 1 · Sockets, ground floor' });
  await form.getByRole('button', { name: 'route' }).click();
  await expect(form.getByRole('button', { name: 'route' })).toHaveAttribute('aria-pressed', 'true');
  await page.screenshot({ path: testInfo.outputPath('phone-photo-details.png') });
  await form.getByRole('button', { name: 'Save 3 photos' }).click();
  // Three camera-sized photos are scaled in the browser; on a busy two-core machine that can take a while.
  await expect(form).toBeHidden({ timeout: 90_000 });
  await expect(page.getByText('3 photos saved on this phone.')).toBeVisible();

  for (const p of photos) {
    await expect(visitPage.trailEntry(p.caption)).toContainText('Waiting');
    await expect(visitPage.trailEntry(p.caption)).toContainText('Lounge');
    await expect(visitPage.trailEntry(p.caption)).toContainText('route');
    await expectDrawn(visitPage.trailEntry(p.caption).getByRole('img', { name: p.caption }));
  }
  await expect(page.getByText('No signal — saving on this phone · 3 waiting')).toBeVisible();

  // Reloaded with no network: the photos, their thumbnails and their state come from the phone.
  await page.reload();
  await visitPage.expectVisit(/Move two lounge sockets/);
  for (const p of photos) {
    await expect(visitPage.trailEntry(p.caption)).toContainText('Waiting');
    await expectDrawn(visitPage.trailEntry(p.caption).getByRole('img', { name: p.caption }));
  }
  await page.screenshot({ path: testInfo.outputPath('phone-trail-offline.png'), fullPage: true });

  await context.setOffline(false);
  for (const p of photos) await expect(visitPage.trailEntry(p.caption)).toContainText('On server', { timeout: 45_000 });
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });
  await page.screenshot({ path: testInfo.outputPath('phone-trail-online.png'), fullPage: true });
  await visitPage.openSync();
  const photoPanel = page.getByRole('region', { name: 'Photos' });
  await expect(photoPanel.getByText('No photos waiting')).toBeVisible();
  await expect(photoPanel.getByText(/3 photos · [\d.]+ MB/)).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('phone-sync.png'), fullPage: true });

  // At the desk: the job's photo trail, in the order the photos were taken.
  const { context: desk, page: office } = await signedInAtDesk(browser, 'office');
  try {
    const job = new OfficeJobPage(office);
    await job.openBoard();
    const card = job.boardCard('Booked', /LED-0041/);
    await expect(card).toContainText('Orchard Rise');
    await office.screenshot({ path: testInfo.outputPath('office-jobs.png') });
    await job.openFromCard(card, /Move two lounge sockets/);
    await job.tab('Photo trail');
    const trail = job.photoTrail;
    // Only this run's photos (the server may be reused between runs).
    const tiles = trail.getByRole('listitem').filter({ hasText: stamp });
    await expect(tiles).toHaveCount(3);
    const captions = await tiles.allInnerTexts();
    expect(captions.map((text) => inTimeOrder.findIndex((p) => text.includes(p.caption)))).toEqual([0, 1, 2]);
    for (const p of inTimeOrder) await expectDrawn(trail.getByRole('img', { name: p.caption }));
    await office.screenshot({ path: testInfo.outputPath('office-trail.png'), fullPage: true });

    // The photo turned on its side in the camera arrives upright, scaled to a 2560 px long edge.
    const res = await office.evaluate(async () => {
      const session = JSON.parse(localStorage.getItem('wiretrail.session') ?? '{}') as { accessToken?: string };
      const r = await fetch(`/api/photos?search=${encodeURIComponent('Back box before boxing in')}&pageSize=50`, { headers: { authorization: `Bearer ${session.accessToken}` } });
      return (await r.json()) as { items: { caption: string; width: number; height: number; uploadState: string }[] };
    });
    const upright = res.items.find((p) => p.caption === photos[1]!.caption)!;
    expect(upright).toMatchObject({ width: 1920, height: 2560, uploadState: 'ready' });

    await trail.getByRole('button', { name: `Open photo: ${inTimeOrder[0]!.caption}` }).click();
    const viewer = office.getByRole('dialog', { name: inTimeOrder[0]!.caption });
    await expect(viewer).toBeVisible();
    await expectDrawn(viewer.getByRole('img', { name: inTimeOrder[0]!.caption }));
    await expect(viewer.getByText('1 of 3')).toBeVisible();
    await expect(viewer.getByRole('button', { name: 'Download original' })).toBeVisible();
    await office.screenshot({ path: testInfo.outputPath('office-viewer-upright.png') });
    await office.keyboard.press('ArrowRight');
    await expect(office.getByRole('dialog', { name: inTimeOrder[1]!.caption })).toBeVisible();
    await expectDrawn(office.getByRole('dialog').getByRole('img', { name: inTimeOrder[1]!.caption }));
    await office.screenshot({ path: testInfo.outputPath('office-viewer.png') });
    const download = office.waitForEvent('download');
    await office.getByRole('button', { name: 'Download original' }).click();
    expect((await download).suggestedFilename()).toMatch(/^LED-0041-.*\.jpg$/);
    await office.keyboard.press('Escape');
    await expect(office.getByRole('dialog')).toBeHidden();

    // The circuit they show has them on its own row.
    await office.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Customers & sites' }).click();
    await office.getByRole('grid', { name: 'Sites' }).getByRole('link', { name: 'Orchard Rise' }).click();
    const circuitRow = office.getByRole('table', { name: 'Circuits' }).getByRole('row', { name: /Sockets, ground floor/ });
    await expect(circuitRow).toContainText(/\d+ photos/);
    await expectDrawn(circuitRow.getByRole('img').first());
    await office.screenshot({ path: testInfo.outputPath('office-site-circuits.png'), fullPage: true });
  } finally {
    await desk.close();
  }
});
