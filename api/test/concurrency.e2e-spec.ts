import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { formatHlc, type Hlc, type Mutation, type MutationResult, tickHlc } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { DeviceMirror, pullPage, type Session, withoutOfficeOnly } from './sync-helpers.js';
import { addPerson, createTestApp, signIn, type TestApp } from './test-app.js';

/**
 * Twenty technicians on overlapping jobs sync at the same moment, over HTTP, round after round. No request may fail
 * (no SQLITE_BUSY reaching a client), no acknowledged write may go missing, and every phone ends with the server's rows.
 */
const TECHNICIANS = 20;
const ROUNDS = 4;

describe('twenty technicians syncing overlapping jobs at once', () => {
  let t: TestApp;
  let admin: Session;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await signIn(t, 'admin@larkfield.example');
  });
  afterAll(() => t.close());

  it('loses nothing and converges', async () => {
    const auth = { authorization: `Bearer ${admin.accessToken}` };
    const office = new DeviceMirror('concurrency-office');
    await office.pullAll(t, admin);
    const harbour = office.one('visit', (r) => (r.technicianIds as string[]).length === 2);
    const orchard = office.one('visit', (r) => r.status === 'planned' && r.siteId !== harbour.siteId && (r.plannedStart as string).startsWith(new Date().toISOString().slice(0, 10)));
    const shared = [harbour, orchard];

    // Twenty technicians, each on both visits, so every site is shared by all of them.
    const techs: Session[] = [];
    for (let i = 0; i < TECHNICIANS; i++) {
      const email = `load-tech-${i}@larkfield.example`;
      expect((await addPerson(t, admin, { email, name: `Load Tech ${i}`, role: 'technician' }, 'a-long-password')).status).toBe(201);
      techs.push(await signIn(t, email, 'a-long-password'));
    }
    for (const v of shared) {
      await t.http.patch(`/api/visits/${v.id}`).set(auth).send({ technicianIds: techs.map((s) => s.user.id) }).expect(200);
    }

    const phones = techs.map((s, i) => ({ s, mirror: new DeviceMirror(`load-phone-${i}`), clock: null as Hlc | null, acked: [] as Array<{ m: Mutation; r: MutationResult }> }));
    await Promise.all(phones.map((p) => p.mirror.pullAll(t, p.s)));
    const circuits = phones[0]!.mirror.find('circuit');
    expect(circuits.length).toBeGreaterThanOrEqual(6);

    const statuses: number[] = [];
    for (let round = 0; round < ROUNDS; round++) {
      await Promise.all(
        phones.map(async (p, i) => {
          const mutations: Mutation[] = [];
          const hlc = () => {
            p.clock = tickHlc(p.clock, Date.now(), p.mirror.deviceId);
            return formatHlc(p.clock);
          };
          for (const v of shared) {
            mutations.push({ mutationId: uuidv7(), entity: 'note', id: uuidv7(), baseVersion: 0, set: { visitId: v.id, siteId: v.siteId as string, text: `round ${round} from ${i}` }, hlc: hlc() });
          }
          // Everyone edits the same few circuits: plenty of concurrent edits of the same fields.
          for (const c of circuits.slice(0, 3)) {
            const local = p.mirror.rows.get(`circuit:${c.id}`)!;
            mutations.push({ mutationId: uuidv7(), entity: 'circuit', id: c.id, baseVersion: local.version, set: { description: `r${round} t${i}` }, hlc: hlc() });
          }
          const res = await t.http.post('/api/sync/push').set('authorization', `Bearer ${p.s.accessToken}`).send({ deviceId: p.mirror.deviceId, mutations });
          statuses.push(res.status);
          if (res.status === 200) (res.body.results as MutationResult[]).forEach((r, k) => p.acked.push({ m: mutations[k]!, r }));
          await p.mirror.pullAll(t, p.s);
        }),
      );
    }
    expect(statuses.filter((s) => s !== 200)).toEqual([]);

    await Promise.all(phones.map((p) => p.mirror.pullAll(t, p.s)));
    const truth = new DeviceMirror('concurrency-check');
    await truth.pullAll(t, admin);
    const conflicts = truth.find('conflict');
    for (const p of phones) {
      for (const { m, r } of p.acked) {
        expect(r.status).not.toBe('rejected');
        if (m.entity === 'note') {
          expect(truth.rows.get(`note:${m.id}`)?.text).toBe(m.set!.text);
        } else {
          // Every value sent is in the row or in a conflict about that field.
          const value = m.set!.description;
          const inRow = truth.rows.get(`circuit:${m.id}`)?.description === value;
          const inConflict = conflicts.some((c) => c.rowId === m.id && c.field === 'description' && (c.keptValue === value || c.discardedValue === value));
          expect(inRow || inConflict).toBe(true);
        }
      }
      // Each phone holds exactly the server's rows within its scope, less what a technician never receives.
      for (const [key, row] of p.mirror.rows) expect(withoutOfficeOnly(key, truth.rows.get(key))).toEqual(row);
    }
    expect(truth.find('note', (n) => String(n.text).startsWith('round '))).toHaveLength(TECHNICIANS * ROUNDS * shared.length);
    expect((await pullPage(t, techs[0]!, 'load-phone-0', phones[0]!.mirror.checkpoint)).changes).toEqual([]);
  }, 120_000);
});
