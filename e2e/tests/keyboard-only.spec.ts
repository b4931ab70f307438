import type { APIRequestContext } from '@playwright/test';
import { apiSession, bookVisit, DESK, expect, recordVisitDone, test } from '../fixtures.js';
import { pressOn, tabTo } from '../pages/keyboard.js';

test.use({ viewport: DESK, signedInAs: 'office' });

// Every step below is a key press: no click, no mouse. A screen is reached by its address, as a bookmark would.

test('the office books a visit with the keyboard only', async ({ page }) => {
  test.setTimeout(60_000);
  await page.goto('/schedule');
  const grid = page.getByRole('grid', { name: 'Visits this week' });
  await expect(grid.getByRole('row', { name: 'Aled Pryce' })).toBeVisible();

  await pressOn(page, page.getByRole('button', { name: 'Book a visit' }));
  const dialog = page.getByRole('dialog', { name: 'Book a visit' });
  await expect(dialog).toBeVisible();
  // The job: opened with the arrow key, found by typing its reference, chosen with Enter.
  await tabTo(page, dialog.getByRole('combobox', { name: 'Job' }));
  await page.keyboard.press('ArrowDown');
  await expect(page.getByRole('listbox')).toBeVisible();
  await page.keyboard.type('LED-0044');
  await page.keyboard.press('Enter');
  await expect(dialog.getByRole('combobox', { name: 'Job' })).toContainText('LED-0044');
  // Times typed into the pickers' fields, figure by figure.
  await tabTo(page, dialog.getByRole('group', { name: 'Start' }));
  await page.keyboard.type('1910');
  await tabTo(page, dialog.getByRole('group', { name: 'Finish' }));
  await page.keyboard.type('2040');
  await tabTo(page, dialog.getByRole('checkbox', { name: 'Aled Pryce' }));
  await page.keyboard.press('Space');
  await expect(dialog.getByRole('checkbox', { name: 'Aled Pryce' })).toBeChecked();
  await pressOn(page, dialog.getByRole('button', { name: /^Book (visit|anyway)$/ }));
  await expect(dialog).toHaveCount(0);
  await expect(grid.getByRole('row', { name: 'Aled Pryce' })).toContainText('19:10–20:40');
});

const tokenFor = async (request: APIRequestContext, email: string) => (await apiSession(request, email)).accessToken;

test('the office settles a conflict with the keyboard only', async ({ page, request }) => {
  test.setTimeout(60_000);
  const stamp = Date.now().toString(36);
  // Two phones change the same circuit's description offline, as in the conflicts spec.
  const [tech1, tech2] = [await tokenFor(request, 'tech1@larkfield.example'), await tokenFor(request, 'tech2@larkfield.example')];
  const pullOn = async (token: string, device: string) =>
    (await request.get(`/api/sync/pull?checkpoint=0&limit=1000&deviceId=${device}`, { headers: { authorization: `Bearer ${token}` } })).json();
  const pulled = await pullOn(tech1, `kbda${stamp}`);
  await pullOn(tech2, `kbdb${stamp}`);
  const circuit = pulled.changes.find((c: { entity: string; row: { description?: string } }) => c.entity === 'circuit' && c.row?.description?.startsWith('Comms cabinet')).row;
  const push = (token: string, device: string, at: string, description: string) =>
    request.post('/api/sync/push', {
      headers: { authorization: `Bearer ${token}` },
      data: { deviceId: device, mutations: [{ mutationId: `${device}-${stamp}`, entity: 'circuit', id: circuit.id, baseVersion: circuit.version, set: { description }, hlc: `${at}-0000-${device}` }] },
    });
  expect((await push(tech1, `kbda${stamp}`, '2026-12-02T10:00:00.000Z', `Comms cabinet, keyboard (${stamp})`)).ok()).toBe(true);
  expect((await push(tech2, `kbdb${stamp}`, '2026-12-02T10:03:00.000Z', `Server cupboard, keyboard (${stamp})`)).ok()).toBe(true);

  await page.goto('/conflicts');
  const card = page.getByRole('article', { name: 'Circuit · Description' }).filter({ hasText: stamp });
  await expect(card).toBeVisible();
  await pressOn(page, card.getByRole('button', { name: 'Use the other value' }));
  await expect(card).toHaveCount(0);
  // Tabs take the focus once, on the chosen one; the arrow keys move along them and Enter opens one.
  await tabTo(page, page.getByRole('tab', { selected: true }), { back: true });
  await page.keyboard.press('ArrowRight');
  await expect(page.getByRole('tab', { name: 'Settled' })).toBeFocused();
  await page.keyboard.press('Enter');
  // A row names its circuit by the description it has now, so earlier conflicts on the same circuit carry the stamp
  // too: this one is the row whose settled value is the one chosen here.
  const row = page.getByRole('table', { name: 'Settled conflicts' }).getByRole('row').filter({ hasText: `The other value: Comms cabinet, keyboard (${stamp})` });
  await expect(row).toHaveCount(1);
  await expect(row).toContainText('Dan Whitlow');
});

test('the office builds an invoice from a visit and issues it with the keyboard only', async ({ page, request }) => {
  test.setTimeout(90_000);
  const title = `Socket by the back door (keyboard ${Date.now().toString(36)})`;
  const todayAt = (h: number, m = 0) => {
    const d = new Date();
    d.setHours(h, m, 0, 0);
    return d.toISOString();
  };
  const { jobId, visitId } = await bookVisit(request, { technicianEmail: 'tech2@larkfield.example', siteName: 'Fernhill Close', title, startHour: 8, endHour: 10 });
  await recordVisitDone(request, { technicianEmail: 'tech2@larkfield.example', visitId, arrived: todayAt(8, 5), left: todayAt(9, 35), parts: [{ name: 'Cat6 keystone jack', quantity: 1 }] });

  await page.goto(`/invoices/jobs/${jobId}`);
  await expect(page.getByRole('heading', { name: 'Quotes and invoices' })).toBeVisible();
  await pressOn(page, page.getByRole('button', { name: 'New invoice' }));
  const draft = page.getByRole('dialog', { name: /Draft invoice/ });
  await expect(draft.getByRole('group', { name: /^Line \d+$/ })).toHaveCount(2);
  await pressOn(page, draft.getByRole('button', { name: 'Save and issue…' }));
  const ask = page.getByRole('dialog', { name: 'Issue this invoice?' });
  await expect(ask).toBeVisible();
  await pressOn(page, ask.getByRole('button', { name: 'Issue' }));
  const issued = page.getByRole('dialog', { name: /^Invoice INV-\d{4}/ });
  await expect(issued.getByText('Awaiting payment')).toBeVisible();
});
