import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { MAX_PUSH_MUTATIONS } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { catchUp, DeviceMirror, hlcAt, mutation, pullPage, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

describe('sync: push and pull', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let tech2: Session;
  let officeView: DeviceMirror;
  let tech1View: DeviceMirror;
  const site = (name: string) => officeView.one('site', (r) => r.name === name);
  /** The Orchard Rise visit booked for tech1 today (demo data). */
  const myVisitToday = () =>
    tech1View.one('visit', (r) => (r.technicianIds as string[]).includes(tech1.user.id) && (r.plannedStart as string).startsWith(new Date().toISOString().slice(0, 10)));
  const visitAt = (siteName: string, when: (iso: string) => boolean) =>
    officeView.one('visit', (r) => r.siteId === site(siteName).id && when(r.plannedStart as string));
  /** Planned that many days from today (demo data: Fernhill Close has the TV points in three days and the garden office 40 days ago). */
  const inDays = (n: number) => (iso: string) => iso.startsWith(new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10));

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    tech2 = await signIn(t, 'tech2@larkfield.example');
    officeView = new DeviceMirror('office-desk-1');
    await officeView.pullAll(t, office);
    tech1View = new DeviceMirror('tech1-phone');
    await tech1View.pullAll(t, tech1);
  });
  afterAll(() => t.close());

  it('gives the office every demo row of its organisation, in pages, and nothing of another', async () => {
    expect(officeView.find('customer')).toHaveLength(3);
    expect(officeView.find('visit')).toHaveLength(6);
    expect(officeView.find('circuit')).toHaveLength(8);
    const paged = new DeviceMirror('office-desk-2');
    await paged.pullAll(t, office, 7);
    expect(paged.rows.size).toBe(officeView.rows.size);
    const oakmere = new DeviceMirror('oakmere-desk');
    await oakmere.pullAll(t, await signIn(t, 'admin@oakmere.example'));
    // Oakmere's own four demo rows (the shared subcontractor's job), none of Larkfield's.
    expect([...oakmere.rows.keys()].map((k) => k.split(':')[0]).sort()).toEqual(['customer', 'job', 'site', 'visit']);
    for (const key of oakmere.rows.keys()) expect(officeView.rows.has(key)).toBe(false);
  });

  it('round-trips a row of every entity a device may write', async () => {
    const ids: Record<string, string> = {};
    const make = (entity: string) => (ids[entity] = uuidv7());
    const v = visitAt('Orchard Rise', (p) => p >= new Date().toISOString().slice(0, 10));
    const batch = [
      mutation('customer', make('customer'), { name: 'Round Trip Ltd', phone: '01632 960 999' }),
      mutation('site', make('site'), { customerId: ids.customer!, address: '1 Test Row', earthing: 'TN-S', zeOhm: 0.4 }),
      mutation('area', make('area'), { siteId: ids.site!, name: 'Loft' }),
      mutation('board', make('board'), { siteId: ids.site!, areaId: ids.area!, name: 'Garage board' }),
      mutation('circuit', make('circuit'), { siteId: ids.site!, boardId: ids.board!, number: '7', kind: 'radial', deviceType: 'B', deviceRatingA: 16, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 }),
      mutation('job', make('job'), { siteId: ids.site!, customerId: ids.customer!, title: 'Garage sockets', status: 'booked' }),
      mutation('visit', make('visit'), { jobId: ids.job!, siteId: ids.site!, technicianIds: [tech2.user.id], plannedStart: '2026-12-09T09:00:00.000Z', status: 'planned' }),
      mutation('note', make('note'), { visitId: ids.visit!, siteId: ids.site!, text: 'Garage board is fed from the main CU, way 9.' }),
      mutation('photo', make('photo'), { visitId: ids.visit!, siteId: ids.site!, caption: 'Board before work', tags: ['before close-up'], sha256: 'a'.repeat(64), sizeBytes: 1234, width: 800, height: 600 }),
      mutation('cableRun', make('cableRun'), { siteId: ids.site!, label: 'G-01', medium: 'Cat6A', status: 'traced', traceMethod: 'tone-and-probe', wiremap: { near: [1, 2, 3, 4, 5, 6, 7, 8] } }),
      mutation('pointChange', make('pointChange'), { visitId: ids.visit!, siteId: ids.site!, circuitId: ids.circuit!, action: 'add', connection: 'radial', toDescription: 'Above the bench', toHeightMm: 1100 }),
      mutation('testResult', make('testResult'), { visitId: ids.visit!, siteId: ids.site!, circuitId: ids.circuit!, r1r2Ohm: 0.41, zsOhm: 0.69, irLiveEarthMOhm: 200, irTestVoltageV: 500, polarity: 'correct', instrument: 'MFT serial 0001' }),
    ];
    const results = await push(t, office, 'office-desk-1', batch);
    expect(results.map((r) => r.status)).toEqual(batch.map(() => 'applied'));
    const versions = results.map((r) => r.version!);
    expect([...versions].sort((a, b) => a - b)).toEqual(versions);
    expect(results[4]!.fieldVersions).toMatchObject({ number: versions[4], deviceRatingA: versions[4] });

    const arrived = await officeView.pullAll(t, office);
    for (const m of batch) {
      const row = officeView.rows.get(`${m.entity}:${m.id}`);
      expect(row).toMatchObject({ id: m.id, ...m.set });
      expect(arrived.some((c) => c.id === m.id)).toBe(true);
    }
    expect(officeView.rows.get(`note:${ids.note}`)).not.toHaveProperty('organisationId');
    expect(v.id).toBeDefined();

    // Update and delete come back the same way.
    const circuit = officeView.rows.get(`circuit:${ids.circuit}`)!;
    const [upd] = await push(t, office, 'office-desk-1', [mutation('circuit', circuit.id, { description: 'Garage sockets' }, { baseVersion: circuit.version })]);
    expect(upd).toMatchObject({ status: 'applied' });
    expect(upd!.fieldVersions!.description).toBe(upd!.version);
    expect(upd!.fieldVersions!.number).toBe(circuit.version);
    const [del] = await push(t, office, 'office-desk-1', [mutation('cableRun', ids.cableRun!, 'delete', { baseVersion: officeView.rows.get(`cableRun:${ids.cableRun}`)!.version })]);
    expect(del!.status).toBe('applied');
    const after = await officeView.pullAll(t, office);
    expect(after).toEqual(expect.arrayContaining([expect.objectContaining({ entity: 'cableRun', id: ids.cableRun, deleted: true, row: null })]));
    expect(officeView.rows.get(`circuit:${ids.circuit}`)!.description).toBe('Garage sockets');
  });

  it('applies a replayed batch once and answers it with the stored results', async () => {
    const v = myVisitToday();
    const batch = [
      mutation('note', uuidv7(), { visitId: v.id, siteId: v.siteId as string, text: 'Lounge skirting is original: chase above it.' }, { deviceId: 'tech1-phone' }),
      mutation('visit', v.id, { status: 'on-site', actualStart: new Date().toISOString() }, { baseVersion: v.version, deviceId: 'tech1-phone' }),
    ];
    const first = await push(t, tech1, 'tech1-phone', batch);
    expect(first.map((r) => r.status)).toEqual(['applied', 'applied']);
    const second = await push(t, tech1, 'tech1-phone', batch);
    expect(second).toEqual(first);
    const mirror = new DeviceMirror('office-check');
    await mirror.pullAll(t, office);
    expect(mirror.find('note', (r) => r.id === batch[0]!.id)).toHaveLength(1);
    expect(mirror.rows.get(`visit:${v.id}`)!.version).toBe(first[1]!.version);
  });

  it('refuses a bad mutation alone and applies the ones after it', async () => {
    const v = myVisitToday();
    const good = () => mutation('note', uuidv7(), { visitId: v.id, siteId: v.siteId as string, text: 'ok' });
    const results = await push(t, tech1, 'tech1-phone', [
      good(),
      mutation('spaceship' as never, uuidv7(), { name: 'x' }),
      mutation('note', uuidv7(), { visitId: v.id, siteId: v.siteId as string, text: 'x', colour: 'red' } as never),
      mutation('circuit', uuidv7(), { siteId: v.siteId as string, boardId: uuidv7(), number: '9' }),
      { ...good(), hlc: 'yesterday' },
      good(),
    ]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'rejected', 'rejected', 'rejected', 'rejected', 'applied']);
    expect(results[1]!.error).toMatch(/entity must be one of/);
    expect(results[2]!.error).toBe('note.colour is not a field we accept');
    expect(results[3]!.error).toMatch(/circuit.boardId points at a board that does not exist/);
    expect(results[4]!.error).toMatch(/hlc/);
  });

  it('refuses a mutation naming __proto__, constructor or prototype as a field, instead of applying it without them', async () => {
    const v = myVisitToday();
    const ids = [uuidv7(), uuidv7(), uuidv7()];
    const body = JSON.stringify({
      deviceId: 'tech1-phone',
      mutations: ['__proto__', 'constructor', 'prototype'].map((key, i) => ({
        mutationId: uuidv7(), entity: 'note', id: ids[i], baseVersion: 0, hlc: hlcAt(new Date().toISOString(), 'tech1-phone'),
        set: JSON.parse(`{"visitId":"${v.id}","siteId":"${v.siteId as string}","text":"Typed with a stray key","${key}":{"polluted":true}}`),
      })),
    });
    const res = await t.http.post('/api/sync/push').set('authorization', `Bearer ${tech1.accessToken}`).set('content-type', 'application/json').send(body);
    expect(res.status).toBe(200);
    expect(res.body.results.map((r: { status: string; error: string }) => [r.status, r.error])).toEqual([
      ['rejected', 'note.__proto__ is not a field we accept'],
      ['rejected', 'note.constructor is not a field we accept'],
      ['rejected', 'note.prototype is not a field we accept'],
    ]);
    expect(({} as { polluted?: boolean }).polluted).toBeUndefined();
  });

  it('keeps a technician to their own visits and sites', async () => {
    const fernhill = site('Fernhill Close');
    expect(tech1View.find('site', (r) => r.id === fernhill.id)).toHaveLength(0);
    expect(tech1View.find('customer', (r) => r.name === 'Tom and Priya Okonjo')).toHaveLength(0);
    expect(tech1View.find('visit').every((r) => r.siteId !== fernhill.id)).toBe(true);
    expect(tech1View.find('conflict')).toHaveLength(0);
    expect(tech1View.find('site').map((s) => s.name).sort()).toEqual(['Brightwater Dental, Harbour Yard', 'Orchard Rise']);

    const fernVisit = visitAt('Fernhill Close', inDays(3));
    const orchardVisit = tech1View.one('visit', (r) => r.status !== 'finished' && r.siteId === site('Orchard Rise').id);
    const [note, job, address, plan, otherSite] = await push(t, tech1, 'tech1-phone', [
      mutation('note', uuidv7(), { visitId: fernVisit.id, siteId: fernhill.id, text: 'not mine' }),
      mutation('job', uuidv7(), { siteId: fernhill.id, customerId: fernhill.customerId as string, title: 'x' }),
      mutation('site', site('Orchard Rise').id, { address: 'Somewhere else' }, { baseVersion: 1 }),
      mutation('visit', orchardVisit.id, { plannedStart: '2026-12-25T09:00:00.000Z' }, { baseVersion: orchardVisit.version }),
      mutation('area', uuidv7(), { siteId: fernhill.id, name: 'Shed' }),
    ]);
    expect(note).toMatchObject({ status: 'rejected', error: 'That visit is not assigned to you.' });
    expect(job!.error).toMatch(/cannot change job records/);
    expect(address!.error).toBe('site.address can be changed by the office only.');
    expect(plan!.error).toBe('visit.plannedStart can be changed by the office only.');
    expect(otherSite!.error).toBe('That site is not one of your visits.');
    // Observed site fields are theirs to record.
    const [ze] = await push(t, tech1, 'tech1-phone', [mutation('site', site('Orchard Rise').id, { zeOhm: 0.31 }, { baseVersion: site('Orchard Rise').version })]);
    expect(ze!.status).toBe('applied');
  });

  it('brings a newly assigned site whole, and evicts it when unassigned', async () => {
    await tech1View.pullAll(t, tech1);
    const fern = visitAt('Fernhill Close', inDays(3));
    const current = (await pullPage(t, office, 'office-fresh', 0, 1000)).changes.find((c) => c.id === fern.id)!.row!;
    await catchUp(t, office, 'office-desk-1');
    const [assign] = await push(t, office, 'office-desk-1', [mutation('visit', fern.id, { technicianIds: [tech2.user.id, tech1.user.id] }, { baseVersion: current.version })]);
    expect(assign!.status).toBe('applied');
    const gained = await tech1View.pullAll(t, tech1);
    const fernId = site('Fernhill Close').id;
    expect(gained.filter((c) => !c.deleted).map((c) => c.entity)).toEqual(expect.arrayContaining(['site', 'area', 'board', 'circuit', 'job', 'visit', 'customer']));
    expect(tech1View.find('circuit', (r) => r.siteId === fernId)).toHaveLength(2);
    expect(tech1View.find('customer', (r) => r.name === 'Tom and Priya Okonjo')).toHaveLength(1);

    await catchUp(t, office, 'office-desk-1');
    const [unassign] = await push(t, office, 'office-desk-1', [mutation('visit', fern.id, { technicianIds: [tech2.user.id] }, { baseVersion: assign!.version })]);
    expect(unassign!.status).toBe('applied');
    const lost = await tech1View.pullAll(t, tech1);
    expect(lost.filter((c) => c.deleted).length).toBeGreaterThanOrEqual(6);
    expect(tech1View.find('site', (r) => r.id === fernId)).toHaveLength(0);
    expect(tech1View.find('circuit', (r) => r.siteId === fernId)).toHaveLength(0);
    expect(tech1View.find('customer', (r) => r.name === 'Tom and Priya Okonjo')).toHaveLength(0);
  });

  it('asks an unknown device, or one with a checkpoint it was never given, to start again', async () => {
    expect(await pullPage(t, tech1, 'never-seen-device', 5)).toMatchObject({ reset: true, changes: [] });
    expect(await pullPage(t, tech1, 'tech1-phone', tech1View.checkpoint + 12345)).toMatchObject({ reset: true });
    // A lost reply: asking again from the checkpoint before still works.
    const before = tech1View.checkpoint;
    await pullPage(t, tech1, 'tech1-phone', before);
    expect((await pullPage(t, tech1, 'tech1-phone', before)).reset).toBeUndefined();
  });

  it('answers a batch over the limit with 413 and a message', async () => {
    const v = tech1View.one('visit', (r) => r.status !== 'finished' && r.siteId === site('Orchard Rise').id);
    const many = Array.from({ length: MAX_PUSH_MUTATIONS + 1 }, () => mutation('note', uuidv7(), { visitId: v.id, siteId: v.siteId as string, text: 'x' }));
    const res = await t.http.post('/api/sync/push').set('authorization', `Bearer ${tech1.accessToken}`).send({ deviceId: 'tech1-phone', mutations: many });
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/at most 500 mutations/);
    const bad = await t.http.post('/api/sync/push').set('authorization', `Bearer ${tech1.accessToken}`).send({ deviceId: 'x', mutations: 'all of them' });
    expect(bad.status).toBe(400);
    expect(bad.body.message.join(' ')).toMatch(/deviceId/);
    expect(bad.body.message.join(' ')).toMatch(/mutations must be a list/);
    await t.http.get('/api/sync/pull?checkpoint=-1&deviceId=tech1-phone').set('authorization', `Bearer ${tech1.accessToken}`).expect(400);
    await t.http.get('/api/sync/pull?checkpoint=0').expect(401);
  });

  it('settles the same field edited on two phones the same way whichever syncs first, keeping the loser', async () => {
    // Both technicians share tomorrow's visit at the practice, so both may record its circuits.
    const circuits = officeView.find('circuit', (r) => r.siteId === site('Brightwater Dental, Harbour Yard').id);
    expect(circuits.length).toBeGreaterThanOrEqual(2);
    const [c1, c2] = circuits;
    const early = (id: string, base: number) => mutation('circuit', id, { description: 'Reception sockets (ring, verified)' }, { baseVersion: base, hlc: hlcAt('2026-12-02T10:00:00.000Z', 'tech1-phone') });
    const late = (id: string, base: number) => mutation('circuit', id, { description: 'Reception and waiting room sockets' }, { baseVersion: base, hlc: hlcAt('2026-12-02T10:05:00.000Z', 'tech2-phone') });
    await catchUp(t, tech1, 'tech1-phone');
    await catchUp(t, tech2, 'tech2-phone');
    // Order one: the earlier edit reaches the server first.
    await push(t, tech1, 'tech1-phone', [early(c1!.id, c1!.version)]);
    const r1 = await push(t, tech2, 'tech2-phone', [late(c1!.id, c1!.version)]);
    // Order two: the later edit reaches the server first.
    await push(t, tech2, 'tech2-phone', [late(c2!.id, c2!.version)]);
    const r2 = await push(t, tech1, 'tech1-phone', [early(c2!.id, c2!.version)]);
    expect(r1[0]!.status).toBe('applied');
    expect(r2[0]!.status).toBe('merged');
    await officeView.pullAll(t, office);
    for (const c of [c1!, c2!]) {
      expect(officeView.rows.get(`circuit:${c.id}`)!.description).toBe('Reception and waiting room sockets');
      const conflicts = officeView.find('conflict', (r) => r.rowId === c.id);
      expect(conflicts).toHaveLength(1);
      expect(conflicts[0]).toMatchObject({
        entity: 'circuit', field: 'description', reason: 'later-edit-wins',
        keptValue: 'Reception and waiting room sockets', discardedValue: 'Reception sockets (ring, verified)',
        keptById: tech2.user.id, discardedById: tech1.user.id,
      });
    }
  });

  it('turns an edit of a record behind an issued certificate into a conflict for review', async () => {
    const earlier = officeView.one('visit', (r) => r.status === 'finished');
    const result = officeView.one('testResult', (r) => r.visitId === earlier.id);
    const issued = await t.http.post(`/api/jobs/${earlier.jobId as string}/documents`).set('authorization', `Bearer ${office.accessToken}`).send({ kind: 'minor-works' });
    expect(issued.status).toBe(201);
    await catchUp(t, tech2, 'tech2-phone');
    const [edit] = await push(t, tech2, 'tech2-phone', [mutation('testResult', result.id, { zsOhm: 0.71 }, { baseVersion: result.version })]);
    expect(edit).toMatchObject({ status: 'merged', conflictIds: [expect.any(String)], heldBy: issued.body.number });
    await officeView.pullAll(t, office);
    expect(officeView.rows.get(`testResult:${result.id}`)!.zsOhm).toBe(result.zsOhm);
    expect(officeView.one('conflict', (r) => r.id === edit!.conflictIds![0])).toMatchObject({ reason: 'locked-by-document', discardedValue: 0.71 });
    const res = await t.http.post(`/api/conflicts/${edit!.conflictIds![0]}/resolve`).set('authorization', `Bearer ${office.accessToken}`).send({ choice: 'discarded' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/issued document/);
  });

  it('refuses a document in a push, alone, and applies the rest of the batch', async () => {
    const orchard = site('Orchard Rise');
    const [jobId, visitId, noteId] = [uuidv7(), uuidv7(), uuidv7()];
    const made = await push(t, office, 'office-desk-1', [
      mutation('job', jobId, { siteId: orchard.id, customerId: orchard.customerId as string, title: 'Porch light', status: 'booked' }),
      mutation('visit', visitId, { jobId, siteId: orchard.id, technicianIds: [tech2.user.id], plannedStart: '2026-12-10T09:00:00.000Z', status: 'planned' }),
      mutation('note', noteId, { visitId, siteId: orchard.id, text: 'Porch light on the landing circuit.' }),
      mutation('document', uuidv7(), { jobId, siteId: orchard.id, kind: 'minor-works', number: 'MW-0101', issuedAt: '2026-12-10T15:00:00.000Z' }),
      mutation('note', noteId, { text: 'After the refused document' }, { baseVersion: 0 }),
    ]);
    expect(made.map((r) => r.status)).toEqual(['applied', 'applied', 'applied', 'rejected', 'applied']);
    await officeView.pullAll(t, office);
    expect(officeView.rows.get(`note:${noteId}`)!.text).toBe('After the refused document');
    expect(officeView.find('document', (d) => d.number === 'MW-0101')).toEqual([]);
  });

  it('locks a visit signed off on site: a technician’s later edits become conflicts, new records still arrive, the office may correct', async () => {
    const visit = myVisitToday();
    const testId = uuidv7();
    const [created, finished] = await push(t, tech1, 'tech1-phone', [
      mutation('testResult', testId, { visitId: visit.id, siteId: visit.siteId as string, r1r2Ohm: 0.31, zsOhm: 0.59 }, { deviceId: 'tech1-phone' }),
      mutation('visit', visit.id, { status: 'finished', signedByName: 'Sam Brannigan', signedAt: new Date().toISOString(), signatureSvg: '<svg xmlns="http://www.w3.org/2000/svg"/>' }, { baseVersion: visit.version, deviceId: 'tech1-phone' }),
    ]);
    expect([created!.status, finished!.status]).toEqual(['applied', 'applied']);
    // A second phone, offline until now, edits the reading after the visit was signed.
    await catchUp(t, tech1, 'tech1-tablet');
    const [edit] = await push(t, tech1, 'tech1-tablet', [mutation('testResult', testId, { zsOhm: 0.95 }, { baseVersion: created!.version, deviceId: 'tech1-tablet' })]);
    expect(edit).toMatchObject({ status: 'merged', conflictIds: [expect.any(String)] });
    const [reopen] = await push(t, tech1, 'tech1-tablet', [mutation('visit', visit.id, { status: 'on-site' }, { baseVersion: finished!.version, deviceId: 'tech1-tablet' })]);
    expect(reopen).toMatchObject({ status: 'merged' });
    const [late] = await push(t, tech1, 'tech1-tablet', [mutation('note', uuidv7(), { visitId: visit.id, siteId: visit.siteId as string, text: 'Customer asked for a spare fuse; left in the drawer.' }, { deviceId: 'tech1-tablet' })]);
    expect(late!.status).toBe('applied');
    await officeView.pullAll(t, office);
    expect(officeView.rows.get(`testResult:${testId}`)!.zsOhm).toBe(0.59);
    expect(officeView.rows.get(`visit:${visit.id}`)!.status).toBe('finished');
    expect(officeView.one('conflict', (r) => r.id === edit!.conflictIds![0])).toMatchObject({ reason: 'locked-by-sign-off', field: 'zsOhm', keptValue: 0.59, discardedValue: 0.95 });
    // The office is not held by the sign-off lock.
    await catchUp(t, office, 'office-desk-1');
    const [fix] = await push(t, office, 'office-desk-1', [mutation('testResult', testId, { instrument: 'Loop tester, serial 4471' }, { baseVersion: created!.version })]);
    expect(fix!.status).toBe('applied');
  });

  it('lets the office settle a conflict; the chosen value reaches the phones', async () => {
    const auth = { authorization: `Bearer ${office.accessToken}` };
    const list = await t.http.get('/api/conflicts?entity=circuit').set(auth).expect(200);
    expect(list.body.total).toBeGreaterThanOrEqual(2);
    const conflict = list.body.items[0];
    // Named in words, not by id: the circuit, its board, its site and the customer.
    expect(conflict.subject.title).toMatch(/^Circuit \S+ · \S/);
    expect(conflict.subject.context).toEqual([expect.stringMatching(/^board /), expect.any(String), expect.any(String)]);
    const settled = await t.http.post(`/api/conflicts/${conflict.id}/resolve`).set(auth).send({ choice: 'discarded' }).expect(200);
    expect(settled.body).toMatchObject({ resolvedById: office.user.id, resolution: { choice: 'discarded' } });
    await t.http.post(`/api/conflicts/${conflict.id}/resolve`).set(auth).send({ choice: 'kept' }).expect(409);
    await t.http.post(`/api/conflicts/${conflict.id}/resolve`).set(auth).send({ choice: 'value' }).expect(400);
    const phone = new DeviceMirror('tech2-check');
    await phone.pullAll(t, tech2);
    expect(phone.rows.get(`circuit:${conflict.rowId}`)!.description).toBe(conflict.discardedValue);
    const open = await t.http.get(`/api/conflicts?rowId=${conflict.rowId}`).set(auth).expect(200);
    expect(open.body.total).toBe(0);
    // Settled ones stay listed, with who settled them and how.
    const done = await t.http.get(`/api/conflicts?resolved=true&rowId=${conflict.rowId}`).set(auth).expect(200);
    // The circuit is named as it now reads: its description is the value the office chose.
    expect(done.body.items[0]).toMatchObject({ id: conflict.id, resolvedById: office.user.id, subject: { title: expect.stringContaining(String(conflict.discardedValue)), context: conflict.subject.context } });
    // Typing an empty value clears an optional field: null is a value, not a missing one.
    const other = (await t.http.get('/api/conflicts?entity=circuit').set(auth).expect(200)).body.items.find((c: { field: string }) => c.field === 'description');
    expect(other).toBeTruthy();
    await t.http.post(`/api/conflicts/${other.id}/resolve`).set(auth).send({ choice: 'value', value: null }).expect(200);
    await phone.pullAll(t, tech2);
    expect(phone.rows.get(`circuit:${other.rowId}`)!.description).toBeNull();
    await t.http.get('/api/conflicts').set({ authorization: `Bearer ${tech1.accessToken}` }).expect(403);
  });
});
