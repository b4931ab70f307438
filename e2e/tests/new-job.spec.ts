import { DESK, expect, test } from '../fixtures.js';

test.use({ viewport: DESK, signedInAs: 'office' });

/** A new enquiry by phone: the office takes the caller as a new customer with a new site, and the job for them. */
test('the office takes a new job for a new customer at a new site, and another at that site from the site’s page', async ({ page, officeJob }) => {
  test.setTimeout(90_000);
  const stamp = Date.now().toString(36).slice(-5).toUpperCase();
  const customer = `Priya Natarajan ${stamp}`;

  await page.goto('/jobs');
  await page.getByRole('button', { name: 'New job' }).click();
  const dialog = page.getByRole('dialog', { name: 'New job' });
  await dialog.getByRole('combobox', { name: 'Customer' }).click();
  await page.getByRole('option', { name: 'A new customer…' }).click();
  await dialog.getByLabel('Name').fill(customer);
  await dialog.getByLabel('Phone').fill('07700 900871');
  await dialog.getByLabel('Address').fill(`3 Mill Lane (${stamp}), Wendmouth`);
  await dialog.getByLabel('Postcode').fill('WM4 1QT');
  await dialog.getByLabel('What the job is').fill('Replace the kitchen downlights');
  await dialog.getByRole('button', { name: 'Take the job' }).click();

  // The job's own page: in Enquiry, with the next reference in the series
  await officeJob.expectJob('Replace the kitchen downlights');
  await expect(page.getByText(new RegExp(`^LED-\\d{4} · ${customer}`))).toBeVisible();
  await expect(page.getByRole('combobox', { name: 'Status' })).toHaveText('Enquiry');

  // The site is on the customers' list now; a second job taken from its page is for the same customer and site.
  await page.goto('/customers');
  await page.getByRole('textbox', { name: /Search|Find/ }).fill(stamp);
  await page.getByRole('link', { name: new RegExp(`3 Mill Lane \\(${stamp}\\)`) }).first().click();
  await page.getByRole('button', { name: 'New job here' }).click();
  const second = page.getByRole('dialog', { name: 'New job' });
  await expect(second.getByRole('combobox', { name: 'Customer' })).toHaveText(customer);
  await second.getByLabel('What the job is').fill('Outside socket by the shed');
  await second.getByRole('button', { name: 'Take the job' }).click();
  await officeJob.expectJob('Outside socket by the shed');
  await expect(page.getByText(new RegExp(`^LED-\\d{4} · ${customer} · 3 Mill Lane \\(${stamp}\\)`))).toBeVisible();
});
