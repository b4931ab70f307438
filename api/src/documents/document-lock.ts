import type { SyncEntityName } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import { PrintedRecord } from '../paperwork/entities/printed-record.entity.js';
import type { LockRule, RecordKey } from '../sync/record-locks.js';

/** An issued document's own fields that still change: how its e-mail is getting on. */
const FIELDS_AFTER_ISSUE = new Set(['emailState', 'emailedTo', 'emailedAt', 'emailError']);

/** Rowids per look-up: well inside both databases' limits on bound parameters. */
const CHUNK = 500;

/**
 * Which of these records a standing document prints: one issued and not superseded. Keyed `entity:id`, naming the
 * document by number (the newest, where two print the same record).
 */
export async function standingPrints(em: EntityManager, records: readonly RecordKey[]): Promise<Map<string, string>> {
  const wanted = new Set(records.map((r) => `${r.entity}:${r.id}`));
  const ids = [...new Set(records.map((r) => r.id))];
  const held = new Map<string, string>();
  for (let start = 0; start < ids.length; start += CHUNK) {
    const found = await em
      .createQueryBuilder(PrintedRecord, 'p')
      .innerJoin('document', 'd', 'd.id = p.documentId AND d.organisationId = p.organisationId')
      .select('p.entity', 'entity')
      .addSelect('p.rowId', 'rowId')
      .addSelect('d.number', 'number')
      .where('p.rowId IN (:...ids)', { ids: ids.slice(start, start + CHUNK) })
      .andWhere('d.issuedAt IS NOT NULL AND d.supersededAt IS NULL AND d.deletedAt IS NULL')
      .orderBy('d.issuedAt', 'ASC')
      .getRawMany<{ entity: SyncEntityName; rowId: string; number: string }>();
    for (const f of found) if (wanted.has(`${f.entity}:${f.rowId}`)) held.set(`${f.entity}:${f.rowId}`, f.number);
  }
  return held;
}

/**
 * A signed certificate never changes after issue, nor do the records it prints: an issued document locks itself
 * (but for its e-mail's progress) and every record it prints, site-wide ones included, for everyone, until a
 * revision supersedes it. A change attempted anyway reaches the office as a `locked-by-document` conflict.
 */
export const DOCUMENT_LOCK: LockRule = {
  reason: 'locked-by-document',
  locksRow: (document, fields) => document.issuedAt != null && fields.some((f) => !FIELDS_AFTER_ISSUE.has(f)),
  holds: standingPrints,
  // No document prints how to get into the site.
  unheldFields: { site: ['accessNotes'] },
};
