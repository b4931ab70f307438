import type { Locator } from '@playwright/test';
import { apiSession, expect, PHONE, test } from '../fixtures.js';

test.use({ viewport: PHONE });

/** The image has been decoded and drawn (not a broken or empty picture). */
async function expectDrawn(img: Locator): Promise<void> {
  await expect(img).toBeVisible();
  await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth > 0)).toBe(true);
}

test('a customer opens a share link on a phone without an account, and sees a plain page once it is withdrawn', async ({ page, request }) => {
  const office = await apiSession(request, 'office@larkfield.example');
  const headers = { authorization: `Bearer ${office.accessToken}` };
  const jobs = (await (await request.get('/api/jobs?search=LED-0033', { headers })).json()) as { items: Array<{ id: string }> };
  const jobId = jobs.items[0]!.id;
  const issued = await request.post(`/api/jobs/${jobId}/documents`, { headers, data: { kind: 'photo-record' } });
  expect(issued.status()).toBe(201);
  const { number } = (await issued.json()) as { number: string };
  const link = (await (await request.post(`/api/jobs/${jobId}/share-links`, { headers, data: { days: 7, label: 'Browser test' } })).json()) as { id: string; url: string };

  await page.goto(new URL(link.url).pathname);
  await expect(page.getByRole('heading', { level: 1, name: 'Extra double socket in the front bedroom' })).toBeVisible();
  await expect(page.getByText('Hannah Greaves')).toBeVisible();
  await expect(page.getByText('14 Orchard Rise, Wendmouth, WM2 4HD')).toBeVisible();

  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: `Download PDF of ${number}` }).click();
  expect((await download).suggestedFilename()).toBe(`${number}.pdf`);

  // The thumbnails say nothing their captions do not: they are named by the button around them.
  const photos = page.getByRole('list', { name: 'Photos' }).locator('img');
  await expect(photos).toHaveCount(3);
  for (const img of await photos.all()) await expectDrawn(img);
  await page.getByRole('button', { name: 'Open photo: Box open before the accessory went on: ring in and out, CPCs sleeved' }).click();
  const viewer = page.getByRole('dialog', { name: 'Box open before the accessory went on: ring in and out, CPCs sleeved' });
  await expectDrawn(viewer.getByRole('img'));
  await viewer.getByRole('button', { name: 'Close the photo' }).click();

  const revoked = await request.post(`/api/share-links/${link.id}/revoke`, { headers });
  expect(revoked.status()).toBe(200);
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: 'This link does not work' })).toBeVisible();
  await expect(page.getByText('This link has been withdrawn by the contractor.', { exact: false })).toBeVisible();
  await expect(page.getByText('Extra double socket in the front bedroom')).toHaveCount(0);
});
