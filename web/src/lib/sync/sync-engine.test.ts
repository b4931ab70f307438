import 'fake-indexeddb/auto';
import type { Change, FieldValue, Mutation, MutationResult, PullResponse, PushRequest, PushResponse, SyncedRow, SyncEntityName } from '@wiretrail/core';
import { MAX_CLOCK_AHEAD_MS, parseHlc } from '@wiretrail/core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiError, OfflineError } from '@/lib/api-client';
import { db } from '@/lib/db';
import { setSession } from '@/lib/session';
import { getEngineState } from './sync-state';
import { createRecord, saveRecord } from './local-write';
import { retryDelay, SyncEngine, type SyncTransport } from './sync-engine';

const USER = { id: 'u-tech-1', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000001';
const VISIT = '01900000-0000-7000-8000-000000000002';
const BOARD = '01900000-0000-7000-8000-000000000003';

interface ServerRow {
  entity: SyncEntityName;
  row: SyncedRow;
  seq: number;
  deleted: boolean;
}

/**
 * A small server in memory with the protocol's rules: replayed mutation ids return the stored result,
 * a field someone else changed since the device's base keeps the server's value ('merged'), versions come from one sequence.
 */
class FakeServer implements SyncTransport {
  seq = 0;
  rows = new Map<string, ServerRow>();
  results = new Map<string, MutationResult>();
  pushes: PushRequest[] = [];
  offline = false;
  /** Gives a reason to refuse a mutation for good. */
  refuse: (m: Mutation) => string | null = () => null;
  /** Runs while a pull is on the wire, before its answer arrives (like someone typing meanwhile). */
  duringPull: (() => Promise<void>) | null = null;
  resetNextPull = false;
  /** Rows that leave the device's scope on its next pull. */
  evicted = new Set<string>();
  /** Compacted up to here: a pull from an older checkpoint is told to start again, as the real server does. */
  floor = 0;
  resetsSent = 0;

  private key = (entity: string, id: string) => `${entity}:${id}`;
  private writer = new Map<string, string>();

  async push(request: PushRequest): Promise<PushResponse> {
    if (this.offline) throw new OfflineError();
    this.pushes.push(structuredClone(request));
    return { results: request.mutations.map((m) => this.apply(m)) };
  }

  private apply(m: Mutation): MutationResult {
    const stored = this.results.get(m.mutationId);
    if (stored) return stored;
    const reason = this.refuse(m);
    let result: MutationResult;
    if (reason) {
      result = { mutationId: m.mutationId, status: 'rejected', error: reason };
    } else {
      const k = this.key(m.entity, m.id);
      const current = this.rows.get(k);
      const version = ++this.seq;
      const row: SyncedRow = current ? structuredClone(current.row) : { id: m.id, version: 0, fieldVersions: {} };
      let lost = false;
      const device = m.hlc.split('-').at(-1);
      for (const [field, value] of Object.entries(m.set ?? {})) {
        // As on the server: one device's own changes follow one another and are never concurrent.
        if ((row.fieldVersions[field] ?? 0) > m.baseVersion && this.writer.get(`${k}|${field}`) !== device) {
          lost = true;
          continue;
        }
        row[field] = value;
        row.fieldVersions[field] = version;
        this.writer.set(`${k}|${field}`, device!);
      }
      row.version = version;
      this.rows.set(k, { entity: m.entity, row, seq: version, deleted: !!m.delete });
      result = { mutationId: m.mutationId, status: lost ? 'merged' : 'applied', version, fieldVersions: { ...row.fieldVersions } };
    }
    this.results.set(m.mutationId, result);
    return result;
  }

  /** An edit made at the office. */
  edit(entity: SyncEntityName, id: string, fields: Record<string, FieldValue>): void {
    const k = this.key(entity, id);
    const version = ++this.seq;
    const row: SyncedRow = this.rows.has(k) ? structuredClone(this.rows.get(k)!.row) : { id, version: 0, fieldVersions: {} };
    for (const [f, v] of Object.entries(fields)) {
      row[f] = v;
      row.fieldVersions[f] = version;
    }
    row.version = version;
    this.rows.set(k, { entity, row, seq: version, deleted: false });
  }

  /** A deletion at the office. */
  remove(entity: SyncEntityName, id: string): void {
    const r = this.rows.get(this.key(entity, id))!;
    r.seq = r.row.version = ++this.seq;
    r.deleted = true;
  }

  /** The tombstones leave the log once past the retention period. */
  compact(): void {
    for (const [k, r] of this.rows) {
      if (!r.deleted) continue;
      this.rows.delete(k);
      this.floor = Math.max(this.floor, r.seq);
    }
  }

  evict(entity: SyncEntityName, id: string): void {
    this.evicted.add(this.key(entity, id));
    this.rows.get(this.key(entity, id))!.seq = ++this.seq;
  }

  row(entity: SyncEntityName, id: string): SyncedRow | undefined {
    return this.rows.get(this.key(entity, id))?.row;
  }

  async pull({ checkpoint, limit }: { checkpoint: number; limit: number; deviceId: string }): Promise<PullResponse> {
    if (this.offline) throw new OfflineError();
    if (this.duringPull) {
      const run = this.duringPull;
      this.duringPull = null;
      await run();
    }
    if (this.resetNextPull || (checkpoint > 0 && checkpoint < this.floor)) {
      this.resetNextPull = false;
      this.resetsSent++;
      return { changes: [], checkpoint: 0, hasMore: false, reset: true };
    }
    const after = [...this.rows.entries()].filter(([, r]) => r.seq > checkpoint).sort((a, b) => a[1].seq - b[1].seq);
    const page = after.slice(0, limit);
    const changes: Change[] = page.map(([k, r]) => {
      const gone = r.deleted || this.evicted.has(k);
      return { entity: r.entity, id: r.row.id, version: r.row.version, deleted: gone, row: gone ? null : structuredClone(r.row) };
    });
    return { changes, checkpoint: page.length ? page[page.length - 1]![1].seq : checkpoint, hasMore: after.length > limit };
  }
}

let server: FakeServer;
let scheduled: { run: () => void; ms: number }[];

function makeEngine(transport: SyncTransport = server) {
  return new SyncEngine({
    db,
    transport,
    userId: USER.id,
    timers: {
      set: (run, ms) => scheduled.push({ run, ms }),
      clear: () => undefined,
    },
  });
}

const note = (text: string) => createRecord('note', { visitId: VISIT, siteId: SITE, text });

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
  server = new FakeServer();
  scheduled = [];
});

afterEach(() => {
  setSession(null);
});

describe('sync engine: push', () => {
  it('sends the outbox, removes what the server acknowledged and keeps the new versions as the next base', async () => {
    const id = await note('Ring final in kitchen extended by 4 m');
    await createRecord('circuit', { siteId: SITE, boardId: BOARD, number: '3', description: 'Kitchen sockets', kind: 'ring' });
    expect(await db.outbox.count()).toBe(2);

    await expect(makeEngine().syncNow()).resolves.toBe('done');

    expect(await db.outbox.count()).toBe(0);
    const local = await db.note.get(id);
    const remote = server.row('note', id)!;
    expect(remote.text).toBe('Ring final in kitchen extended by 4 m');
    expect(local?._base.version).toBe(remote.version);
    expect(local?._base.fieldVersions.text).toBe(remote.fieldVersions.text);
    expect(await db.getMeta('lastSyncAt')).toBeTruthy();
    expect(await db.getMeta('lastError')).toBeNull();

    // A later edit rests on what this phone last pulled; the server knows its own earlier change came first.
    await saveRecord('note', id, { text: 'Ring final in kitchen extended by 4.5 m' });
    expect((await db.outbox.toArray())[0]?.baseVersion).toBe(local?._base.version);
    await makeEngine().syncNow();
    expect(server.row('note', id)!.text).toBe('Ring final in kitchen extended by 4.5 m');
  });

  it('sends photo bytes before the rows, and runs another round at once while photos remain', async () => {
    await note('Back box fixed; photo taken');
    const order: string[] = [];
    const transport: SyncTransport = {
      push: async (request) => {
        order.push('push');
        return server.push(request);
      },
      pull: async (params) => {
        order.push('pull');
        return server.pull(params);
      },
    };
    let rounds = 0;
    const engine = new SyncEngine({
      db,
      transport,
      userId: USER.id,
      timers: { set: (run, ms) => scheduled.push({ run, ms }), clear: () => undefined },
      beforePush: async () => {
        order.push('photos');
        return ++rounds < 2;
      },
    });
    await expect(engine.syncNow()).resolves.toBe('done');
    expect(order).toEqual(['photos', 'push', 'pull', 'photos', 'pull']);
  });

  it('sends a second change to the same row on the base of the first, and the server applies both in order', async () => {
    const id = await note('first');
    await saveRecord('note', id, { text: 'second' });
    await makeEngine().syncNow();
    expect(server.pushes.flatMap((p) => p.mutations).map((m) => m.baseVersion)).toEqual([0, 0]);
    expect(server.row('note', id)!.text).toBe('second');
    expect((await db.note.get(id))?.text).toBe('second');
  });

  it('moves a refused change to the failed list with its reason, and still sends those after it', async () => {
    server.refuse = (m) => (m.set?.text === 'refuse me' ? 'note.visitId is not one of your visits' : null);
    const bad = await note('refuse me');
    const good = await note('Board labels photographed');
    await makeEngine().syncNow();

    expect(await db.outbox.count()).toBe(0);
    const failed = await db.failed.toArray();
    expect(failed).toHaveLength(1);
    expect(failed[0]).toMatchObject({ id: bad, entity: 'note', error: 'note.visitId is not one of your visits', set: { text: 'refuse me' } });
    // Never reached the server: the row goes, what was typed stays in the failed list.
    expect(await db.note.get(bad)).toBeUndefined();
    expect(server.row('note', good)?.text).toBe('Board labels photographed');
  });

  it('halves the batch when the server says it is too big', async () => {
    for (let i = 0; i < 6; i++) await note(`note ${i}`);
    let calls = 0;
    const transport: SyncTransport = {
      push: async (req) => {
        calls++;
        if (req.mutations.length > 2) throw new ApiError(413, ['At most 2 changes per batch.']);
        return server.push(req);
      },
      pull: (p) => server.pull(p),
    };
    await expect(makeEngine(transport).syncNow()).resolves.toBe('done');
    expect(await db.outbox.count()).toBe(0);
    expect(calls).toBeGreaterThan(3);
  });

  it('leaves everything in place when there is no signal, and tries again later with a growing wait', async () => {
    server.offline = true;
    const id = await note('Cupboard under stairs: no signal');
    const engine = makeEngine();

    await expect(engine.syncNow()).resolves.toBe('offline');
    expect(await db.note.get(id)).toBeTruthy();
    const [entry] = await db.outbox.toArray();
    expect(entry).toMatchObject({ id, attempts: 1 });
    expect(entry?.lastError).toMatch(/No signal/);
    expect(await db.getMeta('lastError')).toMatch(/No signal/);
    expect(scheduled).toHaveLength(1);
    expect(getEngineState().nextRetryAt).not.toBeNull();

    await engine.syncNow();
    expect(scheduled[1]!.ms).toBeGreaterThanOrEqual(scheduled[0]!.ms * 1.2);

    // The signal comes back and the scheduled retry goes through.
    server.offline = false;
    scheduled.at(-1)!.run();
    await expect(engine.syncNow()).resolves.toBe('done');
    expect(await db.outbox.count()).toBe(0);
    expect(server.row('note', id)?.text).toBe('Cupboard under stairs: no signal');
    expect(await db.getMeta('lastError')).toBeNull();
  });

  it('stops without retrying when the sign-in has ended, keeping the outbox for the next sign-in', async () => {
    const id = await note('kept for later');
    const transport: SyncTransport = {
      push: async () => {
        throw new ApiError(401, ['Your session has ended.']);
      },
      pull: (p) => server.pull(p),
    };
    await expect(makeEngine(transport).syncNow()).resolves.toBe('signed-out');
    expect(scheduled).toHaveLength(0);
    expect(await db.outbox.count()).toBe(1);
    expect(await db.getMeta('lastError')).toMatch(/Sign in again/);

    await expect(makeEngine().syncNow()).resolves.toBe('done');
    expect(server.row('note', id)?.text).toBe('kept for later');
  });

  it('shows the office system’s word that the phone’s clock is ahead, keeps the changes, and restamps them once the clock is right', async () => {
    const realNow = Date.now;
    const ahead = realNow() + 3 * 86_400_000;
    Date.now = () => ahead;
    let id: string;
    try {
      id = await note('Written while the phone thought it was Thursday');
    } finally {
      Date.now = realNow;
    }
    const clockRefusal = "This phone's clock is ahead of the office system's by more than 5 minutes. Set the phone's date and time to automatic, then sync again.";
    const phoneClock = { now: ahead };
    const transport: SyncTransport = {
      push: async (request) => {
        const far = request.mutations.some((m) => Date.parse(m.hlc.slice(0, 24)) > realNow() + MAX_CLOCK_AHEAD_MS);
        if (far) throw new ApiError(422, [clockRefusal]);
        return server.push(request);
      },
      pull: (p) => server.pull(p),
    };
    const engine = (now: () => number) => new SyncEngine({ db, transport, userId: USER.id, now, timers: { set: (run, ms) => scheduled.push({ run, ms }), clear: () => undefined } });
    await expect(engine(() => phoneClock.now).syncNow()).resolves.toBe('failed');
    expect(await db.getMeta('lastError')).toContain(clockRefusal);
    expect(await db.outbox.count()).toBe(1);

    // The clock is put right: the change goes with a clock of now, and later ones follow it.
    await expect(engine(() => realNow()).syncNow()).resolves.toBe('done');
    expect(server.row('note', id)?.text).toBe('Written while the phone thought it was Thursday');
    const sent = server.pushes.at(-1)!.mutations[0]!;
    expect(Date.parse(sent.hlc.slice(0, 24))).toBeLessThanOrEqual(realNow());
    expect(Date.parse((await db.getMeta('hlc'))!.slice(0, 24))).toBeLessThanOrEqual(realNow());
  });

  it('syncs each person on a shared phone under a device id of their own', async () => {
    await note('First person');
    await makeEngine().syncNow();
    const firstDevice = server.pushes[0]!.deviceId;
    expect(parseHlc(server.pushes[0]!.mutations[0]!.hlc)?.deviceId).toBe(firstDevice);

    const OTHER = { ...USER, id: 'u-tech-2', email: 'tech2@larkfield.example' };
    setSession({ accessToken: 'a', refreshToken: 'r', user: OTHER });
    await note('Second person');
    await new SyncEngine({ db, transport: server, userId: OTHER.id, timers: { set: () => undefined, clear: () => undefined } }).syncNow();
    const secondPush = server.pushes.at(-1)!;
    expect(secondPush.deviceId).not.toBe(firstDevice);
    expect(parseHlc(secondPush.mutations[0]!.hlc)?.deviceId).toBe(secondPush.deviceId);

    // The first person comes back to the same id.
    setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
    await note('First person again');
    await makeEngine().syncNow();
    expect(server.pushes.at(-1)!.deviceId).toBe(firstDevice);
  });

  it('backs off up to a few minutes', () => {
    const half = () => 0.5;
    expect(retryDelay(1, half)).toBe(5_000);
    expect(retryDelay(2, half)).toBe(10_000);
    expect(retryDelay(20, half)).toBe(5 * 60_000);
  });
});

describe('sync engine: pull', () => {
  const circuitId = '01900000-0000-7000-8000-0000000000c1';

  beforeEach(() => {
    server.edit('site', SITE, { customerId: '01900000-0000-7000-8000-0000000000a1', address: '14 Quarry Row, Wendmouth' });
    server.edit('board', BOARD, { siteId: SITE, name: 'Consumer unit' });
    server.edit('circuit', circuitId, { siteId: SITE, boardId: BOARD, number: '1', description: 'Sockets downstairs', kind: 'ring' });
  });

  it('brings the rows down, page by page', async () => {
    for (let i = 0; i < 1200; i++) server.edit('area', `01900000-0000-7000-8000-${String(i).padStart(12, '0')}`, { siteId: SITE, name: `Room ${i}` });
    await makeEngine().syncNow();
    expect(await db.area.count()).toBe(1200);
    expect((await db.circuit.get(circuitId))?.description).toBe('Sockets downstairs');
    expect(await db.getMeta('checkpoint')).toBe(server.seq);
  });

  describe('a first sync, which does not read back rows that cannot be on the phone', () => {
    const area = (i: number) => `01900000-0000-7000-8000-${String(i).padStart(12, '0')}`;
    /** The server's pulls, with `between` run once just before the second page is asked for. */
    const secondPage = (between: () => Promise<void>): SyncTransport => {
      let pulls = 0;
      return { push: (r) => server.push(r), pull: async (p) => (++pulls === 2 ? (await between(), server.pull(p)) : server.pull(p)) };
    };
    const newer = (i: number, name: string) => ({ id: area(i), siteId: SITE, name, _base: { version: 10_000, fieldVersions: {}, values: {} } });

    beforeEach(() => {
      for (let i = 0; i < 600; i++) server.edit('area', area(i), { siteId: SITE, name: `Room ${i}` });
    });

    it('still keeps a newer row that was on the phone before it began, and what is typed while it runs', async () => {
      await db.area.put(newer(550, 'Already here, newer'));
      let typed = '';
      let made = '';
      await makeEngine(secondPage(async () => {
        // A room from the first page is renamed at the office and on the phone: it comes again in the second.
        server.edit('area', area(10), { name: 'Renamed at the office' });
        await saveRecord('area', area(10), { name: 'Renamed on the phone' });
        typed = await note('Typed between two pages');
        // A room from the first page leaves this user's scope.
        server.evict('area', area(20));
        // A room made on the phone after the first page, that the office knows too (another tab sent it).
        made = await createRecord('area', { siteId: SITE, name: 'Made on the phone' });
        server.edit('area', made, { siteId: SITE, name: 'Named at the office' });
      })).syncNow();
      expect(await db.area.count()).toBe(600);
      expect(await db.area.get(area(20))).toBeUndefined();
      expect((await db.area.get(area(550)))?.name).toBe('Already here, newer');
      expect((await db.area.get(made))?.name).toBe('Made on the phone');
      expect(await db.area.get(area(10))).toMatchObject({ name: 'Renamed on the phone', _base: { values: { name: 'Renamed at the office' } } });
      expect((await db.note.get(typed))?.text).toBe('Typed between two pages');
      expect(await db.outbox.count()).toBe(3);
    });

    it('reads every row again once something else has synced between its pages, as another tab would', async () => {
      await makeEngine(secondPage(async () => {
        // Another tab's sync stores a later version of a row this page is about to bring, and its checkpoint.
        await db.area.put(newer(550, 'Stored by the other tab'));
        await db.setMeta('checkpoint', 9_999);
      })).syncNow();
      expect((await db.area.get(area(550)))?.name).toBe('Stored by the other tab');
      expect((await db.area.get(area(551)))?.name).toBe('Room 551');
    });
  });

  it('keeps the phone’s unsent value of a field and takes the server’s others; if the server keeps its own, the phone follows', async () => {
    await makeEngine().syncNow();
    // The office edits the circuit while the technician edits the same field on the phone.
    server.edit('circuit', circuitId, { description: 'Sockets ground floor', kind: 'radial' });
    server.duringPull = () => saveRecord('circuit', circuitId, { description: 'Sockets, lounge and hall' });
    await makeEngine().syncNow();

    let local = await db.circuit.get(circuitId);
    expect(local?.description).toBe('Sockets, lounge and hall');
    expect(local?.kind).toBe('radial');
    expect(local?._base.values.description).toBe('Sockets ground floor');
    expect(await db.outbox.count()).toBe(1);

    // Sent with the version the technician saw: the server sees the concurrent edit and keeps its own value.
    await makeEngine().syncNow();
    expect(server.pushes.at(-1)!.mutations[0]!.baseVersion).toBeLessThan(server.row('circuit', circuitId)!.fieldVersions.description!);
    local = await db.circuit.get(circuitId);
    expect(local?.description).toBe('Sockets ground floor');
    expect(local?._base.values).toEqual({});
    expect(await db.outbox.count()).toBe(0);
  });

  it('removes deleted and out-of-scope rows, except those with unsent changes', async () => {
    const otherCircuit = '01900000-0000-7000-8000-0000000000c2';
    server.edit('circuit', otherCircuit, { siteId: SITE, boardId: BOARD, number: '2', description: 'Lighting' });
    await makeEngine().syncNow();
    expect(await db.circuit.count()).toBe(2);

    server.evict('circuit', circuitId);
    server.evict('circuit', otherCircuit);
    server.duringPull = () => saveRecord('circuit', circuitId, { description: 'Changed in the loft' });
    await makeEngine().syncNow();

    expect(await db.circuit.get(otherCircuit)).toBeUndefined();
    expect((await db.circuit.get(circuitId))?.description).toBe('Changed in the loft');
    expect(await db.outbox.count()).toBe(1);
  });

  it('on reset clears the synced rows but keeps the outbox, then pulls everything again', async () => {
    await makeEngine().syncNow();
    await db.area.put({ id: '01900000-0000-7000-8000-0000000000f1', siteId: SITE, name: 'Gone from the server', _base: { version: 1, fieldVersions: {}, values: {} } });
    let pendingNote = '';
    server.resetNextPull = true;
    server.duringPull = async () => {
      pendingNote = await note('typed during the reset');
    };
    await makeEngine().syncNow();

    expect(await db.area.count()).toBe(0);
    expect((await db.circuit.get(circuitId))?.description).toBe('Sockets downstairs');
    expect(await db.note.get(pendingNote)).toBeTruthy();
    expect(await db.outbox.count()).toBe(1);
    await makeEngine().syncNow();
    expect(server.row('note', pendingNote)?.text).toBe('typed during the reset');
  });

  it('keeps every edit made offline past the retention period, sends it, and starts again without the rows deleted meanwhile', async () => {
    const loft = '01900000-0000-7000-8000-0000000000f3';
    const hall = '01900000-0000-7000-8000-0000000000f4';
    server.edit('area', loft, { siteId: SITE, name: 'Loft' });
    server.edit('area', hall, { siteId: SITE, name: 'Hall' });
    await makeEngine().syncNow();
    expect(await db.area.count()).toBe(2);

    // Months out of signal: everything recorded waits on the phone.
    server.offline = true;
    await saveRecord('circuit', circuitId, { description: 'Sockets downstairs, extended to the garage', lengthM: 31 });
    const noted = await note('Garage spur added from the ring');
    const garage = await createRecord('area', { siteId: SITE, name: 'Garage' });
    await saveRecord('area', hall, { level: 'Ground' });
    await expect(makeEngine().syncNow()).resolves.toBe('offline');
    expect(await db.outbox.count()).toBe(4);

    // Meanwhile the office deletes the loft, edits the circuit, and the tombstone is compacted away.
    server.remove('area', loft);
    server.edit('circuit', circuitId, { kind: 'radial' });
    server.compact();
    server.offline = false;
    let typedDuringReset = '';
    server.duringPull = async () => {
      typedDuringReset = await note('Typed while the phone started again');
    };
    await expect(makeEngine().syncNow()).resolves.toBe('done');

    expect(server.resetsSent).toBe(1);
    // Every edit made offline reached the server, beside the office's own change.
    expect(server.row('circuit', circuitId)).toMatchObject({ description: 'Sockets downstairs, extended to the garage', lengthM: 31, kind: 'radial' });
    expect(server.row('note', noted)?.text).toBe('Garage spur added from the ring');
    expect(server.row('area', garage)?.name).toBe('Garage');
    expect(server.row('area', hall)).toMatchObject({ name: 'Hall', level: 'Ground' });
    // The phone started again: the loft it never heard was deleted is gone, its own rows are there.
    expect(await db.area.get(loft)).toBeUndefined();
    expect(await db.area.get(garage)).toMatchObject({ name: 'Garage' });
    expect(await db.circuit.get(circuitId)).toMatchObject({ description: 'Sockets downstairs, extended to the garage', kind: 'radial' });
    // What was typed while it started again is kept and goes with the next round.
    expect(await db.note.get(typedDuringReset)).toMatchObject({ text: 'Typed while the phone started again' });
    expect(await db.outbox.count()).toBe(1);
    await makeEngine().syncNow();
    expect(server.row('note', typedDuringReset)?.text).toBe('Typed while the phone started again');
    expect(await db.outbox.count()).toBe(0);
  });

  it('clears the rows of a different user who used this phone before, but not the outbox', async () => {
    await makeEngine().syncNow();
    await db.setMeta('userId', 'someone-else');
    await db.outbox.add({
      mutationId: '01900000-0000-7000-8000-0000000000e1', entity: 'note', id: '01900000-0000-7000-8000-0000000000e2', baseVersion: 0,
      set: { visitId: VISIT, siteId: SITE, text: 'theirs' }, hlc: '2026-03-14T09:26:53.589Z-0001-d7f3', userId: 'someone-else',
      createdAt: new Date().toISOString(), attempts: 0,
    });
    server.edit('area', '01900000-0000-7000-8000-0000000000f2', { siteId: SITE, name: 'Loft' });
    await db.setMeta('checkpoint', server.seq);
    await makeEngine().syncNow();
    // Pulled again from the start for this user; the other user's change waits for them.
    expect(await db.circuit.count()).toBe(1);
    expect(await db.outbox.count()).toBe(1);
    expect(server.row('note', '01900000-0000-7000-8000-0000000000e2')).toBeUndefined();
  });
});
