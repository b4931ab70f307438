import { readFile } from 'node:fs/promises';
import { apiSession, DESK, expect, test } from '../fixtures.js';

test.use({ viewport: DESK, signedInAs: 'office' });

const T568A = ['white-green', 'green', 'white-orange', 'blue', 'white-blue', 'orange', 'white-brown', 'brown'];
const T568B = ['white-orange', 'orange', 'white-green', 'blue', 'white-blue', 'green', 'white-brown', 'brown'];

function uuidv7(): string {
  const hex = (n: number) => Array.from({ length: n }, () => Math.floor(Math.random() * 16).toString(16)).join('');
  const ms = Date.now().toString(16).padStart(12, '0');
  return `${ms.slice(0, 8)}-${ms.slice(8)}-7${hex(3)}-${'89ab'[Math.floor(Math.random() * 4)]}${hex(3)}-${hex(12)}`;
}

test('the office works the jobs board and table, reads a job’s cable schedule as CSV, and edits a site', async ({ page, request, officeJob }) => {
  test.setTimeout(90_000);
  // The server may be reused between runs: this run's records carry its own stamp.
  const stamp = Date.now().toString(36).slice(-5).toUpperCase();

  // Aled records two cables at the practice on his phone: one terminated T568A at the near end (a crossed pair), one right.
  const office = await apiSession(request, 'office@larkfield.example');
  const aled = await apiSession(request, 'tech2@larkfield.example');
  const asOffice = { authorization: `Bearer ${office.accessToken}` };
  const job = (await (await request.get('/api/jobs?search=LED-0042', { headers: asOffice })).json()).items[0];
  const visit = (await (await request.get(`/api/visits?jobId=${job.id}`, { headers: asOffice })).json()).items[0];
  const areas = (await (await request.get(`/api/areas?siteId=${job.siteId}`, { headers: asOffice })).json()).items as { id: string; name: string }[];
  const area = (name: string) => areas.find((a) => a.name === name)!.id;
  const cable = (label: string, near: string[], description: string, lengthM: number) => ({
    mutationId: uuidv7(), entity: 'cableRun', id: uuidv7(), baseVersion: 0, hlc: `${new Date().toISOString()}-0000-desk-e2e-phone`,
    set: {
      siteId: job.siteId, label, medium: 'Cat6', scheme: 'T568B', linkKind: 'permanent-link', status: 'tested', lastVisitId: visit.id,
      endAAreaId: area('Comms cupboard'), endADescription: `Patch panel, ${label}`, endBAreaId: area('Surgery 1'), endBDescription: description,
      wiremap: { nearEnd: near, farEnd: T568B }, lengthM, testedAt: new Date().toISOString(),
    },
  });
  const pushed = await request.post('/api/sync/push', {
    headers: { authorization: `Bearer ${aled.accessToken}` },
    data: { deviceId: 'desk-e2e-phone', mutations: [cable(`X${stamp}-1`, T568A, 'Wall plate, by the chair', 31.6), cable(`X${stamp}-2`, T568B, 'X-ray unit', 12)] },
  });
  expect((await pushed.json()).results.map((r: { status: string }) => r.status)).toEqual(['applied', 'applied']);

  await page.goto('/');

  // The board: a column per open status, each job a card.
  await expect(page.getByRole('heading', { name: 'Jobs', level: 1 })).toBeVisible();
  await expect(officeJob.boardCard('Booked', /LED-0041/)).toContainText('Orchard Rise');
  await expect(officeJob.boardCard('On site', /LED-0042/)).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('desk-board.png') });

  // The table: filtered by technician and sorted by reference, newest reference first, on the server.
  await page.getByRole('group', { name: 'View' }).getByRole('button', { name: 'Table' }).click();
  const grid = page.getByRole('grid', { name: 'Jobs' });
  // The demo's own jobs, LED-0040 to LED-0049: other tests take jobs of their own, enough to fill the first page.
  await page.getByLabel('Search').fill('LED-004');
  await expect(grid.getByRole('row', { name: /LED-0045/ })).toBeVisible();
  await page.getByRole('combobox', { name: 'Technician' }).click();
  await page.getByRole('option', { name: 'Sam Brannigan' }).click();
  await expect(grid.getByRole('row', { name: /LED-0045/ })).toHaveCount(0);
  await expect(page).toHaveURL(/technician=/);
  await grid.getByRole('columnheader', { name: 'Reference' }).click();
  await expect(page).toHaveURL(/sort=reference/);
  await grid.getByRole('columnheader', { name: 'Reference' }).click();
  await expect(page).toHaveURL(/dir=desc/);
  // The demo's own jobs: other tests book Sam on jobs of their own, which now take the next reference too.
  const references = grid.getByRole('row').filter({ hasText: /LED-004[12]/ });
  await expect(references).toHaveText([/LED-0042/, /LED-0041/]);
  await page.getByLabel('Search').fill('harbour');
  await expect(references).toHaveText([/LED-0042/]);
  await page.screenshot({ path: test.info().outputPath('desk-table.png') });

  // The job, its cable schedule with the fault named, and the schedule as CSV.
  await grid.getByRole('link', { name: /Cat6 to reception/ }).click();
  await officeJob.expectJob(/Cat6 to reception/);
  await officeJob.tab('Cable schedule');
  const crossed = officeJob.cableRow(`X${stamp}-1`);
  await expect(crossed).toContainText('Crossed pairs, pins 1, 2, 3, 6 (near end)');
  await expect(crossed).toContainText('Surgery 1 · Wall plate, by the chair');
  await expect(crossed).toContainText('Fail');
  await expect(officeJob.cableRow(`X${stamp}-2`)).toContainText('Pass');
  await page.screenshot({ path: test.info().outputPath('desk-cable-schedule.png') });
  const file = await officeJob.exportCableSchedule();
  expect(file.suggestedFilename()).toMatch(/^LED-0042-brightwater-dental-harbour-yard-cable-schedule-\d{4}-\d{2}-\d{2}\.csv$/);
  const csv = (await readFile(await file.path())).toString('utf8').replace(/^\uFEFF/, '');
  const lines = csv.split('\r\n');
  expect(lines[0]).toBe('Label,From area,From position,From termination,To area,To position,To termination,Medium,Scheme,Length (m),Link,Wiremap,Length check,Verdict,Status,Last tested');
  const row = lines.find((l) => l.startsWith(`X${stamp}-1,`));
  expect(row).toContain(`Comms cupboard,"Patch panel, X${stamp}-1",,Surgery 1,"Wall plate, by the chair",,Cat6,T568B,31.6,Permanent link,"Crossed pairs, pins 1, 2, 3, 6 (near end)"`);
  expect(row).toContain(',Fail,Tested,');
  // Every cable at the site, the seed's included, not just one page.
  expect(lines.some((l) => l.startsWith('RC-01,'))).toBe(true);

  // The site: its Ze corrected, after a value the form refuses, and a circuit added.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Customers & sites' }).click();
  // Brightwater's practice: Fernhill Close's board is the demo's installation certificate, whose schedule every circuit joins.
  await page.getByRole('grid', { name: 'Sites' }).getByRole('link', { name: 'Brightwater Dental, Harbour Yard' }).click();
  await page.getByRole('button', { name: 'Change site details' }).click();
  const siteForm = page.getByRole('dialog', { name: /Change Brightwater Dental, Harbour Yard/ });
  await siteForm.getByLabel('Ze (Ω)').fill('-1');
  await siteForm.getByRole('button', { name: 'Save changes' }).click();
  await expect(siteForm.getByText('Ze must be at least 0 Ω.')).toBeVisible();
  const ze = (21 + (parseInt(stamp, 36) % 300) / 10).toFixed(1);
  await siteForm.getByLabel('Ze (Ω)').fill(ze);
  await siteForm.getByRole('button', { name: 'Save changes' }).click();
  await expect(siteForm).toBeHidden();
  // Shown as a number, so 37.0 reads 37.
  await expect(page.getByRole('region', { name: 'Supply and access' })).toContainText(`${Number(ze)} Ω`);

  await page.getByRole('button', { name: 'Add circuit' }).click();
  const circuitForm = page.getByRole('dialog', { name: 'Add a circuit' });
  await circuitForm.getByLabel('Circuit number').fill(`G${stamp}`);
  await circuitForm.getByLabel('Description').fill(`Garden office ${stamp}`);
  await circuitForm.getByLabel('Kind of circuit').click();
  await page.getByRole('option', { name: 'Radial' }).click();
  await circuitForm.getByLabel('Protective device').click();
  await page.getByRole('option', { name: 'Type B circuit-breaker' }).click();
  await circuitForm.getByLabel('Rating', { exact: true }).fill('abc');
  await circuitForm.getByRole('button', { name: 'Add circuit' }).click();
  await expect(circuitForm.getByText('Rating must be a number, like 32 A.')).toBeVisible();
  await circuitForm.getByLabel('Rating', { exact: true }).fill('20');
  await circuitForm.getByLabel('RCD rating').fill('30');
  await circuitForm.getByLabel('Live conductor size').fill('2.5');
  await circuitForm.getByLabel('cpc size').fill('1.5');
  await circuitForm.getByRole('button', { name: 'Add circuit' }).click();
  await expect(circuitForm).toBeHidden();
  const added = page.getByRole('table', { name: 'Circuits' }).getByRole('row', { name: new RegExp(`Garden office ${stamp}`) });
  await expect(added).toContainText('Radial');
  await expect(added).toContainText('Type B 20 A');
  await expect(added).toContainText('2.5 / 1.5');
  await page.screenshot({ path: test.info().outputPath('desk-site.png'), fullPage: true });

  // What the office saved reaches the server as numbers, on the site it was added to.
  const circuits = (await (await request.get(`/api/circuits?search=${encodeURIComponent(`Garden office ${stamp}`)}`, { headers: asOffice })).json()).items;
  expect(circuits).toEqual([expect.objectContaining({ number: `G${stamp}`, kind: 'radial', deviceType: 'B', deviceRatingA: 20, rcdRatingMa: 30, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 })]);
});
