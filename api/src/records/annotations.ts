import { type EntityManager, In } from 'typeorm';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import type { OfficeRecord } from './records.service.js';

/**
 * The rows of one kind that a page of rows points at, by id, read in one query and only from the caller's organisation.
 * Deleted rows are included, so that a record still names the area or circuit it was made against.
 */
export async function rowsById(
  em: EntityManager,
  organisationId: string,
  entity: OfficeRecord,
  ids: Iterable<unknown>,
): Promise<Map<string, SyncRecord>> {
  const wanted = [...new Set([...ids].filter((id): id is string => typeof id === 'string'))];
  if (!wanted.length) return new Map();
  const rows = await em.getRepository<SyncRecord>(entity).find({ where: { id: In(wanted), organisationId }, withDeleted: true });
  return new Map(rows.map((r) => [r.id, r]));
}

/** What a circuit is called on screens and in reports: its board, way number and description. */
export function circuitLabel(circuit: SyncRecord | undefined, board: SyncRecord | undefined): string | null {
  if (!circuit) return null;
  const parts = [board ? `${board.name as string}, circuit ${circuit.number as string}` : `Circuit ${circuit.number as string}`];
  if (circuit.description) parts.push(circuit.description as string);
  return parts.join(' · ');
}

export const nameOf = (row: SyncRecord | undefined): string | null => (row ? ((row.name as string | null) ?? null) : null);
