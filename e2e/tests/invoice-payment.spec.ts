import { bookVisit, DESK, expect, PHONE, SIGNED_OUT, signedInAtDesk, test } from '../fixtures.js';

const PORT = Number(process.env.E2E_PORT ?? 3100);
/** scripts/e2e-server.mjs puts the mail fake's messages on the web port + 1001. */
const MAIL = `http://127.0.0.1:${PORT + 1001}/messages`;

test.use({ viewport: DESK });

test('the office issues an invoice, the customer pays it by card from their link, and the office sees it paid', async ({ browser, request }) => {
  test.setTimeout(90_000);
  // A job of this test's own, so that no other test's invoices get in the way.
  const title = `Porch light and switch (billing test ${Date.now().toString(36)})`;
  const { jobId } = await bookVisit(request, { technicianEmail: 'tech2@larkfield.example', siteName: 'Fernhill Close', title });
  const office = await signedInAtDesk(browser, 'office');
  const page = office.page;
  await expect(page).toHaveURL(/\/jobs$/);

  // From the invoices screen to the job's billing.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Invoices' }).click();
  await expect(page.getByRole('heading', { name: 'Who owes what' })).toBeVisible();
  await page.getByRole('button', { name: 'Quote or invoice a job' }).click();
  await page.getByRole('combobox', { name: 'Job' }).fill(title);
  await page.getByRole('option', { name: title }).click();
  await page.getByRole('button', { name: 'Go to its billing' }).click();
  await expect(page).toHaveURL(new RegExp(`/invoices/jobs/${jobId}$`));

  // The visit has not happened yet, so the draft says there is no labour to add; the office adds a fixed price.
  await page.getByRole('button', { name: 'New invoice' }).click();
  const dialog = page.getByRole('dialog', { name: /Draft invoice/ });
  await expect(dialog.getByText(/has no arrival time recorded, so its labour is not included/)).toBeVisible();
  await dialog.getByRole('button', { name: 'Add a line' }).click();
  const line = dialog.getByRole('group', { name: 'Line 1' });
  await line.getByLabel('Description').fill('Outside light and switch at the porch, fitted and tested');
  await line.getByLabel('Unit price (£)').fill('85.5');
  await line.getByLabel('Quantity', { exact: true }).fill('one');
  await dialog.getByRole('button', { name: 'Save draft' }).click();
  await expect(dialog.getByText('Line 1: Quantity: a number with at most three decimal places, like 2.5.')).toBeVisible();
  await line.getByLabel('Quantity', { exact: true }).fill('1');
  // £85.50 and 20 % VAT (£17.10): £102.60.
  await expect(dialog.getByRole('table', { name: 'Totals' })).toContainText('Total£102.60');
  await dialog.getByRole('button', { name: 'Save and issue…' }).click();
  await page.getByRole('dialog', { name: 'Issue this invoice?' }).getByRole('button', { name: 'Issue' }).click();

  const issued = page.getByRole('dialog', { name: /^Invoice INV-\d{4}/ });
  await expect(issued.getByText('Awaiting payment')).toBeVisible();
  const number = (await issued.getByRole('heading').first().textContent())!.match(/INV-\d{4}/)![0];

  // E-mailed with a link to the job's record: the link is read from the local mail fake.
  await issued.getByRole('button', { name: 'E-mail to the customer' }).click();
  const send = page.getByRole('dialog', { name: `E-mail invoice ${number} to the customer` });
  await expect(send.getByLabel('To', { exact: true })).toHaveValue('okonjo.home@example.com');
  await send.getByRole('button', { name: 'Send' }).click();
  await expect(issued.getByLabel('E-mail: Sent')).toBeVisible({ timeout: 20_000 });
  const letter = async () => {
    const messages = (await (await request.get(MAIL)).json()) as Array<{ subject: string; text: string }>;
    return messages.find((m) => m.subject.startsWith(`Invoice ${number} `))?.text ?? '';
  };
  await expect.poll(letter).toContain('and pay by card');
  const text = await letter();
  const link = new URL(/https?:\/\/\S+\/shared\/[A-Za-z0-9_-]{43}/.exec(text)![0]);

  // The customer, on a phone, with no account and nothing shared with the office's browser.
  const customer = await browser.newContext({ viewport: PHONE, serviceWorkers: 'block', storageState: SIGNED_OUT });
  const phone = await customer.newPage();
  await phone.goto(link.pathname);
  await expect(phone.getByRole('heading', { level: 1, name: title })).toBeVisible();
  const entry = phone.getByRole('list', { name: 'Quotes and invoices' }).getByRole('listitem', { name: `Invoice ${number}` });
  await expect(entry).toContainText('£102.60 to pay by');
  await entry.getByRole('button', { name: 'Pay by card' }).click();

  // The provider's checkout page (the local fake): a declined card first, then one that pays.
  await expect(phone.getByRole('heading', { name: 'Pay by card' })).toBeVisible();
  await expect(phone.getByText('£102.60').first()).toBeVisible();
  await phone.getByLabel('Card number').fill('4000 0000 0000 0002');
  await phone.getByRole('button', { name: 'Pay £102.60' }).click();
  await expect(phone.getByRole('heading', { name: 'The card was declined.' })).toBeVisible();
  await phone.getByRole('link', { name: 'Try another card' }).click();
  await phone.getByLabel('Card number').fill('4242 4242 4242 4242');
  await phone.getByRole('button', { name: 'Pay £102.60' }).click();

  // Back on the link, paid: the provider's signed event reached the API before it sent the customer back.
  await expect(phone).toHaveURL(new RegExp(`${link.pathname}\\?paid=[0-9a-f-]{36}$`));
  await expect(phone.getByText(`Thank you: your payment for invoice ${number} has been received.`)).toBeVisible();
  await expect(entry).toContainText('Paid. Thank you.');
  await expect(entry.getByRole('button', { name: 'Pay by card' })).toHaveCount(0);
  await customer.close();

  // The office sees it paid, by card, without doing anything.
  await issued.getByRole('button', { name: 'Close' }).click();
  await page.reload();
  const row = page.getByRole('table', { name: 'Quotes and invoices of this job' }).getByRole('row', { name: new RegExp(number) });
  await expect(row.getByText('Paid', { exact: true })).toBeVisible();
  await row.getByRole('button', { name: `Open ${number}` }).click();
  const paid = page.getByRole('dialog', { name: new RegExp(`^Invoice ${number}`) });
  await expect(paid.getByRole('table', { name: 'Payments received' })).toContainText('Card (online)');
  await expect(paid.getByRole('table', { name: 'Payments received' })).toContainText('£102.60');
  await expect(paid.getByText('Nothing owed')).toBeVisible();
  await office.context.close();
});
