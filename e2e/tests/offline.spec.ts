import { expect, PHONE, test } from '../fixtures.js';

test.use({ viewport: PHONE });

test.describe('signed in as the technician', () => {
  test.use({ signedInAs: 'technician' });

  test('after one visit online, the app opens with no network and shows the shell', async ({ page, context, technicianVisit }) => {
    await page.goto('/today');
    await technicianVisit.expectToday();
    await technicianVisit.waitForServiceWorker();

    await context.setOffline(true);
    await page.reload();
    await technicianVisit.expectToday();
    await expect(page.getByText('No signal — saving on this phone')).toBeVisible();
    // Screens never opened online are stored too.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sync' }).click();
    await expect(page.getByRole('heading', { name: 'Sync', level: 1 })).toBeVisible();
    await expect(page.getByText('No signal. Everything you record is kept on this phone')).toBeVisible();
    await context.setOffline(false);
  });
});

test('a deep link opens offline too', async ({ page, context, signInPage }) => {
  await signInPage.goto();
  await signInPage.signIn('tech2@larkfield.example');
  await expect(page.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await context.setOffline(true);
  await page.goto('/me');
  await expect(page.getByText('tech2@larkfield.example')).toBeVisible();
  await context.setOffline(false);
});
