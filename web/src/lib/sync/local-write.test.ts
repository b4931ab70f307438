import 'fake-indexeddb/auto';
import { compareHlc, parseHlc } from '@wiretrail/core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { setSession } from '@/lib/session';
import { createRecord, createRecords, deleteRecord, LocalWriteError, saveRecord, subscribeLocalWrites } from './local-write';

const USER = { id: 'u-tech-1', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000001';
const VISIT = '01900000-0000-7000-8000-000000000002';

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
});

afterEach(() => setSession(null));

describe('local writes', () => {
  it('keeps the row and its outbox entry together, with a new id and a clock that only moves forward', async () => {
    let heard = 0;
    const stop = subscribeLocalWrites(() => heard++);
    const first = await createRecord('note', { visitId: VISIT, siteId: SITE, text: 'Isolated at the consumer unit, proved dead' });
    const second = await createRecord('note', { visitId: VISIT, siteId: SITE, text: 'Back-box fixed' });
    stop();

    expect(first < second).toBe(true);
    expect(await db.note.get(first)).toMatchObject({ text: 'Isolated at the consumer unit, proved dead', _base: { version: 0 } });
    const outbox = await db.outbox.orderBy('seq').toArray();
    expect(outbox.map((e) => [e.entity, e.id, e.baseVersion, e.userId])).toEqual([
      ['note', first, 0, USER.id],
      ['note', second, 0, USER.id],
    ]);
    // The phone's own time of recording travels with the row, so a trail keeps it whenever the row reaches the server.
    expect(outbox[0]!.set).toEqual({ visitId: VISIT, siteId: SITE, text: 'Isolated at the consumer unit, proved dead', recordedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/) });
    const deviceId = (await db.getMeta('deviceIds'))?.[USER.id];
    expect(deviceId).toEqual(expect.any(String));
    expect(parseHlc(outbox[0]!.hlc)?.deviceId).toBe(deviceId);
    expect(compareHlc(outbox[0]!.hlc, outbox[1]!.hlc)).toBe(-1);
    expect(await db.getMeta('hlc')).toBe(outbox[1]!.hlc);
    expect(heard).toBe(2);
  });

  it('stamps when a record was made once, at creation, and never on a later edit', async () => {
    const id = await createRecord('note', { visitId: VISIT, siteId: SITE, text: 'Floorboards lifted' });
    const made = (await db.note.get(id))!.recordedAt;
    expect(Date.parse(made!)).toBeLessThanOrEqual(Date.now());
    const circuit = await createRecord('circuit', { siteId: SITE, boardId: SITE, number: '9', recordedAt: '2026-12-03T10:06:00.000Z' });
    expect((await db.circuit.get(circuit))!.recordedAt).toBe('2026-12-03T10:06:00.000Z');
    await saveRecord('circuit', circuit, { description: 'Garage sockets' });
    expect((await db.outbox.orderBy('seq').last())!.set).toEqual({ description: 'Garage sockets' });
  });

  it('keeps nothing when the outbox entry cannot be written', async () => {
    const fail = () => {
      throw new Error('disk full');
    };
    db.outbox.hook('creating', fail);
    try {
      await expect(createRecord('note', { visitId: VISIT, siteId: SITE, text: 'lost?' })).rejects.toBeInstanceOf(LocalWriteError);
    } finally {
      db.outbox.hook('creating').unsubscribe(fail);
    }
    expect(await db.note.count()).toBe(0);
    expect(await db.outbox.count()).toBe(0);
  });

  it('refuses bad values and fields a technician may not set, before writing anything', async () => {
    await expect(createRecord('note', { visitId: VISIT, siteId: SITE, text: '  ' })).rejects.toThrow('note.text must not be empty');
    await expect(createRecord('circuit', { siteId: SITE, boardId: 'not-an-id', number: '1' })).rejects.toThrow(/boardId/);
    await expect(createRecord('circuit', { siteId: SITE, number: '1' })).rejects.toThrow('circuit.boardId must not be empty');
    await expect(createRecord('job', { siteId: SITE, customerId: SITE, title: 'Mine now' })).rejects.toThrow(/office/);
    expect(await db.outbox.count()).toBe(0);
  });

  it('creates several rows all at once or not at all', async () => {
    const board = '01900000-0000-7000-8000-0000000000b1';
    await expect(
      createRecords([
        { entity: 'board', id: board, fields: { siteId: SITE, name: 'Garage sub-board' } },
        { entity: 'circuit', fields: { siteId: SITE, boardId: board, number: '' } },
      ]),
    ).rejects.toThrow(/number/);
    expect(await db.board.count()).toBe(0);
    await createRecords([
      { entity: 'board', id: board, fields: { siteId: SITE, name: 'Garage sub-board' } },
      { entity: 'circuit', fields: { siteId: SITE, boardId: board, number: '1', kind: 'radial' } },
    ]);
    expect((await db.outbox.orderBy('seq').toArray()).map((e) => e.entity)).toEqual(['board', 'circuit']);
  });

  it('an edit sends only what changed, with the server version as its base, and remembers the server value', async () => {
    const id = '01900000-0000-7000-8000-0000000000c1';
    await db.circuit.put({ id, siteId: SITE, boardId: SITE, number: '1', description: 'Sockets', kind: 'ring', _base: { version: 7, fieldVersions: { description: 7 }, values: {} } });
    await saveRecord('circuit', id, { description: 'Sockets, kitchen', kind: 'ring' });
    await saveRecord('circuit', id, { description: 'Sockets, kitchen and utility' });
    const row = await db.circuit.get(id);
    expect(row?.description).toBe('Sockets, kitchen and utility');
    expect(row?._base.values).toEqual({ description: 'Sockets' });
    const outbox = await db.outbox.orderBy('seq').toArray();
    expect(outbox.map((e) => [e.baseVersion, e.set])).toEqual([
      [7, { description: 'Sockets, kitchen' }],
      [7, { description: 'Sockets, kitchen and utility' }],
    ]);
  });

  it('a deletion removes the row and keeps it in the outbox entry in case the server refuses', async () => {
    const id = await createRecord('note', { visitId: VISIT, siteId: SITE, text: 'wrong visit' });
    await deleteRecord('note', id);
    expect(await db.note.get(id)).toBeUndefined();
    const last = (await db.outbox.orderBy('seq').last())!;
    expect(last).toMatchObject({ id, delete: true, restore: { id, text: 'wrong visit' } });
  });

  it('needs someone signed in', async () => {
    setSession(null);
    await expect(createRecord('note', { visitId: VISIT, siteId: SITE, text: 'x' })).rejects.toThrow(/Sign in/);
  });
});
