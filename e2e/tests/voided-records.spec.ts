import { execFileSync } from 'node:child_process';
import { apiSession, bookVisit, expect, PHONE, ROLE_USERS, signedInAtDesk, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/** Poppler's pdftotext, reading order kept, lines joined: what a search of the document finds. */
const pdfToText = (pdf: Buffer) => execFileSync('pdftotext', ['-raw', '-', '-'], { input: pdf }).toString('utf8').replace(/\s+/g, ' ');

/**
 * A cable saved with a typo is voided on the phone with no signal: it stays, struck through with its reason, for the
 * office, and the label sheet and the cabling report leave it out. The ring's insulation is read over the tester's
 * range, passes on the phone and prints on the certificate as the tester showed it.
 */
test('a cable voided offline is left off the labels and the report, and the desk sees it struck through with the reason', async ({
  browser,
  page,
  context,
  request,
  technicianVisit: visitPage,
}) => {
  test.setTimeout(240_000);
  const stamp = Date.now().toString(36).slice(-4).toUpperCase();
  const title = `Data points and a socket on the ring (${stamp})`;
  const [good, typo] = [`VD-${stamp}1`, `VD-${stamp}I`];
  const reason = 'Typed I for 1 in the label';
  const { jobId, visitId } = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 0, endHour: 23 });

  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });
  await visitPage.goOffline(context);
  await card.getByRole('link', { name: /^Open / }).click();
  await visitPage.expectVisit(title);

  // Two cables, the second a typo of the first's label.
  await visitPage.section('Cables');
  for (const label of [good, typo]) {
    await page.getByRole('link', { name: 'Record a cable' }).click();
    await visitPage.cableForm.getByLabel('Label', { exact: true }).fill(label);
    await visitPage.cableForm.getByRole('button', { name: 'Both ends as T568B' }).click();
    await visitPage.cableForm.getByLabel('Length (m)').fill('14');
    await visitPage.cableForm.getByRole('button', { name: 'Save new cable' }).click();
    await expect(page.getByText(`Cable ${label} saved on this phone.`)).toBeVisible();
  }

  // Voided from the trail, with the reason it asks for.
  await visitPage.section('Trail');
  const entry = visitPage.trailEntry(`Cable ${typo}`);
  await entry.getByRole('button', { name: `Void cable ${typo}…` }).click();
  const dialog = page.getByRole('dialog', { name: `Void cable ${typo}?` });
  await dialog.getByRole('button', { name: 'Void it' }).click();
  await expect(dialog.getByText('Say why this record is void, like “typed the wrong label”.')).toBeVisible();
  await dialog.getByLabel('Why is it void?').fill(reason);
  await dialog.getByRole('button', { name: 'Void it' }).click();
  await expect(entry).toContainText(`Void: ${reason}`);
  await expect(entry.getByText(new RegExp(`^Cable ${typo} ·`))).toHaveCSS('text-decoration-line', 'line-through');

  // The label sheet prints the real cable only.
  await visitPage.section('Cables');
  await expect(page.getByRole('list', { name: 'Cable runs' }).getByRole('link', { name: new RegExp(typo) })).toContainText(`Void: ${reason}`);
  await page.getByRole('link', { name: 'Print labels with QR codes' }).click();
  const labels = page.getByRole('list', { name: 'Cable labels' });
  await expect(labels.getByRole('img', { name: `QR code for cable ${good}` })).toHaveCount(2);
  await expect(labels.getByRole('img', { name: `QR code for cable ${typo}` })).toHaveCount(0);
  await page.goBack();

  // The ring's insulation over the tester's range: ">299" passes the 1.0 MΩ minimum (BS 7671:2018+A2:2022 Table 64).
  await visitPage.section('Circuits & tests');
  await visitPage.readCautions();
  const readings = await visitPage.openReadings(/^1 · Sockets, ground floor/, 1);
  // r1 = rn within 0.05 Ω (IET GN3 9th ed. 2022, step 1); r2 within 3 % of 1.633 × r1 (IEC 60228 ratio; 3 % trade practice);
  // R1+R2 (0.56 + 0.92) / 4 = 0.37 Ω (GN3 step 3); Zs 0.62 Ω within 0.8 × 1.37 Ω (Table 41.3, B32; Appendix 3);
  // 24 ms at 30 mA against 300 ms (Reg 643.8).
  await readings.getByLabel('r1 (Ω)', { exact: true }).fill('0.56');
  await readings.getByLabel('rn (Ω)', { exact: true }).fill('0.56');
  await readings.getByLabel('r2 (Ω)', { exact: true }).fill('0.92');
  await readings.getByLabel('R1+R2 (Ω)', { exact: true }).fill('0.37');
  await readings.getByLabel('Live to live (MΩ)').fill('>299');
  await readings.getByLabel('Live to earth (MΩ)').fill('>299');
  await readings.getByRole('button', { name: 'Correct', exact: true }).click();
  await readings.getByLabel('Measured Zs (Ω)').fill('0.62');
  await readings.getByLabel('Time at 30 mA (ms)').fill('24');
  await readings.getByLabel('Instrument').fill('Multifunction tester');
  await expect(readings.getByRole('button', { name: /^Insulation resistance, live to live: Pass · limit 1 MΩ/ })).toBeVisible();
  await expect(readings.getByRole('status', { name: 'Circuit summary' })).toContainText('This circuit: Pass');
  await readings.getByRole('button', { name: 'Save readings' }).click();
  await expect(page.getByText('Readings saved on this phone.')).toBeVisible();

  // The sign-off counts the real cable only, then the visit is signed and finished with no signal.
  await visitPage.section('Sign-off');
  await expect(page.getByText(/0 photos · 0 notes · 1 cable · 0 point changes · 1 circuit tested/)).toBeVisible();
  await expect(page.getByText('No fails and no missing readings.')).toBeVisible();
  await page.getByLabel('Work done and its extent').fill('Socket added to ring 1; two data points run.');
  await visitPage.sign();
  await page.getByRole('button', { name: 'Finish visit' }).click();
  await expect(page.getByText(/Signed off .* by Sam Brannigan/)).toBeVisible();

  await context.setOffline(false);
  await visitPage.openSync();
  await expect(page.getByText('Nothing waiting')).toBeVisible({ timeout: 45_000 });

  // The cabling report leaves the voided cable out; the certificate prints the reading as the tester showed it.
  const office = await apiSession(request, ROLE_USERS.office);
  const headers = { authorization: `Bearer ${office.accessToken}` };
  const pdfOf = async (kind: string) => {
    const issued = await request.post(`/api/jobs/${jobId}/documents`, { headers, data: { kind } });
    expect(issued.status(), await issued.text()).toBe(201);
    const { id } = (await issued.json()) as { id: string };
    return pdfToText(await (await request.get(`/api/documents/${id}/pdf`, { headers })).body());
  };
  const report = await pdfOf('cabling-report');
  // A narrow column may break a label across lines: compare without the spaces.
  const packed = report.replace(/\s+/g, '');
  expect(report).toContain('1 cable recorded or tested on this job’s visits');
  expect(packed).toContain(good);
  expect(packed).not.toContain(typo);
  const certificate = await pdfOf('minor-works');
  expect(certificate).toContain('>299 MΩ');

  // At the desk, the visit's page keeps the voided cable, struck through, with its reason.
  const desk = await signedInAtDesk(browser, 'office');
  await desk.page.goto(`/jobs/${jobId}/visits/${visitId}`);
  const line = desk.page.getByRole('list', { name: 'What was recorded, in time order' }).getByRole('listitem', { name: new RegExp(`^Cable ${typo}.*\\(void\\)$`) });
  await expect(line).toContainText(`Void: ${reason}`);
  await expect(line.getByText(new RegExp(`^Cable ${typo}`))).toHaveCSS('text-decoration-line', 'line-through');
  if (process.env.SCREENSHOT_DIR) await desk.page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/desk-visit.png`, fullPage: true });
  await desk.context.close();
});
