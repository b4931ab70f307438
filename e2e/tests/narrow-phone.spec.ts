import type { Locator, Page } from '@playwright/test';
import { apiSession, bookVisit, expect, ROLE_USERS, test } from '../fixtures.js';

/** The narrowest phone we build for. */
const NARROW = { width: 360, height: 780 };

test.use({ viewport: NARROW, signedInAs: 'technician' });

/** Nothing on the page is wider than the screen. */
async function expectNoSidewaysScroll(page: Page): Promise<void> {
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(NARROW.width);
}

/** The element lies wholly on the screen, left to right. */
async function expectAcrossTheScreen(el: Locator): Promise<void> {
  const box = await el.boundingBox();
  expect(box).not.toBeNull();
  expect(box!.x).toBeGreaterThanOrEqual(0);
  expect(box!.x + box!.width).toBeLessThanOrEqual(NARROW.width);
}

test('a visit booked for tomorrow asks before arrival, and an arrival can be taken back', async ({ request, page, technicianVisit: visitPage }) => {
  const stamp = Date.now().toString(36);
  const title = `Tomorrow's socket (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 9, endHour: 11, dayOffset: 1 });
  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });

  await card.getByRole('button', { name: 'I’m on site' }).click();
  const ask = page.getByRole('dialog', { name: 'On site for a visit booked tomorrow?' });
  await expect(ask).toContainText('is booked for Tomorrow, 09:00–11:00');
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/arrive-tomorrow.png` });
  await ask.getByRole('button', { name: 'Not yet' }).click();
  await expect(ask).toBeHidden();
  await expect(card.getByText('Planned')).toBeVisible();

  await card.getByRole('button', { name: 'I’m on site' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'I’m on site now' }).click();
  await expect(card.getByText('On site')).toBeVisible();
  await expect(card.getByRole('link', { name: 'Open visit' })).toBeVisible();
  await expect(page.getByText(/^Arrival recorded at \d\d:\d\d\.$/)).toBeVisible();
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/arrived-undo.png` });
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(card.getByText('Planned')).toBeVisible();
  await expect(card.getByRole('button', { name: 'I’m on site' })).toBeVisible();
  await expectNoSidewaysScroll(page);
});

test('at 360 px every section tab shows, Sign-off included, and the pin buttons keep their colour names inside them', async ({ request, page, technicianVisit: visitPage }) => {
  const stamp = Date.now().toString(36);
  const title = `Narrow phone patch (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 0, endHour: 23 });
  await visitPage.openToday();
  await visitPage.openFromToday(title);

  const tabs = page.getByRole('tablist', { name: 'Parts of this visit' });
  for (const name of ['Trail', 'Cables', 'Points', 'Circuits & tests', 'Sign-off']) await expectAcrossTheScreen(tabs.getByRole('tab', { name }));
  // No scroll arrows: the tabs fit.
  expect(await tabs.evaluate((el) => el.querySelectorAll('.MuiTabs-scrollButtons').length)).toBe(0);
  await visitPage.section('Sign-off');
  await expect(page.getByRole('tab', { name: 'Sign-off', selected: true })).toBeVisible();
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/tabs-360.png` });

  await visitPage.section('Cables');
  await page.getByRole('link', { name: 'Record a cable' }).click();
  const cableForm = visitPage.cableForm;
  await cableForm.getByRole('button', { name: 'Both ends as T568B' }).click();
  // The near end with the orange pair's wires swapped at pin 1 and 2: striped names on the wrong pins too.
  const end = await cableForm.getByRole('group', { name: 'Which end' }).getByRole('button').first().textContent();
  await visitPage.pickColour(end!, 1, 'orange');
  await visitPage.pickColour(end!, 2, 'white/orange');
  const pins = cableForm.getByRole('table', { name: /: pins$/ });
  const rows = pins.getByRole('row');
  await expect(rows).toHaveCount(9);
  for (let pin = 1; pin <= 8; pin += 1) {
    const button = pins.getByRole('button', { name: new RegExp(`pin ${pin}:`) });
    await expectAcrossTheScreen(button);
    // The words stay inside the button, and the button inside its cell: nothing overlaps the scheme's column.
    const fits = await button.evaluate((el) => {
      const cell = el.closest('td')!;
      const before = cell.previousElementSibling as HTMLElement;
      const b = el.getBoundingClientRect();
      const c = cell.getBoundingClientRect();
      return { overflow: el.scrollWidth - el.clientWidth, inCell: b.left >= c.left - 0.5 && b.right <= c.right + 0.5, clear: before.getBoundingClientRect().right <= b.left + 0.5 };
    });
    expect(fits, `pin ${pin}`).toEqual({ overflow: 0, inCell: true, clear: true });
  }
  await expectNoSidewaysScroll(page);
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/pins-360.png`, fullPage: true });
});

test.describe('in the dark theme', () => {
  test.use({ colorScheme: 'dark' });

  test('a locked wiremap still outlines its wrong pins in red', async ({ request, page, technicianVisit: visitPage }) => {
    const stamp = Date.now().toString(36);
    const title = `Dark cupboard patch (${stamp})`;
    const label = `DK-${stamp.slice(-4)}`;
    const { visitId } = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 0, endHour: 23 });
    await visitPage.openToday();
    await visitPage.openFromToday(title);
    await visitPage.section('Cables');
    await page.getByRole('link', { name: 'Record a cable' }).click();
    const cableForm = visitPage.cableForm;
    await cableForm.getByLabel('Label', { exact: true }).fill(label);
    await cableForm.getByLabel('End A description').fill('Faceplate in the study');
    await cableForm.getByLabel('End B description').fill('Patch panel port 9');
    await cableForm.getByRole('button', { name: 'Both ends as T568B' }).click();
    const end = await cableForm.getByRole('group', { name: 'Which end' }).getByRole('button').first().textContent();
    await visitPage.pickColour(end!, 1, 'orange');
    await visitPage.pickColour(end!, 2, 'white/orange');
    await cableForm.getByRole('button', { name: 'Save new cable' }).click();
    await expect(page.getByText(`Cable ${label} saved on this phone.`)).toBeVisible();
    await visitPage.openSync();
    await expect(page.getByText('Nothing waiting')).toBeVisible({ timeout: 45_000 });

    // The office closes the visit; the phone learns it and locks the records.
    const { accessToken } = await apiSession(request, ROLE_USERS.office);
    const closed = await request.patch(`/api/visits/${visitId}`, { headers: { authorization: `Bearer ${accessToken}` }, data: { status: 'finished' } });
    expect(closed.ok()).toBe(true);
    await page.getByRole('button', { name: 'Sync now' }).click();
    await page.goto(`/visits/${visitId}/cables`);
    await expect(page.getByText(/The records are locked/)).toBeVisible({ timeout: 30_000 });
    await page.getByRole('link', { name: new RegExp(label) }).click();

    const wrong = page.getByRole('button', { name: /pin 1: .*not as the scheme has it/ });
    await expect(wrong).toBeDisabled();
    const right = page.getByRole('button', { name: /pin 3: / });
    const [wrongBorder, rightBorder, error] = await Promise.all([
      wrong.evaluate((el) => getComputedStyle(el).borderTopColor),
      right.evaluate((el) => getComputedStyle(el).borderTopColor),
      page.evaluate(() => {
        const probe = document.createElement('div');
        probe.style.color = 'var(--mui-palette-error-main)';
        document.body.append(probe);
        const colour = getComputedStyle(probe).color;
        probe.remove();
        return colour;
      }),
    ]);
    expect(wrongBorder).toBe(error);
    expect(rightBorder).not.toBe(error);
    if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/locked-dark.png`, fullPage: true });
  });
});

test('the wall drawing names its figures in full and answers a bad one with a message', async ({ request, page, technicianVisit: visitPage }) => {
  const stamp = Date.now().toString(36);
  const title = `Narrow wall drawing (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 0, endHour: 23 });
  await visitPage.openToday();
  await visitPage.openFromToday(title);
  await visitPage.section('Points');
  await visitPage.readCautions();
  await page.getByRole('link', { name: 'Record a point change' }).click();
  const form = visitPage.pointForm;
  await form.getByLabel('Check a new concealed cable route').check();
  const figures = form.getByRole('group', { name: 'The wall and the cable' });
  for (const name of ['Wall width (mm)', 'Wall height (mm)', 'Wall thickness (mm)', 'Cable depth (mm)']) {
    const label = figures.locator('label', { hasText: name });
    await expect(label).toHaveText(name);
    // The whole label shows: not cut short with an ellipsis.
    expect(await label.evaluate((el) => el.scrollWidth - el.clientWidth)).toBeLessThanOrEqual(0);
  }
  await figures.getByLabel('Wall height (mm)').fill('abc');
  await figures.getByLabel('Cable depth (mm)').fill('99999');
  await expect(figures.getByText('Wall height must be a number of millimetres, like 2400.')).toBeVisible();
  await expect(figures.getByText('Cable depth above 1000 mm is not a real depth; check the figure.')).toBeVisible();
  await expectNoSidewaysScroll(page);
  await figures.scrollIntoViewIfNeeded();
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/wall-figures-360.png` });
});
