import { bookVisit, expect, officeRows, PHONE, ROLE_USERS, signedInAtDesk, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

test('a technician records a note and a circuit with no signal, and the office gets them once the phone is back online', async ({
  page,
  context,
  request,
  technicianVisit: visitPage,
  browser,
}) => {
  test.setTimeout(90_000);
  const stamp = Date.now().toString(36);
  const noteText = `Lounge sockets moved; ring continuity checked before boxing in (${stamp})`;
  const circuitNumber = `E${stamp.slice(-6)}`;
  const circuitDescription = `Fused spur for the electric fire (${stamp})`;
  // A visit of this test's own, so that reading the cautions on it happens once whatever else runs.
  const title = `Sockets and a spur at Orchard Rise (${stamp})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title });

  // The first sync brings the technician's visits onto the phone.
  await visitPage.openToday();
  const visitId = await visitPage.openFromToday(title);
  await expect(page).toHaveURL(/\/visits\/[0-9a-f-]{36}$/);

  await visitPage.goOffline(context);

  await visitPage.addNote(noteText);

  // Circuit work starts with the safety cautions, once per visit.
  await visitPage.section('Circuits & tests');
  await expect(page.getByText(/Prove it dead at the point of work/)).toBeVisible();
  await visitPage.readCautions();
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
  await visitPage.expectVisit(title);
  await expect(page.getByText(`${circuitNumber} · ${circuitDescription}`)).toBeVisible();
  await visitPage.section('Trail');
  await expect(page.getByText(noteText)).toBeVisible();
  await expect(page.getByText('No signal — saving on this phone · 3 waiting')).toBeVisible();

  await context.setOffline(false);
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });
  await visitPage.openSync();
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
  const { context: desk, page: office } = await signedInAtDesk(browser, 'office');
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
