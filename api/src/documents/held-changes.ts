import { type HeldChange, isSyncEntity, type SyncEntityName } from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import { PrintedRecord } from '../paperwork/entities/printed-record.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { DOCUMENT_LOCK } from './document-lock.js';

const describe = (entity: SyncEntityName, row: SyncRecord | undefined, circuits: Map<string, SyncRecord>): string => {
  const circuit = (c: SyncRecord | undefined) => (c ? `Circuit ${String(c.number)}${c.description ? ` (${String(c.description)})` : ''}` : 'A circuit');
  switch (entity) {
    case 'site':
      return 'The site';
    case 'circuit':
      return circuit(row);
    case 'board':
      return `Board ${String(row?.name ?? '')}`.trim();
    case 'cableRun':
      return `Cable ${String(row?.label ?? '')}`.trim();
    case 'testResult':
      return `Test of ${circuit(typeof row?.circuitId === 'string' ? circuits.get(row.circuitId) : undefined).replace(/^C/, 'c')}`;
    case 'pointChange':
      return 'A point change';
    case 'linkTest':
      return 'A link’s performance results';
    case 'visit':
      return 'The visit';
    case 'photo':
      return `Photo${row?.caption ? `: ${String(row.caption)}` : ''}`;
    default:
      return entity;
  }
};

/** The changes waiting behind the job's standing documents, oldest first. */
export async function heldChangesOf(em: EntityManager, organisationId: string, jobId: string): Promise<HeldChange[]> {
  const found = await em
    .createQueryBuilder()
    .select('c.id', 'conflictId')
    .addSelect('d.id', 'documentId')
    .addSelect('d.number', 'number')
    .from('conflict', 'c')
    .innerJoin(PrintedRecord, 'p', 'p.rowId = c.rowId AND p.entity = c.entity AND p.organisationId = c.organisationId')
    .innerJoin('document', 'd', 'd.id = p.documentId')
    .where('c.organisationId = :org AND c.reason = :reason AND c.resolvedAt IS NULL', { org: organisationId, reason: DOCUMENT_LOCK.reason })
    .andWhere('d.jobId = :jobId AND d.issuedAt IS NOT NULL AND d.supersededAt IS NULL AND d.deletedAt IS NULL', { jobId })
    .getRawMany<{ conflictId: string; documentId: string; number: string }>();
  if (!found.length) return [];
  const conflicts = await syncRepository(em, 'conflict').find({ where: { id: In(found.map((f) => f.conflictId)) }, order: { version: 'ASC' } });
  const rows = new Map<string, SyncRecord>();
  const byEntity = new Map<SyncEntityName, string[]>();
  for (const c of conflicts) if (isSyncEntity(c.entity)) byEntity.set(c.entity, [...(byEntity.get(c.entity) ?? []), c.rowId]);
  // One query at a time: they share the transaction's connection.
  for (const [entity, ids] of byEntity) for (const r of await em.getRepository<SyncRecord>(entity).find({ where: { id: In(ids) }, withDeleted: true })) rows.set(`${entity}:${r.id}`, r);
  const circuitIds = [...rows.values()].map((r) => r.circuitId).filter((id): id is string => typeof id === 'string');
  const circuits = new Map((circuitIds.length ? await em.getRepository<SyncRecord>('circuit').find({ where: { id: In(circuitIds) }, withDeleted: true }) : []).map((c) => [c.id, c]));
  const documentOf = new Map(found.map((f) => [f.conflictId, f]));
  return conflicts.filter((c) => isSyncEntity(c.entity)).map((c) => {
    const entity = c.entity;
    const doc = documentOf.get(c.id)!;
    return {
      conflictId: c.id,
      documentId: doc.documentId,
      number: doc.number,
      entity,
      rowId: c.rowId,
      record: describe(entity, rows.get(`${entity}:${c.rowId}`), circuits),
      field: c.field,
      issuedValue: c.keptValue,
      pendingValue: c.discardedValue,
      changedById: c.discardedById ?? null,
      changedHlc: c.discardedHlc ?? null,
    };
  });
}
