import type { APIRequestContext } from '@playwright/test';
import { apiSession, DESK, expect, test } from '../fixtures.js';

test.use({ viewport: DESK, signedInAs: 'office' });

const tokenFor = async (request: APIRequestContext, email: string) => (await apiSession(request, email)).accessToken;

test('the office settles two offline edits of the same circuit, side by side', async ({ page, request }) => {
  test.setTimeout(60_000);
  const stamp = Date.now().toString(36);
  // Both technicians are on tomorrow's practice visit, so both may record its circuits.
  const [tech1, tech2] = [await tokenFor(request, 'tech1@larkfield.example'), await tokenFor(request, 'tech2@larkfield.example')];
  // Each phone has pulled the circuit before going offline: the server takes no base a device was never sent.
  const pullOn = async (token: string, device: string) =>
    (await request.get(`/api/sync/pull?checkpoint=0&limit=1000&deviceId=${device}`, { headers: { authorization: `Bearer ${token}` } })).json();
  const pulled = await pullOn(tech1, 'phonea');
  await pullOn(tech2, 'phoneb');
  const circuit = pulled.changes.find((c: { entity: string; row: { description?: string } }) => c.entity === 'circuit' && c.row.description === 'Comms cabinet').row;
  const push = (token: string, device: string, at: string, description: string) =>
    request.post('/api/sync/push', {
      headers: { authorization: `Bearer ${token}` },
      data: { deviceId: device, mutations: [{ mutationId: `${device}-${stamp}`, entity: 'circuit', id: circuit.id, baseVersion: circuit.version, set: { description }, hlc: `${at}-0000-${device}` }] },
    });
  expect((await push(tech1, 'phonea', '2026-12-02T10:00:00.000Z', `Comms cabinet, 16 A radial (${stamp})`)).ok()).toBe(true);
  expect((await push(tech2, 'phoneb', '2026-12-02T10:03:00.000Z', `Server cupboard (${stamp})`)).ok()).toBe(true);

  await page.goto('/');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Conflicts' }).click();
  const card = page.getByRole('article', { name: 'Circuit · Description' }).filter({ hasText: stamp });
  await expect(card).toContainText('Changed on two devices before either had synced');
  await expect(card).toContainText(`Server cupboard (${stamp})`);
  await expect(card).toContainText(`Comms cabinet, 16 A radial (${stamp})`);
  await expect(card).toContainText('Aled Pryce');
  await expect(card).toContainText('Sam Brannigan');
  // Which circuit, in words: where it is and whose it is, not a record id
  await expect(card).toContainText(/board \S+ · Brightwater Dental, Harbour Yard · Brightwater Dental Practice/);
  await expect(card).not.toContainText(/record [0-9a-f]{6}/);
  await page.screenshot({ path: 'test-results/conflicts-inbox.png' });
  await card.getByRole('button', { name: 'Use the other value' }).click();
  await expect(card).toHaveCount(0);
  // Settled ones stay on record: what was chosen, who chose it
  await page.getByRole('tab', { name: 'Settled' }).click();
  const row = page.getByRole('table', { name: 'Settled conflicts' }).getByRole('row').filter({ hasText: stamp });
  await expect(row).toContainText(`The other value: Comms cabinet, 16 A radial (${stamp})`);
  await expect(row).toContainText('Dan Whitlow');

  const after = await (await request.get(`/api/circuits/${circuit.id}`, { headers: { authorization: `Bearer ${await tokenFor(request, 'office@larkfield.example')}` } })).json();
  expect(after.description).toBe(`Comms cabinet, 16 A radial (${stamp})`);
});
