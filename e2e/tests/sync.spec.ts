import { bookVisit, expect, officeRows, PHONE, signedInAtDesk, test, waitForServiceWorker } from '../fixtures.js';

test.use({ viewport: PHONE });

test('a technician records a note and a circuit with no signal, and the office gets them once the phone is back online', async ({
  page,
  context,
  request,
  signInPage,
  browser,
}) => {
  test.setTimeout(90_000);
  const stamp = Date.now().toString(36);
  const noteText = `Lounge sockets moved; ring continuity checked before boxing in (${stamp})`;
  const circuitNumber = `E${stamp.slice(-6)}`;
  const circuitDescription = `Fused spur for the electric fire (${stamp})`;
  // A visit of this test's own, so that reading the cautions on it happens once whatever else runs.
  const title = `Sockets and a spur at Orchard Rise (${stamp})`;
  await bookVisit(request, { technicianEmail: 'tech1@larkfield.example', siteName: 'Orchard Rise', title });

  await signInPage.goto();
  await signInPage.signIn('tech1@larkfield.example');
  await expect(page.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
  await waitForServiceWorker(page);
  // The first sync brings the technician's visits onto the phone.
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });
  const visit = page.getByRole('region', { name: 'My visits' }).getByRole('link', { name: new RegExp(title.replace(/[()]/g, '.')) });
  await visit.click();
  await expect(page).toHaveURL(/\/visits\/[0-9a-f-]{36}$/);
  const visitId = page.url().split('/').pop()!;
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();

  await context.setOffline(true);
  await expect(page.getByText('No signal — saving on this phone')).toBeVisible();

  await page.getByLabel('Note', { exact: true }).fill(noteText);
  await page.getByRole('button', { name: 'Add note' }).click();
  await expect(page.getByRole('list', { name: 'Trail of this visit' }).getByText(noteText)).toBeVisible();

  // Circuit work starts with the safety cautions, once per visit.
  await page.getByRole('tab', { name: 'Circuits & tests' }).click();
  await expect(page.getByText(/Prove it dead at the point of work/)).toBeVisible();
  await page.getByRole('button', { name: 'I have read these cautions' }).click();
  await expect(page.getByText(/prove dead/)).toBeVisible();
  const circuitForm = page.getByRole('form', { name: 'Add a circuit' });
  await expect(circuitForm.getByLabel('Board', { exact: true })).toHaveValue(/[0-9a-f-]{36}/);
  await circuitForm.getByLabel('Circuit number', { exact: true }).fill(circuitNumber);
  await circuitForm.getByLabel('Description', { exact: true }).fill(circuitDescription);
  await circuitForm.getByLabel('Kind', { exact: true }).selectOption('radial');
  await circuitForm.getByRole('button', { name: 'Add circuit' }).click();
  const circuits = page.getByRole('list', { name: 'Circuits on this site' });
  await expect(circuits.getByText(`${circuitNumber} · ${circuitDescription}`)).toBeVisible();

  await expect(page.getByText('No signal — saving on this phone · 3 waiting')).toBeVisible();

  // Reloaded with no network: the service worker serves the app, the records come from the phone.
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  await expect(page.getByText(`${circuitNumber} · ${circuitDescription}`)).toBeVisible();
  await page.getByRole('tab', { name: 'Trail' }).click();
  await expect(page.getByText(noteText)).toBeVisible();
  await expect(page.getByText('No signal — saving on this phone · 3 waiting')).toBeVisible();

  await context.setOffline(false);
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sync' }).click();
  await expect(page.getByRole('heading', { name: 'Sync', level: 1 })).toBeVisible();
  await expect(page.getByText('Nothing waiting')).toBeVisible();

  // The office sees exactly one of each, as typed.
  const rows = await officeRows(request);
  const notes = rows.filter((c) => c.entity === 'note' && !c.deleted && c.row?.text === noteText);
  expect(notes).toHaveLength(1);
  expect(notes[0]!.row).toMatchObject({ visitId, text: noteText });
  const added = rows.filter((c) => c.entity === 'circuit' && !c.deleted && c.row?.number === circuitNumber);
  expect(added).toHaveLength(1);
  expect(added[0]!.row).toMatchObject({ description: circuitDescription, kind: 'radial', siteId: notes[0]!.row!.siteId });

  // And in the office's own screens, at the desk.
  const { context: desk, page: office } = await signedInAtDesk(browser, 'office@larkfield.example');
  try {
    await office.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Customers & sites' }).click();
    await office.getByRole('grid', { name: 'Sites' }).getByRole('link', { name: 'Orchard Rise' }).click();
    const row = office.getByRole('table', { name: 'Circuits' }).getByRole('row', { name: new RegExp(circuitNumber) });
    await expect(row).toContainText(circuitDescription);
    await expect(row).toContainText('Radial');
  } finally {
    await desk.close();
  }
});
