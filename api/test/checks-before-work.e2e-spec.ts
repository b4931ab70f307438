import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { checksBeforeWork } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { mutation, push, type Session } from './sync-helpers.js';
import { bearer, createTestApp, signInAll, type TestApp } from './test-app.js';

type Row = { id: string; [field: string]: unknown };
type Page<T = Row> = { items: T[]; total: number };
type Line = { key: string; figure: string | null; result: { verdict: string; note: string; source: string } };
type Checks = { verdict: string; lines: Line[] };

/**
 * The checks before breaking into a circuit, as the office reads them: the server works them out from the records
 * with core's `checksBeforeWork`, the function the phone's Points form runs, so both sides give the same answer.
 */
describe('checks before the work, for the office', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  const ids: Record<string, string> = {};
  const get = async <T = Page>(s: Session, path: string): Promise<T> => (await t.http.get(path).set(bearer(s)).expect(200)).body as T;

  // A new radial for a kitchen appliance at Orchard Rise, 20 m of 2.5/1.5 on a B16 with no RCD, and a socket on it.
  const circuit = { siteId: '', boardId: '', number: '7', description: 'Utility sockets', kind: 'radial', deviceType: 'B', deviceRatingA: 16, liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: 20 };
  const point = {
    action: 'add', accessoryKind: 'Twin socket-outlet', toDescription: 'Beside the back door', connection: 'radial', supplies: 'sockets', location: 'indoors', dwelling: true,
    joinR1R2Ohm: 0.39, addedRouteM: 3, designCurrentA: 13, installationMethod: 'C', liveCsaMm2: 2.5, cpcCsaMm2: 1.5,
  };

  beforeAll(async () => {
    t = await createTestApp();
    [office, tech1] = await signInAll(t, 'office@larkfield.example', 'tech1@larkfield.example');
    const site = (await get(office, '/api/sites?pageSize=200')).items.find((s) => s.name === 'Orchard Rise')!;
    const job = (await get(office, '/api/jobs?pageSize=200')).items.find((j) => j.reference === 'LED-0041')!;
    ids.site = site.id;
    ids.visit = (await get(office, `/api/visits?jobId=${job.id}`)).items[0]!.id;
    ids.job = job.id;
    const board = (await get(office, `/api/boards?siteId=${site.id}`)).items[0]!;
    Object.assign(circuit, { siteId: site.id, boardId: board.id });
    ids.circuit = uuidv7();
    ids.point = uuidv7();
    ids.test = uuidv7();
    const replies = await push(t, tech1, 'tech1-phone', [
      mutation('circuit', ids.circuit, circuit, { deviceId: 'tech1-phone' }),
      mutation('pointChange', ids.point, { visitId: ids.visit, siteId: site.id, circuitId: ids.circuit, ...point }, { deviceId: 'tech1-phone' }),
      // 5 Ω on 20 m of 2.5/1.5 mm², whose own R1+R2 is 0.39 Ω (IEC 60228:2004: 19.51 mΩ/m × 20 m)
      mutation('testResult', ids.test, { visitId: ids.visit, siteId: site.id, circuitId: ids.circuit, r1r2Ohm: 5, testedAt: '2026-12-05T10:00:00.000Z' }, { deviceId: 'tech1-phone' }),
    ]);
    expect(replies.map((r) => r.status)).toEqual(['applied', 'applied', 'applied']);
  });
  afterAll(() => t.close());

  it('adds the server’s checks to a point change, the same as core gives for the same records', async () => {
    const row = await get<Row & { beforeWork: Checks }>(office, `/api/point-changes/${ids.point}`);
    const site = await get<Row>(office, `/api/sites/${ids.site}`);
    const expected = checksBeforeWork({ point: { id: ids.point, ...point }, circuit: { id: ids.circuit, ...circuit }, site });
    expect(row.beforeWork).toEqual(JSON.parse(JSON.stringify(expected)));
    const byKey = Object.fromEntries(row.beforeWork.lines.map((l) => [l.key, l]));
    // Ze 0.28 Ω + 1.20 × (0.39 + 3 × 0.01951) Ω = 0.8182 Ω ≤ 2.73 Ω for B16 (BS 7671:2018+A2:2022 Table 41.3, C1)
    expect(byKey['predicted-zs']).toMatchObject({ figure: 'Predicted Zs 0.82 Ω', result: { verdict: 'pass' } });
    // Sockets up to 32 A need 30 mA (Reg 411.3.3); this circuit has none: the clear warning
    expect(byKey.rcd).toMatchObject({ figure: '30 mA RCD required: the circuit has none', result: { verdict: 'fail' } });
    expect(byKey.rcd!.result.source).toContain('Reg 411.3.3');
    // 2.5 mm² clipped direct: 27 A ≥ 16 A (Table 4D5)
    expect(byKey.cable!.result.verdict).toBe('pass');
    expect(row.beforeWork.verdict).toBe('fail');
  });

  it('lists the same checks beside the circuit’s test results, and judges a radial’s R1+R2 against its cable', async () => {
    const page = await get<Page<Row & { beforeWork: Array<Checks & { pointChangeId: string; accessoryKind: string }>; assessment: { lines: Line[] } }>>(office, `/api/test-results?circuitId=${ids.circuit}`);
    const [result] = page.items;
    expect(result!.beforeWork).toHaveLength(1);
    expect(result!.beforeWork[0]).toMatchObject({ pointChangeId: ids.point, accessoryKind: 'Twin socket-outlet', verdict: 'fail' });
    const r1r2 = result!.assessment.lines.find((l) => l.key === 'r1r2')!;
    expect(r1r2.result.verdict).toBe('check');
    expect(r1r2.result.note).toMatch(/well above 0\.39 Ω expected for 20 m of 2\.5\/1\.5 mm²/);
  });
});
