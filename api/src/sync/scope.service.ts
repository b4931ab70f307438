import { Injectable, Optional } from '@nestjs/common';
import { type EntityManager, In, IsNull, Like } from 'typeorm';
import { WriteQueue } from '../common/write-queue.js';
import { selectMany } from './bulk-write.js';
import { SyncChange, SyncCounter } from './entities/sync-bookkeeping.entity.js';
import { SYNC_SCHEMAS, syncRepository } from './entities/sync-schemas.js';

export interface TechnicianScope {
  /** Visits assigned to the technician (not cancelled). */
  visitIds: Set<string>;
  visitSite: Map<string, string>;
  /** Sites of those visits: the technician sees each site's whole history. */
  siteIds: Set<string>;
  /** Customers of those sites, for names and contact details on site. */
  customerIds: Set<string>;
  /** Every visit the technician is on, cancelled ones too: the only visits their phone receives. */
  ownVisitIds: Set<string>;
  /** The jobs of those visits: another job at the same site (an enquiry, say) is none of the phone's business. */
  jobIds: Set<string>;
}

/** What the scope needs of one of the technician's visits. */
interface OwnVisit {
  siteId: string;
  jobId: string;
  status: string | null;
}

/** A technician's visits and their sites' customers as of change `seq`, brought up to date by the changes since. */
interface Known {
  seq: number;
  visits: Map<string, OwnVisit>;
  customerOf: Map<string, string>;
  at: number;
}

/** Technicians whose scope is kept between requests, and for how long (well inside the shortest retention). */
const KEPT = 2_000;
const KEPT_MS = 60 * 60_000;
/** Past this many visit and site changes since, reading the technician's visits afresh is cheaper. */
const MOST_CHANGES = 5_000;

@Injectable()
export class ScopeService {
  /**
   * Working a scope out reads every visit of the organisation (the technician is found in a JSON list), which on
   * five years of data costs more than the rest of an incremental pull; a phone pulls every few minutes. So each
   * technician's scope is kept with the change number it was worked out at, and brought up to date from the visits
   * and sites changed since (the change log, by number). Writes take turns, so every change up to the counter has
   * committed; work rolled back may have been seen, so a rollback forgets everything kept.
   */
  private readonly known = new Map<string, Known>();

  /** Without the queue (the demo data's one transaction), nothing outlives the instance that kept it. */
  constructor(@Optional() queue?: WriteQueue) {
    queue?.onRollback(() => this.known.clear());
  }

  async technicianScope(em: EntityManager, organisationId: string, userId: string): Promise<TechnicianScope> {
    const key = `${organisationId}:${userId}`;
    const [counter] = await selectMany(em, SyncCounter, 'name', ['global']);
    const seq = counter?.value ?? 0;
    let known = this.known.get(key);
    if (known && (Date.now() - known.at > KEPT_MS || !(await this.catchUp(em, organisationId, userId, known, seq)))) known = undefined;
    if (!known) known = await this.readAfresh(em, organisationId, userId, seq);
    this.known.delete(key);
    if (this.known.size >= KEPT) this.known.delete(this.known.keys().next().value!);
    this.known.set(key, known);
    return scopeOf(known);
  }

  private async readAfresh(em: EntityManager, organisationId: string, userId: string, seq: number): Promise<Known> {
    // technicianIds is a JSON list; LIKE narrows the rows, the check below makes it exact.
    const rows = await syncRepository(em, 'visit').find({
      where: { organisationId, deletedAt: IsNull(), technicianIds: Like(`%${userId}%`) },
      select: { id: true, siteId: true, jobId: true, technicianIds: true, status: true },
    });
    const visits = new Map<string, OwnVisit>();
    for (const v of rows) if (Array.isArray(v.technicianIds) && v.technicianIds.includes(userId)) visits.set(v.id, { siteId: v.siteId, jobId: v.jobId, status: v.status });
    const known: Known = { seq, visits, customerOf: new Map(), at: Date.now() };
    await this.readCustomers(em, organisationId, known, sitesOf(visits));
    return known;
  }

  /** Applies the visits and sites changed since `known.seq`; false when there are too many to be worth it. */
  private async catchUp(em: EntityManager, organisationId: string, userId: string, known: Known, seq: number): Promise<boolean> {
    if (seq === known.seq) return true;
    const changed = await em.getRepository(SyncChange).createQueryBuilder('c')
      .select(['c.entity', 'c.rowId'])
      .where('c.organisationId = :organisationId', { organisationId })
      .andWhere('c.seq > :since', { since: known.seq })
      .andWhere('c.entity IN (:...entities)', { entities: ['visit', 'site'] })
      .limit(MOST_CHANGES + 1)
      .getMany();
    if (changed.length > MOST_CHANGES) return false;
    const visitIds = changed.filter((c) => c.entity === 'visit').map((c) => c.rowId);
    for (const v of await selectMany(em, SYNC_SCHEMAS.visit, 'id', visitIds)) {
      const theirs = v.organisationId === organisationId && v.deletedAt === null && Array.isArray(v.technicianIds) && v.technicianIds.includes(userId);
      if (theirs) known.visits.set(v.id, { siteId: v.siteId, jobId: v.jobId, status: v.status });
      else known.visits.delete(v.id);
    }
    const sites = sitesOf(known.visits);
    const siteMoved = changed.some((c) => c.entity === 'site' && sites.has(c.rowId));
    const sitesChanged = siteMoved || sites.size !== known.customerOf.size || [...sites].some((s) => !known.customerOf.has(s));
    if (sitesChanged) await this.readCustomers(em, organisationId, known, sites);
    known.seq = seq;
    return true;
  }

  private async readCustomers(em: EntityManager, organisationId: string, known: Known, sites: Set<string>): Promise<void> {
    known.customerOf = new Map();
    if (!sites.size) return;
    const rows = await syncRepository(em, 'site').find({ where: { id: In([...sites]), organisationId }, select: { id: true, customerId: true } });
    for (const s of rows) known.customerOf.set(s.id, s.customerId);
  }

  async customersOfSites(em: EntityManager, organisationId: string, siteIds: string[]): Promise<Set<string>> {
    if (!siteIds.length) return new Set();
    const sites = await syncRepository(em, 'site').find({ where: { id: In(siteIds), organisationId }, select: { id: true, customerId: true }, withDeleted: true });
    return new Set(sites.map((s) => s.customerId));
  }
}

/** The sites of the visits that are not cancelled: a cancelled visit brings nothing of its site. */
function sitesOf(visits: Map<string, OwnVisit>): Set<string> {
  const sites = new Set<string>();
  for (const v of visits.values()) if (v.status !== 'cancelled') sites.add(v.siteId);
  return sites;
}

/** Fresh sets every time: callers may keep or change what they are given. */
function scopeOf(known: Known): TechnicianScope {
  const mine = [...known.visits].filter(([, v]) => v.status !== 'cancelled');
  const visitSite = new Map(mine.map(([id, v]) => [id, v.siteId]));
  const siteIds = new Set(visitSite.values());
  return {
    visitIds: new Set(visitSite.keys()),
    visitSite,
    siteIds,
    customerIds: new Set([...siteIds].map((s) => known.customerOf.get(s)).filter((c): c is string => c !== undefined)),
    ownVisitIds: new Set(known.visits.keys()),
    jobIds: new Set([...known.visits.values()].map((v) => v.jobId)),
  };
}
