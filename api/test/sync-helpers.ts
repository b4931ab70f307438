import type { Change, Mutation, MutationResult, PullResponse, SyncedRow } from '@wiretrail/core';
import { formatHlc, officeOnlyFields, parseHlc, type SyncEntityName } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import type { signIn, TestApp } from './test-app.js';

export type Session = Awaited<ReturnType<typeof signIn>>;

let counter = 0;
/** A clock string for a device at a given moment. */
export function hlcAt(iso: string, deviceId: string): string {
  return formatHlc({ ms: Date.parse(iso), counter: counter++ % 0xffff, deviceId });
}

/** Mutations made without a clock of their own: the device that pushes them stamps them with its id, as a phone does. */
const unstamped = new WeakSet<Mutation>();

export function mutation(entity: Mutation['entity'], id: string, set: Mutation['set'] | 'delete', opts: { baseVersion?: number; hlc?: string; deviceId?: string } = {}): Mutation {
  const m: Mutation = {
    mutationId: uuidv7(),
    entity,
    id,
    baseVersion: opts.baseVersion ?? 0,
    ...(set === 'delete' ? { delete: true as const } : { set }),
    hlc: opts.hlc ?? formatHlc({ ms: Date.now(), counter: counter++ % 0xffff, deviceId: opts.deviceId ?? 'dev1' }),
  };
  if (!opts.hlc && !opts.deviceId) unstamped.add(m);
  return m;
}

/** The mutation's clock with the pushing device's id, when the test left the device to the push. */
export function stampedBy(deviceId: string, m: Mutation): Mutation {
  if (!unstamped.has(m)) return m;
  const hlc = parseHlc(m.hlc)!;
  return { ...m, hlc: formatHlc({ ...hlc, deviceId }) };
}

export async function push(t: TestApp, s: Session, deviceId: string, mutations: Mutation[]): Promise<MutationResult[]> {
  const res = await t.http.post('/api/sync/push').set('authorization', `Bearer ${s.accessToken}`).send({ deviceId, mutations: mutations.map((m) => stampedBy(deviceId, m)) });
  if (res.status !== 200) throw new Error(`push answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body.results;
}

export async function pullPage(t: TestApp, s: Session, deviceId: string, checkpoint: number, limit = 500): Promise<PullResponse> {
  const res = await t.http.get(`/api/sync/pull?checkpoint=${checkpoint}&limit=${limit}&deviceId=${deviceId}`).set('authorization', `Bearer ${s.accessToken}`);
  if (res.status !== 200) throw new Error(`pull answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body;
}

const mirrors = new Map<string, DeviceMirror>();

/**
 * Pulls everything new to a device, as a phone does before it edits: the server takes no base version above what
 * the device has been sent. A device that a test already follows with a mirror pulls through that mirror.
 */
export async function catchUp(t: TestApp, s: Session, deviceId: string): Promise<void> {
  await (mirrors.get(deviceId) ?? new DeviceMirror(deviceId)).pullAll(t, s);
}

/** A device's local copy: pulls until there is no more, applying changes as the app does. */
export class DeviceMirror {
  /** Keyed `entity:id`; the entity is in the key because a conflict row has an `entity` field of its own. */
  rows = new Map<string, SyncedRow>();
  checkpoint = 0;
  log: Change[] = [];

  constructor(readonly deviceId: string) {
    mirrors.set(deviceId, this);
  }

  async pullAll(t: TestApp, s: Session, limit = 500): Promise<Change[]> {
    const all: Change[] = [];
    for (;;) {
      const page = await pullPage(t, s, this.deviceId, this.checkpoint, limit);
      if (page.reset) {
        this.rows.clear();
        this.checkpoint = 0;
        continue;
      }
      for (const c of page.changes) {
        const key = `${c.entity}:${c.id}`;
        if (c.deleted) this.rows.delete(key);
        else this.rows.set(key, c.row!);
      }
      all.push(...page.changes);
      this.log.push(...page.changes);
      this.checkpoint = page.checkpoint;
      if (!page.hasMore) return all;
    }
  }

  find(entity: string, pred: (r: SyncedRow) => boolean = () => true): SyncedRow[] {
    return [...this.rows.entries()].filter(([key, r]) => key.startsWith(`${entity}:`) && pred(r)).map(([, r]) => r);
  }

  one(entity: string, pred: (r: SyncedRow) => boolean): SyncedRow {
    const found = this.find(entity, pred);
    if (found.length !== 1) throw new Error(`expected one ${entity}, found ${found.length}`);
    return found[0]!;
  }
}

/** A row as a technician's phone receives it: without the fields the registry keeps for the office. */
export function withoutOfficeOnly(key: string, row: SyncedRow | undefined): SyncedRow | undefined {
  if (!row) return row;
  const hidden = officeOnlyFields(key.split(':')[0] as SyncEntityName);
  if (!hidden.length) return row;
  const out: Record<string, unknown> = { ...row, fieldVersions: { ...row.fieldVersions } };
  for (const f of hidden) {
    delete out[f];
    delete (out.fieldVersions as Record<string, number>)[f];
  }
  return out as SyncedRow;
}
