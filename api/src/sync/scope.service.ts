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
}

@Injectable()
export class ScopeService {
  async technicianScope(em: EntityManager, organisationId: string, userId: string): Promise<TechnicianScope> {
    // technicianIds is a JSON list; LIKE narrows the rows, the check below makes it exact.
    const visits = await syncRepository(em, 'visit').find({
      where: { organisationId, deletedAt: IsNull(), technicianIds: Like(`%${userId}%`) },
      select: { id: true, siteId: true, technicianIds: true, status: true },
    });
    const mine = visits.filter((v) => Array.isArray(v.technicianIds) && v.technicianIds.includes(userId) && v.status !== 'cancelled');
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
    };
  }

  async customersOfSites(em: EntityManager, organisationId: string, siteIds: string[]): Promise<Set<string>> {
    if (!siteIds.length) return new Set();
    const sites = await syncRepository(em, 'site').find({ where: { id: In(siteIds), organisationId }, select: { id: true, customerId: true }, withDeleted: true });
    return new Set(sites.map((s) => s.customerId));
  }
}
