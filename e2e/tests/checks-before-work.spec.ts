import { bookVisit, expect, PHONE, ROLE_USERS, test } from '../fixtures.js';

test.use({ viewport: PHONE, signedInAs: 'technician' });

test('with no signal, the Points form answers before the cable is cut: predicted Zs, RCD, cable size and cpc; a radial’s R1+R2 is checked against its cable', async ({
  page,
  context,
  request,
  technicianVisit: visitPage,
}) => {
  test.setTimeout(180_000);
  const stamp = Date.now().toString(36);
  const title = `Extend the lounge ring and add a utility radial (${stamp})`;
  const number = `U${stamp.slice(-3).toUpperCase()}`;
  await bookVisit(request, { technicianEmail: ROLE_USERS.technician, siteName: 'Orchard Rise', title, startHour: 9, endHour: 12 });

  await visitPage.openToday();
  const card = visitPage.visitCard(title);
  await expect(card).toBeVisible({ timeout: 20_000 });
  await visitPage.goOffline(context);
  await card.getByRole('link', { name: /^Open / }).click();
  await visitPage.expectVisit(title);

  // A ring extension on circuit 1 (B32, 30 mA RCD), through an insulated stud wall.
  await visitPage.section('Points');
  await visitPage.readCautions();
  const pointForm = await visitPage.startRingExtension();
  const checks = pointForm.getByRole('status', { name: 'Checks before the work' });
  // Ze 0.28 Ω (the site) + 1.20 × (r1 + r2) / 4 after 8 m of 2.5/1.5 (0.2829 Ω) = 0.62 Ω ≤ 1.37 Ω for B32
  // (IEC 60228:2004; BS 7671:2018+A2:2022 Table 41.3)
  await expect(checks.getByRole('listitem', { name: 'Predicted Zs at the new point' })).toContainText('Predicted Zs 0.62 Ω');
  await expect(checks.getByRole('listitem', { name: 'RCD protection' })).toContainText('30 mA RCD required: the circuit has one');
  await expect(checks).toContainText('a competent person decide');
  // Pushed into the middle of the insulation (method 103) 2.5 mm² carries 13.5 A, under the 20 A a ring needs (Table 4D5)
  await pointForm.getByRole('button', { name: /^Method 103 / }).click();
  await expect(checks.getByRole('listitem', { name: 'New cable' })).toContainText('Iz 13.5 A');
  await expect(checks.getByRole('listitem', { name: 'New cable' }).getByRole('button', { name: /: Fail/ })).toBeVisible();
  // Touching the board (method 102): 21 A
  await pointForm.getByRole('button', { name: /^Method 102 / }).click();
  await expect(checks.getByRole('listitem', { name: 'New cable' })).toContainText('Iz 21 A');
  // 230 / 0.62 = 371 A clears the B32 at once: √(371² × 0.1) / 115 = 1.02 mm² ≤ 1.5 mm² (Reg 543.1.3, Table 54.3)
  await expect(checks.getByRole('listitem', { name: 'Cpc for the fault' })).toContainText('Minimum cpc 1.02 mm² at 371 A');
  await pointForm.getByRole('button', { name: 'Save new point change' }).click();
  await expect(page.getByRole('heading', { name: 'Point change' })).toBeVisible();

  // A new radial with no RCD, recorded on the phone, then a socket on it.
  await visitPage.section('Circuits & tests');
  const addCircuit = page.getByRole('form', { name: 'Add a circuit' });
  await addCircuit.getByLabel('Circuit number').fill(number);
  await addCircuit.getByLabel('Description').fill('Utility sockets');
  await addCircuit.getByLabel('Kind').selectOption({ label: 'Radial' });
  await addCircuit.getByLabel('Protective device').selectOption({ label: 'Type B circuit-breaker' });
  await addCircuit.getByLabel('Rating (A)').fill('20');
  await addCircuit.getByLabel('Live size (mm²)').fill('2.5');
  await addCircuit.getByLabel('Cpc size (mm²)').fill('1.5');
  await addCircuit.getByLabel('Cable length to the furthest point (m)').fill('20');
  await addCircuit.getByRole('button', { name: 'Add circuit' }).click();
  await expect(addCircuit.getByRole('status')).toHaveText(`Circuit ${number} saved on this phone.`);

  await visitPage.section('Points');
  await page.getByRole('link', { name: 'Record a point change' }).click();
  await pointForm.getByRole('button', { name: 'New point', exact: true }).click();
  await pointForm.getByLabel('Accessory').fill('Single socket-outlet');
  await pointForm.getByLabel('Where it is: where on the wall').fill('Beside the back door');
  await pointForm.getByLabel('Circuit', { exact: true }).selectOption({ label: `${number} · Utility sockets` });
  await pointForm.getByLabel('How it joins the circuit').selectOption({ label: 'On a radial' });
  await pointForm.getByLabel('Length of the new cable (m)').fill('20');
  await pointForm.getByLabel('R1+R2 where it joins (Ω)').fill('0');
  // Sockets need 30 mA (BS 7671:2018+A2:2022 Reg 411.3.3): the warning shows before the work, not after it
  const warning = checks.getByRole('alert');
  await expect(warning).toContainText('30 mA RCD required: the circuit has none');
  await expect(warning).toContainText('provide it before the work is put into service');
  await pointForm.getByRole('button', { name: 'Save new point change' }).click();
  await expect(page.getByRole('heading', { name: 'Point change' })).toBeVisible();

  // The readings: 5 Ω on 20 m of 2.5/1.5, whose own R1+R2 is 0.39 Ω (IEC 60228:2004), is no pass.
  await visitPage.section('Circuits & tests');
  await page.getByRole('list', { name: 'Circuits on this site' }).getByRole('link', { name: new RegExp(`^${number} · Utility sockets`) }).click();
  const form = page.getByRole('form', { name: `Readings for circuit ${number}` });
  const conductor = form.getByRole('region', { name: 'Protective conductor' });
  await expect(conductor).toContainText('Expect R1+R2 of about 0.39 Ω: 20 m of 2.5/1.5 mm²');
  await conductor.getByLabel('R1+R2 (Ω)', { exact: true }).fill('5');
  await expect(conductor.getByRole('button', { name: /^R1\+R2 \(protective conductor continuity\): Check · expect about 0\.39 Ω/ })).toBeVisible();
  await conductor.getByLabel('R1+R2 (Ω)', { exact: true }).fill('0.41');
  await expect(conductor.getByRole('button', { name: /^R1\+R2 \(protective conductor continuity\): Pass/ })).toBeVisible();
  await context.setOffline(false);
});
