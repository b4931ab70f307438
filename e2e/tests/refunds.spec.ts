import { bookVisit, DESK, expect, signedInAtDesk, test } from '../fixtures.js';
import { OfficeJobPage } from '../pages/office-job-page.js';

test.use({ viewport: DESK });

test('a part-paid invoice credited in full shows what is owed back, at the invoice and in the aged view, until the office records the refund', async ({ browser, request }) => {
  test.setTimeout(120_000);
  // A job of this test's own, so that no other test's invoices get in the way.
  const title = `Garden socket not wanted (refund test ${Date.now().toString(36)})`;
  const { jobId } = await bookVisit(request, { technicianEmail: 'tech2@larkfield.example', siteName: 'Fernhill Close', title });
  const office = await signedInAtDesk(browser, 'office');
  const page = office.page;
  const job = new OfficeJobPage(page);
  await job.openBilling(jobId);

  // £50.00 and 20 % VAT (£10.00): £60.00.
  const draft = await job.newInvoiceFromJob();
  await draft.getByRole('button', { name: 'Add a line' }).click();
  const line = draft.getByRole('group', { name: 'Line 1' });
  await line.getByLabel('Description').fill('Outside socket on the patio');
  await line.getByLabel('Unit price (£)').fill('50');
  await line.getByLabel('Quantity', { exact: true }).fill('1');
  const number = await job.issueDraft(draft);

  // £25.00 taken on site.
  let invoice = await job.openInvoice(number);
  await invoice.getByRole('button', { name: 'Record a payment' }).click();
  const payment = invoice.getByRole('form', { name: `Record a payment against ${number}` });
  await payment.getByLabel('Amount (£)').fill('25.00');
  await payment.getByLabel('How it was paid').selectOption('cash');
  await payment.getByRole('button', { name: 'Record payment' }).click();
  await expect(invoice.getByText('£35.00 still owed')).toBeVisible();

  // The customer no longer wants it: the whole invoice is credited, after the warning that nothing goes back by itself.
  await invoice.getByRole('button', { name: 'Raise a credit note' }).click();
  await page.getByRole('dialog', { name: 'Credit an invoice that has been paid?' }).getByRole('button', { name: 'Raise the credit note' }).click();
  const credit = page.getByRole('dialog', { name: /Draft credit note/ });
  await credit.getByRole('button', { name: 'Save and issue…' }).click();
  await page.getByRole('dialog', { name: 'Issue this credit note?' }).getByRole('button', { name: 'Issue' }).click();
  await expect(page.getByRole('dialog', { name: /^Credit note CN-\d{4}/ })).toBeVisible();
  await page.getByRole('dialog', { name: /^Credit note CN-\d{4}/ }).getByRole('button', { name: 'Close' }).click();

  invoice = await job.openInvoice(number);
  await expect(invoice.getByText('Overpaid')).toBeVisible();
  await expect(invoice.getByText('£25.00 to refund')).toBeVisible();
  await expect(invoice.getByText('£25.00 paid too much: to refund')).toBeVisible();
  await invoice.getByRole('button', { name: 'Close' }).click();

  // The aged view shows the money owed back to the customer, and does not count it as debt.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Invoices' }).click();
  await expect(page.getByRole('heading', { name: 'Who owes what' })).toBeVisible();
  const owedBack = page.getByRole('region', { name: 'Owed back to customers' });
  await expect(owedBack.getByText(new RegExp(`${number}.*£25\\.00 paid, £60\\.00 credited · £25\\.00 to refund`))).toBeVisible();
  await expect(page.getByRole('table', { name: 'Owed by customer' }).getByText(number)).toHaveCount(0);
  await page.screenshot({ path: test.info().outputPath('owed-back.png'), fullPage: true });

  // The refund: more than is owed back is refused on the form; the whole £25.00 by bank transfer is recorded.
  await job.openBilling(jobId);
  invoice = await job.openInvoice(number);
  await invoice.getByRole('button', { name: 'Record a refund' }).click();
  const refund = invoice.getByRole('form', { name: `Record a refund on ${number}` });
  await expect(refund.getByLabel('Amount (£)')).toHaveValue('25.00');
  await refund.getByLabel('Amount (£)').fill('25.01');
  await refund.getByRole('button', { name: 'Record refund' }).click();
  await expect(refund.getByText(`Amount: £25.01 is more than the £25.00 owed back to the customer on ${number}.`)).toBeVisible();
  await refund.getByLabel('Amount (£)').fill('25.00');
  await refund.getByLabel('Reference').fill('Transfer to H Okonjo');
  await refund.getByRole('button', { name: 'Record refund' }).click();
  await expect(page.getByText(`Refund recorded. Nothing is left to refund on ${number}.`)).toBeVisible();
  await expect(invoice.getByText('Refunded', { exact: true })).toBeVisible();
  await expect(invoice.getByText('£25.00 given back')).toBeVisible();
  await expect(invoice.getByRole('table', { name: 'Refunds given' })).toContainText('Transfer to H Okonjo');
  await expect(invoice.getByText(/Nothing owed and nothing left to refund/)).toBeVisible();
  await expect(invoice.getByRole('button', { name: 'Record a refund' })).toHaveCount(0);
  await invoice.getByRole('button', { name: 'Close' }).click();

  // Nothing of it is owed back any more.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Invoices' }).click();
  await expect(page.getByRole('heading', { name: 'Owed back to customers' })).toBeVisible();
  await expect(page.getByRole('region', { name: 'Owed back to customers' }).getByText(number)).toHaveCount(0);
  await office.context.close();
});
