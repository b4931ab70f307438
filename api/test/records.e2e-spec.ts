import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { formatHlc } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { catchUp } from './sync-helpers.js';
import { bearer, createTestApp, expectErrorBody, messagesOf, signIn, signInAll, type TestApp } from './test-app.js';

type Session = Awaited<ReturnType<typeof signIn>>;
type Row = { id: string; version: number; fieldVersions: Record<string, number>; [field: string]: unknown };
type Page = { items: Row[]; total: number; page: number; pageSize: number };

const RESOURCES = ['customers', 'sites', 'areas', 'boards', 'circuits', 'jobs', 'visits'] as const;
const NOBODY = '01890000-0000-7000-8000-000000000000';
/** A change each resource accepts, so that a refusal can only be about whose row it is. */
const VALID_CHANGE: Record<(typeof RESOURCES)[number], Record<string, unknown>> = {
  customers: { name: 'Taken over' },
  sites: { name: 'Taken over' },
  areas: { name: 'Taken over' },
  boards: { name: 'Taken over' },
  circuits: { description: 'Taken over' },
  jobs: { title: 'Taken over' },
  visits: { status: 'cancelled' },
};

describe('office records: customers, sites, areas, boards, circuits, jobs and visits', () => {
  let t: TestApp;
  let office: Session;
  let admin: Session;
  let tech1: Session;
  let tech2: Session;
  let oakmere: Session;
  /** One seeded Larkfield row of each resource, plus the named ones the tests use. */
  const seed: Record<string, Row> = {};

  const as = bearer;
  const list = async (s: Session, path: string): Promise<Page> => (await t.http.get(path).set(as(s)).expect(200)).body;
  const names = (page: Page, field = 'name') => page.items.map((r) => r[field]);
  const create = async (path: string, body: object, s = office): Promise<Row> => (await t.http.post(path).set(as(s)).send(body).expect(201)).body;
  const messages = messagesOf;
  // The device pulls first, as a phone does: the server takes no base version above what the device was sent.
  const push = async (s: Session, mutation: object) => {
    await catchUp(t, s, 'testdevice2');
    return t.http.post('/api/sync/push').set(as(s)).send({
      deviceId: 'testdevice2',
      mutations: [{ mutationId: uuidv7(), hlc: formatHlc({ ms: Date.now(), counter: 0, deviceId: 'testdevice2' }), ...mutation }],
    }).expect(200);
  };

  beforeAll(async () => {
    t = await createTestApp();
    [office, admin, tech1, tech2, oakmere] = await signInAll(t, 'office@larkfield.example', 'admin@larkfield.example', 'tech1@larkfield.example', 'tech2@larkfield.example', 'admin@oakmere.example');
    const find = async (path: string, field: string, value: string) => {
      const row = (await list(office, `${path}?pageSize=200`)).items.find((r) => r[field] === value);
      if (!row) throw new Error(`seed has no ${path} with ${field} ${value}`);
      return row;
    };
    seed.greaves = await find('/api/customers', 'name', 'Hannah Greaves');
    seed.brightwater = await find('/api/customers', 'name', 'Brightwater Dental Practice');
    seed.orchard = await find('/api/sites', 'name', 'Orchard Rise');
    seed.harbour = await find('/api/sites', 'name', 'Brightwater Dental, Harbour Yard');
    seed.kitchen = await find('/api/areas', 'name', 'Kitchen');
    seed.reception = await find('/api/areas', 'name', 'Reception');
    seed.orchardCu = await find('/api/boards', 'description', '10-way dual RCD board');
    seed.harbourDb1 = await find('/api/boards', 'name', 'DB1');
    seed.orchardC1 = await find('/api/circuits', 'description', 'Sockets, ground floor');
    seed.sockets = await find('/api/jobs', 'reference', 'LED-0041');
    seed.harbourData = await find('/api/jobs', 'reference', 'LED-0042');
    seed.orchardToday = (await list(office, `/api/visits?jobId=${seed.sockets.id}`)).items[0]!;
    seed.customers = seed.greaves;
    seed.sites = seed.orchard;
    seed.areas = seed.kitchen;
    seed.boards = seed.orchardCu;
    seed.circuits = seed.orchardC1;
    seed.jobs = seed.sockets;
    seed.visits = seed.orchardToday;
  });
  afterAll(() => t.close());

  describe('who may call', () => {
    const routes = (resource: (typeof RESOURCES)[number]) => [
      ['get', `/api/${resource}`],
      ['get', `/api/${resource}/${seed[resource]!.id}`],
      ['post', `/api/${resource}`],
      ['patch', `/api/${resource}/${seed[resource]!.id}`],
    ] as const;

    it.each(RESOURCES)('refuses every %s route to a technician with 403', async (resource) => {
      for (const [method, path] of routes(resource)) {
        const res = await t.http[method](path).set(as(tech1)).send(method === 'get' ? undefined : { name: 'Mine now' });
        expect([method, path, res.status]).toEqual([method, path, 403]);
        expectErrorBody(res.body, 403);
      }
    });

    it('refuses every route without a token with 401', async () => {
      for (const resource of RESOURCES) {
        for (const [method, path] of routes(resource)) {
          const res = await t.http[method](path).send({});
          expect([method, path, res.status]).toEqual([method, path, 401]);
        }
      }
    });

    it('lets the admin read and write as the office does', async () => {
      expect((await list(admin, '/api/jobs')).total).toBe(5);
      const area = await create('/api/areas', { siteId: seed.orchard!.id, name: 'Loft' }, admin);
      expect(area).toMatchObject({ name: 'Loft', createdById: admin.user.id });
    });
  });

  describe('customers', () => {
    it('lists by name, pages and searches', async () => {
      const all = await list(office, '/api/customers');
      expect(names(all)).toEqual(['Brightwater Dental Practice', 'Hannah Greaves', 'Tom and Priya Okonjo']);
      expect(all).toMatchObject({ total: 3, page: 1, pageSize: 50 });
      const second = await list(office, '/api/customers?pageSize=2&page=2');
      expect(second).toMatchObject({ total: 3, page: 2, pageSize: 2 });
      expect(names(second)).toEqual(['Tom and Priya Okonjo']);
      expect(names(await list(office, '/api/customers?search=ORCHARD'))).toEqual(['Hannah Greaves']);
      expect(names(await list(office, '/api/customers?search=01632'))).toEqual(['Brightwater Dental Practice']);
      // LIKE wildcards are searched for literally.
      expect((await list(office, '/api/customers?search=%25')).total).toBe(0);
      expect((await list(office, '/api/customers?search=_')).total).toBe(0);
    });

    it('gets, creates and updates a customer', async () => {
      const one = (await t.http.get(`/api/customers/${seed.greaves!.id}`).set(as(office)).expect(200)).body;
      expect(one).toMatchObject({ id: seed.greaves!.id, name: 'Hannah Greaves', email: 'hannah.greaves@example.com' });
      expect(one).not.toHaveProperty('organisationId');
      expect(one).not.toHaveProperty('fieldMeta');

      const made = await create('/api/customers', { name: '  Ada Fenwick  ', phone: '07700 900123' });
      expect(made).toMatchObject({ name: 'Ada Fenwick', phone: '07700 900123', createdById: office.user.id });
      expect(made.version).toBeGreaterThan(0);
      expect(made.fieldVersions).toEqual({ name: made.version, phone: made.version });

      const changed = (await t.http.patch(`/api/customers/${made.id}`).set(as(office)).send({ email: 'ada@example.com', phone: null }).expect(200)).body;
      expect(changed).toMatchObject({ name: 'Ada Fenwick', email: 'ada@example.com', phone: null });
      expect(changed.version).toBeGreaterThan(made.version);
      expect(changed.fieldVersions).toEqual({ name: made.version, phone: changed.version, email: changed.version });
      expect((await t.http.get(`/api/customers/${made.id}`).set(as(office)).expect(200)).body).toEqual(changed);
    });
  });

  describe('sites', () => {
    it("gives each site its customer's name and each customer their sites, and finds a site by its customer", async () => {
      const harbour = (await list(office, '/api/sites?search=harbour')).items[0]!;
      expect(harbour.customerName).toBe('Brightwater Dental Practice');
      expect(names(await list(office, '/api/sites?search=okonjo'))).toEqual(['Fernhill Close']);
      const okonjo = (await list(office, '/api/customers?search=okonjo')).items[0]!;
      expect(okonjo.sites).toEqual([{ id: expect.any(String), name: 'Fernhill Close' }]);
      // A save answers with the row as the next read gives it.
      const saved = (await t.http.patch(`/api/sites/${harbour.id}`).set(as(office)).send({ postcode: 'WM1 6QP' }).expect(200)).body;
      expect(saved.customerName).toBe('Brightwater Dental Practice');
    });

    it('filters by customer and searches name, address and postcode', async () => {
      expect(names(await list(office, `/api/sites?customerId=${seed.brightwater!.id}`))).toEqual(['Brightwater Dental, Harbour Yard']);
      expect(names(await list(office, '/api/sites?search=br2 8nt'))).toEqual(['Fernhill Close']);
      expect((await list(office, '/api/sites')).total).toBe(3);
    });

    it('creates and updates a site', async () => {
      const made = await create('/api/sites', { customerId: seed.greaves!.id, address: '2 Mill Lane, Wendmouth', earthing: 'TT', zeOhm: 21.5 });
      expect(made).toMatchObject({ customerId: seed.greaves!.id, address: '2 Mill Lane, Wendmouth', earthing: 'TT', zeOhm: 21.5, name: null });
      const changed = (await t.http.patch(`/api/sites/${made.id}`).set(as(office)).send({ name: 'Mill Lane', postcode: 'WM3 1AA' }).expect(200)).body;
      expect(changed).toMatchObject({ name: 'Mill Lane', postcode: 'WM3 1AA', earthing: 'TT' });
      expect(names(await list(office, `/api/sites?customerId=${seed.greaves!.id}`))).toEqual(['Mill Lane', 'Orchard Rise']);
    });
  });

  describe('areas', () => {
    it('filters by site and searches name and level', async () => {
      const orchard = await list(office, `/api/areas?siteId=${seed.orchard!.id}`);
      expect(names(orchard)).toEqual(expect.arrayContaining(['Cupboard under stairs', 'Front bedroom', 'Kitchen', 'Lounge']));
      expect(orchard.items.every((a) => a.siteId === seed.orchard!.id)).toBe(true);
      expect(names(await list(office, `/api/areas?siteId=${seed.harbour!.id}`))).toEqual(['Comms cupboard', 'Reception', 'Surgery 1']);
      expect(names(await list(office, '/api/areas?search=first'))).toEqual(['Front bedroom', 'Study']);
    });

    it('creates and updates an area, which stays on its site', async () => {
      const made = await create('/api/areas', { siteId: seed.harbour!.id, name: 'Surgery 2' });
      const changed = (await t.http.patch(`/api/areas/${made.id}`).set(as(office)).send({ level: 'Ground' }).expect(200)).body;
      expect(changed).toMatchObject({ siteId: seed.harbour!.id, name: 'Surgery 2', level: 'Ground' });
      const moved = await t.http.patch(`/api/areas/${made.id}`).set(as(office)).send({ siteId: seed.orchard!.id }).expect(400);
      expect(messages(moved.body)).toMatch(/siteId is not a field we accept/);
    });
  });

  describe('boards', () => {
    it('filters by site and searches name and description', async () => {
      expect(names(await list(office, `/api/boards?siteId=${seed.harbour!.id}`))).toEqual(['DB1']);
      expect(names(await list(office, '/api/boards?search=three-phase'))).toEqual(['DB1']);
      expect((await list(office, '/api/boards')).total).toBe(3);
    });

    it('creates and updates a board, whose area must be on its site', async () => {
      const made = await create('/api/boards', { siteId: seed.orchard!.id, areaId: seed.kitchen!.id, name: 'Garage sub-board' });
      expect(made).toMatchObject({ areaId: seed.kitchen!.id, name: 'Garage sub-board' });
      const changed = (await t.http.patch(`/api/boards/${made.id}`).set(as(office)).send({ description: '4-way RCBO', areaId: null }).expect(200)).body;
      expect(changed).toMatchObject({ description: '4-way RCBO', areaId: null });
      const elsewhere = await t.http.patch(`/api/boards/${made.id}`).set(as(office)).send({ areaId: seed.reception!.id }).expect(400);
      expect(messages(elsewhere.body)).toMatch(/areaId must be on this board's site/);
      await t.http.post('/api/boards').set(as(office)).send({ siteId: seed.harbour!.id, areaId: seed.kitchen!.id, name: 'DB2' }).expect(400);
    });
  });

  describe('circuits', () => {
    it('filters by site and board, sorts by board then way number, and searches', async () => {
      const orchard = await list(office, `/api/circuits?siteId=${seed.orchard!.id}`);
      expect(names(orchard, 'number')).toEqual(['1', '2', '3', '4']);
      expect(names(await list(office, `/api/circuits?boardId=${seed.harbourDb1!.id}`), 'number')).toEqual(['L1-3', 'L2-4']);
      expect(names(await list(office, '/api/circuits?search=cooker'), 'description')).toEqual(['Cooker']);
      expect((await list(office, `/api/circuits?siteId=${seed.orchard!.id}&boardId=${seed.harbourDb1!.id}`)).total).toBe(0);
    });

    it('creates and updates a circuit, whose board must be on its site', async () => {
      const made = await create('/api/circuits', {
        siteId: seed.orchard!.id, boardId: seed.orchardCu!.id, number: '10', description: 'Garden', kind: 'radial',
        deviceType: 'B', deviceRatingA: 16, rcdRatingMa: 30, liveCsaMm2: 2.5, cpcCsaMm2: 1.5,
      });
      expect(made).toMatchObject({ number: '10', kind: 'radial', deviceRatingA: 16 });
      // Way 10 comes after way 4, not after way 1.
      expect(names(await list(office, `/api/circuits?boardId=${seed.orchardCu!.id}`), 'number')).toEqual(['1', '2', '3', '4', '10']);
      const changed = (await t.http.patch(`/api/circuits/${made.id}`).set(as(office)).send({ deviceType: 'C', deviceRatingA: 20 }).expect(200)).body;
      expect(changed).toMatchObject({ deviceType: 'C', deviceRatingA: 20, description: 'Garden' });
      const res = await t.http.post('/api/circuits').set(as(office)).send({ siteId: seed.orchard!.id, boardId: seed.harbourDb1!.id, number: '11' }).expect(400);
      expect(messages(res.body)).toMatch(/boardId must be on this circuit's site/);
      await t.http.patch(`/api/circuits/${made.id}`).set(as(office)).send({ boardId: seed.harbourDb1!.id }).expect(400);
    });
  });

  describe('jobs', () => {
    it('filters by status, site and customer, and searches', async () => {
      expect(names(await list(office, '/api/jobs?status=booked'), 'reference').sort()).toEqual(['LED-0041', 'LED-0044', 'LED-0045']);
      expect(names(await list(office, `/api/jobs?siteId=${seed.orchard!.id}`), 'reference').sort()).toEqual(['LED-0033', 'LED-0041']);
      expect(names(await list(office, `/api/jobs?customerId=${seed.brightwater!.id}&status=on-site`), 'reference')).toEqual(['LED-0042']);
      expect(names(await list(office, '/api/jobs?search=led-0045'), 'reference')).toEqual(['LED-0045']);
      expect(names(await list(office, '/api/jobs?search=garden office'), 'reference')).toEqual(['LED-0045']);
    });

    it('creates a job, lists it first, and updates it', async () => {
      const made = await create('/api/jobs', { siteId: seed.harbour!.id, customerId: seed.brightwater!.id, title: 'Emergency lighting test', status: 'enquiry' });
      expect((await list(office, '/api/jobs')).items[0]!.id).toBe(made.id);
      const changed = (await t.http.patch(`/api/jobs/${made.id}`).set(as(office)).send({ status: 'booked', reference: 'LED-0050' }).expect(200)).body;
      expect(changed).toMatchObject({ status: 'booked', reference: 'LED-0050', title: 'Emergency lighting test' });
    });
  });

  describe('visits', () => {
    it('lists in schedule order and filters by job, site, technician and planned time', async () => {
      const all = await list(office, '/api/visits');
      const starts = names(all, 'plannedStart') as string[];
      expect(starts).toEqual([...starts].sort());
      expect(all.total).toBe(6);
      expect((await list(office, `/api/visits?jobId=${seed.harbourData!.id}`)).total).toBe(2);
      expect((await list(office, `/api/visits?siteId=${seed.harbour!.id}`)).items.every((v) => v.siteId === seed.harbour!.id)).toBe(true);
      const mine = await list(office, `/api/visits?technicianId=${tech1.user.id}`);
      expect(mine.total).toBe(2);
      expect(mine.items.every((v) => (v.technicianIds as string[]).includes(tech1.user.id))).toBe(true);
      expect((await list(office, `/api/visits?technicianId=${tech2.user.id}`)).total).toBe(5);

      const today = seed.orchardToday!.plannedStart as string;
      const day = today.slice(0, 10);
      const next = new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString();
      const onDay = await list(office, `/api/visits?from=${day}T00:00:00Z&to=${next}`);
      expect(names(onDay, 'plannedStart')).toEqual([`${day}T09:00:00.000Z`, `${day}T13:00:00.000Z`]);
      expect((await list(office, `/api/visits?from=${today}&to=${today}`)).total).toBe(0);
    });

    it("finds visits by their job's title or reference and their site's name", async () => {
      expect((await list(office, '/api/visits?search=LED-0042')).total).toBe(2);
      expect((await list(office, '/api/visits?search=electric fire')).items.map((v) => v.id)).toEqual([seed.orchardToday!.id]);
      expect((await list(office, '/api/visits?search=fernhill')).total).toBe(2);
    });

    it('creates a visit in UTC, updates it, and keeps it at its job’s site', async () => {
      const made = await create('/api/visits', {
        jobId: seed.harbourData!.id, siteId: seed.harbour!.id, technicianIds: [tech1.user.id],
        plannedStart: '2030-06-03T09:00:00+01:00', plannedEnd: '2030-06-03T12:00Z', status: 'planned',
      });
      expect(made).toMatchObject({ plannedStart: '2030-06-03T08:00:00.000Z', plannedEnd: '2030-06-03T12:00:00.000Z', technicianIds: [tech1.user.id] });
      const changed = (await t.http.patch(`/api/visits/${made.id}`).set(as(office)).send({ technicianIds: [tech1.user.id, tech2.user.id] }).expect(200)).body;
      expect(changed.technicianIds).toEqual([tech1.user.id, tech2.user.id]);
      expect((await list(office, '/api/visits')).items.at(-1)!.id).toBe(made.id);
      const wrongSite = await t.http.post('/api/visits').set(as(office)).send({ jobId: seed.harbourData!.id, siteId: seed.orchard!.id }).expect(400);
      expect(messages(wrongSite.body)).toMatch(/jobId must be on this visit's site/);
      await t.http.patch(`/api/visits/${made.id}`).set(as(office)).send({ jobId: seed.sockets!.id }).expect(400);
    });
  });

  describe('validation', () => {
    it.each([
      ['post', '/api/jobs', () => ({ siteId: seed.orchard!.id, customerId: seed.greaves!.id, title: 'x', status: 'finished' }), /status must be one of: enquiry, booked, on-site, paperwork, done, cancelled/],
      ['post', '/api/customers', () => ({ name: 'x'.repeat(201) }), /name must be at most 200 characters/],
      ['post', '/api/customers', () => ({ name: '   ' }), /name must not be empty/],
      ['post', '/api/customers', () => ({ name: 'Colour Co', colour: 'red' }), /colour is not a field we accept/],
      ['post', '/api/sites', () => ({ customerId: 'abc', address: '1 High St' }), /customerId must be the id of a customer/],
      ['post', '/api/sites', () => ({ customerId: seed.greaves!.id, address: '1 High St', zeOhm: '0.3' }), /zeOhm must be a number/],
      ['post', '/api/sites', () => ({ customerId: seed.greaves!.id, address: '1 High St', earthing: 'TN-C' }), /earthing must be one of: TN-C-S, TN-S, TT/],
      ['post', '/api/areas', () => ({ siteId: seed.orchard!.id }), /name is required/],
      ['post', '/api/circuits', () => ({ siteId: seed.orchard!.id, boardId: seed.orchardCu!.id, number: '12', deviceType: 'K' }), /deviceType must be one of/],
      ['patch', '/api/circuits/:id', () => ({ deviceRatingA: 0.1 }), /deviceRatingA must be at least 0.5/],
      ['patch', '/api/circuits/:id', () => ({ rcdRatingMa: 3001 }), /rcdRatingMa must be at most 3000/],
      ['patch', '/api/circuits/:id', () => ({ number: '123456789012345678901' }), /number must be at most 20 characters/],
      ['patch', '/api/visits/:id', () => ({ plannedStart: '2030-06-03' }), /plannedStart must be an ISO-8601 date and time/],
      ['patch', '/api/visits/:id', () => ({ plannedStart: '2030-06-03T09:00' }), /plannedStart must be an ISO-8601 date and time with its zone/],
      ['patch', '/api/visits/:id', () => ({ technicianIds: ['abc'] }), /technicianIds must be a list of user ids/],
      ['patch', '/api/visits/:id', () => ({ status: 'done' }), /status must be one of: planned, on-site, finished, cancelled/],
      ['patch', '/api/jobs/:id', () => ({ version: 99 }), /version is not a field we accept/],
      ['patch', '/api/jobs/:id', () => ({ title: null }), /job.title must not be empty/],
      ['patch', '/api/customers/:id', () => ({}), /Nothing to change/],
    ] as const)('%s %s answers 400 naming the field (%#)', async (method, path, body, expected) => {
      const resource = path.split('/')[2] as (typeof RESOURCES)[number];
      const res = await t.http[method](path.replace(':id', seed[resource]!.id)).set(as(office)).send(body()).expect(400);
      expectErrorBody(res.body, 400);
      expect(messages(res.body)).toMatch(expected);
    });

    it('checks list filters and ids in the path', async () => {
      for (const path of [
        '/api/jobs?status=finished', '/api/customers?pageSize=201', '/api/customers?page=0', '/api/visits?from=tomorrow',
        '/api/circuits?boardId=abc', '/api/visits?technicianId=abc', '/api/sites?colour=red', '/api/areas/not-a-uuid',
      ]) {
        const res = await t.http.get(path).set(as(office));
        expect([path, res.status]).toEqual([path, 400]);
      }
      const res = await t.http.get('/api/customers?pageSize=201').set(as(office)).expect(400);
      expect(messages(res.body)).toMatch(/pageSize must be at most 200/);
    });

    it('refuses a reference to a missing row or another organisation’s row with 400', async () => {
      const missing = await t.http.post('/api/sites').set(as(office)).send({ customerId: NOBODY, address: '1 High St' }).expect(400);
      expect(messages(missing.body)).toMatch(/site.customerId points at a customer that does not exist/);
      const foreign = await t.http.post('/api/areas').set(as(oakmere)).send({ siteId: seed.orchard!.id, name: 'Taken' }).expect(400);
      expect(messages(foreign.body)).toMatch(/area.siteId points at a site that does not exist/);
      const outsider = await t.http.patch(`/api/visits/${seed.orchardToday!.id}`).set(as(office)).send({ technicianIds: [oakmere.user.id] }).expect(400);
      expect(messages(outsider.body)).toMatch(/visit.technicianIds points at a user that does not exist/);
      const before = (await list(oakmere, '/api/jobs')).total;
      const jobs = await t.http.post('/api/jobs').set(as(oakmere)).send({ siteId: seed.orchard!.id, customerId: seed.greaves!.id, title: 'Poached' }).expect(400);
      expectErrorBody(jobs.body, 400);
      expect((await list(oakmere, '/api/jobs')).total).toBe(before);
    });
  });

  describe('organisations never see each other', () => {
    it.each(RESOURCES)("Oakmere sees none of Larkfield's %s and gets 404 for their ids", async (resource) => {
      // Oakmere has rows of its own (the demo's subcontractor works for both): none of them is one of Larkfield's.
      const larkfield = new Set((await list(office, `/api/${resource}?pageSize=200`)).items.map((r) => r.id));
      for (const query of ['?pageSize=200', '?search=a&pageSize=200']) {
        const theirs = (await list(oakmere, `/api/${resource}${query}`)).items.map((r) => r.id);
        expect(theirs.filter((id) => larkfield.has(id))).toEqual([]);
      }
      const id = seed[resource]!.id;
      const theirs = await t.http.get(`/api/${resource}/${id}`).set(as(oakmere)).expect(404);
      const none = await t.http.get(`/api/${resource}/${NOBODY}`).set(as(oakmere)).expect(404);
      expectErrorBody(theirs.body, 404);
      expect(theirs.body).toEqual(none.body);
      await t.http.patch(`/api/${resource}/${id}`).set(as(oakmere)).send(VALID_CHANGE[resource]).expect(404);
    });

    it("leaves Larkfield's rows as they were", async () => {
      for (const resource of RESOURCES) {
        const row = (await t.http.get(`/api/${resource}/${seed[resource]!.id}`).set(as(office)).expect(200)).body;
        for (const [field, value] of Object.entries(VALID_CHANGE[resource])) expect([resource, row[field]]).not.toEqual([resource, value]);
      }
    });
  });

  describe('through the sync engine', () => {
    it('makes an update visible to pull, with the new row and field versions', async () => {
      const before = (await t.http.get(`/api/circuits/${seed.orchardC1!.id}`).set(as(office)).expect(200)).body as Row;
      const after = (await t.http.patch(`/api/circuits/${seed.orchardC1!.id}`).set(as(office)).send({ description: 'Sockets, lounge and hall' }).expect(200)).body as Row;
      expect(after.version).toBeGreaterThan(before.version);
      expect(after.fieldVersions.description).toBe(after.version);
      expect(after.fieldVersions.number).toBe(before.fieldVersions.number);
      expect(after.updatedById).toBe(office.user.id);

      const pull = (await t.http.get('/api/sync/pull?checkpoint=0&deviceId=testdevice1').set(as(office)).expect(200)).body;
      const change = pull.changes.find((c: { entity: string; id: string }) => c.entity === 'circuit' && c.id === seed.orchardC1!.id);
      expect(change).toMatchObject({ deleted: false, version: after.version });
      expect(change.row).toMatchObject({ description: 'Sockets, lounge and hall', version: after.version });
      expect(change.row.fieldVersions.description).toBe(after.version);
    });

    it("reaches the assigned technician's device", async () => {
      const first = (await t.http.get('/api/sync/pull?checkpoint=0&deviceId=tech1phone').set(as(tech1)).expect(200)).body;
      const changed = (await t.http.patch(`/api/visits/${seed.orchardToday!.id}`).set(as(office)).send({ plannedEnd: '2030-01-01T13:00:00Z' }).expect(200)).body;
      const next = (await t.http.get(`/api/sync/pull?checkpoint=${first.checkpoint}&deviceId=tech1phone`).set(as(tech1)).expect(200)).body;
      expect(next.changes).toEqual([expect.objectContaining({ entity: 'visit', id: changed.id, version: changed.version })]);
      expect(next.changes[0].row.plannedEnd).toBe('2030-01-01T13:00:00.000Z');
    });

    it('neither lists, finds nor changes a deleted record', async () => {
      const area = await create('/api/areas', { siteId: seed.orchard!.id, name: 'Shed' });
      await push(office, { entity: 'area', id: area.id, baseVersion: area.version, delete: true });
      await t.http.get(`/api/areas/${area.id}`).set(as(office)).expect(404);
      await t.http.patch(`/api/areas/${area.id}`).set(as(office)).send({ name: 'Shed again' }).expect(404);
      expect((await list(office, '/api/areas?search=shed')).total).toBe(0);
      const board = await t.http.post('/api/boards').set(as(office)).send({ siteId: seed.orchard!.id, areaId: area.id, name: 'Shed board' }).expect(400);
      expect(messages(board.body)).toMatch(/board.areaId points at an area that does not exist/);
    });

    it('turns an edit of a record behind an issued document into a conflict, answering 409 naming the document', async () => {
      const job = await create('/api/jobs', { siteId: seed.orchard!.id, customerId: seed.greaves!.id, title: 'Cable survey', status: 'paperwork' });
      const visit = await create('/api/visits', { jobId: job.id, siteId: seed.orchard!.id, plannedStart: '2030-02-01T09:00:00Z', status: 'finished' });
      // The site's whole cable schedule, chosen at issue: this job's visit recorded none of them.
      const issued = (await t.http.post(`/api/jobs/${job.id}/documents`).set(as(office)).send({ kind: 'cabling-report', coverage: 'site' }).expect(201)).body;
      const cable = (await list(office, `/api/cable-runs?siteId=${seed.orchard!.id}`)).items.find((c) => c.label === 'OR-01')!;

      const res = await t.http.patch(`/api/cable-runs/${cable.id}`).set(as(office)).send({ endBDescription: 'Front bedroom, right of the window' }).expect(409);
      expectErrorBody(res.body, 409);
      expect(res.body.message).toBe(`This cableRun is printed on ${issued.number}, an issued document, so the change was not made; it waits beside the issued value for review. To correct it, revise ${issued.number}.`);
      expect(res.body).toMatchObject({ heldBy: issued.number, conflictIds: [expect.any(String)] });
      expect((await t.http.get(`/api/cable-runs/${cable.id}`).set(as(office)).expect(200)).body.endBDescription).toBe(cable.endBDescription);
      const conflict = (await t.http.get(`/api/conflicts/${res.body.conflictIds[0]}`).set(as(office)).expect(200)).body;
      expect(conflict).toMatchObject({ entity: 'cableRun', rowId: cable.id, field: 'endBDescription', reason: 'locked-by-document', discardedValue: 'Front bedroom, right of the window' });
      // The job and its visit are not printed on the report and can still change.
      await t.http.patch(`/api/visits/${visit.id}`).set(as(office)).send({ plannedStart: '2030-02-02T09:00:00Z' }).expect(200);
      await t.http.patch(`/api/jobs/${job.id}`).set(as(office)).send({ status: 'done' }).expect(200);
    });
  });
});
