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

  it('never gives two jobs made at once the same reference', async () => {
    const made = await Promise.all([1, 2, 3, 4].map((n) => create({ title: `Enquiry ${n}` }).expect(201)));
    const references = made.map((r) => r.body.reference as string);
    expect(new Set(references).size).toBe(4);
    for (const r of references) expect(r).toMatch(/^LED-00(4[7-9]|50)$/);
  });
});
