import 'fake-indexeddb/auto';
import { INSPECTION_ITEMS, type InspectionMarks, judgeInstallationCertificate } from '@wiretrail/core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { addRing, base, ids, resetPhone, tidyUp } from '@/test/visit-fixtures';
import { getSignOff } from '../data/get-sign-off';

beforeEach(resetPhone);
afterEach(tidyUp);

const RADIAL_ID = '01900000-0000-7000-8000-0000000000b1';
const ALL_DONE: InspectionMarks = Object.fromEntries(INSPECTION_ITEMS.map((i) => [i.id, { state: 'done' as const }]));
// B20 with a 30 mA RCD: Zs 0.62 Ω within 0.8 × 2.19 = 1.75 Ω (BS 7671:2018+A2:2022 Table 41.3; Appendix 3, trade practice);
// insulation 299 MΩ at 500 V against 1.0 MΩ (Table 64); RCD 19 ms against 300 ms (Reg 643.8).
const RADIAL_TEST = { r1r2Ohm: 0.31, irLiveLiveMOhm: 299, irLiveEarthMOhm: 299, irTestVoltageV: 500, polarity: 'correct', zsOhm: 0.62, rcdTripMs: 19, instrument: 'MFT-7', testedAt: '2026-03-14T10:40:00.000Z' } as const;

/**
 * The same records on the phone's sign-off and through the judgment the server runs before it issues the
 * installation certificate (once the visit is signed): the same reasons, in the same words.
 */
describe('the sign-off judges an installation certificate as the server will', () => {
  it('names the certificate, every circuit of the board left untested and every inspection left open', async () => {
    await addRing();
    await db.circuit.put({
      id: RADIAL_ID, siteId: ids.site, boardId: ids.board, number: '7', description: 'Garden office', kind: 'radial', deviceType: 'B', deviceRatingA: 20, rcdRatingMa: 30, rcdType: 'A',
      liveCsaMm2: 2.5, cpcCsaMm2: 1.5, newOnVisitId: ids.visit, wiringType: 'SWA', referenceMethod: 'D', pointsServed: 1, deviceStandard: 'BS EN 61009-1', deviceBreakingKa: 6, ...base,
    });
    await db.testResult.put({ id: '01900000-0000-7000-8000-0000000000b2', visitId: ids.visit, siteId: ids.site, circuitId: RADIAL_ID, ...RADIAL_TEST, ...base });
    await db.visit.update(ids.visit, { inspectionMarks: { ...ALL_DONE, isolation: { state: 'limitation', note: '' } } });

    const visit = (await db.visit.get(ids.visit))!;
    const summary = await getSignOff(visit);
    expect(summary.choice).toMatchObject({ kind: 'installation-certificate', reasons: ['Circuit 7 (Garden office) was installed as a new circuit.'] });
    expect(summary.problems.map((p) => p.kind)).toEqual(['untested', 'inspection']);

    const signed = { ...visit, status: 'finished' as const, signedByName: 'Sam Brannigan', signedAt: '2026-03-14T11:00:00.000Z', signatureSvg: '<svg/>' };
    const server = judgeInstallationCertificate(
      { visits: [signed], tests: await db.testResult.toArray(), pointChanges: [], circuits: await db.circuit.toArray(), boards: await db.board.toArray(), earthing: 'TN-C-S' },
      null,
    );
    expect(summary.certificate.problems).toEqual(server.problems);
    expect(server.issuable).toBe(false);
  });
});
