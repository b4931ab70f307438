import { type Download, expect, type Locator, type Page } from '@playwright/test';

/** A job at the office's desk: reached from the Jobs board or table, with its tabs. */
export class OfficeJobPage {
  readonly photoTrail: Locator;
  readonly cableSchedule: Locator;
  readonly issuedDocuments: Locator;

  constructor(readonly page: Page) {
    this.photoTrail = page.getByRole('region', { name: 'Photo trail' });
    this.cableSchedule = page.getByRole('grid', { name: 'Cable schedule' });
    this.issuedDocuments = page.getByRole('table', { name: 'Issued documents' });
  }

  /** The Jobs board, from the side navigation. */
  async openBoard(): Promise<void> {
    await this.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs' }).click();
  }

  /** The Jobs board showing only jobs that match these words, as its search leaves it in the address. */
  async openBoardFor(words: string): Promise<void> {
    await this.page.goto(`/jobs?q=${encodeURIComponent(words)}`);
    await expect(this.page.getByRole('heading', { level: 1, name: 'Jobs' })).toBeVisible();
  }

  /** The job's quotes and invoices, at its billing address. */
  async openBilling(jobId: string): Promise<void> {
    await this.page.goto(`/invoices/jobs/${jobId}`);
    await expect(this.page.getByRole('heading', { name: 'Quotes and invoices' })).toBeVisible();
  }

  /** Builds a new invoice from the job's visits and gives its draft's dialog. */
  async newInvoiceFromJob(): Promise<Locator> {
    await this.page.getByRole('button', { name: 'New invoice' }).click();
    const draft = this.page.getByRole('dialog', { name: /Draft invoice/ });
    await expect(draft).toBeVisible();
    return draft;
  }

  /** Issues the draft open in its dialog, answering the question, and gives the number it was issued under. */
  async issueDraft(draft: Locator): Promise<string> {
    await draft.getByRole('button', { name: 'Save and issue…' }).click();
    await this.page.getByRole('dialog', { name: 'Issue this invoice?' }).getByRole('button', { name: 'Issue' }).click();
    const issued = this.page.getByRole('dialog', { name: /^Invoice INV-\d{4}/ });
    await expect(issued.getByText('Awaiting payment')).toBeVisible();
    const number = (await issued.getByRole('heading').first().textContent())!.match(/INV-\d{4}/)![0];
    await issued.getByRole('button', { name: 'Close' }).click();
    return number;
  }

  /** A job's card in one column of the board, by its reference. */
  boardCard(column: string, reference: RegExp): Locator {
    return this.page.getByRole('region', { name: column }).getByRole('article', { name: reference });
  }

  /** Opens the job from its card on the board. */
  async openFromCard(card: Locator, title: RegExp): Promise<void> {
    await card.getByRole('link', { name: title }).click();
    await this.expectJob(title);
  }

  async expectJob(title: string | RegExp): Promise<void> {
    await expect(this.page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  }

  async tab(name: 'Overview' | 'Photo trail' | 'Cable schedule' | 'Points' | 'Circuits & tests' | 'Documents & links' | 'Quotes & invoices'): Promise<void> {
    await this.page.getByRole('tab', { name }).click();
  }

  /** A cable's row in the job's cable schedule. */
  cableRow(label: string | RegExp): Locator {
    return this.cableSchedule.getByRole('row', { name: typeof label === 'string' ? new RegExp(label) : label });
  }

  /** Downloads the cable schedule as CSV. */
  async exportCableSchedule(): Promise<Download> {
    const download = this.page.waitForEvent('download');
    await this.page.getByRole('button', { name: 'Export CSV' }).click();
    return download;
  }

  /** Goes to the job's conflicts to settle them. */
  async openConflicts(): Promise<void> {
    await this.page.getByRole('link', { name: /^Settle/ }).click();
  }

  /** Issues the job's minor works certificate, confirming the question. */
  async issueMinorWorksCertificate(): Promise<void> {
    await this.tab('Documents & links');
    await this.page.getByRole('button', { name: 'Issue minor works certificate' }).click();
    await this.page.getByRole('dialog', { name: 'Issue the minor works certificate?' }).getByRole('button', { name: 'Issue' }).click();
  }

  /** Issues the job's cabling report of this job's cables, confirming the question, and gives the new document's id. */
  async issueCablingReport(jobId: string): Promise<string> {
    await this.tab('Documents & links');
    const issued = this.page.waitForResponse((r) => r.url().endsWith(`/api/jobs/${jobId}/documents`) && r.request().method() === 'POST');
    await this.page.getByRole('button', { name: 'Issue cabling report' }).click();
    await this.page.getByRole('dialog', { name: 'Issue the cabling report?' }).getByRole('button', { name: 'Issue' }).click();
    const res = await issued;
    expect(res.status()).toBe(201);
    return ((await res.json()) as { id: string }).id;
  }

  /** Issues the job's photo record, confirming the question. */
  async issuePhotoRecord(): Promise<void> {
    await this.tab('Documents & links');
    await this.page.getByRole('button', { name: 'Issue photo record' }).click();
    await this.page.getByRole('dialog', { name: 'Issue the photo record?' }).getByRole('button', { name: 'Issue' }).click();
  }

  /** Issues the site's hidden routes record from the job, confirming the question. */
  async issueHiddenRoutesRecord(): Promise<void> {
    await this.tab('Documents & links');
    await this.page.getByRole('button', { name: 'Issue hidden routes record' }).click();
    await this.page.getByRole('dialog', { name: 'Issue the hidden routes record?' }).getByRole('button', { name: 'Issue' }).click();
  }

  /** Opens an invoice, quote or credit note of the job's billing by its number, and gives its dialog. */
  async openInvoice(number: string): Promise<Locator> {
    await this.page.getByRole('table', { name: 'Quotes and invoices of this job' }).getByRole('button', { name: `Open ${number}` }).click();
    const dialog = this.page.getByRole('dialog', { name: new RegExp(`^(Invoice|Quote|Credit note) ${number}`) });
    await expect(dialog).toBeVisible();
    return dialog;
  }

  /** An issued document's row, by the words it shows. */
  documentRow(text: string): Locator {
    return this.issuedDocuments.getByRole('row').filter({ hasText: text }).first();
  }

  /** Opens the form that e-mails an issued document to the customer. */
  async openEmail(number: string): Promise<Locator> {
    await this.issuedDocuments.getByRole('button', { name: `E-mail ${number} to the customer` }).click();
    return this.page.getByRole('dialog', { name: /E-mail/ });
  }
}
