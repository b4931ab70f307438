import { apiSession, DESK, expect, test } from '../fixtures.js';
import { typeInPicker } from '../pages/pickers.js';

test.use({ viewport: DESK, signedInAs: 'office' });

test('the office books a visit for a technician and their phone receives it', async ({ page, request }) => {
  test.setTimeout(60_000);
  await page.goto('/');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Schedule' }).click();
  const grid = page.getByRole('grid', { name: 'Visits this week' });
  await expect(grid.getByRole('row', { name: 'Sam Brannigan' })).toContainText('LED-0041');

  await page.getByRole('button', { name: 'Book a visit' }).click();
  const dialog = page.getByRole('dialog', { name: 'Book a visit' });
  await dialog.getByLabel('Job').click();
  await page.getByRole('option', { name: /LED-0044/ }).click();
  await typeInPicker(dialog, 'Start', '16:30');
  await typeInPicker(dialog, 'Finish', '15:00');
  // Late in the day 16:30 has gone by, and the button asks to book anyway: either way the times are checked first.
  await dialog.getByRole('button', { name: /^Book (visit|anyway)$/ }).click();
  await expect(dialog.getByText('The finish time must be after the start time.')).toBeVisible();
  await typeInPicker(dialog, 'Finish', '17:45');
  await dialog.getByLabel('Aled Pryce').check();
  // Aled is at the practice until 17:00 today (LED-0042): the office is told before booking over it.
  await expect(dialog.getByRole('alert').filter({ hasText: 'Aled Pryce is already booked 13:00–17:00 that day on LED-0042' })).toBeVisible();
  await dialog.getByRole('button', { name: 'Book anyway' }).click();
  await expect(dialog).toHaveCount(0);
  await expect(grid.getByRole('row', { name: 'Aled Pryce' })).toContainText('16:30–17:45');
  await page.screenshot({ path: 'test-results/schedule-week.png' });

  // Aled's phone gets it on its next pull.
  const { accessToken, user } = await apiSession(request, 'tech2@larkfield.example');
  const pulled = await (await request.get('/api/sync/pull?checkpoint=0&limit=1000&deviceId=schedule-e2e', { headers: { authorization: `Bearer ${accessToken}` } })).json();
  const booked = pulled.changes.filter((c: { entity: string; row: { plannedEnd?: string; technicianIds?: string[] } | null }) => c.entity === 'visit' && c.row?.plannedEnd?.endsWith('T17:45:00.000Z') && c.row.technicianIds?.includes(user.id));
  expect(booked).toHaveLength(1);

  // Cancelling asks first, then shows it struck through; a cancelled visit can be restored.
  await grid.getByRole('row', { name: 'Aled Pryce' }).getByRole('button', { name: /16:30–17:45/ }).click();
  await page.getByRole('dialog', { name: 'Change visit' }).getByRole('button', { name: 'Cancel this visit' }).click();
  const confirm = page.getByRole('dialog', { name: 'Cancel this visit?' });
  await confirm.getByRole('button', { name: 'Keep the visit' }).click();
  await expect(confirm).toHaveCount(0);
  await page.getByRole('dialog', { name: 'Change visit' }).getByRole('button', { name: 'Cancel this visit' }).click();
  await confirm.getByRole('button', { name: 'Cancel the visit' }).click();
  await expect(grid.getByRole('row', { name: 'Aled Pryce' })).toContainText('16:30–17:45 · cancelled');
  await grid.getByRole('row', { name: 'Aled Pryce' }).getByRole('button', { name: /16:30–17:45 · cancelled/ }).click();
  await page.getByRole('dialog', { name: 'Change visit' }).getByRole('button', { name: 'Restore this visit' }).click();
  await expect(grid.getByRole('row', { name: 'Aled Pryce' }).getByRole('button', { name: /16:30–17:45/ })).not.toContainText('cancelled');
});
