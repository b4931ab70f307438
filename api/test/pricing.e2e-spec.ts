import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { bearer } from './document-helpers.js';
import { DeviceMirror, type Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

/** The office's price list, VAT rates, labour rates and terms over REST. */
describe('pricing', () => {
  let t: TestApp;
  let office: Session;
  let tech: Session;

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech = await signIn(t, 'tech1@larkfield.example');
  });
  afterAll(() => t.close());

  it('lists the price list by category and name, and finds items by words', async () => {
    const all = (await t.http.get('/api/price-items?pageSize=200').set(bearer(office)).expect(200)).body;
    expect(all.total).toBe(12);
    expect(all.items[0]).toMatchObject({ category: 'Accessories', name: '13 A cartridge fuse', sellMinor: 50, vatRateCode: 'standard' });
    const cable = (await t.http.get('/api/price-items?category=Cable').set(bearer(office)).expect(200)).body;
    expect(cable.items.map((i: { code: string }) => i.code)).toEqual(['LED-TE-15', 'LED-TE-25', 'LED-CAT6']);
    expect((await t.http.get('/api/price-items?search=keystone').set(bearer(office)).expect(200)).body.total).toBe(1);
  });

  it('adds and changes items through sync, so every phone gets them, and refuses what it cannot price', async () => {
    const bad = await t.http.post('/api/price-items').set(bearer(office)).send({ name: 'Outdoor socket', unit: 'each', sellMinor: -1, costMinor: 1.5 }).expect(400);
    expectErrorBody(bad.body, 400);
    expect(bad.body.message).toEqual(['costMinor must be a whole number', 'sellMinor must be at least 0']);
    const rate = await t.http.post('/api/price-items').set(bearer(office)).send({ name: 'Outdoor socket', unit: 'each', vatRateCode: 'luxury' }).expect(400);
    expect(rate.body.message).toMatch(/^vatRateCode must be one of this organisation's VAT rates: standard \(20 %\), reduced \(5 %\), zero \(0 %\)/);

    const item = (await t.http.post('/api/price-items').set(bearer(office)).send({ name: 'Weatherproof twin socket-outlet', unit: 'each', category: 'Accessories', costMinor: 1240, sellMinor: 2150, vatRateCode: 'standard', active: true }).expect(201)).body;
    expect(item).toMatchObject({ name: 'Weatherproof twin socket-outlet', sellMinor: 2150, version: expect.any(Number) });
    const changed = (await t.http.patch(`/api/price-items/${item.id}`).set(bearer(office)).send({ sellMinor: 2250 }).expect(200)).body;
    expect(changed.version).toBeGreaterThan(item.version);

    // A technician's phone receives the organisation's price list, and may not change it.
    const phone = new DeviceMirror('pricing-phone');
    await phone.pullAll(t, tech);
    expect(phone.one('priceItem', (r) => r.id === item.id)).toMatchObject({ sellMinor: 2250 });
    await t.http.post('/api/price-items').set(bearer(tech)).send({ name: 'x', unit: 'each' }).expect(403);
  });

  it('keeps VAT rates as data: one code each, a new rate is a change of basis points', async () => {
    const made = (await t.http.post('/api/vat-rates').set(bearer(office)).send({ code: 'second-hand', name: 'Second-hand margin', basisPoints: 0 }).expect(201)).body;
    expect(made).toMatchObject({ code: 'second-hand', active: true });
    expect((await t.http.post('/api/vat-rates').set(bearer(office)).send({ code: 'standard', name: 'Again', basisPoints: 2000 }).expect(409)).body.message).toBe('code: there is already a VAT rate called standard; change its rate instead.');
    expect((await t.http.post('/api/vat-rates').set(bearer(office)).send({ code: 'Standard Rate', name: '', basisPoints: 20.5 }).expect(400)).body.message).toEqual([
      'code must be 1 to 20 lower-case letters, digits or dashes, like standard',
      'name must not be empty',
      'basisPoints must be a whole number of hundredths of a per cent',
    ]);
    await t.http.patch(`/api/vat-rates/${made.id}`).set(bearer(office)).send({ code: 'renamed' }).expect(400);
    expect((await t.http.patch(`/api/vat-rates/${made.id}`).set(bearer(office)).send({ active: false }).expect(200)).body.active).toBe(false);
    // A withdrawn rate is no longer offered for new items.
    await t.http.post('/api/price-items').set(bearer(office)).send({ name: 'Old stock', unit: 'each', vatRateCode: 'second-hand' }).expect(400);
  });

  it('keeps one default labour rate', async () => {
    const before = (await t.http.get('/api/labour-rates').set(bearer(office)).expect(200)).body.items as Array<{ name: string; isDefault: boolean }>;
    expect(before.filter((r) => r.isDefault).map((r) => r.name)).toEqual(['Electrician']);
    const made = (await t.http.post('/api/labour-rates').set(bearer(office)).send({ name: 'Out of hours', hourlyMinor: 7800, vatRateCode: 'standard', isDefault: true }).expect(201)).body;
    const after = (await t.http.get('/api/labour-rates').set(bearer(office)).expect(200)).body.items as Array<{ id: string; isDefault: boolean }>;
    expect(after.filter((r) => r.isDefault).map((r) => r.id)).toEqual([made.id]);
    expect((await t.http.post('/api/labour-rates').set(bearer(office)).send({ name: 'Mate', hourlyMinor: 3200, vatRateCode: 'none' }).expect(400)).body.message).toMatch(/^vatRateCode must be one of/);
  });

  it('changes the default terms, which new drafts then take', async () => {
    expect((await t.http.get('/api/billing-terms').set(bearer(office)).expect(200)).body).toMatchObject({ vatNumber: 'GB 999 0417 21', paymentTermsDays: 30, quoteValidDays: 30 });
    const bad = await t.http.patch('/api/billing-terms').set(bearer(office)).send({ vatNumber: 'hello', paymentTermsDays: 400, quoteValidDays: 0 }).expect(400);
    expect(bad.body.message).toEqual([
      'vatNumber must be a VAT registration number such as GB 123 4567 89',
      'paymentTermsDays must be at most 365',
      'quoteValidDays must be at least 1',
    ]);
    const terms = (await t.http.patch('/api/billing-terms').set(bearer(office)).send({ paymentTermsDays: 14, paymentInstructions: '  ' }).expect(200)).body;
    expect(terms).toMatchObject({ paymentTermsDays: 14, paymentInstructions: null, vatNumber: 'GB 999 0417 21' });
    const jobs = (await t.http.get('/api/jobs?search=LED-0044').set(bearer(office)).expect(200)).body.items;
    const d = (await t.http.post(`/api/jobs/${jobs[0].id}/invoices`).set(bearer(office)).send({ kind: 'invoice', from: 'blank' }).expect(201)).body;
    expect(d.termDays).toBe(14);
    // The memberships are all still there (five, the subcontractor who also works for Oakmere among them): the organisation row was updated, not rebuilt.
    expect((await t.http.get('/api/users').set(bearer(await signIn(t, 'admin@larkfield.example'))).expect(200)).body.total).toBe(5);
  });
});
