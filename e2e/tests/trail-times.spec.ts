import { bookVisit, expect, PHONE, ROLE_USERS, signedInAtDesk, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

const hhmm = (d: Date) => new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', timeZone: 'Europe/London' }).format(d);

/**
 * A note made on site keeps the time it was made, on the phone and at the desk, after the server has taken it in:
 * the phone's clock here runs apart from the server's, as a day's work does when it waits for a signal.
 */
test('the trail keeps the time a record was made on the phone, before and after it syncs', async ({ page, browser, request, technicianVisit: visitPage }) => {
  test.setTimeout(120_000);
  const stamp = Date.now().toString(36);
  const title = `Note the time (${stamp})`;
  const { jobId, visitId } = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 0, endHour: 23 });
  // Behind by 20 minutes, or, just after midnight, ahead by 3 (within the 5 the server allows): the same day either way.
  const london = new Intl.DateTimeFormat('en-GB', { hour: 'numeric', minute: 'numeric', hourCycle: 'h23', timeZone: 'Europe/London' }).formatToParts(new Date());
  const minutesToday = Number(london.find((p) => p.type === 'hour')!.value) * 60 + Number(london.find((p) => p.type === 'minute')!.value);
  const madeAt = new Date(Date.now() + (minutesToday < 25 ? 3 : -20) * 60_000);
  await page.clock.install({ time: madeAt });

  await visitPage.openToday();
  await visitPage.openFromToday(title);
  const note = `Floorboards lifted on the landing (${stamp})`;
  await visitPage.addNote(note);
  // The phone's time of making it: its clock started at madeAt and has run on since.
  const shown = /\d\d:\d\d/.exec((await visitPage.trailEntry(note).textContent()) ?? '')?.[0];
  expect([0, 1, 2].map((m) => hhmm(new Date(madeAt.getTime() + m * 60_000)))).toContain(shown);

  // Sent, and pulled back with the server's own time of arrival beside it: the trail still says when it was made.
  await visitPage.openSync();
  await expect(page.getByText('Nothing waiting')).toBeVisible({ timeout: 45_000 });
  await page.getByRole('button', { name: 'Sync now' }).click();
  await expect(page.getByText('Up to date').first()).toBeVisible({ timeout: 20_000 });
  await page.goto(`/visits/${visitId}`);
  await expect(visitPage.trailEntry(note)).toContainText(shown!);
  await expect(visitPage.trailEntry(note)).not.toContainText(hhmm(new Date()));

  // At the desk, on the visit's own page.
  const desk = await signedInAtDesk(browser, 'office');
  await desk.page.goto(`/jobs/${jobId}/visits/${visitId}`);
  const line = desk.page.getByRole('list', { name: 'What was recorded, in time order' }).getByRole('listitem', { name: 'Note' }).filter({ hasText: note });
  await expect(line).toContainText(shown!);
  await desk.context.close();
});
