import { bookVisit, DESK, expect, recordVisitDone, test } from '../fixtures.js';

test.use({ viewport: DESK, signedInAs: 'office' });

/** The time of day today, in the browser's zone, as the phone would record it. */
const todayAt = (h: number, m = 0) => {
  const d = new Date();
  d.setHours(h, m, 0, 0);
  return d.toISOString();
};

test('a second invoice from the same visit takes nothing twice', async ({ request, officeJob }) => {
  test.setTimeout(90_000);
  const title = `Two data points in the study (billing once ${Date.now().toString(36)})`;
  const { jobId, visitId } = await bookVisit(request, { technicianEmail: 'tech2@larkfield.example', siteName: 'Fernhill Close', title, startHour: 8, endHour: 10 });
  await recordVisitDone(request, {
    technicianEmail: 'tech2@larkfield.example', visitId, arrived: todayAt(8, 5), left: todayAt(9, 50),
    parts: [{ name: 'Cat6 RJ45 plug', quantity: 2 }, { name: 'Cat6 keystone jack', quantity: 2 }],
  });

  // The first invoice takes the visit's time on site and its two parts.
  await officeJob.openBilling(jobId);
  const first = await officeJob.newInvoiceFromJob();
  await expect(first.getByRole('group', { name: /^Line \d+$/ })).toHaveCount(3);
  await expect(first.getByRole('group', { name: 'Line 1' }).getByLabel('Description')).toHaveValue(/^Labour on .*: 1 h 45 min on site/);
  await expect(first.getByRole('status', { name: 'Left out' })).toHaveCount(0);
  const number = await officeJob.issueDraft(first);

  // Built again from the same visit: nothing is taken twice, and the office is told what was left out and why.
  const second = await officeJob.newInvoiceFromJob();
  const leftOut = second.getByRole('status', { name: 'Left out' });
  await expect(leftOut).toContainText('Left out: already invoiced');
  await expect(leftOut.getByRole('listitem')).toHaveText([new RegExp(`^Visit .*: labour and 2 parts already on ${number}, so not taken again\\.$`)]);
  await expect(second.getByRole('group', { name: /^Line \d+$/ })).toHaveCount(0);
  await expect(second.getByText(/^No lines yet\./)).toBeVisible();
});
