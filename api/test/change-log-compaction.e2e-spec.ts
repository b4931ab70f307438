import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { Mutation } from '@wiretrail/core';
import { In } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { ChangeLogCompaction } from '../src/sync/change-log-compaction.js';
import { AppliedMutation, SyncChange, SyncCompaction } from '../src/sync/entities/sync-bookkeeping.entity.js';
import { DeviceMirror, mutation, pullPage, push, type Session } from './sync-helpers.js';
import { bearer, createTestApp, signIn, type TestApp } from './test-app.js';

const DAY_MS = 24 * 60 * 60 * 1000;
/** Past the default retention of 90 days (SYNC_RETENTION_DAYS). */
const PAST_RETENTION = () => new Date(Date.now() + 91 * DAY_MS);

describe('change log compaction', () => {
  let t: TestApp;
  let office: Session;
  let tech1: Session;
  let phone: DeviceMirror;
  let tablet: DeviceMirror;
  let recent: DeviceMirror;
  let siteId: string;
  let deletedArea: string;
  let editedRun: { id: string; version: number };
  let officeDeletedRun: string;
  /** Made on the phone and the tablet while they were out of signal, never sent before the compaction. */
  const phoneUnsent: Mutation[] = [];
  const tabletUnsent: Mutation[] = [];
  const newArea = uuidv7();
  const newRun = uuidv7();
  let unheardPush: Mutation;

  const tombstones = (organisationId: string) => t.dataSource.getRepository(SyncChange).count({ where: { organisationId, deleted: true } });

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech1 = await signIn(t, 'tech1@larkfield.example');
    phone = new DeviceMirror('tech1-phone-compaction');
    await phone.pullAll(t, tech1);
    siteId = phone.find('site')[0]!.id;

    // Rows the office will delete while the phone is away, and one the phone will edit meanwhile.
    deletedArea = uuidv7();
    officeDeletedRun = uuidv7();
    const runId = uuidv7();
    await push(t, tech1, 'tech1-phone-compaction', [
      mutation('area', deletedArea, { siteId, name: 'Old loft hatch' }),
      mutation('cableRun', officeDeletedRun, { siteId, label: 'X-99', medium: 'Cat6' }),
      mutation('cableRun', runId, { siteId, label: 'K-01', medium: 'Cat6A' }),
    ]);
    await phone.pullAll(t, tech1);
    editedRun = { id: runId, version: phone.one('cableRun', (r) => r.id === runId).version };
    tablet = new DeviceMirror('tech1-tablet-compaction');
    await tablet.pullAll(t, tech1);

    // Out of signal: what the phone and the tablet record waits on them.
    phoneUnsent.push(
      mutation('cableRun', editedRun.id, { label: 'K-01 kitchen', lengthM: 23.5 }, { baseVersion: editedRun.version }),
      mutation('area', newArea, { siteId, name: 'Garage' }),
      mutation('cableRun', newRun, { siteId, label: 'G-01', medium: 'Cat6A', endAAreaId: newArea }),
    );
    tabletUnsent.push(mutation('cableRun', editedRun.id, { endBDescription: 'Patch panel port 12' }, { baseVersion: editedRun.version }));

    // Meanwhile the office deletes two rows; a device that syncs after that is not held back by the compaction.
    const desk = new DeviceMirror('office-desk-compaction');
    await desk.pullAll(t, office);
    const deletes = await push(t, office, 'office-desk-compaction', [
      mutation('area', deletedArea, 'delete', { baseVersion: phone.one('area', (r) => r.id === deletedArea).version }),
      mutation('cableRun', officeDeletedRun, 'delete', { baseVersion: phone.one('cableRun', (r) => r.id === officeDeletedRun).version }),
    ]);
    expect(deletes.map((r) => r.status)).toEqual(['applied', 'applied']);
    await desk.pullAll(t, office);
    recent = new DeviceMirror('tech1-recent-compaction');
    await recent.pullAll(t, tech1);

    // A push whose answer never reached its device: its replay record must outlive the compaction.
    unheardPush = mutation('note', uuidv7(), { visitId: phone.find('visit')[0]!.id, siteId: phone.find('visit')[0]!.siteId as string, text: 'Sent, answer lost' });
    await push(t, tech1, 'tech1-unheard-compaction', [unheardPush]);
  });
  afterAll(() => t.close());

  it('keeps tombstones and every checkpoint within the retention period', async () => {
    const report = await t.app.get(ChangeLogCompaction).compact();
    expect(report).toMatchObject({ tombstones: 0, replayRecords: 0 });
    expect(await tombstones(tech1.user.organisationId)).toBe(2);
    expect((await pullPage(t, tech1, phone.deviceId, phone.checkpoint)).reset).toBeUndefined();
  });

  it('removes tombstones and heard replay records past the retention period, and keeps the unheard one', async () => {
    const heard = await t.dataSource.getRepository(AppliedMutation).countBy({ deviceId: In(['tech1-phone-compaction', 'office-desk-compaction', 'seed']) });
    expect(heard).toBeGreaterThan(0);
    const report = await t.app.get(ChangeLogCompaction).compact({ now: PAST_RETENTION() });
    expect(report.tombstones).toBe(2);
    expect(report.replayRecords).toBeGreaterThanOrEqual(heard);
    expect(await tombstones(tech1.user.organisationId)).toBe(0);
    expect(await t.dataSource.getRepository(AppliedMutation).countBy({ deviceId: In(['tech1-phone-compaction', 'office-desk-compaction', 'seed']) })).toBe(0);
    // The device that never pulled after its push may send it again: it gets the first answer, nothing applies twice.
    expect(await t.dataSource.getRepository(AppliedMutation).countBy({ mutationId: unheardPush.mutationId })).toBe(1);
    const [again] = await push(t, tech1, 'tech1-unheard-compaction', [unheardPush]);
    expect(again).toMatchObject({ status: 'applied' });
    expect(await t.dataSource.getRepository(SyncChange).countBy({ rowId: unheardPush.id })).toBe(1);
    const floor = await t.dataSource.getRepository(SyncCompaction).findOneByOrFail({ organisationId: tech1.user.organisationId });
    expect(floor.throughSeq).toBeGreaterThan(phone.checkpoint);
    expect(floor.throughSeq).toBeLessThanOrEqual(recent.checkpoint);
  });

  it('lets a device that synced since the deletions carry on from its checkpoint', async () => {
    const page = await pullPage(t, tech1, recent.deviceId, recent.checkpoint);
    expect(page.reset).toBeUndefined();
  });

  it('takes every unsent edit of a phone offline past the retention, pushed before it starts again', async () => {
    // The phone's order: push what waits, then pull.
    const results = await push(t, tech1, phone.deviceId, phoneUnsent);
    expect(results.map((r) => r.status)).toEqual(['applied', 'applied', 'applied']);
    const ghostBefore = phone.rows.has(`area:${deletedArea}`);
    expect(ghostBefore).toBe(true);
    const page = await pullPage(t, tech1, phone.deviceId, phone.checkpoint);
    expect(page).toMatchObject({ reset: true, checkpoint: 0, changes: [] });
    await phone.pullAll(t, tech1);
    // Starting again brings the edits as the server now has them, and none of the rows deleted meanwhile.
    expect(phone.one('cableRun', (r) => r.id === editedRun.id)).toMatchObject({ label: 'K-01 kitchen', lengthM: 23.5 });
    expect(phone.one('area', (r) => r.id === newArea)).toMatchObject({ name: 'Garage' });
    expect(phone.one('cableRun', (r) => r.id === newRun)).toMatchObject({ label: 'G-01', endAAreaId: newArea });
    expect(phone.rows.has(`area:${deletedArea}`)).toBe(false);
    expect(phone.rows.has(`cableRun:${officeDeletedRun}`)).toBe(false);
  });

  it('takes the unsent edit of a device told to start again before it pushed', async () => {
    expect(await pullPage(t, tech1, tablet.deviceId, tablet.checkpoint)).toMatchObject({ reset: true });
    await tablet.pullAll(t, tech1);
    expect(tablet.rows.has(`cableRun:${officeDeletedRun}`)).toBe(false);
    const [result] = await push(t, tech1, tablet.deviceId, tabletUnsent);
    expect(result!.status).toBe('applied');
    await tablet.pullAll(t, tech1);
    // Both devices' edits of the same cable run stand: different fields, each kept.
    expect(tablet.one('cableRun', (r) => r.id === editedRun.id)).toMatchObject({ label: 'K-01 kitchen', lengthM: 23.5, endBDescription: 'Patch panel port 12' });
  });

  it('runs on demand for an admin, for their own organisation only', async () => {
    const admin = await signIn(t, 'admin@larkfield.example');
    const res = await t.http.post('/api/sync/compaction').set(bearer(admin));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ tombstones: 0, replayRecords: 0 });
    expect(Date.parse(res.body.before)).toBeLessThan(Date.now() - 89 * DAY_MS);
    expect((await t.http.post('/api/sync/compaction').set(bearer(office))).status).toBe(403);
    expect((await t.http.post('/api/sync/compaction').set(bearer(tech1))).status).toBe(403);
  });
});
