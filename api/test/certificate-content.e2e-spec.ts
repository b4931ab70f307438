import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { VERDICT_DISCLAIMER } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { bearer, downloadPdf, jobByReference, pdfText } from './document-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

const SIGNATURE = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 100"><path d="M10 80 C 40 10 60 10 80 70 S 140 20 290 40" fill="none" stroke="#111" stroke-width="3"/></svg>';

/** What the standard's model minor works certificate asks for (BS 7671:2018+A2:2022 Appendix 6), on our certificate. */
describe('the content of a minor works certificate', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let orchard: { id: string; siteId: string; customerId: string };

  const issue = (jobId: string) => t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'minor-works' });

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    orchard = await jobByReference(t, office, 'LED-0033');
  });
  afterAll(() => t.close());

  it('carries the declaration with the amendment, the installation’s earthing and bonding, and every detail of the circuit', async () => {
    const res = await issue(orchard.id).expect(201);
    const text = await pdfText((await downloadPdf(t, office, res.body.id)).bytes);
    for (const expected of [
      // The declaration, in our words, and the amendment in force on the completion date: the demo's visit is signed
      // in 2026, under A3:2024 (from 31 July 2024, M).
      'Declaration',
      'certifies that the work described on this certificate does not impair the safety of the existing installation',
      'designed, constructed, inspected and tested in accordance with BS 7671:2018+A3:2024, in force on',
      'complies with BS 7671 except for the departures recorded on this certificate',
      'WORK DONE AND TESTED BY Aled Pryce', 'POSITION Electrician and qualifying supervisor',
      // The site, as carried from its records.
      'EARTHING ARRANGEMENT TN-C-S', 'EXTERNAL EARTH FAULT LOOP IMPEDANCE ZE 0.28 Ω',
      'EARTH FAULT LOOP IMPEDANCE AT THE BOARD ZDB Consumer unit: 0.31 Ω',
      'EARTHING CONDUCTOR Present and adequate',
      'MAIN BONDING TO WATER Present and adequate', 'MAIN BONDING TO GAS Present and adequate', 'MAIN BONDING TO OIL No such service',
      'MAIN BONDING TO STRUCTURAL STEEL No such service', 'MAIN BONDING TO OTHER PARTS No such service',
      'Comments on the existing installation (Reg 644.1.2) Consumer unit and main bonding in good order.',
      'Permitted exceptions (Reg 411.3.3) None.',
      // The circuit.
      'Circuit details: Circuit 2 (Sockets, first floor)',
      // As the circuit records it: by its protective device (Tables 41.2 to 41.4), not inferred from the device.
      'METHOD OF FAULT PROTECTION Automatic disconnection by the protective device',
      'PROTECTIVE DEVICE Type B circuit-breaker, 32 A, BS EN 60898-1',
      'RCD 30 mA type A, rated 63 A, BS EN 61008-1',
      'AFDD None fitted',
      'REFERENCE METHOD C', 'NUMBER OF POINTS SERVED 9',
      // BS 7671:2018+A2:2022 Table 41.1: 0.4 s for a final circuit up to 63 A with socket-outlets on TN (M).
      'MAXIMUM DISCONNECTION TIME ALLOWED 0.4 s',
      // The readings the form lists.
      'R1+R2 (protective conductor continuity) 0.35 Ω',
      'RCD test button (optional) operates trips Pass',
      'AFDD test button No AFDD fitted',
    ]) {
      expect(text).toContain(expected);
    }
    expect(text).not.toContain(VERDICT_DISCLAIMER);
    expect(text).not.toMatch(/an aid to checking/);
  });

  it('prints R2 where R1+R2 was not taken, the AFDD and its button, and a permitted exception with its risk assessment', async () => {
    const job = (await t.http.post('/api/jobs').set(bearer(office)).send({ siteId: orchard.siteId, customerId: orchard.customerId, reference: 'LED-0061', title: 'Landing light moved', status: 'on-site' }).expect(201)).body;
    const visitId = (await t.http.post('/api/visits').set(bearer(office)).send({ jobId: job.id, siteId: orchard.siteId, technicianIds: [tech1.user.id], plannedStart: new Date().toISOString(), status: 'on-site' }).expect(201)).body.id;
    const phone = new DeviceMirror('tech1-phone');
    await phone.pullAll(t, tech1);
    const circuit = phone.one('circuit', (c) => c.siteId === orchard.siteId && c.number === '3');
    const visit = phone.one('visit', (v) => v.id === visitId);
    const results = await push(t, tech1, 'tech1-phone', [
      mutation('circuit', circuit.id, {
        deviceStandard: 'BS EN 61009-1', rcdStandard: 'BS EN 61009-1', rcdRatedCurrentA: 6, afddStandard: 'BS EN 62606',
        referenceMethod: '103', pointsServed: 7, maxDisconnectionS: 0.4,
      }, { baseVersion: circuit.version, deviceId: 'tech1-phone' }),
      // A B6 lighting circuit: Zs 1.20 Ω against 0.8 × 7.28 = 5.82 Ω (BS 7671:2018+A2:2022 Table 41.3; Appendix 3, trade practice);
      // insulation 200 MΩ at 500 V against 1.0 MΩ (Table 64); RCD 28 ms against 300 ms (Reg 643.8).
      mutation('testResult', uuidv7(), {
        visitId, siteId: orchard.siteId, circuitId: circuit.id, r2LeadOhm: 0.92, irLiveLiveMOhm: 200, irLiveEarthMOhm: 200, irTestVoltageV: 500,
        polarity: 'correct', zsOhm: 1.2, rcdTripMs: 28, rcdButton: 'operates', afddButton: 'operates', testedAt: new Date().toISOString(),
      }, { deviceId: 'tech1-phone' }),
      mutation('visit', visitId, {
        status: 'finished', workDescription: 'Landing light moved 600 mm towards the stairs.', signedByName: 'Sam Brannigan', signedByPosition: 'Electrician',
        permittedExceptions: 'The metal ceiling rose bracket in the loft is not earthed: it is out of reach and not likely to be touched.',
        riskAssessmentRef: 'RA-2026-014', signedAt: new Date().toISOString(), signatureSvg: SIGNATURE,
      }, { baseVersion: visit.version, deviceId: 'tech1-phone' }),
    ]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'applied', 'applied']);

    const res = await issue(job.id).expect(201);
    const text = await pdfText((await downloadPdf(t, office, res.body.id)).bytes);
    for (const expected of [
      'R2 (protective conductor continuity, long lead) 0.92 Ω a continuous reading Pass',
      'AFDD test button (optional) operates trips Pass',
      'AFDD Fitted, BS EN 62606',
      'PROTECTIVE DEVICE Type B circuit-breaker, 6 A, BS EN 61009-1',
      'RCD 30 mA type A, rated 6 A, BS EN 61009-1',
      'REFERENCE METHOD 103', 'NUMBER OF POINTS SERVED 7',
      // The board's Zdb as the first certificate froze it.
      'Consumer unit: 0.31 Ω',
      'Permitted exceptions (Reg 411.3.3) The metal ceiling rose bracket in the loft is not earthed',
      'RISK ASSESSMENT RA-2026-014',
      'POSITION Electrician',
    ]) {
      expect(text).toContain(expected);
    }
  });

  it('lets the office record the same details over REST, within the registry’s limits', async () => {
    const harbour = await jobByReference(t, office, 'LED-0042');
    const circuits = (await t.http.get(`/api/circuits?siteId=${harbour.siteId}`).set(bearer(office)).expect(200)).body.items as Array<{ id: string; boardId: string }>;
    const circuit = circuits[0]!;
    const changed = await t.http.patch(`/api/circuits/${circuit.id}`).set(bearer(office))
      .send({ deviceStandard: 'BS EN 60898-1', referenceMethod: 'B', pointsServed: 4, maxDisconnectionS: 0.4, rcdRatedCurrentA: 40 }).expect(200);
    expect(changed.body).toMatchObject({ deviceStandard: 'BS EN 60898-1', referenceMethod: 'B', pointsServed: 4, maxDisconnectionS: 0.4, rcdRatedCurrentA: 40 });
    const refused = await t.http.patch(`/api/circuits/${circuit.id}`).set(bearer(office)).send({ pointsServed: 2.5, maxDisconnectionS: 60 }).expect(400);
    expect((refused.body.message as string[]).join(' ')).toMatch(/pointsServed/);
    expect((await t.http.patch(`/api/boards/${circuit.boardId}`).set(bearer(office)).send({ zdbOhm: 0.33 }).expect(200)).body).toMatchObject({ zdbOhm: 0.33 });
    const site = await t.http.patch(`/api/sites/${harbour.siteId}`).set(bearer(office)).send({ earthingConductor: 'adequate', bondingOil: 'none', bondingOtherWhat: 'Lightning protection' }).expect(200);
    expect(site.body).toMatchObject({ earthingConductor: 'adequate', bondingOil: 'none', bondingOtherWhat: 'Lightning protection' });
    await t.http.patch(`/api/sites/${harbour.siteId}`).set(bearer(office)).send({ bondingGas: 'maybe' }).expect(400);
  });
});
