import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { SyncedRow } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { bearer, noisyJpeg, sha256, upload } from './photo-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, signIn, type TestApp } from './test-app.js';

/** A photo's hash is no key to its bytes: only holding the bytes, or a photo on one's own sites, opens them. */
describe('photos by hash stay within the person’s sites', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let tech2: Session;
  let officeView: DeviceMirror;
  const visitOf = (title: string, who: Session) => {
    const job = officeView.one('job', (r) => r.title === title);
    return officeView.one('visit', (r) => r.jobId === job.id && (r.technicianIds as string[]).includes(who.user.id));
  };
  const photoRow = (visit: SyncedRow, hash: string, size: number) =>
    mutation('photo', uuidv7(), { visitId: visit.id, siteId: visit.siteId as string, caption: 'Board', sha256: hash, sizeBytes: size, uploadState: 'ready' });
  const missing = async (s: Session, hashes: string[]) => (await t.http.post('/api/blobs/missing').set(bearer(s)).send({ hashes }).expect(200)).body.missing;

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    tech2 = await signIn(t, 'tech2@larkfield.example');
    officeView = new DeviceMirror('photo-scope-desk');
    await officeView.pullAll(t, office);
  });
  afterAll(() => t.close());

  it('refuses a photo row naming bytes from outside the technician’s sites, tells them nothing of those bytes, and takes the row once they send the bytes', async () => {
    // Fernhill Close is tech2's alone; tech1 has never been there.
    const fernhill = visitOf('Power and AV points behind the new lounge TV', tech2);
    const orchard = visitOf('Move two lounge sockets and add a fused spur for an electric fire', tech1);
    const bytes = await noisyJpeg(320, 240);
    const hash = sha256(bytes);
    expect((await upload(t, tech2, bytes)).last.status).toBe(204);
    const [theirs] = await push(t, tech2, 'photo-scope-tech2', [photoRow(fernhill, hash, bytes.length)]);
    expect(theirs!.status).toBe('applied');

    // Someone who learnt the hash is told the server lacks it, as for any bytes they have not shown it.
    expect(await missing(tech1, [hash])).toEqual([hash]);
    expect(await missing(office, [hash])).toEqual([]);
    expect(await missing(tech2, [hash])).toEqual([]);

    const [forged] = await push(t, tech1, 'photo-scope-tech1', [photoRow(orchard, hash, bytes.length)]);
    expect(forged).toMatchObject({ status: 'rejected', error: 'That photo has not been sent from this phone. Send the photo itself, then its record.' });
    expect(officeView.find('photo', (r) => r.id === forged!.mutationId)).toHaveLength(0);

    // Holding the bytes is proof enough: sent again, they are not stored twice, and the row is taken and served.
    expect((await upload(t, tech1, bytes)).last.status).toBe(204);
    expect(await missing(tech1, [hash])).toEqual([]);
    const row = photoRow(orchard, hash, bytes.length);
    const [honest] = await push(t, tech1, 'photo-scope-tech1', [row]);
    expect(honest!.status).toBe('applied');
    await t.http.get(`/api/photos/${row.id}/thumb`).set(bearer(tech1)).expect(200);
  });

  it('lets a technician name bytes a photo on one of their own sites already shows', async () => {
    // Both technicians share tomorrow's practice visit: a photo tech2 took there is tech1's to see too.
    const job = officeView.one('job', (r) => r.title === 'Cat6 to reception and Surgery 1; trace the unlabelled runs');
    const onlyTech2 = officeView.one('visit', (r) => r.jobId === job.id && (r.technicianIds as string[]).join() === tech2.user.id);
    const shared = officeView.one('visit', (r) => r.jobId === job.id && (r.technicianIds as string[]).includes(tech1.user.id));
    const bytes = await noisyJpeg(300, 200);
    const hash = sha256(bytes);
    expect((await upload(t, tech2, bytes)).last.status).toBe(204);
    expect((await push(t, tech2, 'photo-scope-tech2', [photoRow(onlyTech2, hash, bytes.length)]))[0]!.status).toBe('applied');
    expect(await missing(tech1, [hash])).toEqual([]);
    expect((await push(t, tech1, 'photo-scope-tech1', [photoRow(shared, hash, bytes.length)]))[0]!.status).toBe('applied');
  });
});
