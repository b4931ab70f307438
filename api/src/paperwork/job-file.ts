import { NotFoundException } from '@nestjs/common';
import { type EntityManager, IsNull } from 'typeorm';
import { inTurn } from '../common/in-turn.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';

/** Everything about a job that every document, quote and invoice prints at its head. */
export interface JobFile {
  organisation: Organisation;
  job: SyncRecord;
  site: SyncRecord;
  customer: SyncRecord | null;
  /** Area names of the site, by id. */
  areas: Map<string, string>;
}

/** Rows of an organisation that have not been deleted. */
export const live = (organisationId: string) => ({ organisationId, deletedAt: IsNull() });

export function rows(em: EntityManager, entity: string, where: Record<string, unknown>): Promise<SyncRecord[]> {
  return em.getRepository<SyncRecord>(entity).find({ where: where as never });
}

/** The job with its site, customer and contractor; another organisation's job is simply not found. */
export async function loadJobFile(em: EntityManager, organisationId: string, jobId: string): Promise<JobFile> {
  const job = await em.getRepository<SyncRecord>('job').findOneBy({ id: jobId, ...live(organisationId) });
  if (!job) throw new NotFoundException('No such job.');
  const [organisation, site, customer, areas] = await inTurn(
    () => em.findOneByOrFail(Organisation, { id: organisationId }),
    () => em.getRepository<SyncRecord>('site').findOneOrFail({ where: { id: job.siteId as string, organisationId }, withDeleted: true }),
    () => em.getRepository<SyncRecord>('customer').findOne({ where: { id: job.customerId as string, organisationId }, withDeleted: true }),
    () => rows(em, 'area', { siteId: job.siteId, organisationId }),
  );
  return { organisation, job, site, customer, areas: new Map(areas.map((a) => [a.id, a.name as string])) };
}

export function jobVisits(em: EntityManager, file: JobFile): Promise<SyncRecord[]> {
  return rows(em, 'visit', { jobId: file.job.id, ...live(file.organisation.id) });
}
