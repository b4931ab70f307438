import type { Locator } from '@playwright/test';
import { bookVisit, expect, PHONE, ROLE_USERS, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/** How much of the signature box has ink on it: zero for an empty box. */
const inkIn = (canvas: Locator) =>
  canvas.evaluate((el) => {
    const c = el as HTMLCanvasElement;
    const pixels = c.getContext('2d')!.getImageData(0, 0, c.width, c.height).data;
    let ink = 0;
    for (let i = 3; i < pixels.length; i += 4) if (pixels[i]! > 0) ink++;
    return ink;
  });

/**
 * What a technician types on the phone is kept on the phone as it is typed: a half-written cable and a half-written
 * sign-off, signature included, come back after another section, a reload and a closed tab, with no signal all along.
 */
test('half-typed forms survive a section switch, a reload and a closed tab, offline', async ({ page, context, request, technicianVisit: visitPage }) => {
  test.setTimeout(120_000);
  const stamp = Date.now().toString(36);
  const title = `Drafts kept (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 0, endHour: 23 });
  await visitPage.openToday();
  await visitPage.waitForServiceWorker();
  await visitPage.openFromToday(title);
  const visitUrl = page.url();
  await visitPage.goOffline(context);

  // A cable begun and left for another section.
  await visitPage.section('Cables');
  await page.getByRole('link', { name: 'Record a cable' }).click();
  const cable = page.getByRole('form', { name: 'Record a cable' });
  await cable.getByLabel('Label').fill(`RC-${stamp}`);
  await cable.getByLabel('End A description').fill('Patch panel port 7');
  await page.goBack();
  await visitPage.section('Trail');
  await visitPage.section('Cables');
  await page.getByRole('link', { name: 'Record a cable' }).click();
  await expect(cable.getByLabel('Label')).toHaveValue(`RC-${stamp}`);
  await expect(cable.getByLabel('End A description')).toHaveValue('Patch panel port 7');
  await expect(cable.getByText('Back where you left off')).toBeVisible();
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/cable-draft-restored.png` });

  // A sign-off half written and signed, then another section.
  await page.goto(visitUrl);
  await visitPage.section('Sign-off');
  const signOff = page.getByRole('form', { name: 'Sign off' });
  await signOff.getByLabel('Work done and its extent').fill(`Moved the hall socket 300 mm left (${stamp})`);
  await signOff.getByLabel('Observations').fill('Loose cover on the landing light.');
  await visitPage.sign();
  const box = page.getByLabel('Signature box: sign with your finger');
  expect(await inkIn(box)).toBeGreaterThan(0);
  await visitPage.section('Circuits & tests');
  await visitPage.section('Sign-off');
  await expect(signOff.getByLabel('Work done and its extent')).toHaveValue(`Moved the hall socket 300 mm left (${stamp})`);
  await expect(signOff.getByLabel('Observations')).toHaveValue('Loose cover on the landing light.');
  await expect.poll(() => inkIn(box)).toBeGreaterThan(0);

  // A reload, still with no signal.
  await page.reload();
  await expect(signOff.getByLabel('Work done and its extent')).toHaveValue(`Moved the hall socket 300 mm left (${stamp})`);
  await expect.poll(() => inkIn(box)).toBeGreaterThan(0);

  // The tab closed and the visit opened again in a new one.
  await page.close();
  const again = await context.newPage();
  await again.goto(visitUrl);
  await again.getByRole('tab', { name: 'Sign-off' }).click();
  await expect(again.getByRole('form', { name: 'Sign off' }).getByLabel('Observations')).toHaveValue('Loose cover on the landing light.');
  await again.getByRole('tab', { name: 'Cables' }).click();
  await again.getByRole('link', { name: 'Record a cable' }).click();
  await expect(again.getByRole('form', { name: 'Record a cable' }).getByLabel('Label')).toHaveValue(`RC-${stamp}`);

  // Thrown away on purpose: the form is empty again and stays so.
  await again.getByRole('button', { name: 'Discard' }).click();
  await expect(again.getByRole('form', { name: 'Record a cable' }).getByLabel('Label')).toHaveValue('');
  await again.reload();
  await expect(again.getByRole('form', { name: 'Record a cable' }).getByLabel('Label')).toHaveValue('');
});
