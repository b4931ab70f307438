import type { Locator, Page } from '@playwright/test';
import { bookVisit, DESK, expect, test } from '../fixtures.js';
import { typeInPicker } from '../pages/pickers.js';

test.use({ viewport: DESK, signedInAs: 'office' });

/** Which day column (0 for Monday) holds the card. */
async function columnOf(card: Locator): Promise<number> {
  return card.evaluate((el) => {
    const cell = el.closest('[role="gridcell"]')!;
    return Array.from(cell.parentElement!.querySelectorAll(':scope > [role="gridcell"]')).indexOf(cell);
  });
}

async function openSchedule(page: Page): Promise<Locator> {
  await page.goto('/');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Schedule' }).click();
  const grid = page.getByRole('grid', { name: 'Visits this week' });
  await expect(grid.getByRole('row', { name: 'Sam Brannigan' })).toBeVisible();
  return grid;
}

test("the office drags a visit to another technician's row and another day, sets its time, and the move is kept", async ({ page, request }) => {
  test.setTimeout(60_000);
  const title = `Garage socket (${Date.now().toString(36)})`;
  // Early, so it is the first visit of Aled's day, at the top of the week.
  await bookVisit(request, { technicianEmail: 'tech2@larkfield.example', siteName: 'Orchard Rise', title, startHour: 6, endHour: 7 });
  const grid = await openSchedule(page);
  const card = grid.getByRole('row', { name: 'Aled Pryce' }).getByRole('button', { name: new RegExp(title.replace(/[()]/g, '\\$&')) });
  const from = await columnOf(card);
  const day = from === 0 ? 1 : 0;
  const target = grid.getByRole('row', { name: 'Sam Brannigan' }).getByRole('gridcell').nth(day);
  await card.scrollIntoViewIfNeeded();

  // A drag with the mouse, in steps, as a hand moves.
  const a = (await card.boundingBox())!;
  const b = (await target.boundingBox())!;
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + a.width / 2 + 12, a.y + a.height / 2 + 12, { steps: 4 });
  await page.mouse.move(b.x + b.width / 2, b.y + 20, { steps: 15 });
  await page.mouse.up();

  // Asked first, with the times to change and the warnings of booking.
  const ask = page.getByRole('dialog', { name: 'Move this visit?' });
  await expect(ask).toContainText('from Aled Pryce to Sam Brannigan, on');
  await typeInPicker(ask, 'Start', '07:15');
  await typeInPicker(ask, 'Finish', '06:00');
  await expect(ask.getByText('The finish time must be after the start time.')).toBeVisible();
  await typeInPicker(ask, 'Finish', '08:45');
  await page.screenshot({ path: 'test-results/schedule-move-ask.png' });
  // A day already gone asks to move it anyway.
  await ask.getByRole('button', { name: /^Move (visit|anyway)$/ }).click();
  await expect(ask).toHaveCount(0);
  await expect(page.getByRole('alert').filter({ hasText: 'moved to' })).toBeVisible();

  await page.reload();
  const moved = grid.getByRole('row', { name: 'Sam Brannigan' }).getByRole('gridcell').nth(day).getByRole('button', { name: new RegExp(title.replace(/[()]/g, '\\$&')) });
  await expect(moved).toContainText('07:15–08:45');
  await expect(grid.getByRole('row', { name: 'Aled Pryce' }).getByRole('button', { name: new RegExp(title.replace(/[()]/g, '\\$&')) })).toHaveCount(0);
});

test('the same move by keyboard alone, and undone', async ({ page, request }) => {
  test.setTimeout(60_000);
  const title = `Loft light (${Date.now().toString(36)})`;
  const named = new RegExp(title.replace(/[()]/g, '\\$&'));
  await bookVisit(request, { technicianEmail: 'tech1@larkfield.example', siteName: 'Orchard Rise', title, startHour: 10, endHour: 11 });
  const grid = await openSchedule(page);
  const card = grid.getByRole('row', { name: 'Sam Brannigan' }).getByRole('button', { name: named });
  await card.focus();
  // M picks it up, the arrows carry it up or down to Aled Pryce's row, Enter puts it there.
  const rows = await grid.getByRole('rowheader').allTextContents();
  const steps = rows.indexOf('Aled Pryce') - rows.indexOf('Sam Brannigan');
  await page.keyboard.press('m');
  // Each key is taken once the schedule has said where the visit is: keys pressed faster than the page can follow
  // would each start again from the same row.
  const said = page.getByRole('status').filter({ hasText: /Carrying the visit|is over/ });
  await expect(said).toContainText(/Carrying the visit|is over Sam Brannigan/);
  const from = rows.indexOf('Sam Brannigan');
  for (let i = 1; i <= Math.abs(steps); i++) {
    await page.keyboard.press(steps > 0 ? 'ArrowDown' : 'ArrowUp');
    await expect(said).toContainText(`is over ${rows[from + Math.sign(steps) * i]!}`);
  }
  await page.keyboard.press('Enter');
  const ask = page.getByRole('dialog', { name: 'Move this visit?' });
  await expect(ask).toContainText('from Sam Brannigan to Aled Pryce, on');
  const move = ask.getByRole('button', { name: /^Move (visit|anyway)$/ });
  await move.focus();
  await page.keyboard.press('Enter');
  await expect(ask).toHaveCount(0);
  await expect(grid.getByRole('row', { name: 'Aled Pryce' }).getByRole('button', { name: named })).toBeVisible();
  // Undo puts it back with Sam.
  const undo = page.getByRole('button', { name: 'Undo' });
  await undo.focus();
  await page.keyboard.press('Enter');
  await expect(grid.getByRole('row', { name: 'Sam Brannigan' }).getByRole('button', { name: named })).toBeVisible();
  await expect(grid.getByRole('row', { name: 'Aled Pryce' }).getByRole('button', { name: named })).toHaveCount(0);
});
