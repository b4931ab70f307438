import { Injectable } from '@nestjs/common';
import { type EntityManager, In, IsNull, Like } from 'typeorm';
import { syncRepository } from './entities/sync-schemas.js';

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

@Injectable()
export class ScopeService {
  async technicianScope(em: EntityManager, organisationId: string, userId: string): Promise<TechnicianScope> {
    // technicianIds is a JSON list; LIKE narrows the rows, the check below makes it exact.
    const visits = await syncRepository(em, 'visit').find({
      where: { organisationId, deletedAt: IsNull(), technicianIds: Like(`%${userId}%`) },
      select: { id: true, siteId: true, jobId: true, technicianIds: true, status: true },
    });
    const own = visits.filter((v) => Array.isArray(v.technicianIds) && v.technicianIds.includes(userId));
    const mine = own.filter((v) => v.status !== 'cancelled');
    const visitSite = new Map(mine.map((v) => [v.id, v.siteId]));
    const siteIds = new Set(visitSite.values());
    const sites = siteIds.size
      ? await syncRepository(em, 'site').find({ where: { id: In([...siteIds]), organisationId }, select: { id: true, customerId: true } })
      : [];
    return {
      visitIds: new Set(visitSite.keys()),
      visitSite,
      siteIds,
      customerIds: new Set(sites.map((s) => s.customerId)),
      ownVisitIds: new Set(own.map((v) => v.id)),
      jobIds: new Set(own.map((v) => v.jobId)),
    };
  }

  async customersOfSites(em: EntityManager, organisationId: string, siteIds: string[]): Promise<Set<string>> {
    if (!siteIds.length) return new Set();
    const sites = await syncRepository(em, 'site').find({ where: { id: In(siteIds), organisationId }, select: { id: true, customerId: true }, withDeleted: true });
    return new Set(sites.map((s) => s.customerId));
  }
}
