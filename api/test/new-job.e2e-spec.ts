import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { jobByReference } from './document-helpers.js';
import type { Session } from './sync-helpers.js';
import { bearer, createTestApp, signIn, type TestApp } from './test-app.js';

/** A new enquiry taken at the desk: the job gets the next reference in the organisation's series. */
describe('a new job from the desk', () => {
  let t: TestApp;
  let office: Session;
  let site: { siteId: string; customerId: string };

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    site = await jobByReference(t, office, 'LED-0045');
  });
  afterAll(() => t.close());

  const create = (data: Record<string, unknown>) => t.http.post('/api/jobs').set(bearer(office)).send({ siteId: site.siteId, customerId: site.customerId, status: 'enquiry', ...data });

  it('takes the next reference after the demo’s LED-0045 when none is given, and keeps one that is', async () => {
    expect((await create({ title: 'Replace the kitchen downlights' }).expect(201)).body.reference).toBe('LED-0046');
    expect((await create({ title: 'Quote for an EV charger', reference: 'EV-SURVEY-1' }).expect(201)).body.reference).toBe('EV-SURVEY-1');
  });

  it('stores a new customer’s phone as it is dialled and a site’s postcode as Royal Mail writes it, and refuses text that is neither', async () => {
    const customer = await t.http.post('/api/customers').set(bearer(office)).send({ name: 'Priya Natarajan', phone: '07700900871' }).expect(201);
    expect(customer.body.phone).toBe('07700 900871');
    const site = await t.http.post('/api/sites').set(bearer(office)).send({ customerId: customer.body.id, address: '3 Mill Lane, Wendmouth', postcode: 'wm41qt' }).expect(201);
    expect(site.body.postcode).toBe('WM4 1QT');
    const badPhone = await t.http.post('/api/customers').set(bearer(office)).send({ name: 'Someone', phone: 'call me maybe' }).expect(400);
    expect(badPhone.body.message).toContain('phone is not a phone number, like 07700 900871 or 01632 960123');
    const badPostcode = await t.http.patch(`/api/sites/${site.body.id}`).set(bearer(office)).send({ postcode: 'Wendmouth' }).expect(400);
    expect(badPostcode.body.message).toContain('postcode is not a UK postcode, like WM4 1QT');
    // Cleared by sending nothing
    expect((await t.http.patch(`/api/sites/${site.body.id}`).set(bearer(office)).send({ postcode: null }).expect(200)).body.postcode).toBeNull();
  });

  it('never gives two jobs made at once the same reference', async () => {
    const made = await Promise.all([1, 2, 3, 4].map((n) => create({ title: `Enquiry ${n}` }).expect(201)));
    const references = made.map((r) => r.body.reference as string);
    expect(new Set(references).size).toBe(4);
    for (const r of references) expect(r).toMatch(/^LED-00(4[7-9]|50)$/);
  });
});
