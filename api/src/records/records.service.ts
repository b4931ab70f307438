import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { fieldError, type FieldValue, formatHlc, isFieldValue, type Mutation, type MutationResult, type RecordPage, SYNC_ENTITIES, type SyncedRow } from '@wiretrail/core';
import { type EntityManager, IsNull } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { type Actor, SyncEngine } from '../sync/sync-engine.service.js';
import { type SyncedReply, toSyncedRow } from '../sync/sync.service.js';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { sentFields } from '../common/defined-fields.js';
import { WriteQueue } from '../common/write-queue.js';
import type { PageQueryDto } from './page-query.dto.js';
import { jsonListHas, textLike } from '../database/sql.js';

/** The records the office reads and writes directly; the rest arrive from devices through sync. */
export type OfficeRecord = 'customer' | 'site' | 'area' | 'board' | 'circuit' | 'job' | 'visit' | 'priceItem';
/** Records the office also reads (and for cable runs, corrects) over REST, though devices make them. */
export type SiteRecord = OfficeRecord | 'cableRun' | 'pointChange' | 'testResult';

/** A row as the office reads it: the synced row, plus what a feature adds (names of what it points at, verdicts). */
export type OfficeRow = SyncedRow & Record<string, unknown>;


/** A condition over the alias `r`, in portable SQL with quoted identifiers for any other table. */
export interface Condition {
  sql: string;
  params?: Record<string, unknown>;
}

/** How one kind of record is listed. Columns are the record's field names. */
export interface Listing {
  /** Fields the search text is looked for in. */
  search: string[];
  /** Also match records whose referenced row matches, e.g. a visit by its job's title. */
  searchThrough?: Array<{ field: string; entity: OfficeRecord; columns: string[] }>;
  /** Exact matches; an undefined value is no filter. */
  filters?: Record<string, string | undefined>;
  /** A JSON list field holding this id (a visit's technicians). */
  listContains?: Record<string, string | undefined>;
  /** From inclusive, to exclusive. Works on times because they are stored as UTC ISO text. */
  range?: { field: string; from?: string; to?: string };
  /** Further conditions a feature needs, such as rows of a job's visits. */
  conditions?: Condition[];
  /** A field name, or an SQL expression over the alias `r`; the id is added last so pages never overlap. */
  order: Array<[sort: string, direction: 'ASC' | 'DESC', nulls?: 'NULLS FIRST' | 'NULLS LAST']>;
}

/** A reference that must lie on the record's own site: a circuit's board, a board's area, a visit's job. */
export interface SameSiteRef {
  field: string;
  entity: Exclude<OfficeRecord, 'customer' | 'site' | 'priceItem'>;
}

/** The office writing through the sync engine from a desk: its own device id, so its edits are numbered like a push. */
export function officeActor(user: AuthUser, deviceId = 'office'): Actor {
  return { userId: user.id, organisationId: user.organisationId, role: user.role, deviceId };
}

/** One change the office makes, as a mutation the engine applies like any device's. */
export function officeMutation(entity: Mutation['entity'], id: string, baseVersion: number, set: Record<string, unknown>, deviceId = 'office'): Mutation {
  const values: Record<string, FieldValue> = {};
  for (const [field, value] of Object.entries(set)) {
    // A value JSON would change could not come from a device either; it is refused as the engine refuses a device's.
    if (!isFieldValue(value)) throw new BadRequestException(fieldError(entity, field, value) ?? `${entity}.${field} must be a JSON value`);
    values[field] = value;
  }
  return {
    mutationId: uuidv7(),
    entity,
    id,
    baseVersion,
    set: values,
    hlc: formatHlc({ ms: Date.now(), counter: 0, deviceId }),
  };
}

/** Rows whose visit belongs to the job: a job's photos, point changes and test results. */
export function ofJobVisits(field: string, jobId: string | undefined): Condition[] {
  if (jobId === undefined) return [];
  return [{
    sql: `r.${field} IN (SELECT "v"."id" FROM "visit" "v" WHERE "v"."organisationId" = :org AND "v"."jobId" = :ofJob AND "v"."deletedAt" IS NULL)`,
    params: { ofJob: jobId },
  }];
}

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);
const sortKey = (sort: string) => (/^\w+$/.test(sort) ? `r.${sort}` : sort);

/**
 * List, get, create and update for one kind of synced record, as the office does them over REST.
 * Writes go through the sync engine as the office's own mutations, so versions, per-field history, document locks
 * and conflicts work exactly as for a device's push, and every device pulls the change.
 * A feature's service extends this and says which record it serves and how it is listed.
 */
@Injectable()
export abstract class RecordsService<Q extends PageQueryDto, E extends SiteRecord = SiteRecord, R extends object = OfficeRow> {
  protected abstract readonly entity: E;
  protected readonly sameSite: SameSiteRef[] = [];
  protected abstract listing(query: Q): Listing;

  constructor(
    protected readonly queue: WriteQueue,
    protected readonly engine: SyncEngine,
  ) {}

  async list(user: AuthUser, q: Q): Promise<RecordPage<R>> {
    const l = this.listing(q);
    const { where, params } = this.conditionsFor(user, l, q.search);
    const { rows, total } = await this.queue.read(async (em) => {
      const qb = syncRepository(em, this.entity).createQueryBuilder('r').where(where.join(' AND '), params);
      for (const [sort, direction, nulls] of l.order) qb.addOrderBy(sortKey(sort), direction, nulls);
      if (!l.order.some(([sort]) => sort === 'id')) qb.addOrderBy('r.id', 'ASC');
      const [found, total] = await qb.offset((q.page - 1) * q.pageSize).limit(q.pageSize).getManyAndCount();
      return { rows: await this.annotate(em, user, found), total };
    });
    return { items: rows, total, page: q.page, pageSize: q.pageSize };
  }

  /** How many listed records hold each value of a field, under the same filters as the list (leave that field's own filter out). */
  protected async countBy(user: AuthUser, q: Q, field: string): Promise<Map<string | null, number>> {
    const { where, params } = this.conditionsFor(user, this.listing(q), q.search);
    const rows = await this.queue.read((em) =>
      syncRepository(em, this.entity)
        .createQueryBuilder('r')
        .select(`r.${field}`, 'value')
        .addSelect('COUNT(*)', 'n')
        .where(where.join(' AND '), params)
        .groupBy(`r.${field}`)
        .getRawMany<{ value: string | null; n: number | string }>(),
    );
    return new Map(rows.map((r) => [r.value, Number(r.n)]));
  }

  /**
   * What a feature adds to its rows as the office reads them, inside the same read so that the additions match the rows.
   * By default, nothing.
   */
  protected abstract annotate(em: EntityManager, user: AuthUser, rows: SyncRecord<E>[]): Promise<R[]>;

  private conditionsFor(user: AuthUser, l: Listing, search: string | undefined): { where: string[]; params: Record<string, unknown> } {
    const params: Record<string, unknown> = { org: user.organisationId };
    const where = ['r.organisationId = :org', 'r.deletedAt IS NULL'];
    for (const [field, value] of Object.entries(l.filters ?? {})) {
      if (value === undefined) continue;
      where.push(`r.${field} = :eq_${field}`);
      params[`eq_${field}`] = value;
    }
    for (const [field, value] of Object.entries(l.listContains ?? {})) {
      if (value === undefined) continue;
      where.push(jsonListHas(`r.${field}`, `in_${field}`));
      params[`in_${field}`] = value;
    }
    if (l.range?.from !== undefined) {
      where.push(`r.${l.range.field} >= :rangeFrom`);
      params.rangeFrom = l.range.from;
    }
    if (l.range?.to !== undefined) {
      where.push(`r.${l.range.field} < :rangeTo`);
      params.rangeTo = l.range.to;
    }
    for (const c of l.conditions ?? []) {
      where.push(`(${c.sql})`);
      Object.assign(params, c.params);
    }
    if (search && (l.search.length || l.searchThrough?.length)) {
      params.like = `%${escapeLike(search)}%`;
      const matches = (columns: string[], alias: string) => columns.map((c) => textLike(`"${alias}"."${c}"`, 'like'));
      const through = (l.searchThrough ?? []).map(
        (s) => `r.${s.field} IN (SELECT "t"."id" FROM "${SYNC_ENTITIES[s.entity].table}" AS "t" WHERE "t"."organisationId" = :org AND (${matches(s.columns, 't').join(' OR ')}))`,
      );
      where.push(`(${[...matches(l.search, 'r'), ...through].join(' OR ')})`);
    }
    return { where, params };
  }

  /** Another organisation's record answers exactly like a missing one: its existence is not ours to reveal. */
  async findOne(user: AuthUser, id: string): Promise<R> {
    return this.queue.read(async (em) => (await this.annotate(em, user, [await this.current(em, user, id)]))[0]!);
  }

  async create(user: AuthUser, dto: object): Promise<R> {
    const set = sentFields(dto);
    const id = uuidv7();
    const { result, row } = await this.queue.run(async (em) => {
      await this.checkSameSite(em, user, set, set);
      Object.assign(set, await this.filledIn(em, user, set));
      const [result] = await this.engine.applyAll(em, this.actor(user), [this.mutation(id, 0, set)]);
      return { result: result!, row: await this.saved(em, user, id) };
    });
    return this.answer(result, row);
  }

  /**
   * Fields the server gives a new record that the office left out, such as a job's next reference. Runs inside the
   * write, so two records made at once never get the same one.
   */
  protected async filledIn(_em: EntityManager, _user: AuthUser, _set: Record<string, unknown>): Promise<Record<string, unknown>> {
    return {};
  }

  async update(user: AuthUser, id: string, dto: object): Promise<R> {
    const set = sentFields(dto);
    if (Object.keys(set).length === 0) throw new BadRequestException('Nothing to change: send at least one field.');
    const { result, row } = await this.queue.run(async (em) => {
      const existing = await this.current(em, user, id);
      await this.checkSameSite(em, user, { ...existing, ...set }, set);
      // The base is the version just read, inside the same transaction: the office's edit is the latest word.
      const [result] = await this.engine.applyAll(em, this.actor(user), [this.mutation(id, existing.version, set)]);
      return { result: result!, row: await this.saved(em, user, id) };
    });
    return this.answer(result, row);
  }

  /** The row as written, answered as the office reads it, so a save's answer equals the next read. */
  private async saved(em: EntityManager, user: AuthUser, id: string): Promise<R | null> {
    const row = await syncRepository(em, this.entity).createQueryBuilder('r').where('r.id = :id', { id }).getOne();
    return row ? (await this.annotate(em, user, [row]))[0]! : null;
  }

  private async current(em: EntityManager, user: AuthUser, id: string): Promise<SyncRecord<E>> {
    const row = await syncRepository(em, this.entity)
      .createQueryBuilder('r')
      .where('r.id = :id AND r.organisationId = :org AND r.deletedAt IS NULL', { id, org: user.organisationId })
      .getOne();
    if (!row) throw new NotFoundException(`No such ${this.entity}.`);
    return row;
  }

  /**
   * The engine checks that a referenced row exists in the organisation; this adds that it is on the same site.
   * A reference that does not exist at all is left for the engine to refuse with its own message.
   */
  private async checkSameSite(em: EntityManager, user: AuthUser, merged: Record<string, unknown>, set: Record<string, unknown>): Promise<void> {
    for (const ref of this.sameSite) {
      if (!(ref.field in set) && !('siteId' in set)) continue;
      const refId = merged[ref.field];
      if (typeof refId !== 'string') continue;
      const target = await syncRepository(em, ref.entity).findOne({ where: { id: refId, organisationId: user.organisationId, deletedAt: IsNull() }, select: { id: true, siteId: true } });
      if (target && target.siteId !== merged.siteId) {
        throw new BadRequestException(`${ref.field} must be on this ${this.entity}'s site.`);
      }
    }
  }

  private actor(user: AuthUser): Actor {
    return officeActor(user);
  }

  private mutation(id: string, baseVersion: number, set: Record<string, unknown>): Mutation {
    return officeMutation(this.entity, id, baseVersion, set);
  }

  /** Thrown after the transaction, so that conflicts the engine recorded are kept. */
  private answer(result: MutationResult, row: R | null): R {
    if (result.status === 'rejected') {
      const error = result.error ?? `The ${this.entity} was not saved.`;
      throw /^No \w+ with that id/.test(error) ? new NotFoundException(`No such ${this.entity}.`) : new BadRequestException(error);
    }
    if (result.status === 'merged') {
      const held = result.heldBy ? `printed on ${result.heldBy}, an issued document` : 'part of an issued document';
      const revise = result.heldBy ? ` To correct it, revise ${result.heldBy}.` : '';
      throw new ConflictException({
        statusCode: 409,
        message: `This ${this.entity} is ${held}, so the change was not made; it waits beside the issued value for review.${revise}`,
        error: 'Conflict',
        conflictIds: result.conflictIds ?? [],
        ...(result.heldBy ? { heldBy: result.heldBy } : {}),
      });
    }
    return row!;
  }
}

/** Records the office reads as they are stored, with nothing added. */
export abstract class PlainRecordsService<Q extends PageQueryDto, E extends SiteRecord> extends RecordsService<Q, E, SyncedReply<E>> {
  protected async annotate(_em: EntityManager, _user: AuthUser, rows: SyncRecord<E>[]): Promise<SyncedReply<E>[]> {
    return rows.map(toSyncedRow);
  }
}
