import type { EntityManager } from 'typeorm';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import type { OfficeRecord } from './records.service.js';

/** Rows by id, looked up with a reference that may be empty (an unset area or circuit finds nothing). */
export type RowsById<E extends OfficeRecord> = ReadonlyMap<string | null | undefined, SyncRecord<E>>;

/**
 * The rows of one kind that a page of rows points at, by id, read in one query and only from the caller's organisation.
 * Deleted rows are included, so that a record still names the area or circuit it was made against.
 */
export async function rowsById<E extends OfficeRecord>(
  em: EntityManager,
  organisationId: string,
  entity: E,
  ids: Iterable<string | null | undefined>,
): Promise<RowsById<E>> {
  const wanted = [...new Set([...ids].filter((id): id is string => typeof id === 'string'))];
  if (!wanted.length) return new Map();
  const rows = await syncRepository(em, entity)
    .createQueryBuilder('r')
    .where('r.id IN (:...wanted) AND r.organisationId = :organisationId', { wanted, organisationId })
    .getMany();
  return new Map(rows.map((r) => [r.id, r]));
}

/** What a circuit is called on screens and in reports: its board, way number and description. */
export function circuitLabel(circuit: SyncRecord<'circuit'> | undefined, board: SyncRecord<'board'> | undefined): string | null {
  if (!circuit) return null;
  const parts = [board ? `${board.name}, circuit ${circuit.number}` : `Circuit ${circuit.number}`];
  if (circuit.description) parts.push(circuit.description);
  return parts.join(' · ');
}

export const nameOf = (row: { name: string | null } | undefined): string | null => row?.name ?? null;
