import { DESK, expect, test } from '../fixtures.js';

test.use({ viewport: DESK, signedInAs: 'office' });

test('with done and cancelled shown, every column of the jobs board is on a 1440 px screen, and the board scrolls by keyboard', async ({ page }) => {
  await page.goto('/jobs');
  await page.getByLabel('Show done and cancelled').click();
  const cancelled = page.getByRole('region', { name: 'Cancelled' });
  await expect(cancelled).toBeVisible();
  const box = (await cancelled.boundingBox())!;
  expect(box.x).toBeGreaterThanOrEqual(0);
  expect(box.x + box.width).toBeLessThanOrEqual(DESK.width);
  // The page itself never scrolls sideways; the board would scroll inside itself on a narrower screen.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(DESK.width);
  const board = page.getByRole('region', { name: 'Jobs by status' });
  await board.focus();
  await expect(board).toBeFocused();
  await page.screenshot({ path: 'test-results/jobs-board-closed-shown.png' });
});

test('the verdict chips in the ring column of the test results are shown whole', async ({ page, officeJob }) => {
  await officeJob.openBoardFor('LED-0033');
  await officeJob.openFromCard(officeJob.boardCard('Paperwork', /LED-0033/), /Extra double socket/);
  await officeJob.tab('Circuits & tests');
  const grid = page.getByRole('grid', { name: 'Test results' });
  const ringChips = grid.getByRole('button', { name: /r1 against rn: Pass|r2 against r1: Pass/ });
  await expect(ringChips.first()).toBeVisible();
  expect(await ringChips.count()).toBeGreaterThanOrEqual(2);
  for (const chip of await ringChips.all()) {
    const fits = await chip.evaluate((el) => {
      const label = el.querySelector('span') ?? el;
      const cell = el.closest('[role="gridcell"]')!.getBoundingClientRect();
      const own = el.getBoundingClientRect();
      return { whole: label.scrollWidth <= label.clientWidth, inside: own.right <= cell.right + 0.5 && own.left >= cell.left - 0.5 };
    });
    expect(fits).toEqual({ whole: true, inside: true });
  }
  await page.screenshot({ path: 'test-results/ring-column.png' });
});
