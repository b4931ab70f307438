import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { LINK_TEST_CSV_HEADER } from '@wiretrail/core';
import { type Mailbox, startMailbox } from '../../scripts/mailbox.mjs';
import { bearer, jobByReference } from './document-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp, until } from './test-app.js';

const PUBLIC_URL = 'https://larkfield.wiretrail.example';

/** A cabling certification report is a document like the others: numbered, e-mailed, shared and locked. */
describe('a cabling certification report as paperwork', () => {
  let t: TestApp;
  let mailbox: Mailbox;
  let office: Session;
  let tech2: Session;
  let harbour: { id: string; siteId: string };
  let report: { id: string; number: string; title: string };

  beforeAll(async () => {
    mailbox = await startMailbox();
    t = await createTestApp({ SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mailbox.port), PUBLIC_URL, MAIL_OUTBOX_POLL_MS: '100', MAIL_RETRY_BASE_MS: '100', MAIL_MAX_ATTEMPTS: '3' });
    office = await signIn(t, 'office@larkfield.example');
    tech2 = await signIn(t, 'tech2@larkfield.example');
    harbour = await jobByReference(t, office, 'LED-0042');
    // RC-01 has the demo's results; RC-02's come from our template, so every link passes to a named limit set.
    const columns = LINK_TEST_CSV_HEADER.split(',');
    const row = columns.map((c) => ({ cable_label: 'RC-02', limit_set: 'tia-cat6-permanent-link', next_margin_db: '3.3', return_loss_margin_db: '1.9' })[c] ?? '').join(',');
    await t.http.post(`/api/jobs/${harbour.id}/link-tests/import`).set(bearer(office)).send({ csv: `${LINK_TEST_CSV_HEADER}\n${row}\n` }).expect(201);
    report = (await t.http.post(`/api/jobs/${harbour.id}/documents`).set(bearer(office)).send({ kind: 'cabling-report', coverage: 'site' }).expect(201)).body;
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  it('is numbered in the cabling reports’ series and e-mailed under its own title, with a link that shows it', async () => {
    expect(report.number).toBe('CR-0001');
    expect(report.title).toMatch(/^Cabling certification report: /);
    await t.http.post(`/api/documents/${report.id}/send`).set(bearer(office)).send({ to: 'practice@brightwater-dental.example', linkDays: 14 }).expect(202);
    await until(() => mailbox.messages.length === 1);
    const mail = mailbox.messages[0]!;
    expect(mail.subject).toBe('Cabling certification report CR-0001 from Larkfield Electrical & Data');
    expect(mail.text).toContain('Attached is cabling certification report CR-0001');
    expect(mail.attachments.map((a) => a.filename)).toEqual(['CR-0001.pdf']);
    const link = new RegExp(`${PUBLIC_URL}/shared/([A-Za-z0-9_-]{43})\\b`).exec(mail.text);
    const shared = (await t.http.get(`/api/shared/${link![1]}`).expect(200)).body;
    expect(shared.documents).toEqual([expect.objectContaining({ number: 'CR-0001', kind: 'cabling-report', title: expect.stringMatching(/^Cabling certification report/) })]);
  });

  it('holds the results it prints: a later change from a phone waits beside the issued value', async () => {
    const phone = new DeviceMirror('tech2-phone');
    await phone.pullAll(t, tech2);
    const test = phone.one('linkTest', (l) => l.siteId === harbour.siteId && l.returnLossMarginDb === 1.9);
    const [held] = await push(t, tech2, 'tech2-phone', [mutation('linkTest', test.id, { returnLossMarginDb: -2.5 }, { baseVersion: test.version, deviceId: 'tech2-phone' })]);
    expect(held).toMatchObject({ status: 'merged', heldBy: 'CR-0001' });
    const listed = (await t.http.get(`/api/jobs/${harbour.id}/link-tests`).set(bearer(office)).expect(200)).body as Array<{ id: string; returnLossMarginDb: number }>;
    expect(listed.find((l) => l.id === test.id)!.returnLossMarginDb).toBe(1.9);
  });
});
