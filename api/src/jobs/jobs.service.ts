import { Injectable } from '@nestjs/common';
import { JOB_STATUSES, type JobListing, type JobPage, type JobSort, type JobStatusCounts } from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { type Condition, type Listing, RecordsService } from '../records/records.service.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { toSyncedRow } from '../sync/sync.service.js';
import type { JobFiltersDto, ListJobsQueryDto } from './dto/list-jobs-query.dto.js';
import { inTurn } from '../common/in-turn.js';
import { workOf } from './job-progress.js';

/** Visits still to do: the next visit of a job is the earliest of these. */
const OPEN_VISIT = `("v"."status" IS NULL OR "v"."status" NOT IN ('finished', 'cancelled'))`;

const NEXT_VISIT = `(SELECT MIN("v"."plannedStart") FROM "visit" "v" WHERE "v"."jobId" = "r"."id" AND "v"."deletedAt" IS NULL AND ${OPEN_VISIT})`;

/** The board's order of statuses, so sorting by status reads left to right as the board does. */
const STATUS_ORDER = `CASE "r"."status" ${JOB_STATUSES.map((s, i) => `WHEN '${s}' THEN ${i}`).join(' ')} ELSE ${JOB_STATUSES.length} END`;

const SORTS: Record<JobSort, string> = {
  reference: 'reference',
  title: 'title',
  status: STATUS_ORDER,
  customer: `(SELECT "c"."name" FROM "customer" "c" WHERE "c"."id" = "r"."customerId")`,
  nextVisit: NEXT_VISIT,
  created: 'createdAt',
};

/**
 * The next reference after the recent ones (newest first): the series most of them share, so that one reference typed
 * by hand does not start a new one; one past the highest number in it, zero-padded as it is. With no numbered job the
 * organisation starts at J-0001.
 */
export function nextReference(recent: string[]): string {
  const numbered = recent.map((r) => /^(.*?)(\d+)$/.exec(r.trim())).filter((m): m is RegExpExecArray => m !== null);
  if (numbered.length === 0) return 'J-0001';
  const counts = new Map<string, number>();
  for (const m of numbered) counts.set(m[1]!, (counts.get(m[1]!) ?? 0) + 1);
  // Map keeps the order first seen, newest first, so a tie goes to the newer series.
  const prefix = [...counts].reduce((best, entry) => (entry[1] > best[1] ? entry : best))[0];
  const same = numbered.filter((m) => m[1] === prefix);
  const width = Math.max(...same.map((m) => m[2]!.length));
  const next = Math.max(...same.map((m) => Number(m[2]))) + 1;
  return `${prefix}${String(next).padStart(width, '0')}`;
}

@Injectable()
export class JobsService extends RecordsService<ListJobsQueryDto, 'job', JobListing> {
  protected readonly entity = 'job';

  // Declared here so the replies are checked against the contract the office's job screens read.
  override list(user: AuthUser, q: ListJobsQueryDto): Promise<JobPage> {
    return super.list(user, q);
  }

  override findOne(user: AuthUser, id: string): Promise<JobListing> {
    return super.findOne(user, id);
  }

  /** A job made without a reference takes the next one in the organisation's own series ("LED-0045" → "LED-0046"). */
  protected override async filledIn(em: EntityManager, user: AuthUser, set: Record<string, unknown>): Promise<Record<string, unknown>> {
    if (typeof set.reference === 'string' && set.reference.trim()) return {};
    const latest = await syncRepository(em, 'job')
      .createQueryBuilder('j')
      .select(['j.reference'])
      .where('j.organisationId = :org AND j.reference IS NOT NULL', { org: user.organisationId })
      .orderBy('j.createdAt', 'DESC')
      .limit(50)
      .getMany();
    return { reference: nextReference(latest.map((j) => j.reference ?? '')) };
  }

  protected listing(q: ListJobsQueryDto): Listing {
    const sort = q.sort ?? 'created';
    const direction = (q.direction ?? (sort === 'created' ? 'desc' : 'asc')) === 'desc' ? 'DESC' : 'ASC';
    return {
      search: ['reference', 'title', 'description'],
      searchThrough: [
        { field: 'customerId', entity: 'customer', columns: ['name'] },
        { field: 'siteId', entity: 'site', columns: ['name', 'address', 'postcode'] },
      ],
      filters: { status: q.status, siteId: q.siteId, customerId: q.customerId },
      conditions: this.visitConditions(q),
      // Jobs without a reference or a next visit come last whichever way the column is sorted.
      // Ids are UUIDv7, so they break ties in creation order.
      order: [[SORTS[sort], direction, 'NULLS LAST'], ['id', direction]],
    };
  }

  /** The number of jobs in each status under the same filters, for the board's columns. */
  async statusCounts(user: AuthUser, q: JobFiltersDto): Promise<JobStatusCounts> {
    const found = await this.countBy(user, { ...q, status: undefined }, 'status');
    const counts: JobStatusCounts['counts'] = { enquiry: 0, booked: 0, 'on-site': 0, paperwork: 0, done: 0, cancelled: 0 };
    for (const s of JOB_STATUSES) counts[s] = found.get(s) ?? 0;
    return { counts, total: [...found.values()].reduce((a, b) => a + b, 0) };
  }

  /**
   * A job is chosen by its visits: one visit must match the technician and the date range together.
   * The technician is looked for in the visit's stored JSON list of ids as text, which reads the same on SQLite and
   * PostgreSQL; a quoted UUID cannot match part of another.
   */
  private visitConditions(q: JobFiltersDto): Condition[] {
    const parts: string[] = [];
    const params: Record<string, unknown> = {};
    if (q.technicianId !== undefined) {
      parts.push(`"v"."technicianIds" LIKE :visitTechnician`);
      params.visitTechnician = `%"${q.technicianId}"%`;
    }
    if (q.from !== undefined) {
      parts.push(`"v"."plannedStart" >= :visitFrom`);
      params.visitFrom = q.from;
    }
    if (q.to !== undefined) {
      parts.push(`"v"."plannedStart" < :visitTo`);
      params.visitTo = q.to;
    }
    // A cancelled visit is not a visit on those dates.
    if (q.from !== undefined || q.to !== undefined) parts.push(`("v"."status" IS NULL OR "v"."status" <> 'cancelled')`);
    if (!parts.length) return [];
    return [{
      sql: `EXISTS (SELECT 1 FROM "visit" "v" WHERE "v"."jobId" = "r"."id" AND "v"."organisationId" = :org AND "v"."deletedAt" IS NULL AND ${parts.join(' AND ')})`,
      params,
    }];
  }

  /** Each job with its customer's and site's names, its next visit and who is booked on its visits. */
  protected async annotate(em: EntityManager, user: AuthUser, rows: SyncRecord<'job'>[]): Promise<JobListing[]> {
    if (!rows.length) return [];
    const org = user.organisationId;
    const ids = (field: 'customerId' | 'siteId') => [...new Set(rows.map((r) => r[field]))];
    const [customers, sites, visits] = await inTurn(
      () => syncRepository(em, 'customer').find({ where: { id: In(ids('customerId')), organisationId: org }, select: { id: true, name: true } }),
      () => syncRepository(em, 'site').find({ where: { id: In(ids('siteId')), organisationId: org }, select: { id: true, name: true, address: true } }),
      () => syncRepository(em, 'visit').find({
        where: { jobId: In(rows.map((r) => r.id)), organisationId: org, deletedAt: IsNull() },
        select: { id: true, jobId: true, plannedStart: true, status: true, technicianIds: true },
      }),
    );
    const work = await workOf(em, org, rows.map((r) => r.id));
    const customerName = new Map(customers.map((c) => [c.id, c.name]));
    const siteName = new Map(sites.map((s) => [s.id, s.name ?? s.address]));
    return rows.map((r) => {
      const own = visits.filter((v) => v.jobId === r.id);
      const open = own.filter((v) => v.status !== 'finished' && v.status !== 'cancelled');
      const next = open.flatMap((v) => (typeof v.plannedStart === 'string' ? [v.plannedStart] : [])).sort()[0] ?? null;
      const technicianIds = [...new Set(own.filter((v) => v.status !== 'cancelled').flatMap((v) => v.technicianIds ?? []))];
      return {
        ...toSyncedRow(r),
        customerName: customerName.get(r.customerId) ?? null,
        siteName: siteName.get(r.siteId) ?? null,
        nextVisitStart: next,
        visitCount: own.length,
        technicianIds,
        work: work.get(r.id),
      };
    });
  }
}
