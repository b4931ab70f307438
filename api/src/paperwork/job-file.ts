import { NotFoundException } from '@nestjs/common';
import { type EntityManager, IsNull } from 'typeorm';
import { inTurn } from '../common/in-turn.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';

/** Everything about a job that every document, quote and invoice prints at its head. */
export interface JobFile {
  organisation: Organisation;
  job: SyncRecord<'job'>;
  site: SyncRecord<'site'>;
  customer: SyncRecord<'customer'> | null;
  /** Area names of the site, by id (looked up with a reference that may be empty). */
  areas: ReadonlyMap<string | null, string>;
}

/** Rows of an organisation that have not been deleted. */
export const live = (organisationId: string) => ({ organisationId, deletedAt: IsNull() });

/** The job with its site, customer and contractor; another organisation's job is simply not found. */
export async function loadJobFile(em: EntityManager, organisationId: string, jobId: string): Promise<JobFile> {
  const job = await syncRepository(em, 'job').findOneBy({ id: jobId, ...live(organisationId) });
  if (!job) throw new NotFoundException('No such job.');
  const [organisation, site, customer, areas] = await inTurn(
    () => em.findOneByOrFail(Organisation, { id: organisationId }),
    () => syncRepository(em, 'site').findOneOrFail({ where: { id: job.siteId, organisationId }, withDeleted: true }),
    () => syncRepository(em, 'customer').findOne({ where: { id: job.customerId, organisationId }, withDeleted: true }),
    () => syncRepository(em, 'area').find({ where: { siteId: job.siteId, organisationId } }),
  );
  return { organisation, job, site, customer, areas: new Map<string | null, string>(areas.map((a) => [a.id, a.name])) };
}

export function jobVisits(em: EntityManager, file: JobFile): Promise<SyncRecord<'visit'>[]> {
  return syncRepository(em, 'visit').find({ where: { jobId: file.job.id, ...live(file.organisation.id) } });
}
