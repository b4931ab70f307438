import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { addDays, localDate } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { bearer, jobByReference } from './document-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

const SIGNATURE = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 100"><path d="M10 80 L 290 40" fill="none" stroke="#111" stroke-width="3"/></svg>';
const DAY_MS = 86_400_000;

/** The office's list of work to notify under the Building Regulations, worked out from what the phone recorded. */
describe('notifiable work', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let orchard: { siteId: string; customerId: string };
  const today = () => localDate(new Date(), 'Europe/London');

  /** A job whose one visit, signed `daysAgo` days ago, installed a new circuit (or, with `replaceBoard`, replaced the board). */
  async function jobWithNewWork(reference: string, daysAgo: number, replaceBoard = false): Promise<string> {
    const job = (await t.http.post('/api/jobs').set(bearer(office)).send({ siteId: orchard.siteId, customerId: orchard.customerId, reference, title: `Work for ${reference}`, status: 'on-site' }).expect(201)).body;
    const visitId = (await t.http.post('/api/visits').set(bearer(office)).send({ jobId: job.id, siteId: orchard.siteId, technicianIds: [tech1.user.id], plannedStart: new Date().toISOString(), status: 'on-site' }).expect(201)).body.id;
    const phone = new DeviceMirror(`tech1-${reference}`);
    await phone.pullAll(t, tech1);
    const visit = phone.one('visit', (v) => v.id === visitId);
    const board = phone.one('board', (b) => b.siteId === orchard.siteId);
    const signedAt = new Date(Date.now() - daysAgo * DAY_MS).toISOString();
    const results = await push(t, tech1, `tech1-${reference}`, [
      replaceBoard
        ? mutation('board', board.id, { replacedOnVisitId: visitId }, { baseVersion: board.version, deviceId: `tech1-${reference}` })
        : mutation('circuit', uuidv7(), { siteId: orchard.siteId, boardId: board.id, number: `N${reference.slice(-2)}`, description: 'Garden office radial', newOnVisitId: visitId }, { deviceId: `tech1-${reference}` }),
      mutation('visit', visitId, { status: 'finished', workDescription: 'New radial to the garden office.', signedByName: 'Sam Brannigan', signedAt, signatureSvg: SIGNATURE }, { baseVersion: visit.version, deviceId: `tech1-${reference}` }),
    ]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'applied']);
    return job.id as string;
  }

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    orchard = await jobByReference(t, office, 'LED-0033');
  });
  afterAll(() => t.close());

  it('lists a new circuit finished 40 days ago in England as overdue, first, with its rule, source and last day', async () => {
    const late = await jobWithNewWork('NW-0001', 40);
    const recent = await jobWithNewWork('NW-0002', 2, true);
    const res = await t.http.get('/api/notifiable-work').set(bearer(office)).expect(200);
    expect(res.body.nation).toBe('england');
    expect(res.body.caution).toContain('local building control body decide');
    const ids = (res.body.items as { jobId: string }[]).map((i) => i.jobId);
    expect(ids.indexOf(late)).toBe(0);
    const first = res.body.items[0];
    // The Building Regulations 2010, Schedule 4 and Approved Document P 2013 (incorporating 2016 amendments), section 2:
    // a new circuit is notifiable; reg 20, 30 days after completion (from memory).
    expect(first).toMatchObject({ reference: 'NW-0001', newCircuits: 1, boardReplaced: false, state: 'to-notify', overdue: true });
    expect(first.verdict).toMatchObject({ notifiable: true, daysAllowed: 30 });
    expect(first.verdict.reasons[0]).toMatchObject({ id: 'new-circuit', source: expect.stringContaining('Approved Document P') });
    expect(first.verdict.dueBy).toBe(addDays(first.completedOn, 30));
    const second = res.body.items.find((i: { jobId: string }) => i.jobId === recent);
    expect(second).toMatchObject({ boardReplaced: true, overdue: false, state: 'to-notify' });
    expect(second.verdict.reasons.map((r: { id: string }) => r.id)).toEqual(['board-replaced']);

    const overdue = await t.http.get('/api/notifiable-work?state=overdue').set(bearer(office)).expect(200);
    expect((overdue.body.items as { jobId: string }[]).map((i) => i.jobId)).toEqual([late]);
  });

  it('records the notification with the scheme’s reference, then the customer’s certificate, and refuses what cannot be', async () => {
    const jobId = await jobWithNewWork('NW-0003', 5);
    const refused = await t.http.patch(`/api/notifiable-work/${jobId}`).set(bearer(office)).send({ state: 'notified' }).expect(400);
    expect(JSON.stringify(refused.body.message)).toContain('schemeRef');
    const future = addDays(today(), 3);
    const early = await t.http.patch(`/api/notifiable-work/${jobId}`).set(bearer(office)).send({ state: 'notified', schemeRef: 'NT-1', notifiedOn: future }).expect(400);
    expect(JSON.stringify(early.body.message)).toContain('has not come yet');
    await t.http.patch(`/api/notifiable-work/${jobId}`).set(bearer(office)).send({ state: 'what' }).expect(400);

    const notified = await t.http.patch(`/api/notifiable-work/${jobId}`).set(bearer(office)).send({ state: 'notified', schemeRef: ' NT-884213 ', notifiedOn: today() }).expect(200);
    expect(notified.body).toMatchObject({ state: 'notified', schemeRef: 'NT-884213', notifiedOn: today(), overdue: false });
    const done = await t.http
      .patch(`/api/notifiable-work/${jobId}`)
      .set(bearer(office))
      .send({ state: 'certificate-received', schemeRef: 'NT-884213', notifiedOn: today(), certificateReceivedOn: today() })
      .expect(200);
    expect(done.body.state).toBe('certificate-received');
    const listed = await t.http.get('/api/notifiable-work?state=certificate-received').set(bearer(office)).expect(200);
    expect((listed.body.items as { jobId: string }[]).map((i) => i.jobId)).toContain(jobId);
  });

  it('says "not covered, check locally" for a contractor in Scotland rather than judging the work', async () => {
    const admin = await signIn(t, 'admin@larkfield.example');
    await t.http.patch(`/api/organisations/${admin.user.organisationId}`).set(bearer(admin)).send({ nation: 'scotland', competentPersonScheme: 'Example Scheme' }).expect(200);
    const res = await t.http.get('/api/notifiable-work').set(bearer(office)).expect(200);
    expect(res.body).toMatchObject({ nation: 'scotland', scheme: 'Example Scheme' });
    expect(res.body.items.length).toBeGreaterThan(0);
    for (const item of res.body.items) expect(item.verdict).toMatchObject({ covered: false, notifiable: null, dueBy: null, note: expect.stringContaining('check locally') });
    await t.http.patch(`/api/organisations/${admin.user.organisationId}`).set(bearer(admin)).send({ nation: 'wales-ish' }).expect(400);
    // An admin who leaves the scheme clears it.
    await t.http.patch(`/api/organisations/${admin.user.organisationId}`).set(bearer(admin)).send({ nation: 'england', competentPersonScheme: null }).expect(200);
    expect((await t.http.get('/api/notifiable-work').set(bearer(office)).expect(200)).body).toMatchObject({ nation: 'england', scheme: null });
  });

  it('is the office’s: technicians are refused, and another organisation sees none of it', async () => {
    await t.http.get('/api/notifiable-work').set(bearer(tech1)).expect(403);
    const other = await signIn(t, 'admin@oakmere.example');
    const res = await t.http.get('/api/notifiable-work').set(bearer(other)).expect(200);
    expect(res.body.items).toEqual([]);
    const larkfieldJob = (await t.http.get('/api/notifiable-work').set(bearer(office)).expect(200)).body.items[0].jobId;
    await t.http.patch(`/api/notifiable-work/${larkfieldJob}`).set(bearer(other)).send({ state: 'to-notify' }).expect(404);
  });
});
