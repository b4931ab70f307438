import { Injectable } from '@nestjs/common';
import type { VisitRecord } from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { type Listing, PlainRecordsService, type SameSiteRef } from '../records/records.service.js';
import { syncRepository } from '../sync/entities/sync-schemas.js';
import { toSyncedRow } from '../sync/sync.service.js';
import { User } from '../users/entities/user.entity.js';
import type { ListVisitsQueryDto } from './dto/list-visits-query.dto.js';

@Injectable()
export class VisitsService extends PlainRecordsService<ListVisitsQueryDto, 'visit'> {
  protected readonly entity = 'visit';
  protected readonly sameSite: SameSiteRef[] = [{ field: 'jobId', entity: 'job' }];

  protected listing(q: ListVisitsQueryDto): Listing {
    return {
      // A visit has no words of its own: it is found by its job and its site.
      search: [],
      searchThrough: [
        { field: 'jobId', entity: 'job', columns: ['reference', 'title'] },
        { field: 'siteId', entity: 'site', columns: ['name', 'address', 'postcode'] },
      ],
      filters: { jobId: q.jobId, siteId: q.siteId },
      listContains: { technicianIds: q.technicianId },
      range: { field: 'plannedStart', from: q.from, to: q.to },
      // The schedule's order; visits not yet scheduled come last.
      order: [['plannedStart', 'ASC', 'NULLS LAST']],
    };
  }

  /** Everything recorded on one visit, for the office's page of it; another organisation's visit is not found. */
  async record(user: AuthUser, id: string): Promise<VisitRecord> {
    const visit = await this.findOne(user, id);
    return this.queue.read(async (em) => {
      const mine = { organisationId: user.organisationId, deletedAt: IsNull() };
      const onVisit = { ...mine, visitId: id };
      const job = await syncRepository(em, 'job').findOneOrFail({ where: { id: visit.jobId, organisationId: user.organisationId }, withDeleted: true });
      const site = await syncRepository(em, 'site').findOneOrFail({ where: { id: visit.siteId, organisationId: user.organisationId }, withDeleted: true });
      const notes = await syncRepository(em, 'note').find({ where: onVisit, order: { createdAt: 'ASC', id: 'ASC' } });
      const parts = await syncRepository(em, 'materialLine').find({ where: onVisit, order: { createdAt: 'ASC', id: 'ASC' } });
      const cables = await syncRepository(em, 'cableRun').find({ where: { ...mine, lastVisitId: id }, order: { label: 'ASC' } });
      const pointChanges = await syncRepository(em, 'pointChange').find({ where: onVisit, order: { createdAt: 'ASC', id: 'ASC' } });
      const testResults = await syncRepository(em, 'testResult').find({ where: onVisit, order: { createdAt: 'ASC', id: 'ASC' } });

      const circuitIds = [...new Set([...pointChanges, ...testResults].map((r) => r.circuitId).filter((c): c is string => !!c))];
      const circuits = circuitIds.length ? await syncRepository(em, 'circuit').find({ where: { id: In(circuitIds), organisationId: user.organisationId }, withDeleted: true }) : [];
      const circuitLabel = new Map(circuits.map((c) => [c.id, c.description ? `${c.number} · ${c.description}` : c.number]));
      const label = (circuitId: string | null | undefined) => (circuitId && circuitLabel.get(circuitId)) || null;

      const people = await this.names(em, user, [...(visit.technicianIds ?? []), ...[notes, parts, cables, pointChanges, testResults].flat().map((r) => r.createdById)]);
      const by = <T extends { createdById?: string | null }>(row: T) => ({ ...row, createdByName: (row.createdById && people.get(row.createdById)) || null });

      return {
        visit,
        job: { id: job.id, reference: job.reference ?? null, title: job.title, status: job.status ?? null },
        site: { id: site.id, name: site.name ?? null, address: site.address ?? null, postcode: site.postcode ?? null },
        technicians: (visit.technicianIds ?? []).map((t) => ({ id: t, name: people.get(t) ?? 'A former member of the team' })),
        notes: notes.map((r) => by(toSyncedRow(r))),
        parts: parts.map((r) => by(toSyncedRow(r))),
        cables: cables.map((r) => by(toSyncedRow(r))),
        pointChanges: pointChanges.map((r) => ({ ...by(toSyncedRow(r)), circuitLabel: label(r.circuitId) })),
        testResults: testResults.map((r) => ({ ...by(toSyncedRow(r)), circuitLabel: label(r.circuitId) })),
      };
    });
  }

  private async names(em: EntityManager, user: AuthUser, ids: Array<string | null | undefined>): Promise<Map<string, string>> {
    const wanted = [...new Set(ids.filter((i): i is string => !!i))];
    const found = wanted.length ? await em.find(User, { where: { id: In(wanted), organisationId: user.organisationId }, select: { id: true, name: true }, withDeleted: true }) : [];
    return new Map(found.map((u) => [u.id, u.name]));
  }
}
