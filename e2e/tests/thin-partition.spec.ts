import { bookVisit, expect, PHONE, ROLE_USERS, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

/**
 * A cable 60 mm deep in a 75 mm stud partition is 15 mm from the far face, so it counts as within 50 mm of a surface
 * and must keep to the permitted zones or have 30 mA RCD protection (BS 7671:2018+A2:2022 Reg 522.6.202 and 522.6.204).
 * Run outside the zones with no RCD it fails; the same route 60 mm deep in a 200 mm wall is 140 mm from the far face
 * and passes.
 */
test('a route outside the zones fails in a thin partition and passes deep in a thick wall', async ({ request, page, technicianVisit: visitPage }) => {
  test.setTimeout(90_000);
  const title = `Thin partition (${Date.now().toString(36)})`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 0, endHour: 23 });
  await visitPage.openToday();
  await visitPage.openFromToday(title);
  await visitPage.section('Points');
  await visitPage.readCautions();
  await page.getByRole('link', { name: 'Record a point change' }).click();
  const form = visitPage.pointForm;
  await form.getByLabel('Check a new concealed cable route').check();
  const figures = form.getByRole('group', { name: 'The wall and the cable' });
  await figures.getByLabel('Wall width (mm)').fill('3600');
  await figures.getByLabel('Wall height (mm)').fill('2400');
  await figures.getByLabel('Wall thickness (mm)').fill('75');
  await figures.getByLabel('Cable depth (mm)').fill('60');

  // The socket in the middle of the wall, then the cable across to 900 mm from the left and down: a vertical run
  // away from the socket and from the corners, outside every zone.
  const wall = form.getByRole('img', { name: /^Wall 3600 by 2400 mm/ });
  await wall.scrollIntoViewIfNeeded();
  const box = (await wall.boundingBox())!;
  const at = (xMm: number, yMm: number) => page.mouse.click(box.x + (xMm / 3600) * box.width, box.y + (1 - yMm / 2400) * box.height);
  await at(1800, 1200);
  await at(900, 1200);
  await at(900, 300);

  const verdict = form.getByRole('button', { name: /^Concealed route: / });
  await expect(verdict).toHaveAccessibleName(/^Concealed route: Fail/);
  await figures.getByLabel('Wall thickness (mm)').fill('200');
  await expect(verdict).toHaveAccessibleName(/^Concealed route: Pass/);
});
