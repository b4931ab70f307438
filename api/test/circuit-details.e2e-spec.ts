import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { v7 as uuidv7 } from 'uuid';
import { catchUp, mutation, push, type Session } from './sync-helpers.js';
import { bearer, createTestApp, expectErrorBody, signInAll, type TestApp } from './test-app.js';

type Row = { id: string; version: number; [field: string]: unknown };

// BS 7671:2018+A2:2022 Table 41.3: type B circuit-breakers are listed at 6, 10, 16, 20, 25, 32, 40, 50, 63, 80, 100 and 125 A.
const NOT_MADE_IN_17 = 'Rating: this device is not made in 17 A. Choose one of 6, 10, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125 A.';
const CPC_ABOVE_LIVE = 'Cpc size: 4 mm² is larger than the 2.5 mm² live conductors it runs with; check both sizes.';

/** A circuit's details that cannot be so are refused by the server, from the office's forms and from a phone's push alike. */
describe("a circuit's details, judged by the server", () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let orchard: string;
  let board: string;
  let ring: Row;

  const circuit = async (id: string) => (await t.http.get(`/api/circuits/${id}`).set(bearer(office)).expect(200)).body as Row;

  beforeAll(async () => {
    t = await createTestApp();
    [office, tech1] = await signInAll(t, 'office@larkfield.example', 'tech1@larkfield.example');
    const sites = (await t.http.get('/api/sites?pageSize=200').set(bearer(office)).expect(200)).body.items as Row[];
    orchard = sites.find((s) => s.name === 'Orchard Rise')!.id;
    board = ((await t.http.get(`/api/boards?siteId=${orchard}`).set(bearer(office)).expect(200)).body.items as Row[])[0]!.id;
    ring = ((await t.http.get(`/api/circuits?siteId=${orchard}&pageSize=200`).set(bearer(office)).expect(200)).body.items as Row[]).find((c) => c.description === 'Sockets, ground floor')!;
    // The demo ring: a B32 in 2.5/1.5 mm², which every check below starts from.
    expect(ring).toEqual(expect.objectContaining({ deviceType: 'B', deviceRatingA: 32, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 }));
  });

  afterAll(async () => {
    await t.close();
  });

  it('refuses over REST a 17 A type B breaker and a 4 mm² cpc on 2.5 mm² live conductors, naming the field, and saves nothing', async () => {
    const created = await t.http
      .post('/api/circuits')
      .set(bearer(office))
      .send({ siteId: orchard, boardId: board, number: '9', deviceType: 'B', deviceRatingA: 17, liveCsaMm2: 2.5, cpcCsaMm2: 4 })
      .expect(400);
    expectErrorBody(created.body, 400);
    expect(created.body.message).toBe(`${NOT_MADE_IN_17} ${CPC_ABOVE_LIVE}`);

    const rating = await t.http.patch(`/api/circuits/${ring.id}`).set(bearer(office)).send({ deviceRatingA: 17 }).expect(400);
    expect(rating.body.message).toBe(NOT_MADE_IN_17);
    // The cpc alone is judged against the live conductors already recorded.
    const cpc = await t.http.patch(`/api/circuits/${ring.id}`).set(bearer(office)).send({ cpcCsaMm2: 4 }).expect(400);
    expect(cpc.body.message).toBe(CPC_ABOVE_LIVE);
    const rcd = await t.http.patch(`/api/circuits/${ring.id}`).set(bearer(office)).send({ rcdType: 'Q' }).expect(400);
    expect(rcd.body.message).toBe('RCD type must be AC, A, F or B, with S if it is time-delayed.');

    expect(await circuit(ring.id)).toEqual(expect.objectContaining({ deviceRatingA: 32, cpcCsaMm2: 1.5, version: ring.version }));
    // What can be so is saved: a B40 is made.
    await t.http.patch(`/api/circuits/${ring.id}`).set(bearer(office)).send({ deviceRatingA: 40 }).expect(200);
    await t.http.patch(`/api/circuits/${ring.id}`).set(bearer(office)).send({ deviceRatingA: 32 }).expect(200);
  });

  it("refuses the same in a phone's push, one mutation at a time, with the message the phone shows beside the change", async () => {
    await catchUp(t, tech1, 'tech1-details');
    const now = await circuit(ring.id);
    const fresh = uuidv7();
    const results = await push(t, tech1, 'tech1-details', [
      mutation('circuit', ring.id, { deviceRatingA: 17 }, { baseVersion: now.version }),
      mutation('circuit', ring.id, { cpcCsaMm2: 4 }, { baseVersion: now.version }),
      mutation('circuit', fresh, { siteId: orchard, boardId: board, number: '10', deviceType: 'B', deviceRatingA: 17, liveCsaMm2: 2.5, cpcCsaMm2: 4 }),
      // A change that can be so still goes through in the same push.
      mutation('circuit', ring.id, { description: 'Sockets, ground floor and hall' }, { baseVersion: now.version }),
    ]);
    expect(results.map((r) => [r.status, r.error])).toEqual([
      ['rejected', NOT_MADE_IN_17],
      ['rejected', CPC_ABOVE_LIVE],
      ['rejected', `${NOT_MADE_IN_17} ${CPC_ABOVE_LIVE}`],
      ['applied', undefined],
    ]);
    expect(await circuit(ring.id)).toEqual(expect.objectContaining({ deviceRatingA: 32, cpcCsaMm2: 1.5, description: 'Sockets, ground floor and hall' }));
    await t.http.get(`/api/circuits/${fresh}`).set(bearer(office)).expect(404);
  });

  it('judges the recorded rating again when the device is changed under it', async () => {
    const other = uuidv7();
    const created = await push(t, tech1, 'tech1-details', [mutation('circuit', other, { siteId: orchard, boardId: board, number: '11', deviceType: 'B', deviceRatingA: 32 })]);
    expect(created[0]!.status).toBe('applied');
    // BS 1362 cartridge fuses: 3 A and 13 A (Table 41.2, as the rule set holds them; M).
    const changed = await t.http.patch(`/api/circuits/${other}`).set(bearer(office)).send({ deviceType: 'BS 1362' }).expect(400);
    expect(changed.body.message).toBe('Rating: this device is not made in 32 A. Choose one of 3, 13 A.');
    await t.http.patch(`/api/circuits/${other}`).set(bearer(office)).send({ deviceType: 'BS 1362', deviceRatingA: 13 }).expect(200);
  });
});
