import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { DatumMark, MarkedRoute } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { bearer, downloadPdf, jobByReference, pdfText } from './document-helpers.js';
import { noisyJpeg, sha256, upload } from './photo-helpers.js';
import { catchUp, DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

// A 1600 × 1200 px photo of a 3000 × 2400 mm wall, 2 mm to the pixel: the left corner at x = 100 px, the floor at y = 1100 px.
const DATUMS: DatumMark[] = [
  { id: 'd1', datum: 'left-corner', lineAt: 100, to: { x: 350, y: 600 }, mm: 500 },
  { id: 'd2', datum: 'floor', lineAt: 1100, to: { x: 850, y: 875 }, mm: 450 },
];

/**
 * Routes drawn over a photo of an open wall: a synced record of its own, refused when its shape or its ties are
 * wrong, merged per field, locked by the sign-off for technicians and by an issued hidden-routes record for everyone.
 */
describe('routes drawn on photos', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  const phone = new DeviceMirror('markup-phone');
  const desk = new DeviceMirror('markup-desk');
  const ids = { visit: uuidv7(), area: uuidv7(), board: uuidv7(), circuit: uuidv7(), cable: uuidv7(), photo: uuidv7(), markup: uuidv7() };
  let jobId = '';
  let siteId = '';
  let routes: MarkedRoute[] = [];
  const onPhone = (entity: Parameters<typeof mutation>[0], id: string, set: Parameters<typeof mutation>[2], device = 'markup-phone', mirror = phone) =>
    mutation(entity, id, set, { baseVersion: mirror.rows.get(`${entity}:${id}`)?.version ?? 0, deviceId: device });

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    const { customerId } = await jobByReference(t, office, 'LED-0033');
    siteId = (await t.http.post('/api/sites').set(bearer(office)).send({ customerId, address: '9 Chase Row, Wendmouth', earthing: 'TN-C-S' }).expect(201)).body.id;
    jobId = (await t.http.post('/api/jobs').set(bearer(office)).send({ siteId, customerId, title: 'Kitchen sockets and a data point' }).expect(201)).body.id;
    const made = await push(t, office, 'markup-desk', [
      mutation('visit', ids.visit, { jobId, siteId, technicianIds: [tech1.user.id], plannedStart: new Date().toISOString(), status: 'on-site', actualStart: new Date().toISOString() }),
    ]);
    expect(made.map((r) => r.status)).toEqual(['applied']);
    await phone.pullAll(t, tech1);
    const bytes = await noisyJpeg(1600, 1200);
    expect((await upload(t, tech1, bytes)).last.status).toBe(204);
    const recorded = await push(t, tech1, 'markup-phone', [
      onPhone('area', ids.area, { siteId, name: 'Kitchen' }),
      onPhone('board', ids.board, { siteId, name: 'Consumer unit' }),
      onPhone('circuit', ids.circuit, { siteId, boardId: ids.board, number: '3', description: 'Kitchen ring', kind: 'ring', rcdRatingMa: 30 }),
      onPhone('cableRun', ids.cable, { siteId, label: 'KT-01', medium: 'Cat6', lastVisitId: ids.visit }),
      onPhone('photo', ids.photo, { visitId: ids.visit, siteId, areaId: ids.area, caption: 'Open chase above the worktop', sha256: sha256(bytes), width: 1600, height: 1200, sizeBytes: bytes.length, takenAt: new Date().toISOString() }),
    ]);
    expect(recorded.map((r) => r.status)).toEqual(recorded.map(() => 'applied'));
    await phone.pullAll(t, tech1);
    routes = [
      // Dropped from the ceiling to the socket box, in line with it: the ring.
      { id: 'r1', points: [{ x: 850, y: 0 }, { x: 850, y: 853 }], circuitId: ids.circuit, depthMm: 25 },
      // Along the top of the wall and down the left corner: the data cable.
      { id: 'r2', points: [{ x: 1500, y: 40 }, { x: 140, y: 40 }, { x: 140, y: 1000 }], cableRunId: ids.cable, depthMm: 20 },
    ];
  }, 120_000);
  afterAll(() => t.close());

  it('syncs a markup from the phone to the office, who sees it on the site’s map with its ties named', async () => {
    const [created] = await push(t, tech1, 'markup-phone', [
      onPhone('photoMarkup', ids.markup, {
        photoId: ids.photo, visitId: ids.visit, siteId, areaId: ids.area, wallName: 'Worktop wall',
        wallWidthMm: 3000, wallHeightMm: 2400, wallThicknessMm: 100, routes, datums: DATUMS,
        accessories: [{ id: 'a1', centre: { x: 850, y: 875 }, widthPx: 73, heightPx: 43, label: 'Double socket' }],
        recordedAt: new Date().toISOString(),
      }),
    ]);
    expect(created!.status).toBe('applied');
    await phone.pullAll(t, tech1);
    await desk.pullAll(t, office);
    expect(desk.one('photoMarkup', (m) => m.id === ids.markup)).toMatchObject({ photoId: ids.photo, wallName: 'Worktop wall', routes, datums: DATUMS });
    const map = (await t.http.get(`/api/sites/${siteId}/hidden-routes`).set(bearer(office)).expect(200)).body;
    expect(map.entries.map((e: { photo: { id: string }; markup: { id: string } }) => [e.photo.id, e.markup.id])).toEqual([[ids.photo, ids.markup]]);
    expect(map.cables).toEqual([{ id: ids.cable, label: 'KT-01' }]);
    expect(map.circuits).toEqual([{ id: ids.circuit, number: '3', description: 'Kitchen ring', rcdRatingMa: 30 }]);
    expect(map.areas).toEqual([{ id: ids.area, name: 'Kitchen' }]);
    await t.http.get(`/api/sites/${siteId}/hidden-routes`).set(bearer(tech1)).expect(403);
    await t.http.get(`/api/sites/${uuidv7()}/hidden-routes`).set(bearer(office)).expect(404);
  });

  it('refuses a markup of an impossible shape, or tied to a cable of another site', async () => {
    const elsewhere = (await jobByReference(t, office, 'LED-0033')).siteId;
    const seeded = desk.find('cableRun', (c) => c.siteId === elsewhere)[0]!;
    const results = await push(t, tech1, 'markup-phone', [
      onPhone('photoMarkup', ids.markup, { routes: [{ id: 'x', points: [{ x: 10, y: 10 }, { x: 10, y: 500 }], depthMm: 5000 }] }),
      onPhone('photoMarkup', ids.markup, { routes: [{ id: 'x', points: [{ x: 10, y: 10 }, { x: 10, y: 500 }], cableRunId: seeded.id }] }),
      onPhone('photoMarkup', uuidv7(), { photoId: ids.photo, visitId: ids.visit, siteId, datums: [{ id: 'd', datum: 'skirting', lineAt: 1, to: { x: 1, y: 1 }, mm: 10 }] }),
    ]);
    expect(results.map((r) => r.status)).toEqual(['rejected', 'rejected', 'rejected']);
    expect(results[0]!.error).toBe('photoMarkup: routes[0].depthMm must be from 0 to 1000 mm');
    expect(results[1]!.error).toBe(`photoMarkup.routes: ${seeded.id} is not a cable run or circuit of this site`);
    expect(results[2]!.error).toMatch(/datums\[0\]\.datum must be one of: left-corner, right-corner, floor, ceiling/);
  });

  it('merges edits of different parts from two devices, and keeps the later of two edits of the same part with a conflict', async () => {
    await catchUp(t, office, 'markup-desk');
    const base = desk.one('photoMarkup', (m) => m.id === ids.markup).version;
    expect(phone.one('photoMarkup', (m) => m.id === ids.markup).version).toBe(base);
    const deeper = routes.map((r) => (r.id === 'r1' ? { ...r, depthMm: 30 } : r));
    // The office names the wall while the phone, from the same version, types the depth again.
    const [named] = await push(t, office, 'markup-desk', [mutation('photoMarkup', ids.markup, { wallName: 'Wall behind the worktop' }, { baseVersion: base, deviceId: 'markup-desk' })]);
    const [typed] = await push(t, tech1, 'markup-phone', [mutation('photoMarkup', ids.markup, { routes: deeper }, { baseVersion: base, deviceId: 'markup-phone' })]);
    expect([named!.status, typed!.status]).toEqual(['applied', 'applied']);
    await desk.pullAll(t, office);
    expect(desk.one('photoMarkup', (m) => m.id === ids.markup)).toMatchObject({ wallName: 'Wall behind the worktop', routes: deeper });

    // A second phone, behind, draws the routes again: the later clock wins and the other drawing is kept as a conflict.
    await catchUp(t, tech1, 'markup-tablet');
    const tablet = new DeviceMirror('markup-tablet2');
    await tablet.pullAll(t, tech1);
    const v = tablet.one('photoMarkup', (m) => m.id === ids.markup).version;
    const redrawn = [routes[0]!];
    const [first] = await push(t, tech1, 'markup-tablet2', [mutation('photoMarkup', ids.markup, { routes: redrawn }, { baseVersion: v, deviceId: 'markup-tablet2' })]);
    await phone.pullAll(t, tech1);
    const [second] = await push(t, tech1, 'markup-phone', [mutation('photoMarkup', ids.markup, { routes: deeper, wallThicknessMm: 110 }, { baseVersion: v, deviceId: 'markup-phone' })]);
    expect(first!.status).toBe('applied');
    expect(second).toMatchObject({ status: 'applied', conflictIds: [expect.any(String)] });
    await desk.pullAll(t, office);
    const kept = desk.one('photoMarkup', (m) => m.id === ids.markup);
    expect(kept).toMatchObject({ routes: deeper, wallThicknessMm: 110 });
    expect(desk.one('conflict', (c) => c.id === second!.conflictIds![0])).toMatchObject({ entity: 'photoMarkup', field: 'routes', keptValue: deeper, discardedValue: redrawn });
    await phone.pullAll(t, tech1);
  });

  it('makes one record of two markups of the same photo started offline on two phones, as the phone names a markup by its photo', async () => {
    const photo = uuidv7();
    const [made] = await push(t, tech1, 'markup-phone', [
      onPhone('photo', photo, { visitId: ids.visit, siteId, areaId: ids.area, caption: 'Chase by the door', sha256: 'b'.repeat(64), width: 1600, height: 1200, sizeBytes: 1000, takenAt: new Date().toISOString() }),
    ]);
    expect(made!.status).toBe('applied');
    const start = { photoId: photo, visitId: ids.visit, siteId, areaId: ids.area, recordedAt: new Date().toISOString() };
    // Neither phone has seen the other's: both create the markup under the photo's id.
    const [one] = await push(t, tech1, 'markup-phone', [mutation('photoMarkup', photo, { ...start, wallName: 'Door wall', routes: [routes[0]!] }, { baseVersion: 0, deviceId: 'markup-phone' })]);
    const [two] = await push(t, tech1, 'markup-tablet3', [mutation('photoMarkup', photo, { ...start, wallWidthMm: 2800, routes: [routes[1]!] }, { baseVersion: 0, deviceId: 'markup-tablet3' })]);
    expect(one!.status).toBe('applied');
    expect(two).toMatchObject({ status: 'applied', conflictIds: [expect.any(String)] });
    await desk.pullAll(t, office);
    expect(desk.find('photoMarkup', (m) => m.photoId === photo)).toHaveLength(1);
    // What only one phone wrote is kept from each; the two drawings of the routes meet at the office as a conflict.
    expect(desk.one('photoMarkup', (m) => m.id === photo)).toMatchObject({ wallName: 'Door wall', wallWidthMm: 2800, routes: [routes[1]!] });
    expect(desk.one('conflict', (c) => c.id === two!.conflictIds![0])).toMatchObject({ entity: 'photoMarkup', field: 'routes', discardedValue: [routes[0]!] });
    await phone.pullAll(t, tech1);
  });

  it('locks a technician’s edits once the visit is finished, and still takes the office’s', async () => {
    const visit = phone.one('visit', (r) => r.id === ids.visit);
    const [finished] = await push(t, tech1, 'markup-phone', [
      mutation('visit', ids.visit, { status: 'finished', actualEnd: new Date().toISOString(), signedByName: 'Sam Brannigan', signedAt: new Date().toISOString(), signatureSvg: '<svg xmlns="http://www.w3.org/2000/svg"/>' }, { baseVersion: visit.version, deviceId: 'markup-phone' }),
    ]);
    expect(finished!.status).toBe('applied');
    await phone.pullAll(t, tech1);
    const [late] = await push(t, tech1, 'markup-phone', [onPhone('photoMarkup', ids.markup, { wallName: 'Changed after sign-off' })]);
    expect(late).toMatchObject({ status: 'merged', conflictIds: [expect.any(String)] });
    await desk.pullAll(t, office);
    expect(desk.one('photoMarkup', (m) => m.id === ids.markup).wallName).toBe('Wall behind the worktop');
    expect(desk.one('conflict', (c) => c.id === late!.conflictIds![0])).toMatchObject({ reason: 'locked-by-sign-off', field: 'wallName' });
  });

  it('issues a numbered hidden-routes record that prints every route and holds the markup until revised', async () => {
    const none = await t.http.post(`/api/jobs/${(await jobByReference(t, office, 'LED-0042')).id}/documents`).set(bearer(office)).send({ kind: 'hidden-routes' }).expect(422);
    expect(none.body.message).toEqual(['No photo of this site has a route drawn on it, so there are no hidden routes to record.']);
    const issued = (await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind: 'hidden-routes' }).expect(201)).body;
    expect(issued).toMatchObject({ kind: 'hidden-routes', number: 'HR-0001', title: 'Hidden routes record: Kitchen sockets and a data point' });
    const text = await pdfText((await downloadPdf(t, office, issued.id)).bytes);
    for (const words of ['Hidden routes record', 'Kitchen · Wall behind the worktop', 'Circuit 3 (Kitchen ring)', 'Cable KT-01', '30 mm', '20 mm', '500 mm', '450 mm', 'cable detector', 'competent person', 'Reg 522.6.202']) {
      expect(text).toContain(words);
    }
    // Wall positions from the datums: the drop runs 1500 mm along, from 2200 mm up to the top of the box (D: 2 mm a pixel).
    expect(text).toContain('(1500, 2200) to (1500, 494)');

    await desk.pullAll(t, office);
    const markup = desk.one('photoMarkup', (m) => m.id === ids.markup);
    const [held] = await push(t, office, 'markup-desk', [mutation('photoMarkup', ids.markup, { wallName: 'Renamed after issue' }, { baseVersion: markup.version, deviceId: 'markup-desk' })]);
    expect(held).toMatchObject({ status: 'merged', heldBy: 'HR-0001' });
    const sent = await t.http.post(`/api/documents/${issued.id}/send`).set(bearer(office)).send({ to: 'owner@example.com' }).expect(202);
    expect(sent.body.document).toMatchObject({ emailState: 'queued', emailedTo: 'owner@example.com' });
  });
});
