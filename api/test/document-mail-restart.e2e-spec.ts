import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type Mailbox, startMailbox } from '../../scripts/mailbox.mjs';
import { bearer, jobByReference, sha256 } from './document-helpers.js';
import { createTestApp, signIn, type TestApp, until } from './test-app.js';

// Its own file: the environment is read once per module graph, and this outbox waits 1.5 s before a retry.
describe('the mail outbox across a restart', () => {
  let mailbox: Mailbox;
  let t: TestApp;
  beforeAll(async () => {
    mailbox = await startMailbox();
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  it('keeps an e-mail that could not go yet and sends it once the API is running again', async () => {
    const env = { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mailbox.port), MAIL_OUTBOX_POLL_MS: '100', MAIL_RETRY_BASE_MS: '1500', MAIL_MAX_ATTEMPTS: '5' };
    const before = await createTestApp(env);
    let office = await signIn(before, 'office@larkfield.example');
    const job = await jobByReference(before, office, 'LED-0033');
    const doc = (await before.http.post(`/api/jobs/${job.id}/documents`).set(bearer(office)).send({ kind: 'photo-record' }).expect(201)).body;

    mailbox.refuse(421, '4.7.0 Try again later, closing connection');
    await before.http.post(`/api/documents/${doc.id}/send`).set(bearer(office)).send({ to: 'hannah.greaves@example.com' }).expect(202);
    await until(() => mailbox.offeredAt.length === 1);
    await before.close({ keepFiles: true });

    // The provider is back while the API is down; the new process finds the message in the outbox and sends it.
    mailbox.accept();
    t = await createTestApp(env, { directory: before.directory });
    office = await signIn(t, 'office@larkfield.example');
    await until(() => mailbox.messages.length === 1, 8000);
    expect(mailbox.offeredAt).toHaveLength(2);
    expect(mailbox.messages[0]!.attachments[0]!.filename).toBe('PR-0001.pdf');
    expect(sha256(mailbox.messages[0]!.attachments[0]!.content)).toBe(doc.pdfSha256);
    await until(async () => (await t.http.get(`/api/documents/${doc.id}`).set(bearer(office))).body.emailState === 'sent');
  });
});
