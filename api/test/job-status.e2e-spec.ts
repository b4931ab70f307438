import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { bearer, jobByReference } from './document-helpers.js';
import { fixedLine, issuedInvoice } from './invoice-helpers.js';
import { catchUp, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

const SIGNATURE = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 10"><path d="M1 1L9 9"/></svg>';

/**
 * A job's status follows its work: a visit booked, arrived at, signed off (from a phone's push too), the paperwork
 * issued and paid. The office may set any status by hand; it stands until the work moves again. Cancelled stays.
 */
describe('a job status follows the work', () => {
  let t: TestApp;
  let office: Session;
  let sam: Session;
  let fernhill: { id: string; siteId: string; customerId: string };
  let orchard: { id: string; siteId: string; customerId: string };

  const job = async (id: string) => (await t.http.get(`/api/jobs/${id}`).set(bearer(office)).expect(200)).body as { id: string; status: string; version: number; work: Record<string, number> };
  const newJob = async (title: string, status = 'enquiry', site = fernhill) =>
    (await t.http.post('/api/jobs').set(bearer(office)).send({ siteId: site.siteId, customerId: site.customerId, title, status }).expect(201)).body as { id: string };
  const book = async (jobId: string, plannedStart: string, site = fernhill) =>
    (await t.http.post('/api/visits').set(bearer(office)).send({ jobId, siteId: site.siteId, technicianIds: [sam.user.id], plannedStart, status: 'planned' }).expect(201)).body as { id: string; version: number };
  const visitVersion = async (id: string) => (await t.http.get(`/api/visits/${id}`).set(bearer(office)).expect(200)).body.version as number;
  /** Sam's phone: pulled first, as a phone does before it edits. */
  const samPushes = async (visitId: string, set: Record<string, unknown>) => {
    await catchUp(t, sam, 'sam-phone');
    const [r] = await push(t, sam, 'sam-phone', [mutation('visit', visitId, set as never, { baseVersion: await visitVersion(visitId), deviceId: 'sam-phone' })]);
    expect(r!.status).toBe('applied');
  };

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    sam = await signIn(t, 'tech1@larkfield.example');
    fernhill = await jobByReference(t, office, 'LED-0045');
    orchard = await jobByReference(t, office, 'LED-0033');
  });
  afterAll(() => t.close());

  it('moves from enquiry to booked, on site and paperwork as the visit is booked, arrived at and signed off on the phone', async () => {
    const { id } = await newJob('Outside light by the back door');
    expect((await job(id)).status).toBe('enquiry');

    const visit = await book(id, new Date(Date.now() + 86_400_000).toISOString());
    expect(await job(id)).toMatchObject({ status: 'booked', work: { plannedVisits: 1, onSiteVisits: 0, finishedVisits: 0 } });

    await samPushes(visit.id, { status: 'on-site', actualStart: new Date().toISOString() });
    expect(await job(id)).toMatchObject({ status: 'on-site', work: { plannedVisits: 0, onSiteVisits: 1 } });

    // The sign-off arrives by sync: the last open visit signed off puts the job in Paperwork.
    await samPushes(visit.id, { status: 'finished', actualEnd: new Date().toISOString(), workDescription: 'Outside light fitted.', signedByName: 'Sam Brannigan', signedAt: new Date().toISOString(), signatureSvg: SIGNATURE });
    expect(await job(id)).toMatchObject({ status: 'paperwork', work: { finishedVisits: 1, issuedDocuments: 0 } });
  });

  it('stays in Paperwork while an open visit or unpaid invoice remains, and is done when every issued document is out and every invoice paid', async () => {
    const { id } = await newJob('Cable survey of the lounge', 'enquiry', orchard);
    const first = await book(id, '2030-02-01T09:00:00Z', orchard);
    const second = await book(id, '2030-02-02T09:00:00Z', orchard);
    await samPushes(first.id, { status: 'finished', actualStart: '2030-02-01T09:00:00Z', actualEnd: '2030-02-01T10:00:00Z' });
    // One visit signed off and one to come: still booked.
    expect((await job(id)).status).toBe('booked');
    await samPushes(second.id, { status: 'finished', actualStart: '2030-02-02T09:00:00Z', actualEnd: '2030-02-02T10:00:00Z' });
    expect((await job(id)).status).toBe('paperwork');

    await t.http.post(`/api/jobs/${id}/documents`).set(bearer(office)).send({ kind: 'cabling-report', coverage: 'site' }).expect(201);
    expect(await job(id)).toMatchObject({ status: 'paperwork', work: { issuedDocuments: 1, issuedInvoices: 0 } });
    const inv = await issuedInvoice(t, office, id, [fixedLine('Cable survey', 9_000)]);
    expect(await job(id)).toMatchObject({ status: 'paperwork', work: { issuedInvoices: 1, unpaidInvoices: 1 } });
    await t.http.post(`/api/invoices/${inv.id}/payments`).set(bearer(office)).send({ amountMinor: 5_000, method: 'cash', receivedOn: inv.issueDate }).expect(201);
    expect((await job(id)).status).toBe('paperwork');
    // The last money in: done.
    await t.http.post(`/api/invoices/${inv.id}/payments`).set(bearer(office)).send({ amountMinor: inv.grossMinor - 5_000, method: 'bank-transfer', receivedOn: inv.issueDate }).expect(201);
    expect(await job(id)).toMatchObject({ status: 'done', work: { unpaidInvoices: 0 } });
  });

  it('keeps the office’s own status until the work moves again', async () => {
    const { id } = await newJob('Move the hall light switch');
    const visit = await book(id, '2030-03-01T09:00:00Z');
    expect((await job(id)).status).toBe('booked');
    // The office marks it by hand: an edit that is not the work moving leaves it so.
    await t.http.patch(`/api/jobs/${id}`).set(bearer(office)).send({ status: 'paperwork' }).expect(200);
    await t.http.patch(`/api/visits/${visit.id}`).set(bearer(office)).send({ plannedEnd: '2030-03-01T11:00:00Z' }).expect(200);
    await samPushes(visit.id, { cautionsReadAt: new Date().toISOString() });
    expect((await job(id)).status).toBe('paperwork');
    // Sam arrives: the work moved, and the status follows it again.
    await samPushes(visit.id, { status: 'on-site', actualStart: new Date().toISOString() });
    expect((await job(id)).status).toBe('on-site');
  });

  it('never moves a cancelled job', async () => {
    const { id } = await newJob('Garden lighting, not going ahead', 'cancelled');
    const visit = await book(id, '2030-04-01T09:00:00Z');
    await samPushes(visit.id, { status: 'on-site', actualStart: new Date().toISOString() });
    await samPushes(visit.id, { status: 'finished', actualEnd: new Date().toISOString() });
    expect((await job(id)).status).toBe('cancelled');
  });

  it('leaves cancelled visits out of the visit-date filter', async () => {
    const { id } = await newJob('Loft socket');
    const visit = await book(id, '2031-05-06T09:00:00Z');
    const found = async () => (await t.http.get('/api/jobs?from=2031-05-06T00:00:00Z&to=2031-05-07T00:00:00Z').set(bearer(office)).expect(200)).body.items.map((j: { id: string }) => j.id);
    expect(await found()).toEqual([id]);
    await t.http.patch(`/api/visits/${visit.id}`).set(bearer(office)).send({ status: 'cancelled' }).expect(200);
    expect(await found()).toEqual([]);
    // Its only visit cancelled, the job is an enquiry again.
    expect((await job(id)).status).toBe('enquiry');
  });
});
