import { DESK, expect, PHONE, test } from '../fixtures.js';

test.describe('office and admin at the desk', () => {
  test.use({ viewport: DESK });

  test('the admin signs in to the Jobs board and sees the whole side navigation, Team included', async ({ page, signInPage }) => {
    await signInPage.goto();
    await signInPage.signIn('admin@larkfield.example');
    await expect(page).toHaveURL(/\/jobs$/);
    await expect(page.getByRole('heading', { name: 'Jobs', level: 1 })).toBeVisible();
    const nav = page.getByRole('navigation', { name: 'Main' });
    for (const item of ['Jobs', 'Schedule', 'Customers & sites', 'Conflicts', 'Team']) {
      await expect(nav.getByRole('link', { name: item })).toBeVisible();
    }
    await expect(page.getByText('Larkfield Electrical & Data')).toBeVisible();
    await nav.getByRole('link', { name: 'Team' }).click();
    // Other tests may add people to the shared demo organisation; the four demo users are always there.
    for (const email of ['admin@larkfield.example', 'office@larkfield.example', 'tech1@larkfield.example', 'tech2@larkfield.example']) {
      await expect(page.getByRole('table', { name: 'Team' }).getByRole('cell', { name: email })).toBeVisible();
    }
    await expect(page.getByText('admin@oakmere.example')).toHaveCount(0);
  });

  test('office staff get the desk navigation without Team, and the Team page refuses them', async ({ page, signInPage }) => {
    await signInPage.goto();
    await signInPage.signIn('office@larkfield.example');
    await expect(page).toHaveURL(/\/jobs$/);
    const nav = page.getByRole('navigation', { name: 'Main' });
    await expect(nav.getByRole('link', { name: 'Schedule' })).toBeVisible();
    await expect(nav.getByRole('link', { name: 'Team' })).toHaveCount(0);
    await page.goto('/team');
    await expect(page.getByRole('heading', { name: 'Not for your role', level: 1 })).toBeVisible();
  });
});

test.describe('technician on a phone', () => {
  test.use({ viewport: PHONE });

  test('signs in to Today with the bottom navigation', async ({ page, signInPage }) => {
    await signInPage.goto();
    await signInPage.signIn('tech1@larkfield.example');
    await expect(page).toHaveURL(/\/today$/);
    await expect(page.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
    const nav = page.getByRole('navigation', { name: 'Main' });
    for (const item of ['Today', 'Sync', 'Me']) await expect(nav.getByRole('link', { name: item })).toBeVisible();
    await expect(nav.getByRole('link', { name: 'Jobs' })).toHaveCount(0);
    await nav.getByRole('link', { name: 'Me' }).click();
    await expect(page.getByText('tech1@larkfield.example')).toBeVisible();
  });

  test('is refused an office page with a plain message', async ({ page, signInPage }) => {
    await signInPage.goto();
    await signInPage.signIn('tech2@larkfield.example');
    await expect(page).toHaveURL(/\/today$/);
    await page.goto('/jobs');
    await expect(page.getByRole('heading', { name: 'Not for your role', level: 1 })).toBeVisible();
    await expect(page.getByText('You are signed in as a technician')).toBeVisible();
    await page.getByRole('link', { name: 'Back to my start screen' }).click();
    await expect(page).toHaveURL(/\/today$/);
  });
});

test.describe('sign-in', () => {
  test.use({ viewport: PHONE });

  test('a wrong password gets a plain refusal and no session', async ({ page, signInPage }) => {
    await signInPage.goto();
    await signInPage.signIn('office@larkfield.example', 'not-the-password');
    await expect(page.getByRole('alert')).toContainText('do not match an active account');
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test('a page opened before signing in is shown after it', async ({ page, signInPage }) => {
    await page.goto('/schedule');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fschedule/);
    await signInPage.signIn('office@larkfield.example');
    await expect(page).toHaveURL(/\/schedule$/);
  });

  test('signing out returns to sign-in and the old pages need signing in again', async ({ page, signInPage }) => {
    await signInPage.goto();
    await signInPage.signIn('tech1@larkfield.example');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Me' }).click();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page).toHaveURL(/\/sign-in/);
    await page.goto('/today');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Ftoday/);
  });
});
