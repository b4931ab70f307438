import { apiSession, DESK, expect, ROLE_USERS, test } from '../fixtures.js';

test.use({ viewport: DESK, signedInAs: 'office' });

const SIGNATURE = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 100"><path d="M10 80 L 290 40" fill="none" stroke="#111" stroke-width="3"/></svg>';

/**
 * A new circuit finished 40 days ago in England is overdue for notification (the Building Regulations 2010 and
 * Approved Document P: a new circuit is notifiable, within 30 days of completion, from memory): the office finds it
 * first under Overdue and records the scheme's reference, and it moves to Notified.
 */
test('new work past its last day to notify shows as overdue, and recording the notification moves it on', async ({ page, request }) => {
  test.setTimeout(90_000);
  const stamp = Date.now().toString(36).slice(-5).toUpperCase();
  const { accessToken } = await apiSession(request, ROLE_USERS.office);
  const tech = await apiSession(request, ROLE_USERS.technician);
  const headers = { authorization: `Bearer ${accessToken}` };
  const site = ((await (await request.get('/api/sites?search=Orchard%20Rise', { headers })).json()) as { items: { id: string; customerId: string }[] }).items[0]!;
  const board = ((await (await request.get(`/api/boards?siteId=${site.id}`, { headers })).json()) as { items: { id: string }[] }).items[0]!;
  const title = `Shower radial (${stamp})`;
  const job = (await (await request.post('/api/jobs', { headers, data: { siteId: site.id, customerId: site.customerId, title, status: 'on-site' } })).json()) as { id: string };
  const signedAt = new Date(Date.now() - 40 * 86_400_000).toISOString();
  const visit = await request.post('/api/visits', {
    headers,
    data: { jobId: job.id, siteId: site.id, technicianIds: [tech.user.id], plannedStart: signedAt, status: 'finished', actualEnd: signedAt, signedAt, signedByName: 'Sam Brannigan', signatureSvg: SIGNATURE, workDescription: 'New radial for the electric shower.' },
  });
  expect(visit.ok(), await visit.text()).toBe(true);
  const visitId = ((await visit.json()) as { id: string }).id;
  const circuit = await request.post('/api/circuits', { headers, data: { siteId: site.id, boardId: board.id, number: `S${stamp.slice(-2)}`, description: 'Electric shower', newOnVisitId: visitId } });
  expect(circuit.ok(), await circuit.text()).toBe(true);

  await page.goto('/notifiable-work?state=overdue');
  await expect(page.getByRole('heading', { level: 1, name: 'Notifications' })).toBeVisible();
  await expect(page.getByRole('note')).toContainText('the local building control body decide');
  const row = page.getByRole('row', { name: new RegExp(title.replace(/[()]/g, '\\$&')) });
  await expect(row).toContainText('1 new circuit');
  await expect(row).toContainText('A new circuit was installed');
  await expect(row).toContainText('Overdue');
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/notifiable-work-overdue.png` });

  await row.getByRole('button', { name: /Record the notification/ }).click();
  const dialog = page.getByRole('dialog', { name: /Notification of/ });
  await dialog.getByRole('button', { name: 'Save' }).click();
  await expect(dialog.getByText('Scheme reference: give the reference the scheme gave.')).toBeVisible();
  await dialog.getByLabel('Scheme reference').fill(`NT-${stamp}`);
  await dialog.getByRole('button', { name: 'Save' }).click();
  await expect(dialog).toBeHidden();
  // No longer overdue: it has left this tab, and stands under Notified with its reference.
  await expect(row).toBeHidden();
  await page.getByRole('tab', { name: 'Notified' }).click();
  await expect(page.getByRole('row', { name: new RegExp(title.replace(/[()]/g, '\\$&')) })).toContainText(`NT-${stamp}`);
});
