import { execFileSync } from 'node:child_process';
import { readFile } from 'node:fs/promises';
import type { APIRequestContext } from '@playwright/test';
import { apiSession, bookVisit, expect, PHONE, ROLE_USERS, signedInAtDesk, test } from '../fixtures.js';
import { OfficeJobPage } from '../pages/office-job-page.js';
import { typeInPicker } from '../pages/pickers.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

const pdfToText = (pdf: Buffer) => execFileSync('pdftotext', ['-raw', '-', '-'], { input: pdf }).toString('utf8').replace(/\s+/g, ' ');

/** The text of an issued document's PDF, as pdftotext reads it. */
async function documentText(request: APIRequestContext, documentId: string): Promise<string> {
  const office = await apiSession(request, ROLE_USERS.office);
  const pdf = await request.get(`/api/documents/${documentId}/pdf`, { headers: { authorization: `Bearer ${office.accessToken}` } });
  expect(pdf.status()).toBe(200);
  return pdfToText(await pdf.body());
}

test('a link’s results typed offline on the phone, a CSV imported at the desk, and both kinds of cabling report', async ({ browser, page, context, request, technicianVisit: visitPage }) => {
  test.setTimeout(240_000);
  const stamp = Date.now().toString(36);
  const title = `Certify the reception links (${stamp})`;
  const typed = `RX-${stamp.slice(-4)}A`;
  const imported = `RX-${stamp.slice(-4)}B`;
  const { jobId } = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Brightwater Dental, Harbour Yard', title, startHour: 0, endHour: 23 });

  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });
  await visitPage.goOffline(context);
  await card.getByRole('button', { name: 'I’m on site' }).click();
  await card.getByRole('link', { name: 'Open visit' }).click();
  await visitPage.section('Cables');

  // Two cables recorded with no signal: one tested here, the other's results come from the tester's file later.
  for (const label of [typed, imported]) {
    await page.getByRole('link', { name: 'Record a cable' }).click();
    await visitPage.cableForm.getByLabel('Label', { exact: true }).fill(label);
    await visitPage.cableForm.getByLabel('Medium').selectOption('Cat6');
    await visitPage.cableForm.getByRole('button', { name: 'Save new cable' }).click();
    await expect(page.getByText(`Cable ${label} saved on this phone.`)).toBeVisible();
  }

  await page.getByRole('list', { name: 'Cable runs' }).getByRole('link', { name: new RegExp(`^${typed}`) }).click();
  // The tracing cautions come first, once per visit, then each step of the trace is logged.
  const before = page.getByRole('region', { name: 'Before tracing' });
  await expect(before).toContainText('Never connect a tone generator to a live mains conductor');
  await expect(before).toContainText('Electricity at Work Regulations 1989');
  await expect(before).toContainText('HSE GS38');
  await before.getByRole('button', { name: 'I have read this: start tracing' }).click();
  const step = page.getByRole('form', { name: 'Add a trace step' });
  await step.getByLabel('Tone connected at').fill('Patch panel port 7, proved dead first');
  await step.getByLabel('Heard at').fill('Reception desk, left faceplate');
  await step.getByLabel('Turned out to be').fill('The reception PC’s link');
  await step.getByRole('button', { name: 'Add to the trace log' }).click();
  await expect(page.getByRole('list', { name: 'Trace steps' })).toContainText('Tone on Patch panel port 7, proved dead first; heard Reception desk, left faceplate');

  await page.getByRole('link', { name: 'Performance results' }).click();
  const form = page.getByRole('form', { name: `Performance results of ${typed}` });
  await form.getByLabel('Limit set').selectOption({ label: 'ANSI/TIA-568.2-D Category 6 permanent link' });
  await form.getByLabel('Make').fill('Tallis Instruments');
  await form.getByLabel('Model').fill('LT-600');
  await form.getByLabel('Serial number').fill('TL6-20931');
  await typeInPicker(form, 'Calibrated on', '20/01/2026');
  await form.getByLabel('Adapter used').fill('Cat6 permanent link adapter pair');
  const margin = (parameter: string, value: string) => form.getByRole('region', { name: parameter, exact: true }).getByLabel(/^Margin/).fill(value);
  await margin('Insertion loss', '11.4');
  await margin('NEXT', '4.1');
  await margin('PS NEXT', '5.3');
  await margin('Return loss', '-0.6');
  await form.getByRole('region', { name: 'Propagation delay' }).getByLabel(/^Value/).fill('212');
  // A return loss below its limit line fails the link as it is typed.
  await expect(form.getByRole('status', { name: 'Overall result' })).toContainText('Fail');
  await margin('Return loss', '0.3');
  await form.getByRole('region', { name: 'Return loss' }).getByLabel('Within the tester’s accuracy').check();
  await expect(form.getByRole('status', { name: 'Overall result' })).toContainText('Pass');
  await expect(form.getByRole('status', { name: 'Overall result' })).toContainText('our own term');
  await form.getByRole('button', { name: 'Save new results' }).click();
  await expect(page.getByText(`Cable ${typed} (performance results) saved on this phone.`)).toBeVisible();

  await context.setOffline(false);
  await visitPage.openSync();
  await expect(page.getByText('Nothing waiting')).toBeVisible({ timeout: 45_000 });

  // At the desk: the results arrived; the second link has none yet, so the report is the wiremap and length record.
  const desk = await signedInAtDesk(browser, 'office');
  const job = new OfficeJobPage(desk.page);
  await desk.page.goto(`/jobs/${jobId}`);
  await job.expectJob(title);
  await job.tab('Cable schedule');
  const results = desk.page.getByRole('grid', { name: 'Performance results' });
  await expect(results.getByRole('row', { name: new RegExp(typed) })).toContainText('Pass');

  const record = await documentText(request, await job.issueCablingReport(jobId));
  expect(record).toContain('Wiremap and length record');
  expect(record).toContain('It is not a certification to any category or class');
  expect(record).not.toContain('Cabling certification report');
  await expect(job.documentRow('Wiremap and length record')).toBeVisible();

  // Our own CSV template, downloaded, filled and imported: a bad file is refused whole with each cell named.
  await job.tab('Cable schedule');
  const download = desk.page.waitForEvent('download');
  await desk.page.getByRole('button', { name: 'Download the CSV template' }).click();
  const template = (await readFile(await (await download).path())).toString('utf8');
  expect(template.startsWith('cable_label,medium,limit_set,tester_make,tester_model,tester_serial,calibrated_on,adapter,')).toBe(true);
  const header = template.trim().split(',');
  const row = (cells: Record<string, string>) => header.map((c) => cells[c] ?? '').join(',');
  const file = (rows: Record<string, string>[]) => ({ name: 'reception-links.csv', mimeType: 'text/csv', buffer: Buffer.from([header.join(','), ...rows.map(row)].join('\r\n')) });
  const good = { cable_label: imported, limit_set: 'tia-cat6-permanent-link', tester_make: 'Tallis Instruments', tester_model: 'LT-600', tester_serial: 'TL6-20931', calibrated_on: '2026-01-20', next_margin_db: '3.9', return_loss_margin_db: '2.2', delay_skew_ns: '12' };
  await desk.page.getByLabel('CSV file of link results').setInputFiles(file([good, { ...good, cable_label: 'NO-SUCH', next_margin_db: 'lots' }]));
  const refused = desk.page.getByRole('alert').filter({ hasText: 'Nothing was imported' });
  await expect(refused).toContainText('Line 3, column next_margin_db: "lots" is not a number.');
  await expect(refused).toContainText('Line 3, column cable_label: No cable labelled "NO-SUCH"');
  await expect(results.getByRole('row', { name: new RegExp(imported) })).toHaveCount(0);
  await desk.page.getByLabel('CSV file of link results').setInputFiles(file([good]));
  await expect(desk.page.getByRole('status').filter({ hasText: `1 link imported from reception-links.csv: ${imported}.` })).toBeVisible();
  await expect(results.getByRole('row', { name: new RegExp(imported) })).toContainText('Pass');

  // Every link now passes to a named limit set: the report is a certification, and says what each was tested with.
  const certificate = await documentText(request, await job.issueCablingReport(jobId));
  for (const expected of [
    'Cabling certification report',
    'All 2 links in this report have performance results to a named limit set, and each passes it.',
    'ANSI/TIA-568.2-D Category 6 permanent link',
    'Tallis Instruments LT-600, serial TL6-20931, calibrated 2026-01-20',
    'Return loss +0.3 dB (within the tester’s accuracy)',
    'Propagation delay 212 ns (≤ 498 ns)', // ANSI/TIA-568.2-D permanent link propagation delay (from memory)
    'Delay skew 12 ns (≤ 44 ns)', // ANSI/TIA-568.2-D permanent link delay skew (from memory)
    '“Within the tester’s accuracy” is our own term',
  ]) {
    expect(certificate).toContain(expected);
  }
  expect(certificate).not.toContain('It is not a certification');
  await expect(job.documentRow('Cabling certification report')).toBeVisible();
  await desk.context.close();
});
