import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { v7 as uuidv7 } from 'uuid';
import { bearer, jobByReference } from './document-helpers.js';
import { draft, editable, invoice, type InvoiceBody } from './invoice-helpers.js';
import { catchUp, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

// The money here is the demo price list's (seed/scenario.json); the rule under test is ours: a visit's labour and
// each part used on it go on one live invoice at a time (a draft, or an issued invoice not fully credited).

describe('a visit is billed once', () => {
  let t: TestApp;
  let office: Session;
  let aled: Session;
  let earlier: { id: string; siteId: string };
  let seeded: InvoiceBody;
  let visitId: string;
  let latePart: string;

  const issue = (id: string) => t.http.post(`/api/invoices/${id}/issue`).set(bearer(office));
  const patch = (id: string, body: object) => t.http.patch(`/api/invoices/${id}`).set(bearer(office)).send(body);
  /** A line as read back, sent again with where it came from. */
  const withSources = (l: InvoiceBody['lines'][number]) => ({ ...editable(l), partUseIds: l.partUseIds });

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    aled = await signIn(t, 'tech2@larkfield.example');
    earlier = await jobByReference(t, office, 'LED-0033');
    const items = (await t.http.get(`/api/jobs/${earlier.id}/invoices`).set(bearer(office)).expect(200)).body.items as Array<{ id: string; number: string | null }>;
    // The demo data's INV-0002 was built from LED-0033's visit: its time on site and six parts.
    seeded = await invoice(t, office, items.find((i) => i.number === 'INV-0002')!.id);
    visitId = seeded.lines[0]!.visitId!;
  });
  afterAll(() => t.close());

  it('a second invoice from the same visit takes nothing twice, and says what it left out and why', async () => {
    expect(seeded.lines.map((l) => l.kind)).toEqual(['labour', 'material', 'material', 'material', 'material', 'material', 'material', 'fixed']);
    expect(seeded.lines.slice(1, 7).every((l) => l.partUseIds.length === 1)).toBe(true);

    const again = await draft(t, office, earlier.id, { kind: 'invoice' });
    expect(again.lines).toEqual([]);
    expect(again.leftOut).toEqual([expect.stringMatching(/^Visit \d{1,2} [A-Z][a-z]{2} \d{4}: labour and 6 parts already on INV-0002, so not taken again\.$/)]);
    // A quote built from the job leaves the invoiced work out too.
    expect((await draft(t, office, earlier.id, { kind: 'quote' })).lines).toEqual([]);

    // A part used on the visit after the invoice went out is taken, and only it.
    const plug = seeded.lines.find((l) => l.description === 'Cat6 RJ45 plug')!;
    latePart = uuidv7();
    await catchUp(t, aled, 'aled-phone');
    const [pushed] = await push(t, aled, 'aled-phone', [
      mutation('materialLine', latePart, { visitId, siteId: earlier.siteId, priceItemId: plug.priceItemId, description: 'Cat6 RJ45 plug', quantity: 2, unit: 'each' }),
    ]);
    expect(pushed!.status).toBe('applied');
    const late = await draft(t, office, earlier.id, { kind: 'invoice' });
    expect(late.lines.map((l) => [l.kind, l.description, l.quantity, l.unitPriceMinor, l.partUseIds])).toEqual([['material', 'Cat6 RJ45 plug', '2', 120, [latePart]]]);
    expect(late.leftOut).toEqual(again.leftOut);

    // A draft holds what it took: a third build takes nothing and names the draft.
    const third = await draft(t, office, earlier.id, { kind: 'invoice' });
    expect(third.lines).toEqual([]);
    expect(third.leftOut).toEqual([
      expect.stringMatching(/labour and 6 parts already on INV-0002, so not taken again\.$/),
      expect.stringMatching(/^Visit .*: 1 part already on the draft invoice started \d{1,2} [A-Z][a-z]{2} \d{4}, so not taken again\.$/),
    ]);
    // Editing a draft keeps where its lines came from.
    await patch(late.id, { lines: late.lines.map(withSources) }).expect(200);
    expect((await invoice(t, office, late.id)).lines[0]!.partUseIds).toEqual([latePart]);
    for (const d of [again, third]) await t.http.delete(`/api/invoices/${d.id}`).set(bearer(office)).expect(204);
  });

  it('refuses to issue an invoice asking again for a visit’s labour or parts on another live invoice, naming it', async () => {
    const copy = await draft(t, office, earlier.id, { kind: 'invoice', from: 'blank' });
    await patch(copy.id, { lines: seeded.lines.map(withSources) }).expect(200);
    const refused = await issue(copy.id).expect(409);
    expectErrorBody(refused.body, 409);
    expect(refused.body.message).toMatch(/^This invoice asks again for work already invoiced on INV-0002: Visit .*: labour and 6 parts already on INV-0002\. Remove those lines, or credit INV-0002 in full first\.$/);
    expect((await invoice(t, office, copy.id)).status).toBe('draft');

    // Two drafts holding the same part: the first issues, the second cannot.
    const drafts = (await t.http.get(`/api/jobs/${earlier.id}/invoices`).set(bearer(office)).expect(200)).body.items as InvoiceBody[];
    const late = drafts.find((d) => d.status === 'draft' && d.kind === 'invoice' && d.id !== copy.id)!;
    const twin = await draft(t, office, earlier.id, { kind: 'invoice', from: 'blank' });
    await patch(twin.id, { lines: (await invoice(t, office, late.id)).lines.map(withSources) }).expect(200);
    // The refusal used no number: the first to issue is INV-0003.
    expect((await issue(late.id).expect(200)).body.number).toBe('INV-0003');
    expect((await issue(twin.id).expect(409)).body.message).toMatch(/already invoiced on INV-0003: Visit .*: 1 part already on INV-0003\./);
    for (const id of [copy.id, twin.id]) await t.http.delete(`/api/invoices/${id}`).set(bearer(office)).expect(204);
  });

  it('gives the lines back once a credit note takes back the whole invoice, and not before', async () => {
    const creditNote = async (keep: (l: InvoiceBody['lines'][number]) => boolean) => {
      const cn: InvoiceBody = (await t.http.post(`/api/invoices/${seeded.id}/credit-note`).set(bearer(office)).expect(201)).body;
      await patch(cn.id, { lines: cn.lines.filter(keep).map(withSources) }).expect(200);
      return (await issue(cn.id).expect(200)).body as InvoiceBody;
    };
    // Taking back the testing line alone leaves the visit's work on INV-0002.
    await creditNote((l) => l.kind === 'fixed');
    const partly = await draft(t, office, earlier.id, { kind: 'invoice' });
    expect(partly.lines).toEqual([]);
    expect(partly.leftOut).toEqual([expect.stringMatching(/labour and 6 parts already on INV-0002/), expect.stringMatching(/1 part already on INV-0003/)]);
    await t.http.delete(`/api/invoices/${partly.id}`).set(bearer(office)).expect(204);

    // The rest taken back: INV-0002 asks for nothing, so its labour and parts may be invoiced again.
    await creditNote((l) => l.kind !== 'fixed');
    expect((await invoice(t, office, seeded.id)).account).toMatchObject({ owedMinor: 0, creditedMinor: seeded.grossMinor });
    const released = await draft(t, office, earlier.id, { kind: 'invoice' });
    expect(released.lines.map((l) => [l.kind, l.quantity, l.netMinor])).toEqual(seeded.lines.filter((l) => l.kind !== 'fixed').map((l) => [l.kind, l.quantity, l.netMinor]));
    expect(released.leftOut).toEqual([expect.stringMatching(/^Visit .*: 1 part already on INV-0003, so not taken again\.$/)]);
    expect((await issue(released.id).expect(200)).body.number).toBe('INV-0004');
  });
});
