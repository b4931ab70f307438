import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type Mailbox, startMailbox } from '../../scripts/mailbox.mjs';
import { OutboxMessage } from '../src/mail/entities/outbox-message.entity.js';
import { bearer, downloadPdf, jobByReference, sha256 } from './document-helpers.js';
import { DeviceMirror, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp, until } from './test-app.js';

const PUBLIC_URL = 'https://larkfield.wiretrail.example';

/** A real SMTP server in the test stands in for the provider; the outbox retries quickly here: 100 ms, then 400 ms. */
describe('e-mailing an issued document', () => {
  let t: TestApp;
  let mailbox: Mailbox;
  let office: Session;
  let document: { id: string; number: string; pdfSha256: string };

  const send = (body: object) => t.http.post(`/api/documents/${document.id}/send`).set(bearer(office)).send(body);
  const current = async () => (await t.http.get(`/api/documents/${document.id}`).set(bearer(office)).expect(200)).body;

  beforeAll(async () => {
    mailbox = await startMailbox();
    t = await createTestApp({
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(mailbox.port),
      PUBLIC_URL,
      MAIL_OUTBOX_POLL_MS: '100',
      MAIL_RETRY_BASE_MS: '100',
      MAIL_MAX_ATTEMPTS: '3',
    });
    office = await signIn(t, 'office@larkfield.example');
    const job = await jobByReference(t, office, 'LED-0033');
    document = (await t.http.post(`/api/jobs/${job.id}/documents`).set(bearer(office)).send({ kind: 'minor-works' }).expect(201)).body;
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  it('sends the PDF as issued, with a link to the job’s record, and the document says it was sent', async () => {
    const res = await send({ to: 'hannah.greaves@example.com', linkDays: 14 }).expect(202);
    expect(res.body.document).toMatchObject({ id: document.id, emailState: 'queued', emailedTo: 'hannah.greaves@example.com', emailError: null });
    expect(Date.parse(res.body.shareLink.expiresAt) - Date.now()).toBeGreaterThan(13.9 * 24 * 3600_000);

    await until(() => mailbox.messages.length === 1);
    const mail = mailbox.messages[0]!;
    expect(mail.to).toEqual(['hannah.greaves@example.com']);
    expect(mail.subject).toBe('Minor works certificate MW-0001 from Larkfield Electrical & Data');
    // From the contractor by name, at the address the mail provider allows; a reply goes to their office.
    expect(mail.from).toBe('"Larkfield Electrical & Data" <no-reply@wiretrail.local>');
    expect(mail.replyTo).toBe('office@larkfield.example');
    expect(mail.text).toMatch(/^Hello Hannah Greaves,/);
    expect(mail.text).toContain('Attached is minor works certificate MW-0001 for the work at 14 Orchard Rise, Wendmouth, WM2 4HD');
    expect(mail.attachments).toHaveLength(1);
    const [pdf] = mail.attachments;
    expect(pdf).toMatchObject({ filename: 'MW-0001.pdf', contentType: 'application/pdf' });
    const stored = (await downloadPdf(t, office, document.id)).bytes;
    expect(pdf!.content.equals(stored)).toBe(true);
    expect(sha256(pdf!.content)).toBe(document.pdfSha256);

    // The link opens the job's record for the customer, with the certificate in it.
    const link = new RegExp(`${PUBLIC_URL}/shared/([A-Za-z0-9_-]{43})\\b`).exec(mail.text);
    expect(link).not.toBeNull();
    const shared = (await t.http.get(`/api/shared/${link![1]}`).expect(200)).body;
    expect(shared.job).toMatchObject({ reference: 'LED-0033', customerName: 'Hannah Greaves' });
    expect(shared.documents.map((d: { number: string }) => d.number)).toEqual(['MW-0001']);

    await until(async () => (await current()).emailState === 'sent');
    const sent = await current();
    expect(sent).toMatchObject({ emailState: 'sent', emailedTo: 'hannah.greaves@example.com', emailError: null });
    expect(Date.now() - Date.parse(sent.emailedAt)).toBeLessThan(10_000);
    // Through the sync engine: every device pulls the new state.
    const desk = new DeviceMirror('office-desk');
    await desk.pullAll(t, office);
    expect(desk.one('document', (d) => d.id === document.id)).toMatchObject({ emailState: 'sent', emailedAt: sent.emailedAt });
    // Once sent, the outbox no longer holds the message, and with it the link, in the clear.
    const kept = await t.dataSource.getRepository(OutboxMessage).findOneByOrFail({ subjectId: document.id });
    expect(kept).toMatchObject({ state: 'sent', attempts: 1, text: null });
  });

  it('retries a failing mail server with growing waits, then records failed with the server’s reason', async () => {
    mailbox.refuse(451, '4.3.2 Mailbox busy, try again later');
    const before = mailbox.offeredAt.length;
    await send({ to: 'hannah.greaves@example.com' }).expect(202);
    const seen: string[] = [];
    await until(async () => {
      const d = await current();
      if (d.emailError && !seen.includes(d.emailError)) seen.push(d.emailError);
      return d.emailState === 'failed';
    }, 10_000);
    const failed = await current();
    expect(failed.emailState).toBe('failed');
    expect(failed.emailError).toMatch(/^Not sent after 3 attempts: .*451 4\.3\.2 Mailbox busy, try again later/);
    // While it was still trying, the document said so.
    expect(seen.some((e) => /^Attempt 1 of 3 failed, trying again: .*451/.test(e))).toBe(true);
    const tries = mailbox.offeredAt.slice(before);
    expect(tries).toHaveLength(3);
    // Waits of 100 ms and then 400 ms (MAIL_RETRY_BASE_MS × 4^n).
    expect(tries[1]! - tries[0]!).toBeGreaterThanOrEqual(90);
    expect(tries[2]! - tries[1]!).toBeGreaterThanOrEqual(390);
    expect(mailbox.messages).toHaveLength(1);
    mailbox.accept();
  });

  it('gives up at once when the server refuses the address for good', async () => {
    mailbox.refuse(550, '5.1.1 No such mailbox here');
    const before = mailbox.offeredAt.length;
    await send({ to: 'nobody@example.com' }).expect(202);
    await until(async () => (await current()).emailState === 'failed');
    expect((await current()).emailError).toMatch(/^Not sent after 1 attempt: .*550 5\.1\.1 No such mailbox here/);
    expect(mailbox.offeredAt.length - before).toBe(1);
    mailbox.accept();
  });

  it('names the field when the address is not one, and sends only issued documents of its own organisation', async () => {
    const bad = await send({ to: 'hannah at example' }).expect(400);
    expect(bad.body.message).toEqual(['to must be an e-mail address']);
    const days = await send({ to: 'hannah.greaves@example.com', linkDays: 365 }).expect(400);
    expect(days.body.message).toEqual(['linkDays must be at most 90']);
    const oakmere = await signIn(t, 'admin@oakmere.example');
    await t.http.post(`/api/documents/${document.id}/send`).set(bearer(oakmere)).send({ to: 'x@example.com' }).expect(404);
    const tech = await signIn(t, 'tech2@larkfield.example');
    await t.http.post(`/api/documents/${document.id}/send`).set(bearer(tech)).send({ to: 'x@example.com' }).expect(403);
  });
});
