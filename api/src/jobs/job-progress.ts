import { Injectable, type OnModuleInit } from '@nestjs/common';
import { type JobWork, localDate, NO_WORK, statusFromWork, visitStage } from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import { Invoice } from '../invoices/entities/invoice.entity.js';
import { accountsOf } from '../invoices/invoice-accounts.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { syncRepository } from '../sync/entities/sync-schemas.js';
import { type Actor, SyncEngine } from '../sync/sync-engine.service.js';

/** The visit fields whose change is the work moving: booked, arrived, signed off, cancelled, moved to another job. */
const VISIT_MOVES = ['status', 'actualStart', 'actualEnd', 'plannedStart', 'jobId'] as const;
/** A document issued, or superseded by its revision. */
const DOCUMENT_MOVES = ['supersededAt'] as const;

/**
 * A job's status follows its work (core's `statusFromWork`): a visit booked, arrived at or signed off, a document
 * issued, an invoice issued or paid moves it, in the same transaction as the change, whoever made it (a phone's
 * push included). The office may still set any status by hand: that is an ordinary edit of the job, and it stands
 * until the work moves again, since the status is worked out only when one of those changes happens, never on
 * read. A cancelled job is the office's word and is never moved.
 */
@Injectable()
export class JobProgress implements OnModuleInit {
  constructor(private readonly engine: SyncEngine) {}

  onModuleInit(): void {
    this.engine.onMove('visit', VISIT_MOVES, (em, moved) => this.followRows(em, 'visit', moved));
    this.engine.onMove('document', DOCUMENT_MOVES, (em, moved) => this.followRows(em, 'document', moved));
  }

  private async followRows(em: EntityManager, entity: 'visit' | 'document', moved: ReadonlyMap<string, Actor>): Promise<void> {
    const rows = await syncRepository(em, entity).find({ where: { id: In([...moved.keys()]) }, withDeleted: true, select: { id: true, jobId: true, organisationId: true } });
    const byJob = new Map<string, Actor>();
    // Demo data states each job's status as it stands; loading it is not work moving.
    for (const r of rows) if (moved.get(r.id)!.deviceId !== 'seed') byJob.set(r.jobId, moved.get(r.id)!);
    for (const [jobId, actor] of byJob) await this.follow(em, actor, [jobId]);
  }

  /** Moves these jobs to where their work puts them, as the server's write on behalf of whoever moved the work. */
  async follow(em: EntityManager, by: Pick<Actor, 'userId' | 'organisationId' | 'role'>, jobIds: readonly string[]): Promise<void> {
    if (!jobIds.length) return;
    const jobs = await syncRepository(em, 'job').find({ where: { id: In([...new Set(jobIds)]), organisationId: by.organisationId, deletedAt: IsNull() } });
    const work = await workOf(em, by.organisationId, jobs.map((j) => j.id));
    const writes = jobs.flatMap((row) => {
      if (row.status === 'cancelled') return [];
      const status = statusFromWork(work.get(row.id) ?? NO_WORK);
      return status === row.status ? [] : [{ row, changes: { status } }];
    });
    // Stamped as the office's word, so a phone holding the old status cannot put it back by merge.
    await this.engine.serverWrite(em, { userId: by.userId, organisationId: by.organisationId, role: by.role === 'technician' ? 'office' : by.role, deviceId: 'server' }, 'job', writes);
  }
}

/** What each job's visits, documents and invoices have reached, read in a few queries whatever the number of jobs. */
export async function workOf(em: EntityManager, organisationId: string, jobIds: readonly string[]): Promise<Map<string, JobWork>> {
  const out = new Map<string, JobWork>(jobIds.map((id) => [id, { ...NO_WORK }]));
  if (!jobIds.length) return out;
  const ids = [...out.keys()];
  const visits = await syncRepository(em, 'visit').find({ where: { jobId: In(ids), organisationId, deletedAt: IsNull() }, select: { id: true, jobId: true, status: true, actualStart: true } });
  const documents = await syncRepository(em, 'document').find({ where: { jobId: In(ids), organisationId, deletedAt: IsNull(), supersededAt: IsNull() }, select: { id: true, jobId: true } });
  const invoices = await em.find(Invoice, { where: { jobId: In(ids), organisationId, kind: 'invoice' } });
  const org = await em.findOneByOrFail(Organisation, { id: organisationId });
  const accounts = await accountsOf(em, invoices, localDate(new Date(), org.timeZone));
  for (const v of visits) {
    const w = out.get(v.jobId)!;
    const stage = visitStage(v);
    if (stage === 'planned') w.plannedVisits++;
    else if (stage === 'on-site') w.onSiteVisits++;
    else if (stage === 'finished') w.finishedVisits++;
  }
  for (const d of documents) out.get(d.jobId)!.issuedDocuments++;
  for (const i of invoices) {
    const w = out.get(i.jobId)!;
    if (i.status === 'draft') {
      w.draftInvoices++;
      continue;
    }
    const account = accounts.get(i.id);
    // Fully credited: nothing is asked for any more, so it neither counts as issued nor as unpaid.
    if (!account || account.creditedMinor >= i.grossMinor) continue;
    w.issuedInvoices++;
    if (account.owedMinor > 0) w.unpaidInvoices++;
  }
  return out;
}
