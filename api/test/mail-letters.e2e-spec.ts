import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type Mailbox, type ReceivedMail, startMailbox } from '../../scripts/mailbox.mjs';
import { bearer, downloadPdf, jobByReference, sha256 } from './document-helpers.js';
import { fixedLine, issuedInvoice } from './invoice-helpers.js';
import type { Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp, until } from './test-app.js';

const PUBLIC_URL = 'https://larkfield.wiretrail.example';
const HOSTILE_NAME = '<script>alert("owned")</script> Greaves & Co';

/** The words a reader sees in an HTML part: tags gone, entities read, spaces as one. */
function wordsOf(html: string): string {
  const body = /<body[^>]*>([\s\S]*)<\/body>/.exec(html)?.[1] ?? html;
  return body
    .replace(/<br>\n?/g, '\n')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&(lt|gt|quot|amp|#x27|#x60|#x3D);/g, (_, e: string) => ({ lt: '<', gt: '>', quot: '"', amp: '&', '#x27': "'", '#x60': '`', '#x3D': '=' })[e]!)
    .replace(/\s+/g, ' ')
    .trim();
}
const words = (text: string) => text.replace(/\s+/g, ' ').trim();

/**
 * Every e-mail's text and HTML parts come from one Handlebars template: the same words in both, and in the HTML part
 * every value escaped. A real SMTP server in the test stands in for the provider and keeps what it receives.
 */
describe('the e-mails the office sends', () => {
  let t: TestApp;
  let mailbox: Mailbox;
  let office: Session;
  let job: { id: string; customerId: string };
  let docs: Array<{ id: string; number: string; pdfSha256: string }>;

  const lastMail = async (count: number): Promise<ReceivedMail> => {
    await until(() => mailbox.messages.length >= count);
    return mailbox.messages[count - 1]!;
  };

  beforeAll(async () => {
    mailbox = await startMailbox();
    t = await createTestApp({ SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mailbox.port), PUBLIC_URL, MAIL_OUTBOX_POLL_MS: '100' });
    office = await signIn(t, 'office@larkfield.example');
    job = await jobByReference(t, office, 'LED-0033');
    await t.http.patch(`/api/customers/${job.customerId}`).set(bearer(office)).send({ name: HOSTILE_NAME }).expect(200);
    docs = [];
    for (const kind of ['minor-works', 'photo-record']) docs.push((await t.http.post(`/api/jobs/${job.id}/documents`).set(bearer(office)).send({ kind }).expect(201)).body);
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  it('sends several of a job’s documents in one e-mail, with the office’s message and a copy to another address', async () => {
    const message = 'Thank you for having us on Tuesday.\n\nThe <b>photos</b> show where the new cable runs.';
    const res = await t.http
      .post(`/api/jobs/${job.id}/documents/send`)
      .set(bearer(office))
      .send({ documentIds: docs.map((d) => d.id), to: 'hannah.greaves@example.com', cc: 'accounts@greaves-lettings.example', message, linkDays: 14 })
      .expect(202);
    expect(res.body.documents.map((d: { id: string; emailState: string }) => [d.id, d.emailState])).toEqual(docs.map((d) => [d.id, 'queued']));

    const mail = await lastMail(1);
    expect(mail.to.sort()).toEqual(['accounts@greaves-lettings.example', 'hannah.greaves@example.com']);
    expect(mail.toHeader).toBe('hannah.greaves@example.com');
    expect(mail.cc).toBe('accounts@greaves-lettings.example');
    expect(mail.subject).toBe(`${docs[0]!.number}, ${docs[1]!.number} from Larkfield Electrical & Data`);
    // Both PDFs, each exactly as issued, in the order chosen.
    expect(mail.attachments.map((a) => [a.filename, a.contentType])).toEqual(docs.map((d) => [`${d.number}.pdf`, 'application/pdf']));
    for (const [i, d] of docs.entries()) {
      expect(sha256(mail.attachments[i]!.content)).toBe(d.pdfSha256);
      expect(mail.attachments[i]!.content.equals((await downloadPdf(t, office, d.id)).bytes)).toBe(true);
    }
    // The greeting, then the office's own words, then the letter.
    expect(mail.text).toMatch(new RegExp(`^Hello ${HOSTILE_NAME.replace(/[()]/g, '\\$&')},\n\nThank you for having us on Tuesday.\n\nThe <b>photos</b> show`));
    expect(mail.text).toContain(`Attached are minor works certificate ${docs[0]!.number} and photo record ${docs[1]!.number} for the work at 14 Orchard Rise`);
    expect(mail.text).toMatch(new RegExp(`${PUBLIC_URL}/shared/[A-Za-z0-9_-]{43}\\n`));

    // The HTML part says the same, with the customer's name and the message shown, never taken as markup.
    expect(mail.html).not.toBe('');
    expect(mail.html).not.toContain('<script');
    expect(mail.html).not.toContain('<b>photos');
    expect(mail.html).toContain('&lt;script&gt;alert(&quot;owned&quot;)&lt;/script&gt; Greaves &amp; Co');
    expect(mail.html).toContain('The &lt;b&gt;photos&lt;/b&gt; show');
    expect(mail.html).toMatch(/<a href="https:\/\/larkfield\.wiretrail\.example\/shared\/[A-Za-z0-9_-]{43}">/);
    expect(wordsOf(mail.html)).toBe(words(mail.text));

    for (const d of docs) await until(async () => (await t.http.get(`/api/documents/${d.id}`).set(bearer(office))).body.emailState === 'sent');
  });

  it('refuses a copy-to that is not an address or is the same as To, a message too long, and a document not of the job, naming the field', async () => {
    const send = (body: object) => t.http.post(`/api/jobs/${job.id}/documents/send`).set(bearer(office)).send({ documentIds: [docs[0]!.id], to: 'hannah.greaves@example.com', ...body });
    expect((await send({ cc: 'accounts at greaves' }).expect(400)).body.message).toEqual(['cc must be an e-mail address']);
    expect((await send({ cc: 'Hannah.Greaves@example.com' }).expect(400)).body.message).toEqual(['cc must be another address than to']);
    expect((await send({ message: 'x'.repeat(2001) }).expect(400)).body.message).toEqual(['message must be at most 2000 characters']);
    expect((await send({ documentIds: [] }).expect(400)).body.message).toEqual(['documentIds must name at least one document']);
    expect((await send({ documentIds: [docs[0]!.id, docs[0]!.id] }).expect(400)).body.message).toEqual(['documentIds must not name a document twice']);
    const other = await jobByReference(t, office, 'LED-0042');
    const elsewhere = (await t.http.post(`/api/jobs/${other.id}/documents`).set(bearer(office)).send({ kind: 'photo-record' }).expect(201)).body;
    expect((await send({ documentIds: [elsewhere.id] }).expect(404)).body.message).toBe(`documentIds: ${elsewhere.id} is not a document of this job.`);
  });

  it('writes an invoice’s letter from the same kind of template, with the message and a copy', async () => {
    const inv = await issuedInvoice(t, office, job.id, [fixedLine('Outside socket', 9_000)]);
    const before = mailbox.messages.length;
    await t.http.post(`/api/invoices/${inv.id}/send`).set(bearer(office)).send({ to: 'hannah.greaves@example.com', cc: 'accounts@greaves-lettings.example', message: 'As agreed on site.' }).expect(202);
    const mail = await lastMail(before + 1);
    expect(mail.cc).toBe('accounts@greaves-lettings.example');
    expect(mail.text).toContain('As agreed on site.');
    expect(mail.text).toContain(`Attached is invoice ${inv.number} for £108.00 for the work at 14 Orchard Rise`);
    // The invoice and the job's documents.
    expect(mail.attachments.map((a) => a.filename)).toEqual([`${inv.number}.pdf`, ...docs.map((d) => `${d.number}.pdf`)]);
    expect(mail.html).not.toContain('<script');
    expect(wordsOf(mail.html)).toBe(words(mail.text));
  });
});
