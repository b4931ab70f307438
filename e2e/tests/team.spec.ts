import { DESK, expect, SIGNED_OUT, test } from '../fixtures.js';
import { SignInPage } from '../pages/sign-in-page.js';

test.use({ viewport: DESK, signedInAs: 'admin' });

const MAIL = `http://127.0.0.1:${Number(process.env.E2E_PORT ?? 3100) + 1001}/messages`;

test('the admin adds a technician, who sets their own password from the e-mailed link', async ({ page, request, browser }) => {
  test.setTimeout(60_000);
  const stamp = Date.now().toString(36);
  const email = `new.${stamp}@larkfield.example`;
  await page.goto('/');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Team' }).click();

  await page.getByRole('button', { name: 'Add a person' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add a person' });
  await dialog.getByRole('button', { name: 'Add person' }).click();
  await expect(dialog.getByText('Enter their name.')).toBeVisible();
  await dialog.getByLabel('Name').fill(`Jo Newcombe ${stamp}`);
  await dialog.getByLabel('E-mail').fill(email);
  // Nobody sets another's password: the new person is e-mailed a link to set their own.
  await expect(dialog.getByText(/We e-mail them: a link to set their own password/)).toBeVisible();
  await dialog.getByRole('button', { name: 'Add person' }).click();
  await expect(dialog).toHaveCount(0);
  const row = page.getByRole('row', { name: new RegExp(`Jo Newcombe ${stamp}`) });
  await expect(row).toContainText(email);
  await expect(page.getByRole('switch', { name: 'Ruth Okafor can sign in' })).toBeDisabled();

  await row.getByRole('button', { name: 'Send password link' }).click();
  await expect(page.getByText(`A password link is on its way to ${email}`)).toBeVisible();
  let link = '';
  await expect
    .poll(async () => {
      const messages = (await (await request.get(MAIL)).json()) as Array<{ to: string[]; text: string }>;
      // The welcome on being added carries a link too; the one sent on asking replaces it, so wait for both.
      const theirs = messages.filter((m) => m.to.includes(email));
      link = theirs.length < 2 ? '' : (/https?:\/\/\S+\/reset-password\?token=\S+/.exec(theirs.at(-1)?.text ?? '')?.[0] ?? '');
      return link;
    })
    .not.toBe('');

  // The new technician opens the link on their own device.
  const phone = await browser.newContext({ viewport: { width: 390, height: 844 }, serviceWorkers: 'block', storageState: SIGNED_OUT });
  try {
    const own = await phone.newPage();
    await own.goto(new URL(link).pathname + new URL(link).search);
    await own.getByLabel('New password', { exact: true }).fill('my-own-password-2');
    await own.getByLabel('New password again').fill('my-own-password-3');
    await own.getByRole('button', { name: 'Set password' }).click();
    await expect(own.getByText('The two passwords are not the same.')).toBeVisible();
    await own.getByLabel('New password again').fill('my-own-password-2');
    await own.getByRole('button', { name: 'Set password' }).click();
    await expect(own.getByText('Your password is set.')).toBeVisible();
    await own.getByRole('link', { name: 'Sign in' }).click();
    await new SignInPage(own).signIn(email, 'my-own-password-2');
    await expect(own.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
  } finally {
    await phone.close();
  }

  // Deactivated, after being asked, they can no longer sign in; the admin is told so.
  await page.getByRole('switch', { name: `Jo Newcombe ${stamp} can sign in` }).click();
  const ask = page.getByRole('dialog', { name: `Stop Jo Newcombe ${stamp} signing in?` });
  await ask.getByRole('button', { name: 'Leave it' }).click();
  await expect(page.getByRole('switch', { name: `Jo Newcombe ${stamp} can sign in` })).toBeChecked();
  await page.getByRole('switch', { name: `Jo Newcombe ${stamp} can sign in` }).click();
  await ask.getByRole('button', { name: 'Yes, change it' }).click();
  await expect(page.getByText(`Jo Newcombe ${stamp} can no longer sign in. Their records stay as they are.`)).toBeVisible();
  await expect(page.getByRole('switch', { name: `Jo Newcombe ${stamp} can sign in` })).not.toBeChecked();
  const refused = await request.post('/api/auth/sign-in', { data: { email, password: 'my-own-password-2' } });
  expect(refused.status()).toBe(401);
});
