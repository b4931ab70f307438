import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createHash } from 'node:crypto';
import { ShareLink } from '../src/share-links/entities/share-link.entity.js';
import { asBytes, bearer, jobByReference, sha256 } from './document-helpers.js';
import { DeviceMirror, type Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

const tokenOf = (url: string) => /\/shared\/([A-Za-z0-9_-]{43})$/.exec(url)![1]!;

describe('customer share links', () => {
  let t: TestApp;
  let office: Session;
  let orchard: { id: string };
  let harbour: { id: string };
  let officeView: DeviceMirror;
  let orchardDocument: string;
  let harbourDocument: string;

  const make = (jobId: string, body: object = {}) => t.http.post(`/api/jobs/${jobId}/share-links`).set(bearer(office)).send(body);
  const shared = (token: string, rest = '') => t.http.get(`/api/shared/${token}${rest}`);

  beforeAll(async () => {
    t = await createTestApp({ PUBLIC_URL: 'https://larkfield.wiretrail.example' });
    office = await signIn(t, 'office@larkfield.example');
    orchard = await jobByReference(t, office, 'LED-0033');
    harbour = await jobByReference(t, office, 'LED-0042');
    officeView = new DeviceMirror('office-desk');
    await officeView.pullAll(t, office);
    const issue = async (jobId: string, kind: string) => (await t.http.post(`/api/jobs/${jobId}/documents`).set(bearer(office)).send({ kind }).expect(201)).body.id as string;
    orchardDocument = await issue(orchard.id, 'minor-works');
    harbourDocument = await issue(harbour.id, 'photo-record');
  });
  afterAll(() => t.close());

  const photosOf = (jobId: string) => {
    const visits = new Set(officeView.find('visit', (v) => v.jobId === jobId).map((v) => v.id));
    return officeView.find('photo', (p) => visits.has(p.visitId as string));
  };

  it("shows the customer their job's summary, photo trail and documents, and nothing else", async () => {
    const res = await make(orchard.id, { days: 7, label: 'For Hannah Greaves' }).expect(201);
    expect(res.body).toMatchObject({ jobId: orchard.id, label: 'For Hannah Greaves', state: 'active', openCount: 0 });
    expect(res.body.url).toMatch(/^https:\/\/larkfield\.wiretrail\.example\/shared\/[A-Za-z0-9_-]{43}$/);
    expect(Date.parse(res.body.expiresAt) - Date.now()).toBeGreaterThan(6.9 * 24 * 3600_000);
    const token = tokenOf(res.body.url);

    const view = (await shared(token).expect(200)).body;
    expect(view.job).toEqual({
      reference: 'LED-0033',
      title: 'Extra double socket in the front bedroom',
      status: 'paperwork',
      customerName: 'Hannah Greaves',
      siteAddress: '14 Orchard Rise, Wendmouth, WM2 4HD',
    });
    expect(view.contractor).toEqual({ name: 'Larkfield Electrical & Data', phone: '01632 960 418', email: 'office@larkfield.example' });
    expect(view.photos.map((p: { caption: string }) => p.caption)).toEqual([
      'Route chased down from the loft, inside the zone above the new box',
      'Box open before the accessory went on: ring in and out, CPCs sleeved',
      'Finished: twin socket-outlet, 450 mm to the centre of the box',
    ]);
    expect(view.photos[0]).toMatchObject({ area: 'Front bedroom', takenAt: expect.any(String), thumbUrl: `/api/shared/${token}/photos/${view.photos[0].id}/thumb` });
    expect(view.documents).toEqual([expect.objectContaining({ id: orchardDocument, number: 'MW-0001', kind: 'minor-works', pdfUrl: `/api/shared/${token}/documents/${orchardDocument}/pdf` })]);
    // Only what a customer should see: no ids of people, no notes, no readings, no organisation id.
    const body = JSON.stringify(view);
    expect(body).not.toContain(office.user.organisationId);
    expect(body).not.toContain(office.user.id);
    expect(body).not.toContain('zsOhm');

    const thumb = await t.http.get(view.photos[0].thumbUrl).buffer(true).parse(asBytes).expect(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const display = await t.http.get(view.photos[0].displayUrl).buffer(true).parse(asBytes).expect(200);
    expect((display.body as Buffer).length).toBeGreaterThan((thumb.body as Buffer).length);
    const pdf = await t.http.get(view.documents[0].pdfUrl).buffer(true).parse(asBytes).expect(200);
    expect(pdf.headers['content-disposition']).toBe('attachment; filename="MW-0001.pdf"');
    expect(sha256(pdf.body as Buffer)).toBe((await t.http.get(`/api/documents/${orchardDocument}`).set(bearer(office))).body.pdfSha256);

    const listed = (await t.http.get(`/api/jobs/${orchard.id}/share-links`).set(bearer(office)).expect(200)).body.items;
    expect(listed).toEqual([expect.objectContaining({ id: res.body.id, state: 'active', openCount: 1, lastOpenedAt: expect.any(String) })]);
    // The address is shown once, when the link is made; the list never carries it.
    expect(JSON.stringify(listed)).not.toContain(token);
    expect(listed[0].url).toBeUndefined();
  });

  it("cannot reach another job's photos or documents", async () => {
    const token = tokenOf((await make(orchard.id).expect(201)).body.url);
    const [harbourPhoto] = photosOf(harbour.id);
    expect(harbourPhoto).toBeDefined();
    for (const path of [`/photos/${harbourPhoto!.id}/thumb`, `/photos/${harbourPhoto!.id}/display`, `/documents/${harbourDocument}/pdf`]) {
      const res = await shared(token, path).expect(404);
      expectErrorBody(res.body, 404);
      expect(res.headers['content-type']).toMatch(/json/);
    }
    // Nor the original, which the office keeps to itself.
    const [orchardPhoto] = photosOf(orchard.id);
    await shared(token, `/photos/${orchardPhoto!.id}/original`).expect(404);
  });

  it('stops showing a photo voided on site, even to someone who kept its address', async () => {
    const token = tokenOf((await make(orchard.id).expect(201)).body.url);
    const view = (await shared(token).expect(200)).body;
    const photo = view.photos[1] as { id: string; thumbUrl: string; displayUrl: string };
    await t.http.get(photo.thumbUrl).expect(200);
    // As the row stands once the phone's void has synced.
    const setVoid = (voidedAt: string | null, voidReason: string | null) =>
      t.dataSource.createQueryBuilder().update('photo').set({ voidedAt, voidReason }).where('id = :id', { id: photo.id }).execute();
    await setVoid(new Date().toISOString(), 'Wrong board photographed');
    try {
      const after = (await shared(token).expect(200)).body;
      expect(after.photos.map((p: { id: string }) => p.id)).not.toContain(photo.id);
      for (const url of [photo.thumbUrl, photo.displayUrl]) expectErrorBody((await t.http.get(url).expect(404)).body, 404);
    } finally {
      await setVoid(null, null);
    }
  });

  it('stops working when revoked or expired, and says only that', async () => {
    const revoked = (await make(orchard.id).expect(201)).body;
    const token = tokenOf(revoked.url);
    const [photo] = photosOf(orchard.id);
    await shared(token).expect(200);
    const done = (await t.http.post(`/api/share-links/${revoked.id}/revoke`).set(bearer(office)).expect(200)).body;
    expect(done).toMatchObject({ id: revoked.id, state: 'revoked', revokedAt: expect.any(String) });
    for (const path of ['', `/photos/${photo!.id}/thumb`, `/documents/${orchardDocument}/pdf`]) {
      const res = await shared(token, path).expect(410);
      // The contractor's own contact, so the customer can ask for a new link; nothing of the job.
      expect(res.body).toEqual({
        statusCode: 410,
        message: 'This link has been withdrawn by the contractor. Ask them for a new one if you still need it. Larkfield Electrical & Data: 01632 960 418 · office@larkfield.example.',
        error: 'Gone',
      });
    }
    // Revoking again changes nothing.
    expect((await t.http.post(`/api/share-links/${revoked.id}/revoke`).set(bearer(office)).expect(200)).body.revokedAt).toBe(done.revokedAt);

    const expiring = (await make(orchard.id, { days: 1 }).expect(201)).body;
    await shared(tokenOf(expiring.url)).expect(200);
    // A day later.
    await t.dataSource.getRepository(ShareLink).update({ id: expiring.id }, { expiresAt: new Date(Date.now() - 1000) });
    const res = await shared(tokenOf(expiring.url)).expect(410);
    expect(res.body.message).toBe('This link has expired. Ask the contractor for a new one if you still need it. Larkfield Electrical & Data: 01632 960 418 · office@larkfield.example.');
    await shared(tokenOf(expiring.url), `/photos/${photo!.id}/display`).expect(410);
    const states = (await t.http.get(`/api/jobs/${orchard.id}/share-links`).set(bearer(office)).expect(200)).body.items.map((l: { id: string; state: string }) => [l.id, l.state]);
    expect(states).toEqual(expect.arrayContaining([[revoked.id, 'revoked'], [expiring.id, 'expired']]));
  });

  it('refuses made-up and mangled tokens without a hint of any job', async () => {
    for (const token of ['x'.repeat(43), 'short', `${'A'.repeat(42)}%21`]) {
      const res = await shared(token).expect(404);
      expect(res.body.message).toBe('This link is not valid. Check that it was copied whole, or ask the contractor for a new one.');
    }
  });

  it('stores only the sha256 of each token', async () => {
    const made = (await make(harbour.id).expect(201)).body;
    const token = tokenOf(made.url);
    const row = await t.dataSource.getRepository(ShareLink).findOneByOrFail({ id: made.id });
    expect(row.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    const raw = await t.dataSource.query('SELECT * FROM share_link');
    expect(JSON.stringify(raw)).not.toContain(token);
  });

  it('lets only the office of the organisation make, list and revoke links, with the days named when wrong', async () => {
    const oakmere = await signIn(t, 'admin@oakmere.example');
    const tech = await signIn(t, 'tech2@larkfield.example');
    const made = (await make(orchard.id).expect(201)).body;
    await t.http.post(`/api/jobs/${orchard.id}/share-links`).set(bearer(oakmere)).send({}).expect(404);
    await t.http.get(`/api/jobs/${orchard.id}/share-links`).set(bearer(oakmere)).expect(404);
    await t.http.post(`/api/share-links/${made.id}/revoke`).set(bearer(oakmere)).expect(404);
    await t.http.post(`/api/jobs/${orchard.id}/share-links`).set(bearer(tech)).send({}).expect(403);
    expect((await make(orchard.id, { days: 0 }).expect(400)).body.message).toEqual(['days must be at least 1']);
    expect((await make(orchard.id, { days: 2.5 }).expect(400)).body.message).toEqual(['days must be a whole number of days']);
    expect((await make(orchard.id, { days: 91 }).expect(400)).body.message).toEqual(['days must be at most 90']);
    // Still working after all that: Oakmere could not revoke it.
    await shared(tokenOf(made.url)).expect(200);
  });
});
