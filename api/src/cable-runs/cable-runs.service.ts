import { Injectable } from '@nestjs/common';
import { assessCableRun } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { nameOf, rowsById } from '../records/annotations.js';
import { type Listing, type OfficeRow, ofJobVisits, RecordsService } from '../records/records.service.js';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import { toSyncedRow } from '../sync/sync.service.js';
import type { ListCableRunsQueryDto } from './dto/list-cable-runs-query.dto.js';

@Injectable()
export class CableRunsService extends RecordsService<ListCableRunsQueryDto, 'cableRun'> {
  protected readonly entity = 'cableRun';

  protected listing(q: ListCableRunsQueryDto): Listing {
    return {
      search: ['label', 'endADescription', 'endBDescription'],
      filters: { siteId: q.siteId, lastVisitId: q.visitId, status: q.status },
      conditions: ofJobVisits('lastVisitId', q.jobId),
      // Labels are usually a prefix and a number ("RC-2", "RC-10"): shorter first keeps them in number order.
      order: [['LENGTH(r.label)', 'ASC'], ['label', 'ASC']],
    };
  }

  /** Each run with its ends' area names and the server's own judgement of its test (the phone's is in `verdict`). */
  protected async annotate(em: EntityManager, user: AuthUser, rows: SyncRecord<'cableRun'>[]): Promise<OfficeRow[]> {
    const areas = await rowsById(em, user.organisationId, 'area', rows.flatMap((r) => [r.endAAreaId, r.endBAreaId]));
    return rows.map((r) => ({
      ...toSyncedRow(r),
      endAAreaName: nameOf(areas.get(r.endAAreaId)),
      endBAreaName: nameOf(areas.get(r.endBAreaId)),
      assessment: assessCableRun({ medium: r.medium, scheme: r.scheme, wiremap: r.wiremap, lengthM: r.lengthM, linkKind: r.linkKind }),
    }));
  }
}
