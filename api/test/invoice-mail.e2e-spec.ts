import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type Mailbox, startMailbox } from '../../scripts/mailbox.mjs';
import { bearer, jobByReference, sha256 } from './document-helpers.js';
import { fixedLine, invoice, invoicePdf, issuedInvoice } from './invoice-helpers.js';
import type { Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp, until } from './test-app.js';

const PUBLIC_URL = 'https://larkfield.wiretrail.example';

/** A real SMTP server stands in for the provider; the outbox retries quickly here. */
describe('e-mailing an invoice', () => {
  let t: TestApp;
  let mailbox: Mailbox;
  let office: Session;
  let job: { id: string };

  beforeAll(async () => {
    mailbox = await startMailbox();
    t = await createTestApp({ SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mailbox.port), PUBLIC_URL, MAIL_OUTBOX_POLL_MS: '100', MAIL_RETRY_BASE_MS: '100', MAIL_MAX_ATTEMPTS: '2' });
    office = await signIn(t, 'office@larkfield.example');
    job = await jobByReference(t, office, 'LED-0033');
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  it('sends the invoice with the job’s issued documents and a link to its record, and says it was sent', async () => {
    const certificate = (await t.http.post(`/api/jobs/${job.id}/documents`).set(bearer(office)).send({ kind: 'minor-works' }).expect(201)).body;
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Extra double socket in the front bedroom', 16_500)]);
    const res = await t.http.post(`/api/invoices/${inv.id}/send`).set(bearer(office)).send({ to: 'hannah.greaves@example.com', linkDays: 30 }).expect(202);
    expect(res.body.invoice).toMatchObject({ id: inv.id, emailState: 'queued', emailedTo: 'hannah.greaves@example.com' });

    await until(() => mailbox.messages.length === 1);
    const mail = mailbox.messages[0]!;
    expect(mail.subject).toBe(`Invoice ${inv.number} from Larkfield Electrical & Data`);
    expect(mail.text).toMatch(/^Hello Hannah Greaves,/);
    // £165.00 and 20 % VAT: £198.00.
    expect(mail.text).toContain(`Attached is invoice ${inv.number} for £198.00 for the work at 14 Orchard Rise, Wendmouth, WM2 4HD`);
    expect(mail.text).toContain(`The job’s documents are attached too: Minor works certificate ${certificate.number}.`);
    expect(mail.text).toContain(`Please give ${inv.number} as the reference.`);
    // No card payments are set up in this app, so the e-mail does not offer them.
    expect(mail.text).not.toContain('pay by card');
    expect(mail.attachments.map((a) => a.filename)).toEqual([`${inv.number}.pdf`, `${certificate.number}.pdf`]);
    expect(sha256(mail.attachments[0]!.content)).toBe(inv.pdfSha256);
    expect(mail.attachments[0]!.content.equals((await invoicePdf(t, office, inv.id)).bytes)).toBe(true);
    expect(sha256(mail.attachments[1]!.content)).toBe(certificate.pdfSha256);

    await until(async () => (await invoice(t, office, inv.id)).emailState === 'sent');
    const link = new RegExp(`${PUBLIC_URL}/shared/([A-Za-z0-9_-]{43})\\b`).exec(mail.text);
    const shared = (await t.http.get(`/api/shared/${link![1]}/invoices`).expect(200)).body;
    expect(shared).toMatchObject({ cardPayments: false });
    expect(shared.items.find((i: { id: string }) => i.id === inv.id)).toMatchObject({ owedMinor: 19_800, payByCard: false });
  });

  it('says why when the mail server turns it away', async () => {
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Call-out', 6_000)], 'quote');
    mailbox.refuse(550, 'No such mailbox here');
    try {
      await t.http.post(`/api/invoices/${inv.id}/send`).set(bearer(office)).send({ to: 'nobody@example.com' }).expect(202);
      await until(async () => (await invoice(t, office, inv.id)).emailState === 'failed');
      const after = (await t.http.get(`/api/invoices/${inv.id}`).set(bearer(office)).expect(200)).body;
      expect(after.emailError).toMatch(/^Not sent after 1 attempt: .*No such mailbox here/);
    } finally {
      mailbox.accept();
    }
  });

  it('sends only what is issued', async () => {
    const draft = (await t.http.post(`/api/jobs/${job.id}/invoices`).set(bearer(office)).send({ kind: 'invoice', from: 'blank' }).expect(201)).body;
    const res = await t.http.post(`/api/invoices/${draft.id}/send`).set(bearer(office)).send({ to: 'hannah.greaves@example.com' }).expect(409);
    expect(res.body.message).toBe('Only an issued quote, invoice or credit note can be e-mailed.');
    expect((await t.http.post(`/api/invoices/${draft.id}/send`).set(bearer(office)).send({ to: 'not an address' }).expect(400)).body.message).toEqual(['to must be an e-mail address']);
  });
});
