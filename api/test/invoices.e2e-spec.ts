import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { addDays } from '@wiretrail/core';
import { bearer, jobByReference, pdfText, sha256 } from './document-helpers.js';
import { draft, editable, fixedLine, invoice, invoicePdf, issuedInvoice } from './invoice-helpers.js';
import type { Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

// Check values are worked by hand from the demo price list (seed/scenario.json) with the rounding rule in
// core/src/money/vat.ts: VAT per line to the nearer penny, HMRC VAT Notice 700 paragraph 17.5 (the paragraph's
// wording from memory; HMRC manual VATREC12010 read). Rates: 20 % standard, 5 % reduced, 0 % zero (from memory).
// What a full VAT invoice shows: VAT Regulations 1995 (SI 1995/2518) regulation 14(1), as summarised in HMRC
// manual VATREC5010 (read). A credit note credits VAT at the rate the invoice charged: common practice, from memory.

describe('quotes, invoices and credit notes', () => {
  let t: TestApp;
  let office: Session;
  let admin: Session;
  let earlier: { id: string };
  let harbour: { id: string };

  const patch = (id: string, body: object) => t.http.patch(`/api/invoices/${id}`).set(bearer(office)).send(body);
  const issue = (id: string) => t.http.post(`/api/invoices/${id}/issue`).set(bearer(office));
  const pay = (id: string, body: object) => t.http.post(`/api/invoices/${id}/payments`).set(bearer(office)).send(body);
  const today = async () => (await t.http.get('/api/invoices/aged-debt').set(bearer(office)).expect(200)).body.asOf as string;

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    admin = await signIn(t, 'admin@larkfield.example');
    earlier = await jobByReference(t, office, 'LED-0033');
    harbour = await jobByReference(t, office, 'LED-0042');
  });
  afterAll(() => t.close());

  const seededOrchardInvoice = async () => {
    const items = (await t.http.get(`/api/jobs/${earlier.id}/invoices`).set(bearer(office)).expect(200)).body.items as Array<{ id: string; number: string | null }>;
    return invoice(t, office, items.find((i) => i.number === 'INV-0002')!.id);
  };

  describe('building from the job', () => {
    it('prices labour from the visit’s arrival and departure at the default rate, and parts from the price list', async () => {
      // The demo data's INV-0002 was built from LED-0033's visit by the same builder when it was loaded; building
      // again takes none of it (api/test/billing-once.e2e-spec.ts), so its lines are read here.
      const again = await draft(t, office, earlier.id, { kind: 'invoice' });
      expect(again.lines).toEqual([]);
      expect(again.leftOut).toEqual([expect.stringMatching(/^Visit .*: labour and 6 parts already on INV-0002, so not taken again\.$/)]);
      const d = await seededOrchardInvoice();
      expect(d).toMatchObject({ kind: 'invoice', status: 'issued', number: 'INV-0002', termDays: 30 });
      expect(d.lines.filter((l) => l.kind !== 'fixed').map((l) => [l.kind, l.description, l.quantity, l.unit, l.unitPriceMinor, l.netMinor, l.vatMinor, l.grossMinor])).toEqual([
        // 09:10–10:50 on site is 1 h 40 min, billed as 1.75 h (quarter hours, our rule) × £52.00 = £91.00; 20 % is £18.20.
        ['labour', expect.stringMatching(/^Labour on .*: 1 h 40 min on site, 09:10–10:50 \(Electrician\)$/), '1.75', 'h', 5200, 9100, 1820, 10920],
        ['material', 'Twin switched socket-outlet, white', '1', 'each', 650, 650, 130, 780],
        ['material', 'Flush metal back box, 35 mm, double', '1', 'each', 210, 210, 42, 252],
        // 6.5 m × £1.60 = £10.40; 20 % is £2.08.
        ['material', '2.5 mm² twin and earth cable', '6.5', 'm', 160, 1040, 208, 1248],
        ['material', 'Cat6 U/UTP cable, low smoke', '18', 'm', 75, 1350, 270, 1620],
        ['material', 'Cat6 keystone jack', '1', 'each', 420, 420, 84, 504],
        ['material', 'Cat6 RJ45 plug', '1', 'each', 120, 120, 24, 144],
      ]);
      // Every line's VAT added up, never VAT on the total (VAT Notice 700 §17.5); the seed adds £45.00 for testing.
      expect(d).toMatchObject({ netMinor: 12_890 + 4_500, vatMinor: 2_578 + 900, grossMinor: 15_468 + 5_400 });
      expect(d.byRate).toEqual([{ basisPoints: 2000, netMinor: 17_390, vatMinor: 3_478 }]);
      expect(d.lines[0]!.visitId).toEqual(expect.any(String));
      expect(d.lines.slice(1, 7).every((l) => l.priceItemId && l.partUseIds.length)).toBe(true);
    });

    it('says what it could not price: visits with no times recorded', async () => {
      const d = await draft(t, office, harbour.id, { kind: 'quote' });
      expect(d.lines).toEqual([]);
      expect(d.termDays).toBe(30);
      expect(d.warnings).toEqual([expect.stringMatching(/^The visit on .* has no arrival time recorded, so its labour is not included\.$/), expect.stringMatching(/has no arrival time/)]);
    });

    it('refuses a line it cannot price, naming the line and the field', async () => {
      const d = await draft(t, office, earlier.id, { kind: 'invoice', from: 'blank' });
      const bad = await patch(d.id, { lines: [fixedLine('Socket', 650, 'two'), { ...fixedLine('Fuse', 50), unitPriceMinor: 12.5 }] }).expect(400);
      expectErrorBody(bad.body, 400);
      expect(bad.body.message).toEqual([
        'lines.0.quantity must be a number with at most three decimal places, like 2.5',
        'lines.1.unitPriceMinor must be a whole number of pence',
      ]);
      const rate = await patch(d.id, { lines: [fixedLine('Socket', 650, 1, 'luxury'), fixedLine('Refund', 650, -1)] }).expect(400);
      expect(rate.body.message).toEqual([
        expect.stringMatching(/^lines\[0\]\.vatRateCode must be one of this organisation's VAT rates: standard \(20 %\), reduced \(5 %\), zero \(0 %\); got "luxury"\.$/),
        'lines[1].quantity: must be more than nothing',
      ]);
      const huge = await patch(d.id, { lines: [fixedLine('A lot of cable', 100_000_000, '999999999')] }).expect(400);
      expect(huge.body.message).toEqual(['lines[0]: comes to more than can be held: check its quantity and price']);
      expect((await invoice(t, office, d.id)).lines).toEqual([]);
    });

    it('rounds each line to the penny: 0.333 × £10.03 is 333.999p, so 334p, with 66.8p VAT charged as 67p', async () => {
      const d = await draft(t, office, earlier.id, { kind: 'quote', from: 'blank' });
      const res = await patch(d.id, { lines: [fixedLine('Part of a drum of cable', 1003, '0.333'), fixedLine('Fuse', 50, 3, 'reduced'), fixedLine('Leaflet', 99, 1, 'zero')] }).expect(200);
      expect(res.body.lines.map((l: { netMinor: number; vatMinor: number }) => [l.netMinor, l.vatMinor])).toEqual([[334, 67], [150, 8], [99, 0]]);
      // 5 % of £1.50 is 7.5p, taken up to 8p (a half penny up: the rule in vat.ts).
      expect(res.body.byRate).toEqual([
        { basisPoints: 0, netMinor: 99, vatMinor: 0 },
        { basisPoints: 500, netMinor: 150, vatMinor: 8 },
        { basisPoints: 2000, netMinor: 334, vatMinor: 67 },
      ]);
      expect(res.body).toMatchObject({ netMinor: 583, vatMinor: 75, grossMinor: 658 });
      await t.http.delete(`/api/invoices/${d.id}`).set(bearer(office)).expect(204);
      await t.http.get(`/api/invoices/${d.id}`).set(bearer(office)).expect(404);
    });
  });

  describe('issuing', () => {
    let issued: Awaited<ReturnType<typeof invoice>>;

    beforeAll(async () => {
      // The same lines as the demo data's INV-0002, typed as the office's own: the visit's work is already invoiced.
      const d = await draft(t, office, earlier.id, { kind: 'invoice', from: 'blank' });
      const typed = (await seededOrchardInvoice()).lines.map((l) => ({ ...editable(l), visitId: null }));
      await patch(d.id, { notes: 'Thank you for having us.', lines: typed }).expect(200);
      issued = (await issue(d.id).expect(200)).body;
    });

    it('numbers it, dates it where the contractor is, and sets the due date from the terms', async () => {
      // The demo data has issued INV-0001 and INV-0002 already.
      expect(issued).toMatchObject({ status: 'issued', number: 'INV-0003', termDays: 30, netMinor: 17_390, vatMinor: 3_478, grossMinor: 20_868 });
      expect(issued.issueDate).toBe(await today());
      expect(issued.dueDate).toBe(addDays(issued.issueDate!, 30));
      expect(issued.account).toEqual({ paidMinor: 0, creditedMinor: 0, refundedMinor: 0, owedMinor: 20_868, state: 'awaiting', overdueDays: 0 });
    });

    it('prints what a VAT invoice must show (VAT Regulations 1995 reg. 14(1); VATREC5010)', async () => {
      const { bytes, res } = await invoicePdf(t, office, issued.id);
      expect(res.headers['content-type']).toBe('application/pdf');
      expect(res.headers['content-disposition']).toContain('INV-0003.pdf');
      expect(sha256(bytes)).toBe(issued.pdfSha256);
      const text = await pdfText(bytes);
      for (const words of [
        'Invoice', 'INV-0003', // a unique sequential number
        'DATE OF ISSUE AND TAX POINT', // the time of supply and date of issue
        'Larkfield Electrical & Data', 'Unit 4, Tannery Yard', 'VAT REGISTRATION NUMBER GB 999 0417 21', // the supplier
        'Hannah Greaves', '14 Orchard Rise, Wendmouth', // the customer
        'Cat6 keystone jack', '6.5 m', '£1.60', '20 %', // each line: description, quantity, price, rate
        'Total before VAT £173.90', 'VAT at 20 % £34.78', 'Total £208.68', // totals and the VAT in sterling
        'PAYMENT DUE BY', '(30 days)', 'Bank transfer to Larkfield Electrical & Data', 'Please give INV-0003 as the reference.', 'Thank you for having us.',
      ]) {
        expect([words, text.includes(words)]).toEqual([words, true]);
      }
    });

    it('cannot be changed once issued: edits, deletion and a second issue are refused and nothing moves', async () => {
      const edit = await patch(issued.id, { lines: [fixedLine('Socket', 1)] }).expect(409);
      expectErrorBody(edit.body, 409);
      expect(edit.body.message).toBe('Invoice INV-0003 is issued and cannot be changed: raise a credit note to correct it.');
      await patch(issued.id, { notes: 'changed' }).expect(409);
      await t.http.delete(`/api/invoices/${issued.id}`).set(bearer(office)).expect(409);
      await issue(issued.id).expect(409);
      const after = await invoice(t, office, issued.id);
      expect(after.lines).toEqual(issued.lines);
      expect(after).toMatchObject({ number: 'INV-0003', grossMinor: 20_868, pdfSha256: issued.pdfSha256 });
      expect(sha256((await invoicePdf(t, office, issued.id)).bytes)).toBe(issued.pdfSha256);
    });

    it('refuses to issue an empty draft or one that asks for nothing, using no number', async () => {
      const empty = await draft(t, office, earlier.id, { kind: 'invoice', from: 'blank' });
      const refused = await issue(empty.id).expect(422);
      expect(refused.body.message).toEqual(['Add at least one line before issuing.']);
      await patch(empty.id, { lines: [fixedLine('Goodwill', 0)] }).expect(200);
      expect((await issue(empty.id).expect(422)).body.message).toEqual(['The total must be more than nothing.']);
      await patch(empty.id, { lines: [fixedLine('Call-out', 6000)] }).expect(200);
      expect((await issue(empty.id).expect(200)).body.number).toBe('INV-0004');
    });

    it('a change of VAT rate is data: issued lines keep their rate, and a draft issued after it takes the new one', async () => {
      const rates = (await t.http.get('/api/vat-rates').set(bearer(office)).expect(200)).body.items as Array<{ id: string; code: string; basisPoints: number }>;
      const standard = rates.find((r) => r.code === 'standard')!;
      const d = await draft(t, office, earlier.id, { kind: 'invoice', from: 'blank' });
      await patch(d.id, { lines: [fixedLine('Call-out', 10_000)] }).expect(200);
      // A made-up new rate of 22.5 %, to show that nothing in the code holds 20 %.
      await t.http.patch(`/api/vat-rates/${standard.id}`).set(bearer(admin)).send({ basisPoints: 2250 }).expect(200);
      try {
        const after = (await issue(d.id).expect(200)).body;
        expect(after.lines[0]).toMatchObject({ vatRateCode: 'standard', vatBasisPoints: 2250, netMinor: 10_000, vatMinor: 2_250 });
        expect((await invoice(t, office, issued.id)).lines.every((l) => l.vatBasisPoints === 2000)).toBe(true);
      } finally {
        await t.http.patch(`/api/vat-rates/${standard.id}`).set(bearer(admin)).send({ basisPoints: 2000 }).expect(200);
      }
    });
  });

  describe('credit notes and payments', () => {
    let inv: Awaited<ReturnType<typeof invoice>>;

    beforeAll(async () => {
      // £120.00 of labour and £60.00 call-out at 20 %: £216.00 owed.
      inv = await issuedInvoice(t, office, earlier.id, [fixedLine('Labour', 12_000), fixedLine('Call-out', 6_000)]);
    });

    it('raises a credit note as the negatives of the invoice’s lines, which the office trims before issuing', async () => {
      const credit = (await t.http.post(`/api/invoices/${inv.id}/credit-note`).set(bearer(office)).expect(201)).body;
      expect(credit).toMatchObject({ kind: 'credit-note', status: 'draft', creditsInvoiceId: inv.id, netMinor: -18_000, vatMinor: -3_600, grossMinor: -21_600, creditsNumber: inv.number });
      expect(credit.lines.map((l: { quantity: string; vatBasisPoints: number }) => [l.quantity, l.vatBasisPoints])).toEqual([['-1', 2000], ['-1', 2000]]);
      // Raising it again finds the same draft.
      expect((await t.http.post(`/api/invoices/${inv.id}/credit-note`).set(bearer(office)).expect(201)).body.id).toBe(credit.id);
      // Only the call-out is taken back; a credit note's quantities must be below nothing, at a rate the invoice charged.
      expect((await patch(credit.id, { lines: [fixedLine('Call-out', 6_000, 1)] }).expect(400)).body.message).toEqual(['lines[0].quantity: must be below nothing on a credit note, which takes back what was charged']);
      expect((await patch(credit.id, { lines: [fixedLine('Call-out', 6_000, -1, 'reduced')] }).expect(400)).body.message).toEqual(['lines[0].vatRateCode must be a rate the invoice charged: standard.']);
      await patch(credit.id, { lines: [fixedLine('Call-out, not needed after all', 6_000, -1)] }).expect(200);
      const issuedCredit = (await issue(credit.id).expect(200)).body;
      expect(issuedCredit).toMatchObject({ number: 'CN-0001', grossMinor: -7_200, dueDate: issuedCredit.issueDate });
      const text = await pdfText((await invoicePdf(t, office, credit.id)).bytes);
      expect(text).toContain('Credit note');
      expect(text).toContain(`Takes back what is listed below from invoice ${inv.number}`);
      expect(text).toContain('Total credited -£72.00');

      // £216.00 − £72.00 credited: £144.00 still owed.
      expect((await invoice(t, office, inv.id)).account).toMatchObject({ creditedMinor: 7_200, owedMinor: 14_400, state: 'awaiting' });
    });

    it('refuses to credit more than is left on the invoice', async () => {
      const again = (await t.http.post(`/api/invoices/${inv.id}/credit-note`).set(bearer(office)).expect(201)).body;
      expect(again.grossMinor).toBe(-21_600);
      const refused = await issue(again.id).expect(422);
      expect(refused.body.message).toEqual([`This credit note would take back £216.00, more than the £144.00 of ${inv.number} left to credit.`]);
      await t.http.delete(`/api/invoices/${again.id}`).set(bearer(office)).expect(204);
    });

    it('records part payments taken on site, never more than is owed, and is paid when nothing is left', async () => {
      const day = await today();
      const bad = await pay(inv.id, { amountMinor: 50.5, method: 'card', receivedOn: '14/03/2026' }).expect(400);
      expect(bad.body.message).toEqual([
        'amountMinor must be a whole number of pence',
        'method must be one of: cash, bank-transfer, cheque',
        'receivedOn must be a date written YYYY-MM-DD',
      ]);
      expect((await pay(inv.id, { amountMinor: 5_000, method: 'cash', receivedOn: addDays(day, 1) }).expect(422)).body.message).toEqual([`receivedOn must not be later than today (${day}).`]);
      expect((await pay(inv.id, { amountMinor: 14_401, method: 'cash', receivedOn: day }).expect(422)).body.message).toEqual([`amountMinor: £144.01 is more than the £144.00 still owed on ${inv.number}.`]);

      const part = (await pay(inv.id, { amountMinor: 5_000, method: 'cash', receivedOn: day, note: 'Paid to Sam on site' }).expect(201)).body;
      expect(part.account).toMatchObject({ paidMinor: 5_000, owedMinor: 9_400, state: 'part-paid' });
      const rest = (await pay(inv.id, { amountMinor: 9_400, method: 'cheque', receivedOn: day, reference: 'Cheque 100482' }).expect(201)).body;
      expect(rest.account).toEqual({ paidMinor: 14_400, creditedMinor: 7_200, refundedMinor: 0, owedMinor: 0, state: 'paid', overdueDays: 0 });
      expect(rest.payments.map((p: { method: string; amountMinor: number; reference: string | null }) => [p.method, p.amountMinor, p.reference])).toEqual([['cash', 5_000, null], ['cheque', 9_400, 'Cheque 100482']]);
      expect((await pay(inv.id, { amountMinor: 1, method: 'cash', receivedOn: day }).expect(422)).body.message).toEqual([`Nothing is owed on ${inv.number}.`]);
    });

    it('takes payments against issued invoices only', async () => {
      const quote = (await t.http.get(`/api/jobs/${earlier.id}/invoices`).set(bearer(office)).expect(200)).body.items.find((i: { kind: string; status: string }) => i.kind === 'quote' && i.status === 'draft');
      const d = quote ?? (await draft(t, office, earlier.id, { kind: 'quote', from: 'blank' }));
      await pay(d.id, { amountMinor: 100, method: 'cash', receivedOn: await today() }).expect(409);
    });
  });

  describe('quotes', () => {
    it('stands for the organisation’s days, and an invoice can be made from it line for line', async () => {
      const quote = await issuedInvoice(t, office, harbour.id, [fixedLine('Cat6 to reception and Surgery 1, as walked round', 84_000), fixedLine('Trace and label the unlabelled runs', 18_000)], 'quote');
      expect(quote).toMatchObject({ kind: 'quote', number: expect.stringMatching(/^QU-\d{4}$/), termDays: 30, grossMinor: 122_400, account: null });
      expect(quote.dueDate).toBe(addDays(quote.issueDate!, 30));
      expect(await pdfText((await invoicePdf(t, office, quote.id)).bytes)).toContain('STANDS UNTIL');
      const fromQuote = await draft(t, office, harbour.id, { kind: 'invoice', from: 'quote', quoteId: quote.id });
      expect(fromQuote).toMatchObject({ fromQuoteId: quote.id, status: 'draft', grossMinor: 122_400 });
      expect(fromQuote.lines.map((l) => l.description)).toEqual(quote.lines.map((l) => l.description));
      await t.http.post(`/api/jobs/${harbour.id}/invoices`).set(bearer(office)).send({ kind: 'invoice', from: 'quote' }).expect(400);
      await t.http.post(`/api/jobs/${earlier.id}/invoices`).set(bearer(office)).send({ kind: 'invoice', from: 'quote', quoteId: quote.id }).expect(400);
    });
  });

  describe('who owes what', () => {
    it('ages the demo debts into buckets from known dates, by customer, longest owed first', async () => {
      const list = (await t.http.get('/api/invoices?kind=invoice&state=unpaid&search=LED-0042').set(bearer(office)).expect(200)).body;
      const deposit = list.items.find((i: { number: string }) => i.number === 'INV-0001');
      expect(deposit).toMatchObject({ grossMinor: 36_000, account: { paidMinor: 10_000, owedMinor: 26_000, state: 'part-paid' } });
      const asOf = addDays(deposit.dueDate, 31);
      const report = (await t.http.get(`/api/invoices/aged-debt?asOf=${asOf}`).set(bearer(office)).expect(200)).body;
      expect(report.asOf).toBe(asOf);
      expect(report.buckets.map((b: { key: string }) => b.key)).toEqual(['not-due', '1-30', '31-60', '61-90', 'over-90']);
      const brightwater = report.customers.find((c: { name: string }) => c.name === 'Brightwater Dental Practice');
      // Due 31 days before asOf: the first day of 31–60.
      expect(brightwater.invoices.find((i: { number: string }) => i.number === 'INV-0001')).toMatchObject({ owedMinor: 26_000, overdueDays: 31, bucket: '31-60', state: 'part-paid' });
      expect(report.customers[0].name).toBe('Brightwater Dental Practice');
      // INV-0002 (the Orchard Rise invoice, due 35 days after the deposit) is not due yet on that day.
      const greaves = report.customers.find((c: { name: string }) => c.name === 'Hannah Greaves');
      expect(greaves.invoices.find((i: { number: string }) => i.number === 'INV-0002')).toMatchObject({ owedMinor: 20_868, overdueDays: 0, bucket: 'not-due' });
      expect(report.totals.total).toBe(report.customers.reduce((s: number, c: { totals: { total: number } }) => s + c.totals.total, 0));
      expect(report.totals['31-60']).toBeGreaterThanOrEqual(26_000);

      const later = (await t.http.get(`/api/invoices/aged-debt?asOf=${addDays(deposit.dueDate, 91)}`).set(bearer(office)).expect(200)).body;
      expect(later.customers.find((c: { name: string }) => c.name === 'Brightwater Dental Practice').totals['over-90']).toBeGreaterThanOrEqual(26_000);
      await t.http.get('/api/invoices/aged-debt?asOf=2026-02-30').set(bearer(office)).expect(422);
      await t.http.get('/api/invoices/aged-debt?asOf=yesterday').set(bearer(office)).expect(400);
    });

    it('lists every document, drafts first, and filters by kind, state and words', async () => {
      const all = (await t.http.get('/api/invoices?pageSize=200').set(bearer(office)).expect(200)).body;
      expect(all.total).toBe(all.items.length);
      const firstIssued = all.items.findIndex((i: { status: string }) => i.status === 'issued');
      expect(all.items.slice(firstIssued).every((i: { status: string }) => i.status === 'issued')).toBe(true);
      const drafts = (await t.http.get('/api/invoices?state=draft').set(bearer(office)).expect(200)).body.items;
      expect(drafts.length).toBeGreaterThan(0);
      expect(drafts.every((i: { status: string; number: string | null }) => i.status === 'draft' && i.number === null)).toBe(true);
      const credits = (await t.http.get('/api/invoices?kind=credit-note').set(bearer(office)).expect(200)).body.items;
      expect(credits.map((c: { number: string }) => c.number)).toContain('CN-0001');
      await t.http.get('/api/invoices?state=lost').set(bearer(office)).expect(400);
    });
  });

  describe('a contractor not registered for VAT', () => {
    it('cannot charge VAT, and says so on what it issues', async () => {
      const oakmere = await signIn(t, 'admin@oakmere.example');
      const customer = (await t.http.post('/api/customers').set(bearer(oakmere)).send({ name: 'Mill House Bakery' }).expect(201)).body;
      const site = (await t.http.post('/api/sites').set(bearer(oakmere)).send({ customerId: customer.id, address: '3 Mill Lane, Oakmere Cross' }).expect(201)).body;
      const job = (await t.http.post('/api/jobs').set(bearer(oakmere)).send({ siteId: site.id, customerId: customer.id, title: 'Socket for the new proving cabinet' }).expect(201)).body;
      const d = (await t.http.post(`/api/jobs/${job.id}/invoices`).set(bearer(oakmere)).send({ kind: 'invoice', from: 'blank' }).expect(201)).body;
      await t.http.patch(`/api/invoices/${d.id}`).set(bearer(oakmere)).send({ lines: [fixedLine('Radial and socket', 18_000)] }).expect(200);
      const refused = await t.http.post(`/api/invoices/${d.id}/issue`).set(bearer(oakmere)).expect(422);
      expect(refused.body.message).toEqual(['Oakmere Power & Data has no VAT number, so it cannot charge VAT: put the lines at a 0 % rate, or add the VAT number under Price list, Terms.']);
      await t.http.patch(`/api/invoices/${d.id}`).set(bearer(oakmere)).send({ lines: [fixedLine('Radial and socket', 18_000, 1, 'zero')] }).expect(200);
      const issued = (await t.http.post(`/api/invoices/${d.id}/issue`).set(bearer(oakmere)).expect(200)).body;
      // Oakmere numbers its own invoices: its first is INV-0001, whatever Larkfield has issued.
      expect(issued).toMatchObject({ number: 'INV-0001', vatMinor: 0, grossMinor: 18_000 });
      const text = await pdfText((await invoicePdf(t, oakmere, d.id)).bytes);
      expect(text).toContain('Not registered for VAT');
      expect(text).toContain('Oakmere Power & Data is not registered for VAT, so no VAT is charged.');
      expect(text).not.toContain('VAT at');
      // And Larkfield's invoices are nowhere in Oakmere's lists.
      const theirs = (await t.http.get('/api/invoices').set(bearer(oakmere)).expect(200)).body;
      expect(theirs.items.map((i: { id: string }) => i.id)).toEqual([d.id]);
    });
  });
});
