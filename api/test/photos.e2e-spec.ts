import { beforeAll, describe, expect, it } from '@jest/globals';
import type { SyncedRow } from '@wiretrail/core';
import { existsSync } from 'node:fs';
import { readdir } from 'node:fs/promises';
import { dirname, join, relative, sep } from 'node:path';
import sharp from 'sharp';
import { v7 as uuidv7 } from 'uuid';
import { bearer, hasLocation, jpegWithLocation, sha256, upload } from './photo-helpers.js';
import { describePhotoStorage, type PhotoSuiteContext } from './photo-storage-suite.js';
import { type DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { expectErrorBody, signIn, type TestApp } from './test-app.js';

/** Photos on local disk (the default driver: photos/ beside the database), then what does not depend on the driver. */
describePhotoStorage(
  'local disk',
  {
    env: () => ({}),
    listKeys: async (organisationId) => {
      const dir = join(dirname(process.env.DATABASE_PATH!), 'photos', organisationId);
      if (!existsSync(dir)) return [];
      const files = (await readdir(dir, { recursive: true, withFileTypes: true })).filter((f) => f.isFile());
      return files.map((f) => relative(join(dir, '..'), join(f.parentPath, f.name)).split(sep).join('/'));
    },
  },
  (ctx) => describe('the photo trail and photo settings', () => trailTests(ctx)),
);

function trailTests(ctx: PhotoSuiteContext): void {
  let t: TestApp;
  let office: Session;
  let admin: Session;
  let tech1: Session;
  let tech2: Session;
  let officeView: DeviceMirror;
  const job = (title: string) => officeView.one('job', (r) => r.title === title);
  const trail = async (query: string, s: Session = office) => (await t.http.get(`/api/photos?${query}`).set(bearer(s)).expect(200)).body as { items: SyncedRow[]; total: number; page: number; pageSize: number };

  beforeAll(() => {
    ({ t, office, admin, tech1, tech2, officeView } = ctx);
  });

  it("lists a job's photos in the order they were taken, with who took them and their visit's time", async () => {
    const earlier = job('Extra double socket in the front bedroom');
    const page = await trail(`jobId=${earlier.id}`);
    expect(page).toMatchObject({ total: 3, page: 1, pageSize: 50 });
    expect(page.items.map((p) => p.caption)).toEqual([
      'Route chased down from the loft, inside the zone above the new box',
      'Box open before the accessory went on: ring in and out, CPCs sleeved',
      'Finished: twin socket-outlet, 450 mm to the centre of the box',
    ]);
    const visit = officeView.one('visit', (r) => r.jobId === earlier.id);
    for (const p of page.items) {
      expect(p).toMatchObject({ visitId: visit.id, createdById: tech2.user.id, createdByName: 'Aled Pryce', visitPlannedStart: visit.plannedStart, uploadState: 'ready', subjectType: 'pointChange' });
      expect(p).not.toHaveProperty('organisationId');
      expect(p).not.toHaveProperty('fieldMeta');
    }
    const second = await trail(`jobId=${earlier.id}&pageSize=2&page=2`);
    expect(second).toMatchObject({ total: 3, page: 2, pageSize: 2 });
    expect(second.items.map((p) => p.id)).toEqual([page.items[2]!.id]);
  });

  it('filters by visit, site, area, subject, tag, technician and caption', async () => {
    const harbour = officeView.one('site', (r) => r.name === 'Brightwater Dental, Harbour Yard');
    const comms = officeView.one('area', (r) => r.name === 'Comms cupboard');
    const runRc01 = officeView.one('cableRun', (r) => r.label === 'RC-01');
    expect((await trail(`siteId=${harbour.id}`)).items.map((p) => p.caption)).toEqual(expect.arrayContaining([
      'Runs entering the comms cupboard from the ceiling; two not yet identified',
      'Patch panel labelled RC-01 to RC-12; RC-01 and RC-02 patched to the switch',
    ]));
    expect((await trail(`areaId=${comms.id}`)).total).toBe(2);
    expect((await trail('tag=label')).items.map((p) => p.subjectId)).toEqual([runRc01.id]);
    expect((await trail(`subjectType=cableRun&subjectId=${runRc01.id}`)).total).toBe(1);
    expect((await trail('tag=before%20close-up')).total).toBe(1);
    const byTech2 = await trail(`technicianId=${tech2.user.id}`);
    expect(byTech2.total).toBeGreaterThanOrEqual(5);
    expect(byTech2.items.every((p) => p.createdById === tech2.user.id)).toBe(true);
    expect((await trail('search=patch%20panel')).total).toBe(1);
    const visitId = (await trail('tag=finished')).items[0]!.visitId as string;
    expect((await trail(`visitId=${visitId}`)).total).toBe(3);

    // A technician's own photo appears once it is pushed, under their name.
    const mine = officeView.one('visit', (r) => (r.technicianIds as string[]).includes(tech1.user.id) && r.siteId === officeView.one('site', (s) => s.name === 'Orchard Rise').id);
    const [result] = await push(t, tech1, 'tech1-trail-phone', [
      mutation('photo', uuidv7(), { visitId: mine.id, siteId: mine.siteId as string, caption: 'Lounge socket before the move', tags: ['before close-up'], takenAt: new Date().toISOString(), sha256: 'c'.repeat(64), uploadState: 'waiting' }),
    ]);
    expect(result!.status).toBe('applied');
    const byTech1 = await trail(`technicianId=${tech1.user.id}&search=lounge%20socket`);
    expect(byTech1.items.map((p) => [p.caption, p.uploadState, p.createdById])).toEqual([['Lounge socket before the move', 'waiting', tech1.user.id]]);
  });

  it('is for the office, and checks its filters', async () => {
    await t.http.get('/api/photos').set(bearer(tech1)).expect(403);
    await t.http.get('/api/photos').expect(401);
    const bad = await t.http.get('/api/photos?jobId=nope&subjectType=wall').set(bearer(office)).expect(400);
    expectErrorBody(bad.body, 400);
    expect(bad.body.message).toEqual(expect.arrayContaining(['jobId must be the id of a job', 'subjectType must be one of: cableRun, pointChange, circuit']));
    const oakmere = await signIn(t, 'admin@oakmere.example');
    expect((await trail('', oakmere)).total).toBe(0);
  });

  it('checks what a device asks about missing photos', async () => {
    for (const body of [{}, { hashes: 'abc' }, { hashes: ['A'.repeat(64)] }, { hashes: ['a'.repeat(63)] }, { hashes: Array.from({ length: 501 }, () => 'a'.repeat(64)) }]) {
      const res = await t.http.post('/api/blobs/missing').set(bearer(tech1)).send(body).expect(400);
      expectErrorBody(res.body, 400);
      expect(String(res.body.message)).toMatch(/hashes/);
    }
    await t.http.post('/api/blobs/missing').send({ hashes: [] }).expect(401);
    expect((await t.http.post('/api/blobs/missing').set(bearer(tech1)).send({ hashes: [] }).expect(200)).body).toEqual({ missing: [] });
  });

  it("keeps a photo's location in the sizes only when the organisation says so", async () => {
    const current = await t.http.get('/api/organisations/current').set(bearer(office)).expect(200);
    expect(current.body).toMatchObject({ photoTags: [], keepPhotoLocation: false });
    const displayOf = async (bytes: Buffer) => {
      expect((await upload(t, tech1, bytes)).last.status).toBe(204);
      const visit = officeView.one('visit', (r) => (r.technicianIds as string[]).includes(tech1.user.id) && r.jobId === job('Move two lounge sockets and add a fused spur for an electric fire').id);
      const id = uuidv7();
      await push(t, tech1, 'tech1-location-phone', [mutation('photo', id, { visitId: visit.id, siteId: visit.siteId as string, sha256: sha256(bytes) })]);
      return sharp((await t.http.get(`/api/photos/${id}/display`).set(bearer(office)).buffer(true).expect(200)).body as Buffer).metadata();
    };
    expect(hasLocation((await displayOf(await jpegWithLocation())).exif)).toBe(false);

    await t.http.patch(`/api/organisations/${admin.user.organisationId}`).set(bearer(office)).send({ keepPhotoLocation: true }).expect(403);
    const changed = await t.http
      .patch(`/api/organisations/${admin.user.organisationId}`)
      .set(bearer(admin))
      .send({ keepPhotoLocation: true, photoTags: [' meter tails ', 'fire stopping'] })
      .expect(200);
    expect(changed.body).toMatchObject({ keepPhotoLocation: true, photoTags: ['meter tails', 'fire stopping'] });
    expect(hasLocation((await displayOf(await jpegWithLocation())).exif)).toBe(true);

    for (const body of [{ photoTags: 'meter tails' }, { photoTags: ['x', 'x'] }, { photoTags: [''] }, { keepPhotoLocation: 'yes' }]) {
      const res = await t.http.patch(`/api/organisations/${admin.user.organisationId}`).set(bearer(admin)).send(body).expect(400);
      expect(String(res.body.message)).toMatch(/photoTags|keepPhotoLocation/);
    }
  });
}
