import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import type { Locator, Page } from '@playwright/test';
import { apiSession, expect, PHONE, ROLE_USERS, signedInAtDesk, test } from '../fixtures.js';
import { OfficeJobPage } from '../pages/office-job-page.js';

test.use({ viewport: PHONE });

const ALED = 'tech2@larkfield.example';

/** Poppler's pdftotext, reading order kept, lines joined: what a search of the document finds. */
function pdfToText(pdf: Buffer): string {
  return execFileSync('pdftotext', ['-raw', '-', '-'], { input: pdf }).toString('utf8').replace(/\s+/g, ' ');
}

async function shot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: test.info().outputPath(`${name}.png`), fullPage: true });
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/installation-certificate-${name}.png`, fullPage: true });
}

/**
 * The demo's garden office radial at Fernhill Close (LED-0045): Aled tests the board's two circuits on the day of the
 * visit, 40 days ago (his phone's clock set to that morning), marks the schedule of inspections and signs off. The
 * office is refused the minor works certificate for the new circuit, issues the installation certificate with the
 * particulars the phone does not record, and finds the Building Regulations notification overdue: a new circuit in
 * England is notifiable within 30 days of completion (the Building Regulations 2010 and Approved Document P, from
 * memory). An installation certificate asked for on a plain alteration is refused with the reason.
 */
test('a new radial goes from the phone visit to an issued installation certificate and an overdue notification', async ({ page, browser, request, signInPage, technicianVisit: visitPage }) => {
  test.setTimeout(240_000);
  const office = await apiSession(request, ROLE_USERS.office);
  const headers = { authorization: `Bearer ${office.accessToken}` };
  const job = ((await (await request.get('/api/jobs?search=LED-0045', { headers })).json()) as { items: { id: string; title: string }[] }).items[0]!;
  const visit = ((await (await request.get(`/api/visits?jobId=${job.id}`, { headers })).json()) as { items: { id: string; plannedStart: string }[] }).items[0]!;

  // The phone on the morning of the visit; its clock runs on from there.
  await page.clock.install({ time: new Date(Date.parse(visit.plannedStart) + 30 * 60_000) });
  await signInPage.goto();
  await signInPage.signIn(ALED);
  await visitPage.expectToday();
  await expect(page.getByText('Up to date')).toBeVisible({ timeout: 30_000 });
  await visitPage.openFromToday(job.title);

  await visitPage.section('Circuits & tests');
  await visitPage.readCautions();
  await page.getByRole('link', { name: 'Schedule of circuits, card by card' }).click();
  const schedule = page.getByRole('region', { name: 'Schedule of circuits' });
  await expect(schedule).toContainText('2 of 2 still to test');
  await expect(schedule.getByRole('article', { name: 'Circuit 2 · Garden office sockets' })).toContainText('New');
  // Fault protection by the 30 mA RCD on this TT supply: 50 V / 30 mA = 1667 Ω (BS 7671:2018+A2:2022 Table 41.5).
  await expect(schedule.getByRole('article', { name: 'Circuit 2 · Garden office sockets' })).toContainText('1667 Ω');
  await shot(page, 'schedule-before');

  /** Readings common to both circuits: 200 MΩ at 500 V against 1.0 MΩ (Table 64), 24 ms against 300 ms (Reg 643.8). */
  async function fillCommon(readings: Locator, zs: string): Promise<void> {
    await readings.getByLabel('Live to live (MΩ)').fill('200');
    await readings.getByLabel('Live to earth (MΩ)').fill('200');
    await readings.getByRole('button', { name: 'Correct', exact: true }).click();
    await readings.getByLabel('Measured Zs (Ω)').fill(zs);
    await readings.getByLabel('Time at 30 mA (ms)').fill('24');
    await readings.getByLabel('Instrument').fill('Multifunction tester, serial 40-2231');
    await readings.getByRole('button', { name: 'Save readings' }).click();
    await expect(page.getByText('Readings saved on this phone.')).toBeVisible();
  }

  // The ring: r1 = rn within 0.05 Ω (IET GN3 9th ed. 2022, step 1); r2 within 3 % of 1.633 × r1 (IEC 60228 ratio,
  // trade practice); R1+R2 (0.56 + 0.92) / 4 = 0.37 Ω (GN3 step 3); Zs 38.5 Ω within 1667 Ω (Table 41.5).
  await schedule.getByRole('link', { name: 'Record readings of circuit 1' }).click();
  let readings = page.getByRole('form', { name: 'Readings for circuit 1' });
  await readings.getByLabel('r1 (Ω)', { exact: true }).fill('0.56');
  await readings.getByLabel('rn (Ω)', { exact: true }).fill('0.56');
  await readings.getByLabel('r2 (Ω)', { exact: true }).fill('0.92');
  await readings.getByLabel('R1+R2 (Ω)', { exact: true }).fill('0.37');
  await fillCommon(readings, '38.5');

  await page.goto(`/visits/${visit.id}/schedule`);
  await schedule.getByRole('link', { name: 'Record readings of circuit 2' }).click();
  readings = page.getByRole('form', { name: 'Readings for circuit 2' });
  await readings.getByLabel('R1+R2 (Ω)', { exact: true }).fill('0.31');
  await fillCommon(readings, '38.6');

  await page.goto(`/visits/${visit.id}/schedule`);
  await expect(schedule).toContainText('every circuit tested');
  await expect(schedule.getByRole('article', { name: 'Circuit 2 · Garden office sockets' })).toContainText('38.6 Ω');
  await shot(page, 'schedule-tested');

  await visitPage.section('Sign-off');
  await expect(page.getByRole('region', { name: 'Certificate for this work' })).toContainText(
    'Certificate for this work: electrical installation certificate',
  );
  await expect(page.getByRole('region', { name: 'Certificate for this work' })).toContainText('Circuit 2 (Garden office sockets) was installed as a new circuit.');
  const inspections = page.getByRole('region', { name: 'Schedule of inspections' });
  await inspections.getByRole('button', { name: /^Mark the \d+ open items done$/ }).click();
  await expect(inspections).toContainText('Every item is marked.');
  // A limitation needs its note.
  await inspections.getByRole('group', { name: /^Isolation, switching off/ }).getByRole('button', { name: 'Limitation' }).click();
  await expect(inspections.getByText('Say what limited the inspection of this item.')).toBeVisible();
  await expect(page.getByRole('list', { name: 'Fails and missing readings' })).toContainText('Inspection');
  await shot(page, 'inspections-limitation');
  await inspections.getByLabel('What limited it').fill('Garden office isolator behind stored furniture; seen, not operated.');
  await inspections.getByLabel('What limited it').blur();
  await expect(page.getByText('No fails and no missing readings.')).toBeVisible();

  await page.getByLabel('Work done and its extent').fill('New radial to the garden office in 2.5 mm² SWA, B20 RCBO 30 mA, outside twin socket.');
  await visitPage.sign();
  await page.getByRole('button', { name: 'Finish visit' }).click();
  await expect(page.getByText(/Signed off .* by Aled Pryce/)).toBeVisible();
  await visitPage.openSync();
  await expect(page.getByText('Nothing waiting')).toBeVisible({ timeout: 45_000 });

  // The office: the minor works certificate is refused for the new circuit, with the reason.
  const desk = await signedInAtDesk(browser, 'office');
  const officeJob = new OfficeJobPage(desk.page);
  await desk.page.goto(`/jobs/${job.id}`);
  await officeJob.tab('Documents & links');
  await desk.page.getByRole('button', { name: 'Issue minor works certificate' }).click();
  let dialog = desk.page.getByRole('dialog', { name: 'Issue the minor works certificate?' });
  await expect(dialog.getByRole('alert', { name: 'Which certificate applies' })).toContainText('This work needs the electrical installation certificate');
  await dialog.getByRole('button', { name: 'Issue' }).click();
  await expect(desk.page.getByRole('alert').filter({ hasText: 'The minor works certificate was not issued' })).toContainText(
    'Circuit 2 (Garden office sockets) is a new circuit: a minor works certificate covers an alteration or addition to an existing circuit, and a new circuit needs an electrical installation certificate.',
  );

  // The installation certificate: the particulars start from the site's records; a TT supply needs its electrode.
  await desk.page.getByRole('button', { name: 'Issue installation certificate' }).click();
  dialog = desk.page.getByRole('dialog', { name: 'Issue the electrical installation certificate?' });
  await expect(dialog.getByRole('alert', { name: 'Which certificate applies' })).toContainText('The electrical installation certificate is the one for this work');
  const site = (await (await request.get(`/api/sites?search=${encodeURIComponent('Fernhill Close')}`, { headers })).json()) as { items: { zeOhm: number }[] };
  await expect(dialog.getByLabel('Ze (Ω)')).toHaveValue(String(site.items[0]!.zeOhm));
  await expect(dialog.getByLabel('Inspection and testing by')).toHaveValue('Aled Pryce');
  await dialog.getByRole('button', { name: 'Issue' }).click();
  await expect(dialog.getByText('a TT installation needs its earth electrode’s resistance to earth.')).toBeVisible();
  await shot(desk.page, 'issue-dialog-refused');
  await dialog.getByLabel('Earth electrode resistance (Ω)').fill('36');
  await dialog.getByLabel('Earthing conductor continuity verified').check();
  await dialog.getByLabel('Main bonding continuity verified').check();
  await dialog.getByRole('button', { name: 'Issue' }).click();
  await expect(dialog).toBeHidden({ timeout: 30_000 });
  const issued = desk.page.getByRole('table', { name: 'Issued documents' }).getByRole('row', { name: /EIC-\d{4}/ });
  await expect(issued).toContainText('Electrical installation certificate');
  await shot(desk.page, 'issued');

  // The PDF as a customer's own reader sees it: every column of the schedule, and what was recorded on the phone.
  const documents = ((await (await request.get(`/api/jobs/${job.id}/documents`, { headers })).json()) as { items: { id: string; kind: string; number: string }[] }).items;
  const certificate = documents.find((d) => d.kind === 'installation-certificate')!;
  const text = pdfToText(await (await request.get(`/api/documents/${certificate.id}/pdf`, { headers })).body());
  writeFileSync(test.info().outputPath('installation-certificate.txt'), text);
  for (const column of SCHEDULE_COLUMNS) expect(text).toContain(column);
  for (const words of ['Schedule of inspections', 'Garden office isolator behind stored furniture', 'Supply characteristics and earthing arrangements', 'Particulars at the origin', 'TT', '36 Ω', 'SWA', 'BS EN 61009-1', 'Multifunction tester, serial 40-2231', '1667', '38.6']) {
    expect(text).toContain(words);
  }
  expect(text).not.toMatch(/\bFail\b/);

  // Refused on a plain alteration (the earlier Orchard Rise job extended a ring), with the reason.
  const alteration = ((await (await request.get('/api/jobs?search=LED-0033', { headers })).json()) as { items: { id: string }[] }).items[0]!;
  const refused = await request.post(`/api/jobs/${alteration.id}/documents`, { headers, data: { kind: 'installation-certificate' } });
  expect(refused.status()).toBe(422);
  expect(((await refused.json()) as { message: string[] }).message[0]).toBe(
    'No circuit was installed new and no board was replaced: the work is an addition or alteration to existing circuits. An installation certificate is not the certificate for it: issue a minor works certificate.',
  );

  // Signed off 40 days ago: past the 30 days allowed, so overdue.
  await desk.page.goto('/notifiable-work?state=overdue');
  const row = desk.page.getByRole('row', { name: /Outside socket for the garden office/ });
  await expect(row).toContainText('Overdue');
  await expect(row).toContainText('A new circuit was installed');
  await shot(desk.page, 'overdue');
  await desk.context.close();
});

/** The schedule of circuit details and test results, column by column, as the certificate heads them. */
const SCHEDULE_COLUMNS = [
  'Circuit', 'Description', 'Type of wiring', 'Reference method', 'Points served', 'Live mm²', 'cpc mm²', 'Max disconnection time s', 'Device BS (EN)', 'Device type', 'Rating A',
  'Breaking capacity kA', 'Max permitted Zs Ω', 'RCD type', 'RCD IΔn mA',
  'Ring r1 Ω', 'Ring rn Ω', 'Ring r2 Ω', 'R1+R2 Ω', 'R2 Ω', 'Insulation test voltage V', 'Insulation live-live MΩ', 'Insulation live-earth MΩ', 'Polarity', 'Measured Zs Ω', 'RCD time ms',
  'RCD test button', 'AFDD test button',
];
