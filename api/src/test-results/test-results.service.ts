import { Injectable } from '@nestjs/common';
import { assessCircuitTest, checksBeforeWork, circuitUnderTest, DEFAULT_RULE_SET, readingsOf } from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { circuitLabel, rowsById } from '../records/annotations.js';
import { type Listing, type OfficeRow, ofJobVisits, RecordsService } from '../records/records.service.js';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import { toSyncedRow } from '../sync/sync.service.js';
import type { ListTestResultsQueryDto } from './dto/list-test-results-query.dto.js';
import { inTurn } from '../common/in-turn.js';

/** The circuit as recorded, as the office reads it beside a result. */
const circuitOf = (c: SyncRecord<'circuit'>) => ({
  boardId: c.boardId, number: c.number, description: c.description, kind: c.kind, deviceType: c.deviceType, deviceRatingA: c.deviceRatingA,
  rcdRatingMa: c.rcdRatingMa, rcdType: c.rcdType, liveCsaMm2: c.liveCsaMm2, cpcCsaMm2: c.cpcCsaMm2, lengthM: c.lengthM, faultProtection: c.faultProtection,
});

/** The point changes of these results' visits on these results' circuits, in the order they were recorded. */
async function pointChangesOf(em: EntityManager, organisationId: string, rows: SyncRecord<'testResult'>[]): Promise<SyncRecord<'pointChange'>[]> {
  const visitIds = [...new Set(rows.map((r) => r.visitId))];
  if (!visitIds.length) return [];
  return em.getRepository<SyncRecord<'pointChange'>>('pointChange').find({ where: { organisationId, visitId: In(visitIds) }, order: { id: 'ASC' } });
}

@Injectable()
export class TestResultsService extends RecordsService<ListTestResultsQueryDto, 'testResult'> {
  protected readonly entity = 'testResult';

  protected listing(q: ListTestResultsQueryDto): Listing {
    return {
      search: ['instrument'],
      filters: { visitId: q.visitId, siteId: q.siteId, circuitId: q.circuitId },
      conditions: ofJobVisits('visitId', q.jobId),
      order: [['testedAt', 'ASC', 'NULLS LAST']],
    };
  }

  /**
   * Each result with its circuit and the server's own verdicts, worked out from the readings, the circuit as it is
   * recorded now and the site's earthing. The phone's verdicts stay in `verdicts`; these are the ones documents use.
   * Beside them, the checks before the work of each point change on that circuit in the same visit.
   */
  protected async annotate(em: EntityManager, user: AuthUser, rows: SyncRecord<'testResult'>[]): Promise<OfficeRow[]> {
    const org = user.organisationId;
    const [circuits, sites, points] = await inTurn(
      () => rowsById(em, org, 'circuit', rows.map((r) => r.circuitId)),
      () => rowsById(em, org, 'site', rows.map((r) => r.siteId)),
      () => pointChangesOf(em, org, rows),
    );
    const boards = await rowsById(em, org, 'board', [...circuits.values()].map((c) => c.boardId));
    return rows.map((r) => {
      const c = circuits.get(r.circuitId);
      const board = boards.get(c?.boardId);
      const circuit = c ? { id: c.id, ...circuitOf(c), boardName: board?.name ?? null, label: circuitLabel(c, board) } : null;
      const earthing = sites.get(r.siteId)?.earthing ?? null;
      const assessment = assessCircuitTest({ circuit: c ? circuitUnderTest(c) : {}, readings: readingsOf(r), earthing }, DEFAULT_RULE_SET);
      const beforeWork = points
        .filter((p) => p.visitId === r.visitId && p.circuitId === r.circuitId)
        .map((p) => ({ pointChangeId: p.id, accessoryKind: p.accessoryKind ?? null, ...checksBeforeWork({ point: p, circuit: c, site: sites.get(r.siteId) }, DEFAULT_RULE_SET) }));
      return { ...toSyncedRow(r), circuit, earthing, assessment, beforeWork };
    });
  }
}
