import AxeBuilder from '@axe-core/playwright';
import type { Page, TestInfo } from '@playwright/test';
import { cameraJpeg, exifToday } from '../camera-photos.js';
import { apiSession, bookVisit, DESK, expect, PHONE, ROLE_USERS, SIGNED_OUT, test } from '../fixtures.js';

/** WCAG 2.1 A and AA: what the public sector in the UK is held to, and what a paying customer may ask of us. */
const WCAG_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];

/** Runs axe on the page as it stands and fails with a line per problem and the elements it found it on. */
async function expectNoAxeViolations(page: Page, testInfo: TestInfo, screen: string): Promise<void> {
  // A screenshot of each screen checked, kept for whoever looks at the run (set SCREENSHOT_DIR to keep them all).
  const dir = process.env.SCREENSHOT_DIR;
  if (dir) await page.screenshot({ path: `${dir}/${testInfo.project.name}-${screen.replace(/\W+/g, '-')}-${page.viewportSize()?.width}.png`, fullPage: true });
  // Colours are judged at rest: a button caught half way through a transition reads as low contrast.
  await page.addStyleTag({ content: '*, *::before, *::after { transition: none !important; animation: none !important; }' });
  const { violations } = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
  const problems = violations.map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => `${n.target.join(' ')} ${n.html.slice(0, 80)}`).slice(0, 4).join(' | ')}`);
  expect.soft(problems, `accessibility problems on ${screen}`).toEqual([]);
  // WCAG 1.4.10 (reflow): at a phone's width the page itself never scrolls sideways; a wide table scrolls in its box.
  const width = page.viewportSize()!.width;
  const wide = await page.evaluate((w) => {
    if (document.documentElement.scrollWidth <= w) return [];
    // The outermost elements that reach past the right edge, to say what to mend.
    const past = (el: Element) => el.getBoundingClientRect().right > w + 1;
    const clipped = (el: Element): boolean => {
      for (let a = el.parentElement; a; a = a.parentElement) if (getComputedStyle(a).overflowX !== 'visible' && !past(a)) return true;
      return false;
    };
    return Array.from(document.body.querySelectorAll('*'))
      .filter((el) => past(el) && !clipped(el) && el.parentElement && !past(el.parentElement))
      .slice(0, 4)
      .map((el) => `${el.tagName.toLowerCase()}.${el.className.toString().split(' ').slice(0, 2).join('.')} "${(el.textContent ?? '').slice(0, 40)}"`);
  }, width);
  expect.soft(wide, `${screen} is wider than the screen`).toEqual([]);
}

/**
 * Everything a thumb taps on a technician's screen is at least 44 px each way (WCAG 2.1 2.5.5, the AAA size, which
 * a gloved hand on a ladder needs). Links inside a sentence are exempt, as the criterion allows.
 */
async function expectTapTargets(page: Page, screen: string): Promise<void> {
  const small = await page.evaluate(() => {
    const tappable = 'button, a[href], [role="button"], [role="tab"], [role="checkbox"], [role="radio"], [role="switch"], input[type="checkbox"], input[type="radio"], select, summary';
    const found: string[] = [];
    for (const el of Array.from(document.querySelectorAll(tappable))) {
      if (el.closest('[aria-hidden="true"]')) continue;
      if (el.tagName === 'A' && getComputedStyle(el).display === 'inline') continue;
      // The library draws a check box or a switch over an invisible input: its label, or the box around it, is tapped.
      const input = el as HTMLInputElement;
      const target = input.type === 'checkbox' || input.type === 'radio' ? (el.closest('label') ?? el.parentElement!) : el;
      const r = target.getBoundingClientRect();
      if (r.width === 0 && r.height === 0) continue;
      if (r.width < 43.5 || r.height < 43.5) {
        const name = (el.getAttribute('aria-label') ?? el.textContent ?? '').trim().slice(0, 40);
        found.push(`${el.tagName.toLowerCase()} "${name}" ${Math.round(r.width)}×${Math.round(r.height)}`);
      }
    }
    return found.slice(0, 8);
  });
  expect.soft(small, `tap targets under 44 px on ${screen}`).toEqual([]);
}

for (const [size, viewport] of [
  ['phone', PHONE],
  ['desk', DESK],
] as const) {
  // In a loft or a cupboard the phone is in its dark scheme: both are checked where a technician works, on the phone.
  for (const scheme of size === 'phone' ? (['light', 'dark'] as const) : (['light'] as const)) {
  test.describe(`a technician's screens at ${size} size in the ${scheme} scheme`, () => {
    test.use({ viewport, signedInAs: 'technician', colorScheme: scheme });

    test(`Today, a visit's sections, the Points form with its checks, the readings and the sign-off pass WCAG 2.1 AA (${size}, ${scheme})`, async ({
      page,
      request,
      technicianVisit: visitPage,
    }, testInfo) => {
      test.setTimeout(180_000);
      const check = async (screen: string) => {
        await expectNoAxeViolations(page, testInfo, `${screen} ${scheme}`);
        if (size === 'phone') await expectTapTargets(page, `${screen} (${scheme})`);
      };
      const title = `Accessible screens ${size} ${scheme} (${Date.now().toString(36)})`;
      const booked = await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 9, endHour: 12 });
      // A circuit installed new on this visit, so the sign-off shows the installation certificate's schedule of inspections.
      const office = await apiSession(request, ROLE_USERS.office);
      const headers = { authorization: `Bearer ${office.accessToken}` };
      const orchard = ((await (await request.get('/api/sites?search=Orchard%20Rise', { headers })).json()) as { items: { id: string }[] }).items[0]!;
      const board = ((await (await request.get(`/api/boards?siteId=${orchard.id}`, { headers })).json()) as { items: { id: string }[] }).items[0]!;
      const added = await request.post('/api/circuits', {
        headers,
        data: { siteId: orchard.id, boardId: board.id, number: `N${Date.now().toString(36).slice(-4)}`, description: `New radial ${size} ${scheme}`, kind: 'radial', newOnVisitId: booked.visitId },
      });
      expect(added.ok(), await added.text()).toBe(true);
      const tomorrow = `Accessible arrival ${size} ${scheme} (${Date.now().toString(36)})`;
      await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title: tomorrow, startHour: 9, endHour: 12, dayOffset: 1 });
      await visitPage.openToday();
      await check('today');
      await visitPage.visitCard(tomorrow).getByRole('button', { name: 'I’m on site' }).click();
      await expect(page.getByRole('dialog', { name: 'On site for a visit booked tomorrow?' })).toBeVisible();
      await check('arrival at a visit booked for another day');
      await page.getByRole('dialog').getByRole('button', { name: 'Not yet' }).click();

      await visitPage.openFromToday(title);
      await check('visit trail');
      await visitPage.section('Cables');
      await check('visit cables');

      await visitPage.section('Points');
      await check('visit points with cautions');
      await visitPage.readCautions();
      const pointForm = await visitPage.startRingExtension();
      await pointForm.getByRole('button', { name: /^Method 103 / }).click();
      await expect(pointForm.getByRole('status', { name: 'Checks before the work' }).getByRole('listitem', { name: 'New cable' })).toContainText('Iz 13.5 A');
      // Bad input on purpose: the error it shows must be as readable as the rest
      await pointForm.getByLabel('r2 before (Ω)').fill('-1');
      await pointForm.getByLabel('Check a new concealed cable route').check();
      await pointForm.getByLabel('Wall width (mm)').fill('-10');
      await expect(pointForm.getByText('Wall width cannot be negative.')).toBeVisible();
      await check('point form with checks');
      await page.goBack();

      await visitPage.section('Circuits & tests');
      await check('visit circuits');
      await page.getByRole('list', { name: 'Circuits on this site' }).getByRole('link', { name: /^1 · Sockets, ground floor/ }).click();
      await expect(page.getByRole('form', { name: 'Readings for circuit 1' })).toBeVisible();
      await check('circuit readings');
      await page.goBack();
      await page.getByRole('link', { name: 'Schedule of circuits, card by card' }).click();
      await expect(page.getByRole('region', { name: 'Schedule of circuits' })).toBeVisible();
      await check('board schedule');
      await page.goBack();

      await visitPage.section('Sign-off');
      const inspections = page.getByRole('region', { name: 'Schedule of inspections' });
      await inspections.getByRole('group', { name: /^Isolation, switching off/ }).getByRole('button', { name: 'Limitation' }).click();
      // Bad input on purpose: a limitation with no note.
      await expect(inspections.getByText('Say what limited the inspection of this item.')).toBeVisible();
      await check('sign-off with the schedule of inspections');

      await visitPage.section('Cables');
      await page.getByRole('link', { name: /Record a cable/ }).click();
      await expect(visitPage.cableForm).toBeVisible();
      await check('cable form');
      await page.goBack();
      await page.getByRole('list', { name: 'Cable runs' }).getByRole('link', { name: /^OR-01/ }).click();
      await expect(page.getByRole('region', { name: 'Before tracing' })).toBeVisible();
      await check('cable with its trace log and tracing cautions');
      await page.getByRole('link', { name: 'Performance results' }).click();
      await expect(page.getByRole('form', { name: 'Performance results of OR-01' })).toBeVisible();
      // Bad input on purpose: the errors must be as readable as the rest.
      await page.getByRole('region', { name: 'NEXT', exact: true }).getByLabel('Margin (dB)').fill('lots');
      await page.getByRole('button', { name: 'Save new results' }).click();
      await expect(page.getByRole('alert')).toContainText('Not saved');
      await check('performance results');

      await page.getByRole('link', { name: 'Sync', exact: true }).first().click();
      await check('sync');
      await page.getByRole('link', { name: 'Me', exact: true }).first().click();
      await check('me');
    });

    test(`the photo form filing each photo on its own, and a photo opened from the trail, pass WCAG 2.1 AA (${size}, ${scheme})`, async ({
      page,
      request,
      technicianVisit: visitPage,
    }, testInfo) => {
      test.setTimeout(120_000);
      const check = async (screen: string) => {
        await expectNoAxeViolations(page, testInfo, `${screen} ${scheme}`);
        if (size === 'phone') await expectTapTargets(page, `${screen} (${scheme})`);
      };
      const title = `Accessible photos ${size} ${scheme} (${Date.now().toString(36)})`;
      await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 9, endHour: 12 });
      await visitPage.openToday();
      await visitPage.openFromToday(title);
      const files = await Promise.all([1, 2].map(async (n) => ({ name: `IMG_50${n}.jpg`, mimeType: 'image/jpeg', buffer: await cameraJpeg(`Photo ${n}`, '#6b7f5a', exifToday(9, n)) })));
      await page.getByLabel('Take or add photos').setInputFiles(files);
      const form = visitPage.photoForm;
      await form.getByRole('button', { name: 'File photo 2 on its own' }).click();
      await expect(form.getByRole('img', { name: 'Photo 2' })).toBeVisible({ timeout: 60_000 });
      await check('photo form, filed one by one');
      await form.getByLabel('Caption for photo 1').fill('Socket before moving');
      await form.getByRole('button', { name: 'Save 2 photos' }).click();
      await expect(form).toBeHidden({ timeout: 60_000 });
      await visitPage.trail.getByRole('button', { name: 'Open photo: Socket before moving' }).click();
      await expect(page.getByRole('dialog', { name: /^Photo \d of 2$/ }).getByRole('img', { name: 'Socket before moving' })).toBeVisible();
      await check('photo viewer');
      await page.getByRole('dialog').getByRole('link', { name: 'Mark cable routes' }).click();
      await expect(page.getByRole('img', { name: /drawn$/ })).toBeVisible();
      await check('photo cable routes');
      await page.getByRole('button', { name: 'Drilling check' }).click();
      await check('photo drilling check');
      await page.getByRole('link', { name: 'Hidden routes on this site' }).click();
      await expect(page.getByRole('heading', { name: 'Hidden routes on this site' })).toBeVisible();
      await check('hidden routes on the phone');
    });
  });
  }

  test.describe(`the office's screens at ${size} size`, () => {
    test.use({ viewport, signedInAs: 'admin' });

    test(`Jobs, a job's tabs, schedule, customers, conflicts, invoices, price list and team pass WCAG 2.1 AA (${size})`, async ({ page, officeJob }, testInfo) => {
      test.setTimeout(180_000);
      await page.goto('/jobs');
      await expect(page.getByRole('heading', { level: 1, name: 'Jobs' })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'jobs');

      await page.getByRole('link', { name: /Move two lounge sockets/ }).first().click();
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'job photo trail');
      for (const tab of ['Photo trail', 'Cable schedule', 'Points', 'Circuits & tests', 'Documents & links', 'Quotes & invoices'] as const) {
        await officeJob.tab(tab);
        await expectNoAxeViolations(page, testInfo, `job ${tab}`);
      }
      await officeJob.tab('Cable schedule');
      await page.getByRole('button', { name: 'Record results' }).click();
      await expect(page.getByRole('dialog', { name: 'Record a link’s results' })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'record a link’s results');
      await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
      // The installation certificate's issue dialog for the garden office radial, with its particulars refused as they stand.
      await page.goto('/jobs?search=LED-0045');
      await page.getByRole('link', { name: /Outside socket for the garden office/ }).first().click();
      await officeJob.tab('Documents & links');
      await page.getByRole('button', { name: 'Issue installation certificate' }).click();
      const issueDialog = page.getByRole('dialog', { name: 'Issue the electrical installation certificate?' });
      await expect(issueDialog.getByLabel('Ze (Ω)')).toBeVisible();
      await issueDialog.getByRole('button', { name: 'Issue' }).click();
      await expect(issueDialog.getByText('a TT installation needs its earth electrode’s resistance to earth.')).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'installation certificate issue dialog');
      await issueDialog.getByRole('button', { name: 'Cancel' }).click();
      // A signed visit's own page: LED-0033's, with its sign-off, signature, notes and parts.
      await page.goto('/jobs?search=LED-0033');
      await page.getByRole('link', { name: /Extra double socket in the front bedroom/ }).first().click();
      await page.getByRole('table', { name: 'Visits of this job' }).getByRole('link').first().click();
      await expect(page.getByRole('img', { name: 'Signature of Aled Pryce' })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'visit record');
      await page.goto('/jobs');
      await page.getByRole('button', { name: 'New job' }).click();
      const dialog = page.getByRole('dialog', { name: 'New job' });
      await dialog.getByRole('button', { name: 'Take the job' }).click();
      await expect(dialog.getByText('Choose who the job is for, or take a new customer.')).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'new job with its mistakes');
      await dialog.getByRole('button', { name: 'Cancel' }).click();
      for (const [path, heading] of [
        ['/schedule', 'Schedule'],
        ['/customers', 'Customers & sites'],
        ['/conflicts', 'Conflicts'],
        ['/invoices', 'Invoices'],
        ['/notifiable-work', 'Notifications'],
        ['/price-list', 'Price list'],
        ['/team', 'Team'],
      ] as const) {
        await page.goto(path);
        await expect(page.getByRole('heading', { level: 1, name: heading })).toBeVisible();
        await expectNoAxeViolations(page, testInfo, heading);
      }
      await page.goto('/conflicts');
      await page.getByRole('tab', { name: 'Settled' }).click();
      await expectNoAxeViolations(page, testInfo, 'settled conflicts');
      await page.goto('/customers');
      await page.getByRole('link', { name: 'Orchard Rise' }).first().click();
      await expect(page.getByRole('heading', { level: 1, name: 'Orchard Rise' })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'site');
      await page.getByRole('link', { name: 'Hidden routes' }).click();
      await expect(page.getByRole('heading', { level: 1, name: /^Hidden routes: / })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'site hidden routes');
      await page.goto('/invoices');
      await page.getByRole('link', { name: /^Job’s billing/ }).first().click();
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'job invoices');
    });
  });
}

test.describe('the screens anyone may reach', () => {
  for (const [size, viewport] of [
    ['phone', PHONE],
    ['desk', DESK],
  ] as const) {
    test(`sign-in, and a customer's shared page of a job, pass WCAG 2.1 AA (${size})`, async ({ browser, request }, testInfo) => {
      const context = await browser.newContext({ viewport, storageState: SIGNED_OUT });
      const page = await context.newPage();
      await page.goto('/sign-in');
      await page.getByRole('button', { name: /Sign in/ }).click();
      await expectNoAxeViolations(page, testInfo, 'sign-in with its mistakes');
      // Someone who works for two organisations chooses one once the password is right.
      await page.getByLabel('E-mail').fill('corin@valewiring.example');
      await page.getByLabel('Password').fill('wiretrail-demo');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await expect(page.getByRole('group', { name: /more than one organisation/ })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'sign-in, choosing the organisation');
      await page.getByRole('button', { name: 'Sign in as someone else' }).click();

      const { accessToken } = await apiSession(request, ROLE_USERS.office);
      const headers = { authorization: `Bearer ${accessToken}` };
      const job = ((await (await request.get('/api/jobs?search=LED-0033', { headers })).json()) as { items: { id: string }[] }).items[0]!;
      const link = (await (await request.post(`/api/jobs/${job.id}/share-links`, { headers, data: { days: 1, label: 'Accessibility check' } })).json()) as { url: string };
      await page.goto(new URL(link.url).pathname);
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      await expectNoAxeViolations(page, testInfo, 'shared job');
      await context.close();
    });
  }
});
