import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { formatHlc, MAX_CLOCK_AHEAD_MS } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { catchUp, DeviceMirror, hlcAt, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

/** What a device says about itself (its base, its clock, its id) is checked, and technicians get only their own work. */
describe('sync: claims a device cannot back up, and what a technician receives', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let tech2: Session;
  let officeView: DeviceMirror;
  const site = (name: string) => officeView.one('site', (r) => r.name === name);
  const circuitAt = (name: string) => officeView.find('circuit', (r) => r.siteId === site(name).id)[0]!;
  const rawPush = (s: Session, deviceId: string, mutations: unknown[]) =>
    t.http.post('/api/sync/push').set('authorization', `Bearer ${s.accessToken}`).send({ deviceId, mutations });

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    tech2 = await signIn(t, 'tech2@larkfield.example');
    officeView = new DeviceMirror('claims-desk');
    await officeView.pullAll(t, office);
  });
  afterAll(() => t.close());

  describe('concurrency claims', () => {
    it('refuses a base version above the row’s own, so a stale write cannot pass as the latest', async () => {
      const circuit = circuitAt('Orchard Rise');
      const [stale] = await push(t, tech1, 'claims-tech1', [
        mutation('circuit', circuit.id, { description: 'Stale, claiming to have seen everything' }, { baseVersion: Number.MAX_SAFE_INTEGER }),
      ]);
      expect(stale).toMatchObject({ status: 'rejected', error: expect.stringMatching(/baseVersion .* newer than the circuit itself/) });
      await officeView.pullAll(t, office);
      expect(officeView.rows.get(`circuit:${circuit.id}`)!.description).toBe(circuit.description);
    });

    it('refuses a base version above what the device has been sent, and takes it once the device has pulled it', async () => {
      const circuit = circuitAt('Orchard Rise');
      const phone = new DeviceMirror('claims-tech1-b');
      await phone.pullAll(t, tech1);
      const [officeEdit] = await push(t, office, 'claims-desk', [mutation('circuit', circuit.id, { description: 'Sockets, lounge (office)' }, { baseVersion: circuit.version })]);
      expect(officeEdit!.status).toBe('applied');
      // The phone never saw the office's version, yet claims it as its base: its edit would overwrite unseen.
      const [claimed] = await push(t, tech1, 'claims-tech1-b', [mutation('circuit', circuit.id, { description: 'Sockets, lounge (phone)' }, { baseVersion: officeEdit!.version })]);
      expect(claimed).toMatchObject({ status: 'rejected', error: expect.stringMatching(/newer than anything this device has pulled/) });
      await phone.pullAll(t, tech1);
      const [honest] = await push(t, tech1, 'claims-tech1-b', [mutation('circuit', circuit.id, { description: 'Sockets, lounge (phone)' }, { baseVersion: officeEdit!.version })]);
      expect(honest!.status).toBe('applied');
    });

    it('refuses a clock that carries another device’s id', async () => {
      const circuit = circuitAt('Orchard Rise');
      await catchUp(t, tech1, 'claims-tech1');
      const borrowed = mutation('circuit', circuit.id, { description: 'Under a borrowed id' }, { baseVersion: 0, hlc: formatHlc({ ms: Date.now(), counter: 0, deviceId: 'claims-tech1-b' }) });
      const [result] = await push(t, tech1, 'claims-tech1', [borrowed]);
      expect(result).toMatchObject({ status: 'rejected', error: "hlc must end with this device's id (claims-tech1)." });
    });

    it('refuses the whole push from a clock far ahead, telling the phone to set its clock, and keeps later edits fair', async () => {
      const circuit = circuitAt('Brightwater Dental, Harbour Yard');
      await catchUp(t, tech2, 'claims-tech2');
      for (const when of ['9999-12-31T23:59:59.999Z', new Date(Date.now() + MAX_CLOCK_AHEAD_MS + 60_000).toISOString()]) {
        const res = await rawPush(tech2, 'claims-tech2', [mutation('circuit', circuit.id, { description: 'From the future' }, { baseVersion: circuit.version, hlc: hlcAt(when, 'claims-tech2') })]);
        expect(res.status).toBe(422);
        expect(res.body.message).toMatch(/clock is ahead .* Set the phone's date and time to automatic/);
      }
      // Nothing from the future was kept, so an ordinary later edit wins as it should.
      const [now] = await push(t, tech1, 'claims-tech1', [mutation('circuit', circuit.id, { description: 'Reception sockets, checked today' }, { baseVersion: circuit.version })]);
      expect(now!.status).toBe('applied');
      await officeView.pullAll(t, office);
      expect(officeView.rows.get(`circuit:${circuit.id}`)!.description).toBe('Reception sockets, checked today');
      // A few seconds ahead is an ordinary phone clock.
      const [slightly] = await push(t, tech2, 'claims-tech2', [mutation('circuit', circuit.id, { rcdType: 'A' }, { baseVersion: 0, hlc: hlcAt(new Date(Date.now() + 5_000).toISOString(), 'claims-tech2') })]);
      expect(slightly!.status).not.toBe('rejected');
    });

    it('refuses clocks that are not real dates, or older than the product', async () => {
      const circuit = circuitAt('Brightwater Dental, Harbour Yard');
      const results = await push(t, tech2, 'claims-tech2', ['0000-01-01T00:00:00.000Z', '2026-02-31T10:00:00.000Z', '2019-12-31T23:59:59.999Z'].map((when) =>
        mutation('circuit', circuit.id, { description: `Dated ${when}` }, { baseVersion: 0, hlc: `${when}-0000-claims-tech2` })));
      for (const r of results) expect(r).toMatchObject({ status: 'rejected', error: expect.stringMatching(/hlc must look like .* with a real date from 2020 on/) });
    });

    it('gives a device id to the person who first used it, and none to a server writer’s name', async () => {
      await catchUp(t, tech1, 'claims-phone-of-tech1');
      const visit = new DeviceMirror('claims-tech2-look');
      await visit.pullAll(t, tech2);
      const v = visit.find('visit', (r) => r.status !== 'finished')[0]!;
      const note = mutation('note', uuidv7(), { visitId: v.id, siteId: v.siteId as string, text: 'Under someone else’s device id' }, { deviceId: 'claims-phone-of-tech1' });
      const taken = await rawPush(tech2, 'claims-phone-of-tech1', [note]);
      expect(taken.status).toBe(403);
      expect(taken.body.message).toMatch(/belongs to someone else/);
      const pull = await t.http.get('/api/sync/pull?checkpoint=0&deviceId=claims-phone-of-tech1').set('authorization', `Bearer ${tech2.accessToken}`);
      expect(pull.status).toBe(403);
      for (const serverId of ['office', 'server', 'seed', 'mail-outbox']) {
        expect((await rawPush(tech2, serverId, [{ ...note, hlc: formatHlc({ ms: Date.now(), counter: 0, deviceId: serverId }) }])).status).toBe(403);
      }
      // A device used first by a push is claimed all the same.
      await push(t, tech2, 'claims-first-push', [mutation('note', uuidv7(), { visitId: v.id, siteId: v.siteId as string, text: 'First words from a new phone' })]);
      expect((await t.http.get('/api/sync/pull?checkpoint=0&deviceId=claims-first-push').set('authorization', `Bearer ${tech1.accessToken}`)).status).toBe(403);
    });
  });

  describe('what a technician receives', () => {
    it('sends no cost price to a technician, and the office all of it', async () => {
      const phone = new DeviceMirror('claims-tech1-prices');
      await phone.pullAll(t, tech1);
      const items = phone.find('priceItem');
      expect(items.length).toBeGreaterThan(0);
      for (const item of items) {
        expect(item).not.toHaveProperty('costMinor');
        expect(item.fieldVersions).not.toHaveProperty('costMinor');
        expect(item.sellMinor).toEqual(expect.any(Number));
      }
      expect(officeView.find('priceItem').every((i) => typeof i.costMinor === 'number')).toBe(true);
    });

    it('sends neither another technician’s signed visit nor its signature', async () => {
      const signed = officeView.one('visit', (r) => r.status === 'finished');
      expect(signed.technicianIds).toEqual([tech2.user.id]);
      expect(signed.signatureSvg).toEqual(expect.stringContaining('<svg'));
      const phone = new DeviceMirror('claims-tech1-visits');
      const changes = await phone.pullAll(t, tech1);
      expect(phone.find('site', (r) => r.id === signed.siteId)).toHaveLength(1);
      expect(phone.find('visit', (r) => r.id === signed.id)).toHaveLength(0);
      for (const v of phone.find('visit')) expect(v.technicianIds).toContain(tech1.user.id);
      expect(JSON.stringify(changes)).not.toContain(signed.signatureSvg as string);
      expect(phone.find('job', (r) => r.id === signed.jobId)).toHaveLength(0);
    });

    it('sends no job without a visit of theirs (an enquiry), and brings it once they are given a visit for it', async () => {
      // An enquiry at a site of Aled's (Fernhill Close), with no visit yet.
      const fernhill = officeView.one('site', (r) => r.name === 'Fernhill Close');
      const enquiry = { id: uuidv7(), siteId: fernhill.id, title: 'Lights for the garden room' };
      await catchUp(t, office, 'claims-desk');
      const [asked] = await push(t, office, 'claims-desk', [mutation('job', enquiry.id, { siteId: fernhill.id, customerId: fernhill.customerId as string, title: enquiry.title, status: 'enquiry' })]);
      expect(asked!.status).toBe('applied');
      const phone = new DeviceMirror('claims-tech2-enquiry');
      await phone.pullAll(t, tech2);
      expect(phone.find('site', (r) => r.id === enquiry.siteId)).toHaveLength(1);
      expect(phone.find('job', (r) => r.id === enquiry.id)).toHaveLength(0);
      expect(phone.find('job').length).toBeGreaterThan(0);

      const visitId = uuidv7();
      await catchUp(t, office, 'claims-desk');
      const [booked] = await push(t, office, 'claims-desk', [
        mutation('visit', visitId, { jobId: enquiry.id, siteId: enquiry.siteId as string, technicianIds: [tech2.user.id], plannedStart: '2026-12-20T09:00:00.000Z', status: 'planned' }),
      ]);
      expect(booked!.status).toBe('applied');
      await phone.pullAll(t, tech2);
      expect(phone.one('job', (r) => r.id === enquiry.id).title).toBe(enquiry.title);

      await catchUp(t, office, 'claims-desk');
      const [moved] = await push(t, office, 'claims-desk', [mutation('visit', visitId, { technicianIds: [tech1.user.id] }, { baseVersion: booked!.version })]);
      expect(moved!.status).toBe('applied');
      const gone = await phone.pullAll(t, tech2);
      expect(gone.filter((c) => c.deleted).map((c) => `${c.entity}:${c.id}`)).toEqual(expect.arrayContaining([`visit:${visitId}`, `job:${enquiry.id}`]));
      expect(phone.find('job', (r) => r.id === enquiry.id)).toHaveLength(0);
    });
  });

  describe('what a record may say', () => {
    it('refuses a circuit made through sync on one site at a board on another, as the office’s form does', async () => {
      await catchUp(t, office, 'claims-desk');
      const orchard = site('Orchard Rise');
      const otherBoard = officeView.find('board', (r) => r.siteId !== orchard.id)[0]!;
      const ownBoard = officeView.find('board', (r) => r.siteId === orchard.id)[0]!;
      const [across, own] = await push(t, office, 'claims-desk', [
        mutation('circuit', uuidv7(), { siteId: orchard.id, boardId: otherBoard.id, number: '9', description: 'Across sites' }),
        mutation('circuit', uuidv7(), { siteId: orchard.id, boardId: ownBoard.id, number: '9', description: 'Same site' }),
      ]);
      expect(across).toMatchObject({ status: 'rejected', error: 'circuit.boardId points at a board on another site.' });
      expect(own!.status).toBe('applied');
      // Moving a circuit's board to another site's is refused too, and over REST as before.
      const circuit = circuitAt('Orchard Rise');
      await catchUp(t, office, 'claims-desk');
      const current = (await t.http.get(`/api/circuits/${circuit.id}`).set('authorization', `Bearer ${office.accessToken}`).expect(200)).body;
      const [moved] = await push(t, office, 'claims-desk', [mutation('circuit', circuit.id, { boardId: otherBoard.id }, { baseVersion: current.version })]);
      expect(moved).toMatchObject({ status: 'rejected', error: 'circuit.boardId points at a board on another site.' });
    });

    it('refuses a name made only of no-break, em and zero-width spaces, through sync and over REST', async () => {
      const invisible = '\u00a0\u2003\u200b\u200b';
      const [pushed] = await push(t, office, 'claims-desk', [mutation('customer', uuidv7(), { name: invisible })]);
      expect(pushed).toMatchObject({ status: 'rejected', error: 'customer.name must not be empty' });
      const rest = await t.http.post('/api/customers').set('authorization', `Bearer ${office.accessToken}`).send({ name: invisible });
      expect(rest.status).toBe(400);
      expect(rest.body.message).toContain('name must not be empty');
    });

    it('keeps one spelling of text that looks the same, whichever way it was typed', async () => {
      const id = uuidv7();
      const [made] = await push(t, office, 'claims-desk', [mutation('customer', id, { name: 'Rene\u0301e Okafor' })]);
      expect(made!.status).toBe('applied');
      const rest = await t.http.post('/api/customers').set('authorization', `Bearer ${office.accessToken}`).send({ name: 'Zo\u0308e Hart' }).expect(201);
      await officeView.pullAll(t, office);
      expect(officeView.rows.get(`customer:${id}`)!.name).toBe('Ren\u00e9e Okafor');
      expect(rest.body.name).toBe('Z\u00f6e Hart');
    });

    it('refuses an e-mail address that mixes alphabets to look like someone else’s', async () => {
      const admin = await signIn(t, 'admin@larkfield.example');
      const lookalike = await t.http.post('/api/users').set('authorization', `Bearer ${admin.accessToken}`)
        .send({ email: '\u0430dmin@larkfield.example', name: 'Admin', role: 'admin' });
      expect(lookalike.status).toBe(400);
      expect(lookalike.body.message).toContain('email mixes letters of different alphabets; type the address in one');
      const blank = await t.http.post('/api/users').set('authorization', `Bearer ${admin.accessToken}`)
        .send({ email: 'blank.name@larkfield.example', name: '\u200b\u00a0', role: 'technician' });
      expect(blank.status).toBe(400);
      expect(blank.body.message).toContain('name must not be empty');
    });
  });
});
