import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { Session } from './sync-helpers.js';
import { bearer, createTestApp, expectErrorBody, messagesOf, signInAll, type TestApp } from './test-app.js';

type Job = { id: string; reference: string; status: string; customerName: string; siteName: string; nextVisitStart: string | null; technicianIds: string[]; visitCount: number };
type Page = { items: Job[]; total: number; page: number; pageSize: number };

const DAY = 86_400_000;

/**
 * The office's jobs table and board: server-side paging, sorting, search and filters, and the count per status.
 * The seed's jobs: LED-0041 booked (Greaves, Sam today 09:00), LED-0033 paperwork (Greaves, Aled's finished visit
 * six days ago), LED-0042 on site (Brightwater, Aled today 13:00, both tomorrow 08:30), LED-0044 booked (Okonjo,
 * Aled in three days), LED-0045 booked (Okonjo, the garden office radial: Aled's visit planned 40 days ago, not yet done).
 */
describe('the jobs list for the table and the board', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let tech2: Session;
  let oakmere: Session;
  let today: string;
  const customers: Record<string, string> = {};

  const as = bearer;
  const list = async (query: string, s = office): Promise<Page> => (await t.http.get(`/api/jobs?${query}`).set(as(s)).expect(200)).body;
  const refs = async (query: string) => (await list(query)).items.map((j) => j.reference);
  const day = (offset: number) => new Date(Date.parse(`${today}T00:00:00Z`) + offset * DAY).toISOString();

  beforeAll(async () => {
    t = await createTestApp();
    [office, tech1, tech2, oakmere] = await signInAll(t, 'office@larkfield.example', 'tech1@larkfield.example', 'tech2@larkfield.example', 'admin@oakmere.example');
    const sockets = (await list('search=LED-0041')).items[0]!;
    today = (sockets.nextVisitStart as string).slice(0, 10);
    for (const c of (await t.http.get('/api/customers').set(as(office)).expect(200)).body.items) customers[c.name] = c.id;
  });
  afterAll(() => t.close());

  it("gives each job its customer's and site's names, its next visit and who is booked", async () => {
    const harbour = (await list('search=LED-0042')).items[0]!;
    expect(harbour).toMatchObject({
      customerName: 'Brightwater Dental Practice', siteName: 'Brightwater Dental, Harbour Yard', status: 'on-site',
      nextVisitStart: `${today}T13:00:00.000Z`, visitCount: 2,
    });
    expect([...harbour.technicianIds].sort()).toEqual([tech1.user.id, tech2.user.id].sort());
    // A finished visit is not a next visit; a job without visits has none.
    expect((await list('search=LED-0033')).items[0]).toMatchObject({ nextVisitStart: null, visitCount: 1, technicianIds: [tech2.user.id] });
    // A visit not yet done is still the next one, however long ago it was planned.
    expect((await list('search=LED-0045')).items[0]).toMatchObject({ nextVisitStart: new Date(Date.parse(`${today}T09:00:00Z`) - 40 * DAY).toISOString(), visitCount: 1, technicianIds: [tech2.user.id] });
  });

  it('sorts by reference, title, status, customer and next visit, either way', async () => {
    expect(await refs('')).toEqual(['LED-0045', 'LED-0044', 'LED-0042', 'LED-0033', 'LED-0041']);
    expect(await refs('sort=reference')).toEqual(['LED-0033', 'LED-0041', 'LED-0042', 'LED-0044', 'LED-0045']);
    expect(await refs('sort=reference&direction=desc')).toEqual(['LED-0045', 'LED-0044', 'LED-0042', 'LED-0041', 'LED-0033']);
    expect(await refs('sort=title')).toEqual(['LED-0042', 'LED-0033', 'LED-0041', 'LED-0045', 'LED-0044']);
    // In the board's order: enquiry, booked, on site, paperwork; ties in the order the jobs were made.
    expect(await refs('sort=status')).toEqual(['LED-0041', 'LED-0044', 'LED-0045', 'LED-0042', 'LED-0033']);
    expect(await refs('sort=customer')).toEqual(['LED-0042', 'LED-0041', 'LED-0033', 'LED-0044', 'LED-0045']);
    // Jobs with nothing to visit come last either way.
    expect(await refs('sort=nextVisit')).toEqual(['LED-0045', 'LED-0041', 'LED-0042', 'LED-0044', 'LED-0033']);
    expect((await refs('sort=nextVisit&direction=desc')).slice(0, 3)).toEqual(['LED-0044', 'LED-0042', 'LED-0041']);
  });

  it('pages on the server', async () => {
    const third = await list('sort=reference&pageSize=2&page=3');
    expect(third).toMatchObject({ total: 5, page: 3, pageSize: 2 });
    expect(third.items.map((j) => j.reference)).toEqual(['LED-0045']);
    expect((await list('sort=reference&pageSize=2&page=9')).items).toEqual([]);
  });

  it("searches the reference, title, customer's name and site's address", async () => {
    expect(await refs('search=led-0033')).toEqual(['LED-0033']);
    expect(await refs('search=fused spur')).toEqual(['LED-0041']);
    expect(await refs('search=okonjo&sort=reference')).toEqual(['LED-0044', 'LED-0045']);
    expect(await refs('search=harbour yard')).toEqual(['LED-0042']);
    expect(await refs('search=BR2 8NT&sort=reference')).toEqual(['LED-0044', 'LED-0045']);
  });

  it('filters by status, customer, technician and the dates of visits', async () => {
    expect(await refs('status=booked&sort=reference')).toEqual(['LED-0041', 'LED-0044', 'LED-0045']);
    expect(await refs(`customerId=${customers['Hannah Greaves']}&sort=reference`)).toEqual(['LED-0033', 'LED-0041']);
    expect(await refs(`technicianId=${tech1.user.id}&sort=reference`)).toEqual(['LED-0041', 'LED-0042']);
    expect(await refs(`technicianId=${tech2.user.id}&sort=reference`)).toEqual(['LED-0033', 'LED-0042', 'LED-0044', 'LED-0045']);
    expect(await refs(`from=${day(0)}&to=${day(1)}&sort=reference`)).toEqual(['LED-0041', 'LED-0042']);
    expect(await refs(`from=${day(-7)}&to=${day(0)}`)).toEqual(['LED-0033']);
    expect(await refs(`from=${day(2)}&sort=reference`)).toEqual(['LED-0044']);
    // The technician and the dates must match the same visit: Sam is at the practice tomorrow, not in three days.
    expect(await refs(`technicianId=${tech1.user.id}&from=${day(1)}&to=${day(2)}`)).toEqual(['LED-0042']);
    expect(await refs(`technicianId=${tech1.user.id}&from=${day(3)}&to=${day(4)}`)).toEqual([]);
    expect(await refs(`status=booked&technicianId=${tech2.user.id}&customerId=${customers['Tom and Priya Okonjo']}&sort=reference`)).toEqual(['LED-0044', 'LED-0045']);
  });

  it('counts the jobs in each status under the same filters, for the board', async () => {
    const all = (await t.http.get('/api/jobs/status-counts').set(as(office)).expect(200)).body;
    expect(all).toEqual({ counts: { enquiry: 0, booked: 3, 'on-site': 1, paperwork: 1, done: 0, cancelled: 0 }, total: 5 });
    const sams = (await t.http.get(`/api/jobs/status-counts?technicianId=${tech1.user.id}`).set(as(office)).expect(200)).body;
    expect(sams).toEqual({ counts: { enquiry: 0, booked: 1, 'on-site': 1, paperwork: 0, done: 0, cancelled: 0 }, total: 2 });
    const searched = (await t.http.get('/api/jobs/status-counts?search=okonjo').set(as(office)).expect(200)).body;
    expect(searched.counts).toMatchObject({ enquiry: 0, booked: 2 });
  });

  it('moves a job to another status; the board counts and the phones follow', async () => {
    const job = (await list('search=LED-0044')).items[0]!;
    const moved = (await t.http.patch(`/api/jobs/${job.id}`).set(as(office)).send({ status: 'on-site' }).expect(200)).body;
    expect(moved.status).toBe('on-site');
    const counts = (await t.http.get('/api/jobs/status-counts').set(as(office)).expect(200)).body.counts;
    expect(counts).toMatchObject({ booked: 2, 'on-site': 2 });
    const pulled = (await t.http.get('/api/sync/pull?checkpoint=0&limit=1000&deviceId=jobs-list-tech2').set(as(tech2)).expect(200)).body;
    expect(pulled.changes.find((c: { entity: string; id: string }) => c.entity === 'job' && c.id === job.id).row.status).toBe('on-site');
    const wrong = await t.http.patch(`/api/jobs/${job.id}`).set(as(office)).send({ status: 'finished' }).expect(400);
    expect(messagesOf(wrong.body)).toMatch(/status must be one of: enquiry, booked, on-site, paperwork, done, cancelled/);
    await t.http.patch(`/api/jobs/${job.id}`).set(as(office)).send({ status: 'booked' }).expect(200);
  });

  it.each([
    ['/api/jobs?sort=colour', /sort must be one of: reference, title, status, customer, nextVisit, created/],
    ['/api/jobs?direction=up', /direction must be one of: asc, desc/],
    ['/api/jobs?from=tomorrow', /from must be an ISO-8601 date and time/],
    ['/api/jobs?technicianId=abc', /technicianId must be the id of a user/],
    ['/api/jobs?customerId=abc', /customerId must be the id of a customer/],
    ['/api/jobs/status-counts?status=booked', /status/],
    ['/api/jobs/status-counts?sort=title', /sort/],
  ])('%s answers 400 naming the field', async (path, expected) => {
    const res = await t.http.get(path).set(as(office)).expect(400);
    expectErrorBody(res.body, 400);
    expect(messagesOf(res.body)).toMatch(expected);
  });

  it("is for the office only and shows no other organisation's jobs", async () => {
    await t.http.get('/api/jobs/status-counts').set(as(tech1)).expect(403);
    await t.http.get('/api/jobs/status-counts').expect(401);
    const theirs = (await t.http.get('/api/jobs/status-counts').set(as(oakmere)).expect(200)).body;
    // Oakmere's one job, booked for the subcontractor both contractors share.
    expect(theirs).toEqual({ counts: { enquiry: 0, booked: 1, 'on-site': 0, paperwork: 0, done: 0, cancelled: 0 }, total: 1 });
    expect((await list(`technicianId=${tech1.user.id}`, oakmere)).total).toBe(0);
    expect((await list(`customerId=${customers['Hannah Greaves']}`, oakmere)).total).toBe(0);
    expect((await list('search=LED&sort=nextVisit', oakmere)).items).toEqual([]);
  });
});
