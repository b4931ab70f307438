import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import type { Locator } from '@playwright/test';
import { apiSession, bookVisit, expect, PHONE, ROLE_USERS, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/**
 * A ring whose Zs fails cannot be signed into a certificate by writing a departure: the office's issue is refused,
 * naming the circuit and the reading, until the circuit is tested again on a later visit and passes.
 */
test('a visit with a failing Zs cannot be finished into an issuable certificate without a retest', async ({ page, request, technicianVisit: visitPage }) => {
  test.setTimeout(180_000);
  const stamp = Date.now().toString(36);
  const title = `Add a socket to the ring (${stamp})`;
  const { jobId, visitId } = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 8, endHour: 10 });
  const office = await apiSession(request, ROLE_USERS.office);
  const headers = { authorization: `Bearer ${office.accessToken}` };

  /** Sound ring readings, with the Zs and the RCD time given. */
  async function fillRing(readings: Locator, zs: string): Promise<void> {
    // r1 = rn within 0.05 Ω (IET GN3 9th ed. 2022, step 1); r2 within 3 % of 1.633 × r1 (IEC 60228 ratio; 3 % trade practice);
    // R1+R2 (0.56 + 0.92) / 4 = 0.37 Ω (GN3 step 3); 200 MΩ at 500 V against 1.0 MΩ (BS 7671:2018+A3:2024 Table 64);
    // 24 ms at 30 mA against 300 ms (Reg 643.8).
    await readings.getByLabel('r1 (Ω)', { exact: true }).fill('0.56');
    await readings.getByLabel('rn (Ω)', { exact: true }).fill('0.56');
    await readings.getByLabel('r2 (Ω)', { exact: true }).fill('0.92');
    await readings.getByLabel('R1+R2 (Ω)', { exact: true }).fill('0.37');
    await readings.getByLabel('Live to live (MΩ)').fill('200');
    await readings.getByLabel('Live to earth (MΩ)').fill('200');
    await readings.getByRole('button', { name: 'Correct', exact: true }).click();
    await readings.getByLabel('Measured Zs (Ω)').fill(zs);
    await readings.getByLabel('Time at 30 mA (ms)').fill('24');
    await readings.getByLabel('Instrument').fill('Multifunction tester');
  }

  async function signAndSync(): Promise<void> {
    await visitPage.sign();
    await page.getByRole('button', { name: 'Finish visit' }).click();
  }

  async function waitForSync(): Promise<void> {
    await visitPage.openSync();
    await expect(page.getByText('Nothing waiting')).toBeVisible({ timeout: 45_000 });
  }

  // First visit: Zs 1.25 Ω on the B32 ring is above 0.8 × 1.37 = 1.10 Ω (BS 7671:2018+A3:2024 Table 41.3; Appendix 3, trade practice).
  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });
  await card.getByRole('link', { name: /^Open / }).click();
  await visitPage.expectVisit(title);
  await visitPage.section('Circuits & tests');
  await visitPage.readCautions();
  let readings = await visitPage.openReadings(/^1 · Sockets, ground floor/, 1);
  await fillRing(readings, '1.25');
  await expect(readings.getByRole('button', { name: /^Earth fault loop impedance Zs: Fail/ })).toBeVisible();
  await readings.getByRole('button', { name: 'Save readings' }).click();
  await expect(page.getByText('Readings saved on this phone.')).toBeVisible();

  // A departure written on the sign-off leaves the fail listed, and finishing still asks.
  await visitPage.section('Sign-off');
  await expect(page.getByRole('list', { name: 'Fails and missing readings' })).toContainText('Fail: Circuit 1 (Sockets, ground floor): Earth fault loop impedance Zs');
  await page.getByRole('button', { name: 'Add a departure' }).click();
  const departure = page.getByRole('group', { name: 'Departure 1' });
  await departure.getByLabel('Regulation departed from').fill('411.3.2');
  await departure.getByLabel('What is done instead').fill('Left as found until the supply earth is improved.');
  await departure.getByLabel('Why it gives no less safety').fill('The 30 mA RCD trips in 24 ms.');
  await page.getByLabel('Observations').fill('Zs high on ring 1.');
  await signAndSync();
  await page.getByRole('dialog', { name: /Finish with a problem listed/ }).getByRole('button', { name: 'Finish anyway' }).click();
  await expect(page.getByText(/Signed off .* by Sam Brannigan/)).toBeVisible();
  await waitForSync();

  // The office cannot issue it: the refusal names the circuit and the reading, and says to test again.
  const refused = await request.post(`/api/jobs/${jobId}/documents`, { headers, data: { kind: 'minor-works' } });
  expect(refused.status()).toBe(422);
  const { message } = (await refused.json()) as { message: string[] };
  expect(message[0]).toMatch(/^Circuit 1 \(Sockets, ground floor\): Earth fault loop impedance Zs fails\. Zs 1\.25 Ω is above 1\.10 Ω/);
  expect(message).toContain('Record the missing readings, put right what fails and test the circuit again: a departure from the standard never stands in for a test result.');

  // A return visit on the same job: the fault put right, the ring tested again at 0.62 Ω (within 1.10 Ω).
  const first = (await (await request.get(`/api/visits/${visitId}`, { headers })).json()) as { siteId: string; technicianIds: string[] };
  const at = (h: number) => {
    const d = new Date();
    d.setHours(h, 0, 0, 0);
    return d.toISOString();
  };
  const booked = await request.post('/api/visits', { headers, data: { jobId, siteId: first.siteId, technicianIds: first.technicianIds, plannedStart: at(11), plannedEnd: at(12), status: 'planned' } });
  expect(booked.ok()).toBe(true);
  const retestId = ((await booked.json()) as { id: string }).id;
  // The phone learns of the new visit at its next sync.
  await visitPage.openSync();
  await page.getByRole('button', { name: 'Sync now' }).click();
  await expect(async () => {
    await page.goto(`/visits/${retestId}`);
    await visitPage.expectVisit(title);
  }).toPass({ timeout: 45_000 });
  await visitPage.section('Circuits & tests');
  await visitPage.readCautions();
  readings = await visitPage.openReadings(/^1 · Sockets, ground floor/, 1);
  await fillRing(readings, '0.62');
  await expect(readings.getByRole('button', { name: /^Earth fault loop impedance Zs: Pass/ })).toBeVisible();
  await readings.getByRole('button', { name: 'Save readings' }).click();
  await expect(page.getByText('Readings saved on this phone.')).toBeVisible();
  await visitPage.section('Sign-off');
  await expect(page.getByText('No fails and no missing readings.')).toBeVisible();
  await page.getByLabel('Work done and its extent').fill('Supply earth connection remade; ring 1 tested again.');
  await signAndSync();
  await expect(page.getByText(/Signed off .* by Sam Brannigan/)).toBeVisible();
  await waitForSync();

  // Now it issues, carrying the retest and the departure, with no Fail on it.
  const issued = await request.post(`/api/jobs/${jobId}/documents`, { headers, data: { kind: 'minor-works' } });
  expect(issued.status()).toBe(201);
  const certificate = (await issued.json()) as { id: string; number: string };
  expect(certificate.number).toMatch(/^MW-\d{4}$/);

  // The PDF as a customer's own reader sees it (poppler's pdftotext): the declaration, the amendment, every field.
  const pdf = await request.get(`/api/documents/${certificate.id}/pdf`, { headers });
  expect(pdf.ok()).toBe(true);
  const text = pdfToText(await pdf.body());
  writeFileSync(test.info().outputPath('certificate.txt'), text);
  for (const expected of CERTIFICATE_CONTENT) expect(text).toMatch(expected);
  expect(text).not.toMatch(/\bFail\b/);
});

/** Poppler's pdftotext, reading order kept, lines joined: what a search of the document finds. */
function pdfToText(pdf: Buffer): string {
  return execFileSync('pdftotext', ['-raw', '-', '-'], { input: pdf }).toString('utf8').replace(/\s+/g, ' ');
}

/**
 * What the model minor works certificate asks for (BS 7671:2018+A3:2024 Appendix 6, in our own layout and words),
 * for circuit 1 at Orchard Rise as the demo records it and as this test tested it.
 */
const CERTIFICATE_CONTENT: RegExp[] = [
  /Declaration/,
  /does not impair the safety of the existing installation/,
  // The amendment in force on the completion date (A3:2024 from 31 July 2024, M)
  /designed, constructed, inspected and tested in accordance with BS 7671:2018\+A3:2024, in force on/,
  /WORK DONE AND TESTED BY Sam Brannigan/,
  /POSITION/,
  /EARTHING ARRANGEMENT TN-C-S/,
  /EXTERNAL EARTH FAULT LOOP IMPEDANCE ZE 0\.28 Ω/,
  /ZDB/,
  /EARTHING CONDUCTOR/,
  /MAIN BONDING TO WATER/,
  /MAIN BONDING TO GAS/,
  /MAIN BONDING TO OIL/,
  /MAIN BONDING TO STRUCTURAL STEEL/,
  /MAIN BONDING TO OTHER PARTS/,
  /Comments on the existing installation \(Reg 644\.1\.2\)/,
  /Permitted exceptions \(Reg 411\.3\.3\)/,
  /Circuit 1 \(Sockets, ground floor\)/,
  /METHOD OF FAULT PROTECTION/,
  /PROTECTIVE DEVICE Type B circuit-breaker, 32 A/,
  /RCD 30 mA/,
  /AFDD/,
  /REFERENCE METHOD/,
  /NUMBER OF POINTS SERVED/,
  /MAXIMUM DISCONNECTION TIME ALLOWED/,
  // The retest's readings (the ring end-to-end figures and Zs typed above)
  /R1\+R2 \(protective conductor continuity\) 0\.37 Ω/,
  /0\.62 Ω/,
  /RCD test button/,
  /AFDD test button/,
  // The departure written on the first visit, with its three parts (Regs 120.3, 133.1.3, 133.5)
  /411\.3\.2/,
  /Left as found until the supply earth is improved\./,
];
