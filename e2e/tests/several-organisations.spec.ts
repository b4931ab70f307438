import { expect, PHONE, test } from '../fixtures.js';

const CORIN = 'corin@valewiring.example';

test.use({ viewport: PHONE });

/**
 * The demo subcontractor works for Larkfield and for Oakmere with one e-mail address and one password: the phone
 * asks which organisation after the password, and shows only that organisation's work.
 */
test('a subcontractor chooses the organisation at sign-in and sees only its jobs', async ({ page, signInPage }) => {
  test.setTimeout(60_000);
  const today = page.getByRole('heading', { name: 'Today', level: 1 });
  const bramsey = page.getByText('Two double sockets and a data point in the hall kitchen');

  await signInPage.goto();
  await signInPage.signIn(CORIN, 'not-the-password');
  // A wrong password offers no choice, and says nothing of where the address is known.
  await expect(page.getByText('That e-mail and password do not match an active account.')).toBeVisible();
  await expect(page.getByRole('group', { name: /more than one organisation/ })).toHaveCount(0);

  await signInPage.signIn(CORIN);
  const choice = page.getByRole('group', { name: /more than one organisation/ });
  await expect(choice.getByRole('button')).toHaveText(['Larkfield Electrical & Data', 'Oakmere Power & Data', 'Sign in as someone else']);
  await signInPage.chooseOrganisation('Oakmere Power & Data');
  await expect(today).toBeVisible();
  await expect(bramsey).toBeVisible();
  await expect(page.getByText('Orchard Rise')).toHaveCount(0);
  await page.getByRole('navigation').getByRole('link', { name: 'Me' }).click();
  await expect(page.getByText('Oakmere Power & Data')).toBeVisible();
  await page.getByRole('button', { name: 'Sign out' }).click();

  await signInPage.signIn(CORIN);
  await signInPage.chooseOrganisation('Larkfield Electrical & Data');
  await expect(today).toBeVisible();
  await page.getByRole('navigation').getByRole('link', { name: 'Me' }).click();
  await expect(page.getByText('Larkfield Electrical & Data')).toBeVisible();
  await page.getByRole('navigation').getByRole('link', { name: 'Today' }).click();
  await expect(today).toBeVisible();
  // Oakmere's job stayed with Oakmere: the phone dropped its rows when the organisation changed.
  await expect(page.getByText('No visits booked for you')).toBeVisible();
  await expect(bramsey).toHaveCount(0);

  // And back to Oakmere without the password.
  await page.getByRole('navigation').getByRole('link', { name: 'Me' }).click();
  await page.getByRole('button', { name: 'Work for Oakmere Power & Data' }).click();
  await expect(today).toBeVisible();
  await expect(bramsey).toBeVisible();
});
