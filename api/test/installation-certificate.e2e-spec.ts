import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { INSPECTION_ITEMS, type InspectionMarks, type InstallationCertificatePreview } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { CIRCUIT_DETAIL_COLUMNS, TEST_RESULT_COLUMNS } from '../src/documents/pdf/installation-certificate-pdf.js';
import { bearer, downloadPdf, jobByReference, pdfText } from './document-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

const SIGNATURE = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 100"><path d="M10 80 L 290 40" fill="none" stroke="#111" stroke-width="3"/></svg>';
const ALL_DONE: InspectionMarks = Object.fromEntries(INSPECTION_ITEMS.map((i) => [i.id, { state: 'done' as const }]));
// Readings that pass on the Orchard Rise board (TN-C-S, B-type breakers, 30 mA RCDs):
// insulation 299 MΩ at 500 V against 1.0 MΩ (BS 7671:2018+A2:2022 Table 64); RCD 20 ms against 300 ms (Reg 643.8);
// Zs against 80 % of Table 41.3 (Appendix 3, trade practice): B32 1.37 → 1.10 Ω, B20 2.19 → 1.75 Ω, B6 7.28 → 5.82 Ω;
// a ring's r1 0.52 and rn 0.53 Ω within 0.05 Ω (IET GN3 9th ed. 2022), r2 0.86 Ω about 1.633 × r1 (IEC 60228:2004
// Table 1), R1+R2 0.35 Ω about (r1 + r2) / 4 (GN3 step 3, D).
const COMMON = { irLiveLiveMOhm: 299, irLiveEarthMOhm: 299, irTestVoltageV: 500, polarity: 'correct', rcdTripMs: 20, instrument: 'Multifunction tester MFT-7' };
const RING = { r1Ohm: 0.52, rnOhm: 0.53, r2Ohm: 0.86, r1r2Ohm: 0.35, zsOhm: 0.63 };
const RADIAL = { r1r2Ohm: 0.31, zsOhm: 0.59 };
const NEW_RADIAL = {
  number: '5', description: 'Garden office sockets', kind: 'radial', deviceType: 'B', deviceRatingA: 20, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5,
  wiringType: 'SWA', referenceMethod: 'D', pointsServed: 2, deviceStandard: 'BS EN 61009-1', deviceBreakingKa: 6, maxDisconnectionS: 0.4,
};

/** The electrical installation certificate: the right kind for new circuits only, every reading judged, every schedule column printed. */
describe('installation certificate', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let orchard: { siteId: string; customerId: string };

  /** A job at Orchard Rise whose visit the technician recorded and signed; `readings` by circuit number, `newCircuit` added on the visit. */
  async function signedJob(reference: string, o: { newCircuit: boolean; zsOfNew?: number; marks?: InspectionMarks }): Promise<{ jobId: string; visitId: string; device: string }> {
    const job = (await t.http.post('/api/jobs').set(bearer(office)).send({ siteId: orchard.siteId, customerId: orchard.customerId, reference, title: `Work for ${reference}`, status: 'on-site' }).expect(201)).body;
    const visitId = (await t.http.post('/api/visits').set(bearer(office)).send({ jobId: job.id, siteId: orchard.siteId, technicianIds: [tech1.user.id], plannedStart: new Date().toISOString(), status: 'on-site' }).expect(201)).body.id;
    const device = `tech1-${reference}`;
    const phone = new DeviceMirror(device);
    await phone.pullAll(t, tech1);
    const visit = phone.one('visit', (v) => v.id === visitId);
    const board = phone.one('board', (b) => b.siteId === orchard.siteId);
    const circuits = phone.find('circuit', (c) => c.boardId === board.id);
    const newId = uuidv7();
    const tested = new Date().toISOString();
    const results = await push(t, tech1, device, [
      ...(o.newCircuit ? [mutation('circuit', newId, { siteId: orchard.siteId, boardId: board.id, ...NEW_RADIAL, number: `5${reference.slice(-1)}`, newOnVisitId: visitId }, { deviceId: device })] : []),
      ...circuits.map((c) =>
        mutation('testResult', uuidv7(), { visitId, siteId: orchard.siteId, circuitId: c.id, testedAt: tested, ...COMMON, ...(c.kind === 'ring' ? RING : RADIAL) }, { deviceId: device }),
      ),
      ...(o.newCircuit ? [mutation('testResult', uuidv7(), { visitId, siteId: orchard.siteId, circuitId: newId, testedAt: tested, ...COMMON, ...RADIAL, zsOhm: o.zsOfNew ?? 0.62 }, { deviceId: device })] : []),
      mutation(
        'visit',
        visitId,
        { status: 'finished', workDescription: 'New radial to the garden office.', signedByName: 'Sam Brannigan', signedAt: new Date().toISOString(), signatureSvg: SIGNATURE, inspectionMarks: o.marks ?? ALL_DONE },
        { baseVersion: visit.version, deviceId: device },
      ),
    ]);
    expect(results.every((r) => r.status === 'applied')).toBe(true);
    return { jobId: job.id as string, visitId, device };
  }

  const preview = async (jobId: string) => (await t.http.get(`/api/jobs/${jobId}/installation-certificate`).set(bearer(office)).expect(200)).body as InstallationCertificatePreview;

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    orchard = await jobByReference(t, office, 'LED-0033');
  });
  afterAll(() => t.close());

  it('refuses the minor works certificate on a new circuit, and the installation certificate while a reading fails or the particulars are missing', async () => {
    const { jobId } = await signedJob('EIC-T1', { newCircuit: true, zsOfNew: 1.9 });

    const minor = await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'minor-works' }).expect(422);
    expect(minor.body.message).toContain(
      'Circuit 51 (Garden office sockets) is a new circuit: a minor works certificate covers an alteration or addition to an existing circuit, and a new circuit needs an electrical installation certificate.',
    );

    const seen = await preview(jobId);
    expect(seen.choice).toMatchObject({ kind: 'installation-certificate', reasons: ['Circuit 51 (Garden office sockets) was installed as a new circuit.'] });
    // From the site's records: TN-C-S, Ze 0.28 Ω and PFC 1.8 kA as recorded on site; the signer answers for all three.
    expect(seen.defaults.supply).toMatchObject({ system: 'TN-C-S', zeOhm: 0.28, pfcKa: 1.8 });
    expect(seen.defaults).toMatchObject({ designedBy: 'Sam Brannigan', constructedBy: 'Sam Brannigan', inspectedBy: 'Sam Brannigan', extent: 'addition' });
    expect(seen.circuits).toHaveLength(5);
    // B20 at 0.4 s: 2.19 Ω (BS 7671:2018+A2:2022 Table 41.3) × 0.8 (Appendix 3, trade practice) = 1.75 Ω; 1.9 Ω fails.
    expect(seen.problems.some((p) => /^Circuit 51 \(Garden office sockets\): Earth fault loop impedance Zs fails\./.test(p))).toBe(true);

    const failed = await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'installation-certificate', particulars: seen.defaults }).expect(422);
    expect(failed.body.message.join(' ')).toMatch(/Zs fails/);

    const without = await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'installation-certificate' }).expect(422);
    expect(without.body.message).toContain('particulars: give the certificate’s particulars (supply, origin and who answers for the work).');

  });

  it('issues on a job whose readings pass, numbered EIC-0001, and prints every column of the schedule', async () => {
    const { jobId } = await signedJob('EIC-T2', { newCircuit: true });
    const seen = await preview(jobId);
    expect(seen.problems).toEqual([]);
    await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(tech1)).send({ kind: 'installation-certificate', particulars: seen.defaults }).expect(403);
    const bad = await t.http
      .post(`/api/jobs/${jobId}/documents`)
      .set(bearer(office))
      .send({ kind: 'installation-certificate', particulars: { ...seen.defaults, supply: { ...seen.defaults.supply, zeOhm: null } } })
      .expect(422);
    expect(bad.body.message).toEqual(['supply.zeOhm: give Ze as measured or enquired, in Ω.']);

    const issued = await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'installation-certificate', particulars: seen.defaults }).expect(201);
    expect(issued.body).toMatchObject({ kind: 'installation-certificate', number: 'EIC-0001', signerName: 'Sam Brannigan' });
    expect(issued.body.title).toMatch(/^Electrical installation certificate: /);

    const text = await pdfText((await downloadPdf(t, office, issued.body.id)).bytes);
    for (const column of [...CIRCUIT_DETAIL_COLUMNS, ...TEST_RESULT_COLUMNS]) expect(text).toContain(column);
    for (const words of ['Schedule of inspections', 'Schedule of circuit details', 'Schedule of test results', 'Supply characteristics and earthing arrangements', 'Particulars at the origin', 'Multifunction tester MFT-7', 'Garden office sockets', 'SWA', 'BS EN 61009-1']) {
      expect(text).toContain(words);
    }
    for (const it of INSPECTION_ITEMS.slice(0, 3)) expect(text).toContain(it.regulation);

    // The signed certificate never changes: its circuit is held, and a second one takes the next number.
    const again = await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'installation-certificate', particulars: seen.defaults }).expect(201);
    expect(again.body.number).toBe('EIC-0002');
    // A revision keeps the particulars the office gave, and names the one it supersedes.
    const revised = await t.http.post(`/api/documents/${again.body.id}/revisions`).set(bearer(office)).send({ reason: 'Main switch rating corrected.' }).expect(201);
    expect(revised.body).toMatchObject({ number: 'EIC-0003', supersedesId: again.body.id, particulars: { supply: { system: 'TN-C-S', zeOhm: 0.28 } } });
    expect(await pdfText((await downloadPdf(t, office, revised.body.id)).bytes)).toContain('Main switch rating corrected.');
  });

  it('refuses the installation certificate on a plain alteration, with the reason, and an inspection left unmarked', async () => {
    const { jobId } = await signedJob('EIC-T3', { newCircuit: false, marks: { ...ALL_DONE, isolation: { state: 'limitation', note: '' } } });
    const seen = await preview(jobId);
    expect(seen.choice.kind).toBe('minor-works');
    const refused = await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'installation-certificate', particulars: seen.defaults }).expect(422);
    expect(refused.body.message[0]).toBe(
      'No circuit was installed new and no board was replaced: the work is an addition or alteration to existing circuits. An installation certificate is not the certificate for it: issue a minor works certificate.',
    );
    expect(refused.body.message.join(' ')).toMatch(/is marked as a limitation without saying what limited it/);
  });
});
