import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DocumentCounter } from '../src/paperwork/entities/document-counter.entity.js';
import { Invoice } from '../src/invoices/entities/invoice.entity.js';
import { bearer, jobByReference } from './document-helpers.js';
import { draft, fixedLine } from './invoice-helpers.js';
import type { Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

/**
 * A full VAT invoice carries a unique sequential number (VAT Regulations 1995 reg. 14(1)(a); HMRC VATREC5010):
 * numbers are taken in the issuing transaction, so under load there are no repeats, and refusals leave no gaps.
 */
describe('invoice numbers under concurrent issue', () => {
  let t: TestApp;
  let office: Session;
  let jobId: string;

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    jobId = (await jobByReference(t, office, 'LED-0042')).id;
  });
  afterAll(() => t.close());

  const withLines = async (kind: 'invoice' | 'quote', lines: object[]) => {
    const d = await draft(t, office, jobId, { kind, from: 'blank' });
    if (lines.length) await t.http.patch(`/api/invoices/${d.id}`).set(bearer(office)).send({ lines }).expect(200);
    return d.id;
  };

  it('gives ten issues at once ten numbers in a row, while refusals and a double issue use none', async () => {
    const good = await Promise.all(Array.from({ length: 10 }, (_, i) => withLines('invoice', [fixedLine(`Stage ${i + 1}`, 10_000 + i)])));
    const empty = await Promise.all(Array.from({ length: 3 }, () => withLines('invoice', [])));
    const nothing = await withLines('invoice', [fixedLine('Goodwill', 0)]);
    // Everything at once, with the first good draft sent twice.
    const attempts = [...good, good[0]!, ...empty, nothing];
    const answers = await Promise.all(attempts.map((id) => t.http.post(`/api/invoices/${id}/issue`).set(bearer(office))));

    const statuses = answers.map((a) => a.status).sort();
    expect(statuses).toEqual([...Array(10).fill(200), 409, 422, 422, 422, 422]);
    const numbers = answers.filter((a) => a.status === 200).map((a) => a.body.number as string);
    // The demo data issued INV-0001 and INV-0002.
    expect([...numbers].sort()).toEqual(Array.from({ length: 10 }, (_, i) => `INV-${String(i + 3).padStart(4, '0')}`));
    expect(new Set(numbers).size).toBe(10);

    const org = office.user.organisationId;
    const stored = await t.dataSource.getRepository(Invoice).find({ where: { organisationId: org, kind: 'invoice', status: 'issued' } });
    expect(stored.map((i) => i.number).sort()).toEqual(Array.from({ length: 12 }, (_, i) => `INV-${String(i + 1).padStart(4, '0')}`));
    expect(await t.dataSource.getRepository(DocumentCounter).findOneByOrFail({ organisationId: org, kind: 'invoice' })).toMatchObject({ value: 12 });
    // The refused drafts are still drafts, with no number.
    for (const id of [...empty, nothing]) expect(await t.dataSource.getRepository(Invoice).findOneByOrFail({ id })).toMatchObject({ status: 'draft', number: null });
  });

  it('counts quotes on their own, and the next invoice follows on without a gap', async () => {
    const quotes = await Promise.all([withLines('quote', [fixedLine('Option A', 50_000)]), withLines('quote', [fixedLine('Option B', 65_000)])]);
    const answers = await Promise.all(quotes.map((id) => t.http.post(`/api/invoices/${id}/issue`).set(bearer(office)).expect(200)));
    expect(answers.map((a) => a.body.number).sort()).toEqual(['QU-0002', 'QU-0003']);
    const next = await withLines('invoice', [fixedLine('Final account', 12_000)]);
    expect((await t.http.post(`/api/invoices/${next}/issue`).set(bearer(office)).expect(200)).body.number).toBe('INV-0013');
  });
});
