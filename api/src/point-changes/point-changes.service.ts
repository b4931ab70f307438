import { Injectable } from '@nestjs/common';
import { checksBeforeWork, DEFAULT_RULE_SET } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { circuitLabel, nameOf, rowsById } from '../records/annotations.js';
import { type Listing, type OfficeRow, ofJobVisits, RecordsService } from '../records/records.service.js';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import { toSyncedRow } from '../sync/sync.service.js';
import type { ListPointChangesQueryDto } from './dto/list-point-changes-query.dto.js';
import { inTurn } from '../common/in-turn.js';

@Injectable()
export class PointChangesService extends RecordsService<ListPointChangesQueryDto, 'pointChange'> {
  protected readonly entity = 'pointChange';

  protected listing(q: ListPointChangesQueryDto): Listing {
    return {
      search: ['accessoryKind', 'fromDescription', 'toDescription'],
      filters: { visitId: q.visitId, siteId: q.siteId, circuitId: q.circuitId, action: q.action },
      conditions: ofJobVisits('visitId', q.jobId),
      // In the order they were recorded: ids are UUIDv7, made on the phone when the change was written down.
      order: [['id', 'ASC']],
    };
  }

  /** Each change with the names of its circuit and areas, when its visit was planned, and the server's own checks before the work. */
  protected async annotate(em: EntityManager, user: AuthUser, rows: SyncRecord<'pointChange'>[]): Promise<OfficeRow[]> {
    const org = user.organisationId;
    const [areas, circuits, visits, sites] = await inTurn(
      () => rowsById(em, org, 'area', rows.flatMap((r) => [r.fromAreaId, r.toAreaId])),
      () => rowsById(em, org, 'circuit', rows.map((r) => r.circuitId)),
      () => rowsById(em, org, 'visit', rows.map((r) => r.visitId)),
      () => rowsById(em, org, 'site', rows.map((r) => r.siteId)),
    );
    const boards = await rowsById(em, org, 'board', [...circuits.values()].map((c) => c.boardId));
    return rows.map((r) => {
      const circuit = circuits.get(r.circuitId);
      return {
        ...toSyncedRow(r),
        fromAreaName: nameOf(areas.get(r.fromAreaId)),
        toAreaName: nameOf(areas.get(r.toAreaId)),
        circuitLabel: circuitLabel(circuit, boards.get(circuit?.boardId)),
        visitPlannedStart: visits.get(r.visitId)?.plannedStart ?? null,
        beforeWork: checksBeforeWork({ point: r, circuit, site: sites.get(r.siteId) }, DEFAULT_RULE_SET),
      };
    });
  }
}
