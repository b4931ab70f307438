import { ForbiddenException, Injectable, PayloadTooLargeException, UnprocessableEntityException } from '@nestjs/common';
import {
  type Change,
  clockProblem,
  type Conflict,
  MAX_CLOCK_AHEAD_MS,
  MAX_PULL_LIMIT,
  MAX_PUSH_MUTATIONS,
  type Mutation,
  type PullResponse,
  type PushResponse,
  isHlc,
  officeOnlyFields,
  SYNC_ENTITIES,
  SYNC_ENTITY_NAMES,
  type SyncEntityName,
  type SyncedRow,
} from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { SyncChange, SyncDevice } from './entities/sync-bookkeeping.entity.js';
import { SYNC_SCHEMAS, type SyncRecord, textOrNull } from './entities/sync-schemas.js';
import { insertMany, selectMany } from './bulk-write.js';
import { ChangeLogCompaction } from './change-log-compaction.js';
import { ScopeService, type TechnicianScope } from './scope.service.js';
import { SERVER_DEVICE_IDS, SyncEngine, versionsOf } from './sync-engine.service.js';

const HIDDEN = new Set(['organisationId', 'fieldMeta', 'deletedAt']);
const NONE: ReadonlySet<string> = new Set();

/** The row as a device pulls it: its fields, version and per-field versions, none of the server's bookkeeping. */
export function toPulledRow(row: SyncRecord): SyncedRow {
  return pulledRowWithout(row, NONE);
}

/** The row less the fields this device may not receive (a technician's phone gets no cost price). */
function pulledRowWithout(row: SyncRecord, withheld: ReadonlySet<string>): SyncedRow {
  const versions = versionsOf(row.fieldMeta ?? {});
  for (const f of withheld) delete versions[f];
  const out: SyncedRow = { id: row.id, version: row.version, fieldVersions: versions };
  for (const k in row) {
    if (!Object.hasOwn(row, k) || HIDDEN.has(k) || withheld.has(k) || k in out) continue;
    const v = row[k];
    out[k] = v instanceof Date ? v.toISOString() : v;
  }
  return out;
}

/** A record as the office reads it: the registry's fields with the row's version, times as ISO text. */
export type SyncedReply<E extends Exclude<SyncEntityName, 'conflict'>> = Omit<SyncRecord<E>, 'organisationId' | 'fieldMeta' | 'deletedAt' | 'createdAt' | 'updatedAt'> & {
  createdAt: string;
  updatedAt: string;
  fieldVersions: Record<string, number>;
};

/** The row as the office reads it, typed from the registry so that each reply is checked against its contract. */
export function toSyncedRow<E extends Exclude<SyncEntityName, 'conflict'>>(row: SyncRecord<E>): SyncedReply<E> {
  const { organisationId: _organisation, fieldMeta, deletedAt: _deleted, createdAt, updatedAt, ...fields } = row;
  return { ...fields, createdAt: createdAt.toISOString(), updatedAt: updatedAt.toISOString(), fieldVersions: versionsOf(fieldMeta ?? {}) };
}

/** A conflict as the office reads it: its resolution time as ISO text. */
export function toConflictReply(row: SyncRecord<'conflict'>): Conflict {
  const { organisationId: _organisation, fieldMeta, deletedAt: _deleted, createdAt, updatedAt, resolvedAt, ...fields } = row;
  return {
    ...fields,
    resolvedAt: resolvedAt?.toISOString() ?? null,
    createdAt: createdAt.toISOString(),
    updatedAt: updatedAt.toISOString(),
    fieldVersions: versionsOf(fieldMeta ?? {}),
  };
}

/** Per entity, what a technician's phone never receives. */
const WITHHELD_FROM_TECHNICIANS = new Map(SYNC_ENTITY_NAMES.map((e) => [e, new Set(officeOnlyFields(e))]));

@Injectable()
export class SyncService {
  constructor(
    private readonly queue: WriteQueue,
    private readonly engine: SyncEngine,
    private readonly scopes: ScopeService,
  ) {}

  async push(user: AuthUser, deviceId: string, mutations: Mutation[]): Promise<PushResponse> {
    if (mutations.length > MAX_PUSH_MUTATIONS) {
      throw new PayloadTooLargeException(`A push carries at most ${MAX_PUSH_MUTATIONS} mutations; send the rest in another batch.`);
    }
    // A clock ahead of ours would win every later edit; the whole push waits, with its changes kept on the phone.
    const now = Date.now();
    for (const m of mutations) {
      const problem = typeof m?.hlc === 'string' && isHlc(m.hlc) ? clockProblem(m.hlc, now, MAX_CLOCK_AHEAD_MS) : null;
      if (problem) throw new UnprocessableEntityException(problem);
    }
    const actor = { userId: user.id, organisationId: user.organisationId, role: user.role, deviceId };
    const results = await this.queue.run(async (em) => {
      const device = await this.claimDevice(em, user, deviceId);
      return this.engine.applyAll(em, actor, mutations, { pulledUpTo: device?.checkpoint ?? 0 });
    });
    return { results };
  }

  /**
   * A device id belongs to the person who first used it: another's changes under it would pass for that person's
   * own later edits. A device seen for the first time is recorded, so that nobody else can take its id.
   */
  private async claimDevice(em: EntityManager, user: AuthUser, deviceId: string): Promise<SyncDevice | null> {
    const device = await em.findOneBy(SyncDevice, { deviceId });
    if (SERVER_DEVICE_IDS.has(deviceId) || (device && (device.userId !== user.id || device.organisationId !== user.organisationId))) {
      throw new ForbiddenException('This device id belongs to someone else. Sign out and in again so that the app makes one of its own.');
    }
    if (!device) {
      await em.createQueryBuilder().insert().into(SyncDevice)
        .values({ deviceId, organisationId: user.organisationId, userId: user.id, checkpoint: 0, scope: null, previousCheckpoint: null, previousScope: null, lastPullAt: null })
        .orIgnore().execute();
    }
    return device;
  }

  /**
   * Changes after the checkpoint that this user may see, in server order. Scope is worked out afresh each time:
   * sites that entered it since the checkpoint arrive whole, sites that left it arrive as deletions.
   */
  async pull(user: AuthUser, deviceId: string, checkpoint: number, limit: number): Promise<PullResponse> {
    return this.queue.run(async (em) => {
      const take = Math.min(Math.max(limit, 1), MAX_PULL_LIMIT);
      const device = await this.claimDevice(em, user, deviceId);
      const isTechnician = user.role === 'technician';
      const scope = isTechnician ? await this.scopes.technicianScope(em, user.organisationId, user.id) : null;
      const sitesNow = scope ? [...scope.siteIds].sort() : null;

      let sitesThen: string[] | null = sitesNow;
      if (checkpoint > 0) {
        // Deletions this device has not seen may be compacted away: it starts again, keeping what it has not sent.
        if (checkpoint < (await ChangeLogCompaction.floorOf(em, user.organisationId))) return { changes: [], checkpoint: 0, hasMore: true, reset: true };
        const known = device && device.userId === user.id && device.organisationId === user.organisationId;
        if (known && checkpoint === device.checkpoint) sitesThen = device.scope;
        else if (known && checkpoint === device.previousCheckpoint) sitesThen = device.previousScope;
        else return { changes: [], checkpoint: 0, hasMore: true, reset: true };
      }

      const qb = em
        .getRepository(SyncChange)
        .createQueryBuilder('c')
        .where('c.organisationId = :org', { org: user.organisationId })
        .andWhere('c.seq > :checkpoint', { checkpoint })
        .orderBy('c.seq', 'ASC')
        .take(take);
      if (scope) {
        const visible = Object.values(SYNC_ENTITIES).filter((s) => s.technicianVisible && s.siteField).map((s) => s.name);
        const everyone = Object.values(SYNC_ENTITIES).filter((s) => s.technicianVisible && s.organisationWide).map((s) => s.name);
        qb.andWhere('((c.entity IN (:...visible) AND c.siteId IN (:...sites)) OR (c.entity = :customer AND c.rowId IN (:...customers)) OR c.entity IN (:...everyone))', {
          everyone: everyone.length ? everyone : [''],
          visible,
          sites: sitesNow!.length ? sitesNow : [''],
          customer: 'customer',
          customers: scope.customerIds.size ? [...scope.customerIds] : [''],
        });
      }
      const page = await qb.getMany();
      const hasMore = page.length === take;
      const next = page.length ? page[page.length - 1]!.seq : checkpoint;

      // Catch-up entries beside the page; an eviction is sent whatever its number.
      const extra: Array<SyncChange & { evict?: boolean }> = [];
      if (scope && checkpoint > 0) {
        const then = new Set(sitesThen ?? []);
        const gained = sitesNow!.filter((s) => !then.has(s));
        const lost = [...then].filter((s) => !scope.siteIds.has(s));
        const customersThen = await this.scopes.customersOfSites(em, user.organisationId, [...then]);
        if (gained.length) {
          const newCustomers = [...scope.customerIds].filter((c) => !customersThen.has(c));
          extra.push(...(await em.find(SyncChange, { where: { organisationId: user.organisationId, siteId: In(gained), deleted: false } })));
          if (newCustomers.length) extra.push(...(await em.find(SyncChange, { where: { entity: 'customer', rowId: In(newCustomers) } })));
        }
        if (lost.length) {
          const evicted = await em.find(SyncChange, { where: { organisationId: user.organisationId, siteId: In(lost) } });
          const goneCustomers = [...customersThen].filter((c) => !scope.customerIds.has(c));
          evicted.push(...(await em.find(SyncChange, { where: { entity: 'customer', rowId: In(goneCustomers) } })));
          extra.push(...evicted.map((c) => Object.assign(new SyncChange(), c, { deleted: true, evict: true })));
        }
      }

      const changes = await this.materialise(em, [...extra.filter((c) => c.seq <= next || c.evict), ...page], scope, checkpoint);
      await this.rememberDevice(em, user, deviceId, checkpoint, sitesThen, next, sitesNow);
      return { changes, checkpoint: next, hasMore };
    });
  }

  private async materialise(em: EntityManager, entries: SyncChange[], scope: TechnicianScope | null, checkpoint = 0): Promise<Change[]> {
    const byEntity = new Map<SyncEntityName, Set<string>>();
    for (const c of entries) {
      if (c.deleted) continue;
      const entity = c.entity;
      let ids = byEntity.get(entity);
      if (!ids) byEntity.set(entity, (ids = new Set()));
      ids.add(c.rowId);
    }
    const rows = new Map<string, SyncRecord>();
    // Plain statements hydrated by the driver: the query builder's handling of a thousand ids cost more than the read.
    for (const [entity, ids] of byEntity) {
      for (const r of await selectMany<SyncRecord>(em, SYNC_SCHEMAS[entity], 'id', [...ids])) rows.set(`${entity}:${r.id}`, r);
    }
    if (scope) entries = await this.withJobsOfVisits(em, entries, rows, scope, checkpoint);
    const seen = new Set<string>();
    const out: Change[] = [];
    // Later entries for the same row supersede earlier ones (an eviction after a catch-up, say).
    for (const c of [...entries].reverse()) {
      const key = `${c.entity}:${c.rowId}`;
      if (seen.has(key)) continue;
      seen.add(key);
      const entity = c.entity;
      const row = c.deleted || (scope && !this.technicianSees(scope, entity, c.rowId)) ? null : (rows.get(key) ?? null);
      const deleted = !row || row.deletedAt !== null;
      const withheld = scope ? WITHHELD_FROM_TECHNICIANS.get(entity) : undefined;
      out.push({ entity, id: c.rowId, version: row?.version ?? c.seq, deleted, row: deleted ? null : pulledRowWithout(row!, withheld ?? NONE) });
    }
    return out.reverse();
  }

  /**
   * A technician's phone gets the visits they are on and those visits' jobs, not every visit and job at the site:
   * another technician's signed visit or an enquiry with the customer's details is not theirs to carry about.
   */
  private technicianSees(scope: TechnicianScope, entity: SyncEntityName, id: string): boolean {
    if (entity === 'visit') return scope.ownVisitIds.has(id);
    if (entity === 'job') return scope.jobIds.has(id);
    return true;
  }

  /**
   * A visit newly theirs at a site already on the phone brings its job, which has not changed and would not come
   * otherwise; a visit no longer theirs takes its job away (as a deletion) unless another of theirs needs it.
   */
  private async withJobsOfVisits(
    em: EntityManager, entries: SyncChange[], rows: Map<string, SyncRecord>, scope: TechnicianScope, checkpoint: number,
  ): Promise<SyncChange[]> {
    const listed = new Set(entries.filter((c) => c.entity === 'job').map((c) => c.rowId));
    const wanted = new Set<string>();
    const gone: SyncChange[] = [];
    for (const c of entries) {
      const visit = c.entity === 'visit' ? rows.get(`visit:${c.rowId}`) : undefined;
      const jobId = textOrNull(visit?.jobId) ?? undefined;
      // Only a visit whose people or job changed since the device's checkpoint can have changed what it may see.
      const moved = Math.max(visit?.fieldMeta?.technicianIds?.v ?? 0, visit?.fieldMeta?.jobId?.v ?? 0) > checkpoint;
      if (!jobId || listed.has(jobId) || !moved) continue;
      if (scope.jobIds.has(jobId)) wanted.add(jobId);
      else gone.push(Object.assign(new SyncChange(), { entity: 'job', rowId: jobId, organisationId: c.organisationId, seq: c.seq, siteId: c.siteId, deleted: true }));
    }
    if (!wanted.size) return gone.length ? [...entries, ...gone] : entries;
    const jobs = await em.find(SyncChange, { where: { entity: 'job', rowId: In([...wanted]) } });
    for (const r of await selectMany<SyncRecord>(em, SYNC_SCHEMAS.job, 'id', [...wanted])) rows.set(`job:${r.id}`, r);
    return [...entries, ...gone, ...jobs];
  }

  private async rememberDevice(
    em: EntityManager, user: AuthUser, deviceId: string,
    checkpoint: number, sitesThen: string[] | null, next: number, sitesNow: string[] | null,
  ): Promise<void> {
    // One upsert: save() read the row first to choose between INSERT and UPDATE.
    await insertMany(em, SyncDevice, [{
      deviceId,
      organisationId: user.organisationId,
      userId: user.id,
      checkpoint: next,
      scope: sitesNow,
      previousCheckpoint: checkpoint,
      previousScope: sitesThen,
      lastPullAt: new Date(),
    }], { columns: ['deviceId'] });
  }
}
