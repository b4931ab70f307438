import { v7 as uuidv7 } from 'uuid';
import { apiSession, DESK, expect, PHONE, SIGNED_OUT, test } from '../fixtures.js';

test.use({ viewport: DESK, signedInAs: 'office' });

/** The mail fake that the test server starts beside the API (scripts/e2e-server.mjs): its web inbox. */
const MAIL_INBOX = `http://127.0.0.1:${Number(process.env.E2E_PORT ?? 3100) + 1001}/messages`;

interface CaughtMail {
  to: string[];
  cc: string;
  subject: string;
  text: string;
  html: string;
  attachments: { filename: string; contentType: string; size: number }[];
}

test('the office reviews a finished job, settles a conflict, issues the certificate, e-mails it, and the customer opens the link', async ({
  page,
  request,
  browser,
  officeJob: job,
}) => {
  test.setTimeout(150_000);
  const stamp = Date.now().toString(36);
  const shot = (name: string) => page.screenshot({ path: test.info().outputPath(`${name}.png`), fullPage: true });

  // Aled's tablet, offline since the visit, edits a reading after the visit was signed: it waits for the office.
  const aled = await apiSession(request, 'tech2@larkfield.example');
  const pulled = (await (await request.get(`/api/sync/pull?checkpoint=0&limit=1000&deviceId=tablet${stamp}`, { headers: { authorization: `Bearer ${aled.accessToken}` } })).json()) as {
    changes: { entity: string; row: Record<string, unknown> | null }[];
  };
  // A pull also carries rows that left the technician's scope, as deletions without a row.
  const signed = pulled.changes.find((c) => c.entity === 'visit' && c.row?.status === 'finished' && c.row.signedByName)!.row!;
  const reading = pulled.changes.find((c) => c.entity === 'testResult' && c.row?.visitId === signed.id)!.row!;
  const pushed = await request.post('/api/sync/push', {
    headers: { authorization: `Bearer ${aled.accessToken}` },
    data: {
      deviceId: `tablet${stamp}`,
      mutations: [{ mutationId: uuidv7(), entity: 'testResult', id: reading.id, baseVersion: reading.version, set: { instrument: `Borrowed tester (${stamp})` }, hlc: `${new Date().toISOString()}-0000-tablet${stamp}` }],
    },
  });
  expect((await pushed.json()).results[0]).toMatchObject({ status: 'merged', conflictIds: [expect.any(String)] });

  await page.goto('/');

  // The job the technician finished waits in the paperwork column.
  const card = job.boardCard('Paperwork', /LED-0033/);
  await expect(card).toBeVisible();
  await job.openFromCard(card, /Extra double socket in the front bedroom/);
  await job.expectJob('Extra double socket in the front bedroom');
  await shot('job-overview');

  // Its photo trail and the site's cable schedule.
  await job.tab('Photo trail');
  const trail = job.photoTrail;
  await expect(trail.getByRole('img', { name: /Route chased down/ })).toBeVisible();
  await shot('job-photo-trail');
  await job.tab('Cable schedule');
  await expect(job.cableRow(/OR-01/)).toBeVisible();
  await shot('job-cable-schedule');

  // The reading changed after signing is a conflict on this job: the signed value stays.
  await job.openConflicts();
  const conflict = page.getByRole('article').filter({ hasText: `Borrowed tester (${stamp})` });
  await expect(conflict).toContainText(/after the visit was finished and signed|after a certificate or report was issued/);
  await shot('job-conflict');
  await conflict.getByRole('button', { name: 'Keep as it is' }).click();
  await expect(conflict).toHaveCount(0);
  await page.goBack();

  // Issue the certificate: the server judges the readings again and numbers it.
  await job.expectJob('Extra double socket in the front bedroom');
  await job.issueMinorWorksCertificate();
  const issued = job.issuedDocuments;
  const row = job.documentRow('Minor works certificate');
  await expect(row).toBeVisible({ timeout: 20_000 });
  const number = (await row.getByRole('cell').first().innerText()).trim();
  expect(number).toMatch(/^MW-\d{4}$/);
  await shot('job-documents');

  // E-mail it to the customer: the mail carries the PDF and a link to the job's record.
  const send = await job.openEmail(number);
  await expect(send.getByLabel('To', { exact: true })).toHaveValue('hannah.greaves@example.com');
  await send.getByRole('button', { name: 'Send' }).click();
  await expect(issued.getByRole('row', { name: new RegExp(number) })).toContainText('Sent', { timeout: 30_000 });
  await shot('job-documents-sent');
  let mail: CaughtMail | undefined;
  await expect
    .poll(async () => {
      const inbox = (await (await request.get(MAIL_INBOX)).json()) as CaughtMail[];
      mail = inbox.find((m) => m.subject.includes(number));
      return mail?.to;
    })
    .toEqual(['hannah.greaves@example.com']);
  expect(mail!.attachments).toEqual([expect.objectContaining({ filename: `${number}.pdf`, contentType: 'application/pdf' })]);
  expect(mail!.attachments[0]!.size).toBeGreaterThan(10_000);
  const link = /https?:\/\/\S+\/shared\/\S+/.exec(mail!.text)?.[0];
  expect(link).toBeTruthy();

  // The customer opens the link on their phone, with no account.
  const customer = await browser.newContext({ viewport: PHONE, serviceWorkers: 'block', storageState: SIGNED_OUT });
  try {
    const phone = await customer.newPage();
    await phone.goto(new URL(link!).pathname);
    await expect(phone.getByRole('heading', { level: 1, name: 'Extra double socket in the front bedroom' })).toBeVisible();
    await expect(phone.getByRole('link', { name: `Download PDF of ${number}` })).toBeVisible();
    await expect(phone.getByRole('list', { name: 'Photos' }).getByRole('button', { name: /^Open photo: / }).first()).toBeVisible();
    await phone.screenshot({ path: test.info().outputPath('customer-link.png'), fullPage: true });
  } finally {
    await customer.close();
  }

  // The photo record too, then both papers in one e-mail, with the office's own words and a copy to the landlord.
  await job.issuePhotoRecord();
  const photoRow = job.documentRow('Photo record');
  await expect(photoRow).toBeVisible({ timeout: 20_000 });
  const photoNumber = (await photoRow.getByRole('cell').first().innerText()).trim();
  expect(photoNumber).toMatch(/^PR-\d{4}$/);
  const both = await job.openEmail(photoNumber);
  await both.getByRole('checkbox', { name: `Minor works certificate ${number}` }).check();
  await both.getByLabel('Copy to (optional)').fill('lettings@greaves-lettings.example');
  await both.getByLabel('Your message (optional)').fill(`Thank you for having us (${stamp}). Both papers are attached.`);
  await both.getByRole('button', { name: 'Send' }).click();
  await expect(issued.getByRole('row', { name: new RegExp(photoNumber) })).toContainText('Sent', { timeout: 30_000 });
  let together: CaughtMail | undefined;
  await expect
    .poll(async () => {
      const inbox = (await (await request.get(MAIL_INBOX)).json()) as CaughtMail[];
      together = inbox.find((m) => m.subject.includes(photoNumber) && m.subject.includes(number));
      return together?.cc;
    })
    .toBe('lettings@greaves-lettings.example');
  expect(together!.attachments.map((a) => a.filename)).toEqual([`${photoNumber}.pdf`, `${number}.pdf`]);
  expect(together!.text).toContain(`Thank you for having us (${stamp}). Both papers are attached.`);
  expect(together!.html).toContain(`Thank you for having us (${stamp}). Both papers are attached.`);
});
