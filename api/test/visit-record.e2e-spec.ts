import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { VisitRecord } from '@wiretrail/core';
import { bearer, jobByReference } from './document-helpers.js';
import type { Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

/** The office's page of one visit: everything the technician wrote on it, from the desk. */
describe('a visit’s record for the office', () => {
  let t: TestApp;
  let office: Session;
  let visitId: string;

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    const job = await jobByReference(t, office, 'LED-0033');
    const visits = await t.http.get(`/api/visits?jobId=${job.id}`).set(bearer(office)).expect(200);
    visitId = visits.body.items[0].id;
  });
  afterAll(() => t.close());

  it('carries the sign-off, the signature, the times, the notes, the parts and the readings with their circuits and who made them', async () => {
    const res = await t.http.get(`/api/visits/${visitId}/record`).set(bearer(office)).expect(200);
    const record = res.body as VisitRecord;
    expect(record.job).toMatchObject({ reference: 'LED-0033', title: 'Extra double socket in the front bedroom' });
    expect(record.site.name).toBeTruthy();
    expect(record.technicians.map((p) => p.name)).toEqual(['Aled Pryce']);
    // The demo's signed visit: what was done, who signed, the drawn signature, arrival and departure
    expect(record.visit.status).toBe('finished');
    expect(record.visit.workDescription).toMatch(/^Ring final circuit 2 \(sockets, first floor\) extended/);
    expect(record.visit.signedByName).toBe('Aled Pryce');
    expect(record.visit.signatureSvg).toMatch(/^<svg/);
    expect(record.visit.actualStart).toBeTruthy();
    expect(record.visit.actualEnd).toBeTruthy();
    expect(record.notes.map((n) => n.text)).toContain('New double socket on ring extension from the bedside socket; route dropped vertically from the loft in line with the box.');
    expect(record.parts.map((p) => [p.description, p.quantity, p.unit])).toContainEqual(['2.5 mm² twin and earth cable', 6.5, 'm']);
    expect(record.testResults.length).toBeGreaterThan(0);
    expect(record.testResults[0]!.circuitLabel).toBe('2 · Sockets, first floor');
  });

  it('is not found for a visit of another organisation or one that does not exist', async () => {
    const other = await signIn(t, 'admin@oakmere.example');
    await t.http.get(`/api/visits/${visitId}/record`).set(bearer(other)).expect(404);
    await t.http.get('/api/visits/01900000-0000-7000-8000-00000000ffff/record').set(bearer(office)).expect(404);
  });

  it('is the office’s: a technician reads visits through sync', async () => {
    const tech = await signIn(t, 'tech2@larkfield.example');
    await t.http.get(`/api/visits/${visitId}/record`).set(bearer(tech)).expect(403);
  });
});
