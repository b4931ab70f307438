import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { MINOR_WORKS_CASES } from '@wiretrail/core/minor-works-cases';
import { v7 as uuidv7 } from 'uuid';
import { bearer, downloadPdf, jobByReference, pdfText } from './document-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

const SIGNATURE = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 100"><path d="M10 80 C 40 10 60 10 80 70 S 140 20 290 40" fill="none" stroke="#111" stroke-width="3"/></svg>';

/**
 * A record made by mistake on site is voided with its reason: kept for the office, left out of every document, and
 * voidable only before the visit is finished and never once an issued document prints it.
 */
describe('records voided on site', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  const phone = new DeviceMirror('void-phone');
  const desk = new DeviceMirror('void-desk');
  const ids = { visit: uuidv7(), board: uuidv7(), circuit: uuidv7(), test: uuidv7(), good: uuidv7(), typo: uuidv7(), note: uuidv7(), spare: uuidv7() };
  let jobId = '';
  let siteId = '';
  const row = (entity: string, id: string) => phone.one(entity, (r) => r.id === id);
  const onPhone = (entity: Parameters<typeof mutation>[0], id: string, set: Parameters<typeof mutation>[2]) =>
    mutation(entity, id, set, { baseVersion: phone.rows.get(`${entity}:${id}`)?.version ?? 0, deviceId: 'void-phone' });

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    const { customerId } = await jobByReference(t, office, 'LED-0033');
    const site = (await t.http.post('/api/sites').set(bearer(office)).send({ customerId, address: '4 Mistake Lane, Wendmouth', earthing: 'TN-C-S' }).expect(201)).body;
    siteId = site.id;
    jobId = (await t.http.post('/api/jobs').set(bearer(office)).send({ siteId, customerId, title: 'Sockets and data points' }).expect(201)).body.id;
    const made = await push(t, office, 'void-desk', [
      mutation('visit', ids.visit, { jobId, siteId, technicianIds: [tech1.user.id], plannedStart: new Date().toISOString(), status: 'on-site', actualStart: new Date().toISOString() }),
    ]);
    expect(made.map((r) => r.status)).toEqual(['applied']);
    await phone.pullAll(t, tech1);
    // The sound ring of the shared minor works cases, its insulation read over the tester's range.
    const { id: _c, ...ring } = MINOR_WORKS_CASES[14]!.circuits[0]!;
    const { id: _t, circuitId: _ci, ...readings } = MINOR_WORKS_CASES[14]!.tests[0]!;
    const recorded = await push(t, tech1, 'void-phone', [
      onPhone('board', ids.board, { siteId, name: 'Consumer unit' }),
      onPhone('circuit', ids.circuit, { ...ring, siteId, boardId: ids.board }),
      onPhone('testResult', ids.test, { ...readings, visitId: ids.visit, siteId, circuitId: ids.circuit }),
      onPhone('cableRun', ids.good, { siteId, label: 'MK-01', medium: 'Cat6', lastVisitId: ids.visit, lengthM: 22, linkKind: 'permanent-link' }),
      onPhone('cableRun', ids.typo, { siteId, label: 'MK-O1', medium: 'Cat6', lastVisitId: ids.visit, lengthM: 22, linkKind: 'permanent-link' }),
      onPhone('note', ids.note, { visitId: ids.visit, siteId, text: 'Lounge sockets on the wrong ring' }),
      onPhone('note', ids.spare, { visitId: ids.visit, siteId, text: 'Spare fuse left in the drawer' }),
    ]);
    expect(recorded.map((r) => r.status)).toEqual(recorded.map(() => 'applied'));
    await phone.pullAll(t, tech1);
    // Booting the app with its migrations and demo data takes a while on a busy machine.
  }, 120_000);
  afterAll(() => t.close());

  it('voids a record with its reason while the visit is open, and refuses a void without one', async () => {
    const results = await push(t, tech1, 'void-phone', [
      onPhone('cableRun', ids.typo, { voidedAt: new Date().toISOString(), voidReason: 'Typed O for 0 in the label' }),
      onPhone('note', ids.note, { voidedAt: new Date().toISOString() }),
      onPhone('note', ids.note, { voidedAt: new Date().toISOString(), voidReason: '   ' }),
      onPhone('note', ids.spare, { voidReason: 'No reason to be void' }),
    ]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'rejected', 'rejected', 'rejected']);
    expect(results[1]!.error).toBe('A void needs its reason: say why this note is void.');
    expect(results[2]!.error).toBe('A void needs its reason: say why this note is void.');
    expect(results[3]!.error).toMatch(/has no reason to be void/);
    await phone.pullAll(t, tech1);
    expect(row('cableRun', ids.typo)).toMatchObject({ voidReason: 'Typed O for 0 in the label', voidedAt: expect.any(String) });

    // Put back, and voided again, before the visit is finished.
    const [back] = await push(t, tech1, 'void-phone', [onPhone('note', ids.note, { voidedAt: new Date().toISOString(), voidReason: 'Wrong ring: it is ring 2' })]);
    expect(back!.status).toBe('applied');
    await phone.pullAll(t, tech1);
    const [undone] = await push(t, tech1, 'void-phone', [onPhone('note', ids.note, { voidedAt: null, voidReason: null })]);
    expect(undone!.status).toBe('applied');
    await phone.pullAll(t, tech1);
    expect(row('note', ids.note)).toMatchObject({ voidedAt: null, voidReason: null });
  });

  it('refuses a technician’s void once the visit is finished and signed; the office still sees the voided cable with its reason', async () => {
    const [finished] = await push(t, tech1, 'void-phone', [
      onPhone('visit', ids.visit, { status: 'finished', actualEnd: new Date().toISOString(), workDescription: 'Two sockets added to ring 1; two data points.', signedByName: 'Sam Brannigan', signedAt: new Date().toISOString(), signatureSvg: SIGNATURE }),
    ]);
    expect(finished!.status).toBe('applied');
    await phone.pullAll(t, tech1);
    const refused = await push(t, tech1, 'void-phone', [
      onPhone('cableRun', ids.good, { voidedAt: new Date().toISOString(), voidReason: 'Changed my mind' }),
      onPhone('note', ids.spare, { voidedAt: new Date().toISOString(), voidReason: 'Changed my mind' }),
      onPhone('cableRun', ids.typo, { voidedAt: null, voidReason: null }),
    ]);
    expect(refused.map((r) => r.status)).toEqual(['rejected', 'rejected', 'rejected']);
    expect(refused[0]!.error).toBe('The visit this cable run was recorded on is finished and signed, so it can no longer be voided on site: ask the office to put it right.');
    await desk.pullAll(t, office);
    expect(desk.one('cableRun', (r) => r.id === ids.good).voidedAt).toBeNull();
    expect(desk.one('cableRun', (r) => r.id === ids.typo)).toMatchObject({ label: 'MK-O1', voidReason: 'Typed O for 0 in the label' });
  });

  it('leaves the voided cable out of the cabling report, and prints an over-range insulation reading as the tester showed it', async () => {
    const report = (await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'cabling-report' }).expect(201)).body;
    const reportText = await pdfText((await downloadPdf(t, office, report.id)).bytes);
    expect(reportText).toContain('MK-01');
    expect(reportText).not.toContain('MK-O1');

    const certificate = (await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'minor-works' }).expect(201)).body;
    const certificateText = await pdfText((await downloadPdf(t, office, certificate.id)).bytes);
    expect(certificateText).toContain('>299 MΩ');
    expect(certificateText).toContain('>999 MΩ');

    // Nobody voids what an issued document prints, the office included.
    await desk.pullAll(t, office);
    const test = desk.one('testResult', (r) => r.id === ids.test);
    const [held] = await push(t, office, 'void-desk', [mutation('testResult', ids.test, { voidedAt: new Date().toISOString(), voidReason: 'Wrong circuit' }, { baseVersion: test.version })]);
    expect(held!.status).toBe('rejected');
    expect(held!.error).toBe(`This test result is printed on issued document ${certificate.number}, which never changes: the office can issue a revision that leaves it out.`);
  });
});
