import { expect } from '@jest/globals';
import { formatHlc, type Hlc, type Mutation, type MutationResult, type PullResponse, type SyncedRow, tickHlc } from '@wiretrail/core';
import fc from 'fast-check';
import type { DataSource } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import type { AuthUser } from '../src/common/decorators/current-user.decorator.js';
import { Organisation } from '../src/organisations/entities/organisation.entity.js';
import { Person } from '../src/users/entities/person.entity.js';
import { User } from '../src/users/entities/user.entity.js';

/**
 * The convergence property, shared by the in-process test (convergence.e2e-spec.ts) and the one with two API
 * processes on one PostgreSQL database (postgres/two-instances.e2e-spec.ts).
 *
 * Several devices edit and delete the same rows offline while the network drops requests, drops replies,
 * duplicates them and delivers stale copies late. After everyone syncs on a good connection, every device must
 * hold exactly the server's rows, and the last value each device typed into a field must be in the final row,
 * in a Conflict row for that field, or have been replaced by someone whose device showed it to them first.
 */

/** How the test reaches a server: its sync calls, and a fresh organisation of an admin and two office users. */
/** An organisation of its own for one case: an admin and two office users, written straight to the database. */
export async function organisationOfThree(db: DataSource, name: string): Promise<AuthUser[]> {
  const orgs = db.getRepository(Organisation);
  const org = await orgs.save(orgs.create({ name, address: null, phone: null, email: null }));
  const users: AuthUser[] = [];
  for (const [i, role] of (['admin', 'office', 'office'] as const).entries()) {
    const repo = db.getRepository(User);
    const email = `user-${i}-${uuidv7()}@convergence.example`;
    const people = db.getRepository(Person);
    const person = await people.save(people.create({ email, passwordHash: 'x' }));
    const u = await repo.save(repo.create({ organisationId: org.id, personId: person.id, email, name: `User ${i}`, role, active: true, lastSignInAt: null }));
    users.push({ id: u.id, organisationId: org.id, role, email: u.email, name: u.name });
  }
  return users;
}

export interface SyncPort {
  newOrganisation(n: number): Promise<AuthUser[]>;
  push(user: AuthUser, deviceId: string, mutations: Mutation[]): Promise<{ results: MutationResult[] }>;
  pull(user: AuthUser, deviceId: string, checkpoint: number, limit: number): Promise<PullResponse>;
}

type Key = string; // `${entity}:${id}`
interface LocalRow { entity: string; fields: Record<string, unknown>; version: number }

/**
 * A device as the app keeps it: a shadow of the last server state of each row, the outbox of unsent changes,
 * and the visible rows, which are the shadow with the unsent changes replayed on top.
 */
export class DeviceModel {
  shadow = new Map<Key, LocalRow>();
  rows = new Map<Key, LocalRow>();
  outbox: Mutation[] = [];
  checkpoint = 0;
  clock: Hlc | null = null;
  typed = new Map<string, unknown>(); // `${key}|${field}` -> last value typed here
  delayed: Mutation[][] = [];

  /** Values this device saw in a field and then replaced with its own: a deliberate overwrite, not a loss. */
  constructor(readonly deviceId: string, readonly user: AuthUser, readonly replaced = new Set<string>()) {}

  private hlc(): string {
    this.clock = tickHlc(this.clock, Date.now(), this.deviceId);
    return formatHlc(this.clock);
  }

  /**
   * While a row has unsent changes, what the user sees rests on the base of the first of them; later pulls
   * update the shadow underneath, but the screen kept showing the unsent values. Claiming the newer base would
   * let this device overwrite values its user never saw.
   */
  private baseVersion(key: Key): number {
    const pending = this.outbox.find((m) => `${m.entity}:${m.id}` === key);
    return pending ? pending.baseVersion : (this.shadow.get(key)?.version ?? 0);
  }

  edit(key: Key, field: string, value: unknown): void {
    const row = this.rows.get(key);
    if (!row) return;
    this.replaced.add(`${key}|${field}|${JSON.stringify(row.fields[field])}`);
    this.typed.set(`${key}|${field}`, value);
    this.outbox.push({ mutationId: uuidv7(), entity: row.entity as Mutation['entity'], id: key.split(':')[1]!, baseVersion: this.baseVersion(key), set: { [field]: value as never }, hlc: this.hlc() });
    this.refresh(key);
  }

  remove(key: Key): void {
    const row = this.rows.get(key);
    if (!row) return;
    this.outbox.push({ mutationId: uuidv7(), entity: row.entity as Mutation['entity'], id: key.split(':')[1]!, baseVersion: this.baseVersion(key), delete: true, hlc: this.hlc() });
    this.refresh(key);
  }

  /** Visible row = shadow + unsent changes, in the order they were made. */
  private refresh(key: Key): void {
    const base = this.shadow.get(key);
    let row: LocalRow | undefined = base ? { ...base, fields: { ...base.fields } } : undefined;
    for (const m of this.outbox) {
      if (`${m.entity}:${m.id}` !== key) continue;
      if (m.delete) row = undefined;
      else if (row) Object.assign(row.fields, m.set);
    }
    if (row) this.rows.set(key, row);
    else this.rows.delete(key);
  }

  acknowledge(results: MutationResult[]): void {
    for (const r of results) {
      const i = this.outbox.findIndex((m) => m.mutationId === r.mutationId);
      if (i < 0) continue;
      const [m] = this.outbox.splice(i, 1);
      const key = `${m!.entity}:${m!.id}`;
      const shadow = this.shadow.get(key);
      // Applied as sent: the server now holds it, unless a pull already brought a newer state of the row.
      // The base version stays the one last pulled: the reply's version may include other devices' changes
      // that this device has not seen, and claiming it would hide them from the merge.
      if (r.status === 'applied' && r.version !== undefined && (!shadow || shadow.version <= r.version)) {
        if (m!.delete) this.shadow.delete(key);
        else if (shadow) this.shadow.set(key, { ...shadow, fields: { ...shadow.fields, ...m!.set } });
      }
      this.refresh(key);
    }
  }

  applyPull(page: PullResponse): void {
    if (page.reset) {
      this.shadow.clear();
      this.rows.clear();
      this.checkpoint = 0;
      return;
    }
    for (const c of page.changes) {
      const key = `${c.entity}:${c.id}`;
      if (c.deleted) this.shadow.delete(key);
      else this.shadow.set(key, { entity: c.entity, fields: stripBookkeeping(c.row!), version: c.version });
      this.refresh(key);
    }
    this.checkpoint = page.checkpoint;
  }
}

function stripBookkeeping(row: SyncedRow): Record<string, unknown> {
  const { id: _id, version: _v, fieldVersions: _f, createdAt: _c, updatedAt: _u, createdById: _cb, updatedById: _ub, ...fields } = row;
  return fields;
}

export type Fault = 'ok' | 'drop-request' | 'drop-reply' | 'duplicate' | 'late-copy';
export type Step =
  | { kind: 'edit'; device: number; row: number; field: number; value: number }
  | { kind: 'delete'; device: number; row: number }
  | { kind: 'sync'; device: number; push: Fault; pull: Fault };

const FIELDS = [
  { entity: 'circuit', field: 'description' },
  { entity: 'circuit', field: 'deviceRatingA' },
  { entity: 'customer', field: 'phone' },
  { entity: 'customer', field: 'name' },
] as const;

/**
 * One case: three devices (two office users and the admin) over the port. With `concurrent`, each device works
 * through its own steps at the same time as the others, so pushes and pulls overlap on the server.
 */
export function convergenceProperty(port: SyncPort, options: { concurrent?: boolean } = {}) {
  let n = 0;
  const fault = fc.constantFrom<Fault>('ok', 'drop-request', 'drop-reply', 'duplicate', 'late-copy');
  const step: fc.Arbitrary<Step> = fc.oneof(
    { weight: 5, arbitrary: fc.record({ kind: fc.constant('edit' as const), device: fc.nat(2), row: fc.nat(2), field: fc.nat(3), value: fc.nat(5) }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant('delete' as const), device: fc.nat(2), row: fc.nat(2) }) },
    { weight: 3, arbitrary: fc.record({ kind: fc.constant('sync' as const), device: fc.nat(2), push: fault, pull: fault }) },
  );

  async function seedRows(admin: AuthUser): Promise<Key[]> {
    const customer = uuidv7();
    const site = uuidv7();
    const board = uuidv7();
    const circuits = [uuidv7(), uuidv7()];
    const setup = `setup-${n}`;
    const hlc = formatHlc({ ms: Date.now(), counter: 0, deviceId: setup });
    const m = (entity: Mutation['entity'], id: string, set: Mutation['set']): Mutation => ({ mutationId: uuidv7(), entity, id, baseVersion: 0, set, hlc });
    const { results } = await port.push(admin, setup, [
      m('customer', customer, { name: 'Start', phone: '0' }),
      m('site', site, { customerId: customer, address: '1 Model Row' }),
      m('board', board, { siteId: site, name: 'CU' }),
      ...circuits.map((c, i) => m('circuit', c, { siteId: site, boardId: board, number: String(i + 1), description: 'start', deviceRatingA: 32 })),
    ]);
    expect(results.every((r) => r.status === 'applied')).toBe(true);
    return [`customer:${customer}`, ...circuits.map((c) => `circuit:${c}`)];
  }

  async function pullAll(d: DeviceModel, f: Fault = 'ok'): Promise<void> {
    for (let i = 0; i < 50; i++) {
      const page = await port.pull(d.user, d.deviceId, d.checkpoint, 3);
      if (f === 'drop-reply') return;
      d.applyPull(page);
      if (!page.hasMore && !page.reset) return;
    }
    throw new Error('pull did not finish');
  }

  async function pushOutbox(d: DeviceModel, f: Fault): Promise<void> {
    if (!d.outbox.length || f === 'drop-request') return;
    const batch = d.outbox.slice(0, 4);
    if (f === 'late-copy') d.delayed.push(structuredClone(batch));
    const { results: first } = await port.push(d.user, d.deviceId, batch);
    if (f === 'duplicate') {
      const { results: again } = await port.push(d.user, d.deviceId, batch);
      expect(again).toEqual(first);
    }
    if (f !== 'drop-reply') d.acknowledge(first);
  }

  return fc.asyncProperty(fc.array(step, { minLength: 5, maxLength: 40 }), async (steps) => {
    const users = await port.newOrganisation(n++);
    const keys = await seedRows(users[0]!);
    // Devices 0 and 1 belong to office users, device 2 to the admin: the office-owned customer fields meet both rules.
    const replaced = new Set<string>();
    const devices = [
      new DeviceModel(`dev-a-${n}`, users[1]!, replaced),
      new DeviceModel(`dev-b-${n}`, users[2]!, replaced),
      new DeviceModel(`dev-c-${n}`, users[0]!, replaced),
    ];
    for (const d of devices) await pullAll(d);

    const run = async (s: Step) => {
      const d = devices[s.device]!;
      if (s.kind === 'edit') {
        const { entity, field } = FIELDS[s.field]!;
        const key = keys.find((k) => k.startsWith(entity))!;
        const target = entity === 'circuit' ? keys.filter((k) => k.startsWith('circuit'))[s.row % 2]! : key;
        d.edit(target, field, field === 'deviceRatingA' ? [6, 10, 16, 20, 32, 40][s.value] : `${field}-${d.deviceId}-${s.value}`);
      } else if (s.kind === 'delete') {
        d.remove(keys.filter((k) => k.startsWith('circuit'))[s.row % 2]!);
      } else {
        // A stale copy of an earlier batch may turn up now, out of order.
        const late = d.delayed.shift();
        if (late) await port.push(d.user, d.deviceId, late);
        await pushOutbox(d, s.push);
        await pullAll(d, s.pull);
      }
    };
    if (options.concurrent) {
      await Promise.all(devices.map(async (_, i) => {
        for (const s of steps) if (s.device === i) await run(s);
      }));
    } else {
      for (const s of steps) await run(s);
    }

    // The connection is good again: everyone sends everything, then everyone catches up.
    for (const d of devices) while (d.outbox.length) await pushOutbox(d, 'ok');
    for (const d of devices) for (const late of d.delayed.splice(0)) await port.push(d.user, d.deviceId, late);
    for (const d of devices) await pullAll(d);

    const server = new DeviceModel(`check-${n}`, users[0]!);
    await pullAll(server);
    const serverRows = new Map([...server.rows].filter(([k]) => !k.startsWith('conflict:')));
    const conflicts = [...server.rows].filter(([k]) => k.startsWith('conflict:')).map(([, r]) => r.fields);
    for (const d of devices) {
      const mine = new Map([...d.rows].filter(([k]) => !k.startsWith('conflict:')));
      expect(new Map([...mine].map(([k, r]) => [k, r.fields]))).toEqual(new Map([...serverRows].map(([k, r]) => [k, r.fields])));
      for (const [slot, value] of d.typed) {
        const [key, field] = slot.split('|') as [string, string];
        const final = serverRows.get(key);
        if (!final) continue; // Deleted by someone who had seen every edit (otherwise the edit would have won).
        const kept = final.fields[field] === value;
        const inConflict = conflicts.some((c) => `${c.entity}:${c.rowId}` === key && c.field === field && (c.keptValue === value || c.discardedValue === value));
        const overwrittenKnowingly = replaced.has(`${slot}|${JSON.stringify(value)}`);
        if (!kept && !inConflict && !overwrittenKnowingly) throw new Error(`${d.deviceId} typed ${JSON.stringify(value)} into ${slot}; it is neither in the row nor in a conflict`);
      }
    }
  });
}
