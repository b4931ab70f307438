import type { Locator, Page } from '@playwright/test';
import { cameraJpeg, exifToday } from '../camera-photos.js';
import { expect, PHONE, signedInAtDesk, test, waitForServiceWorker } from '../fixtures.js';

test.use({ viewport: PHONE });

/** The image has been decoded and drawn (not a broken or empty picture). */
async function expectDrawn(img: Locator): Promise<void> {
  await expect(img).toBeVisible();
  await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth > 0)).toBe(true);
}

function trailPhoto(page: Page, caption: string): Locator {
  return page.getByRole('list', { name: 'Trail of this visit' }).getByRole('listitem').filter({ hasText: caption });
}

test('a technician adds photos with no signal; they upload once online, and the office sees them in the job’s photo trail', async ({
  page,
  context,
  signInPage,
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

  await signInPage.goto();
  await signInPage.signIn('tech1@larkfield.example');
  await expect(page.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
  await waitForServiceWorker(page);
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });
  await page.getByRole('region', { name: 'My visits' }).getByRole('link', { name: /Move two lounge sockets/ }).click();
  await expect(page.getByRole('heading', { level: 1, name: /Move two lounge sockets/ })).toBeVisible();
  await expect(page.getByRole('heading', { level: 2, name: 'Trail' })).toBeVisible();

  await context.setOffline(true);
  await expect(page.getByText('No signal — saving on this phone')).toBeVisible();

  await page.getByLabel('Take or add photos').setInputFiles(files);
  const form = page.getByRole('form', { name: 'Photo details' });
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
    await expect(trailPhoto(page, p.caption)).toContainText('Waiting');
    await expect(trailPhoto(page, p.caption)).toContainText('Lounge');
    await expect(trailPhoto(page, p.caption)).toContainText('route');
    await expectDrawn(trailPhoto(page, p.caption).getByRole('img', { name: p.caption }));
  }
  await expect(page.getByText('No signal — saving on this phone · 3 waiting')).toBeVisible();

  // Reloaded with no network: the photos, their thumbnails and their state come from the phone.
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: /Move two lounge sockets/ })).toBeVisible();
  for (const p of photos) {
    await expect(trailPhoto(page, p.caption)).toContainText('Waiting');
    await expectDrawn(trailPhoto(page, p.caption).getByRole('img', { name: p.caption }));
  }
  await page.screenshot({ path: testInfo.outputPath('phone-trail-offline.png'), fullPage: true });

  await context.setOffline(false);
  for (const p of photos) await expect(trailPhoto(page, p.caption)).toContainText('On server', { timeout: 45_000 });
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });
  await page.screenshot({ path: testInfo.outputPath('phone-trail-online.png'), fullPage: true });
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sync' }).click();
  const photoPanel = page.getByRole('region', { name: 'Photos' });
  await expect(photoPanel.getByText('No photos waiting')).toBeVisible();
  await expect(photoPanel.getByText(/3 photos · [\d.]+ MB/)).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('phone-sync.png'), fullPage: true });

  // At the desk: the job's photo trail, in the order the photos were taken.
  const { context: desk, page: office } = await signedInAtDesk(browser, 'office@larkfield.example');
  try {
    await office.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs' }).click();
    const card = office.getByRole('region', { name: 'Booked' }).getByRole('article', { name: /LED-0041/ });
    await expect(card).toContainText('Orchard Rise');
    await office.screenshot({ path: testInfo.outputPath('office-jobs.png') });
    await card.getByRole('link', { name: /Move two lounge sockets/ }).click();
    await expect(office.getByRole('heading', { level: 1, name: /Move two lounge sockets/ })).toBeVisible();
    await office.getByRole('tab', { name: 'Photo trail' }).click();
    const trail = office.getByRole('region', { name: 'Photo trail' });
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
