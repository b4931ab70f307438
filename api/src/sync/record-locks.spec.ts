import { describe, expect, it } from '@jest/globals';
import { SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
import type { SyncRecord } from './entities/sync-schemas.js';
import { type LockReads, type LockRule, RecordLocks } from './record-locks.js';

const row = (id: string, fields: Record<string, unknown>): SyncRecord => ({
  id, organisationId: 'org', version: 1, fieldMeta: {}, deletedAt: null, createdById: null, updatedById: null, createdAt: new Date(), updatedAt: new Date(), ...fields,
});

const visit = row('visit-1', { jobId: 'job-1', siteId: 'site-1', status: 'on-site' });
const note = row('note-1', { visitId: 'visit-1', siteId: 'site-1', text: 'Lights off at the board' });

/** Rows held in memory; every read of the database is noted. */
function store(tables: Partial<Record<SyncEntityName, SyncRecord[]>>, waiting: Partial<Record<SyncEntityName, SyncRecord[]>> = {}) {
  const reads: string[] = [];
  const rows = (entity: SyncEntityName) => tables[entity] ?? [];
  const held = new Map<string, SyncRecord | null>();
  const source: LockReads = {
    has: (entity, id) => held.has(`${entity}:${id}`),
    rowOf: async (entity, id) => {
      if (!held.has(`${entity}:${id}`)) {
        reads.push(`${entity} ${id}`);
        held.set(`${entity}:${id}`, rows(entity).find((r) => r.id === id) ?? null);
      }
      return held.get(`${entity}:${id}`)!;
    },
    load: async (entity, ids) => {
      reads.push(`${entity} ${ids.join(',')}`);
      const found = rows(entity).filter((r) => ids.includes(r.id));
      for (const r of found) held.set(`${entity}:${r.id}`, r);
      return found;
    },
    select: async (entity, column, values, where = {}) => {
      reads.push(`${entity} by ${column}`);
      return rows(entity).filter((r) => values.includes(r[column]) && Object.entries(where).every(([k, v]) => r[k] === v));
    },
    waiting: (entity) => waiting[entity] ?? [],
  };
  return { source, reads };
}

/** A rule as a feature registers one: issued documents hold themselves, but for their e-mail's progress, and their job. */
const ISSUED: LockRule = {
  reason: 'locked-by-document',
  locksRow: (doc, fields) => doc.issuedAt != null && fields.some((f) => !f.startsWith('email')),
  locksJob: (doc) => doc.issuedAt != null,
};
const documentRules = new Map<SyncEntityName, LockRule>([['document', ISSUED]]);

describe('record locks', () => {
  it('judges a row with a rule of its own by that rule alone; a delete changes no field and is not held', async () => {
    const { source } = store({});
    const locks = new RecordLocks(documentRules, source);
    const issued = row('doc-1', { jobId: 'job-1', issuedAt: '2026-03-14T10:00:00.000Z' });
    expect(await locks.lockOf('office', SYNC_ENTITIES.document, issued, ['number'])).toBe('locked-by-document');
    expect(await locks.lockOf('admin', SYNC_ENTITIES.document, issued, ['emailState', 'emailError'])).toBeNull();
    expect(await locks.lockOf('office', SYNC_ENTITIES.document, row('doc-2', { jobId: 'job-1', issuedAt: null }), ['title'])).toBeNull();
    expect(await locks.lockOf('office', SYNC_ENTITIES.document, issued, [])).toBeNull();
  });

  it('locks every record of a job\'s visits behind an issued document, for everyone, from one read per batch', async () => {
    const { source, reads } = store({ visit: [visit], document: [row('doc-1', { jobId: 'job-1', issuedAt: '2026-03-14T10:00:00.000Z' })] });
    const locks = new RecordLocks(documentRules, source);
    await locks.preload([['note', note]], SYNC_ENTITIES);
    expect(reads).toEqual(['visit visit-1', 'document by jobId']);
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toBe('locked-by-document');
    expect(await locks.lockOf('technician', SYNC_ENTITIES.visit, visit, ['observations'])).toBe('locked-by-document');
    expect(reads).toHaveLength(2);
  });

  it('sees a document issued earlier in the same batch, before it is written', async () => {
    const { source } = store({ visit: [visit] }, { document: [row('doc-1', { jobId: 'job-1', issuedAt: '2026-03-14T10:00:00.000Z' })] });
    const locks = new RecordLocks(documentRules, source);
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toBe('locked-by-document');
  });

  it('reads a job again once a document of the batch was written', async () => {
    const tables = { visit: [visit], document: [row('doc-1', { jobId: 'job-1', issuedAt: null })] };
    const { source, reads } = store(tables);
    const locks = new RecordLocks(documentRules, source);
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toBeNull();
    tables.document[0]!.issuedAt = '2026-03-14T10:00:00.000Z';
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toBeNull();
    locks.changed('document');
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toBe('locked-by-document');
    expect(reads.filter((r) => r.startsWith('document'))).toHaveLength(2);
  });

  it('holds a signed-off visit\'s records against technicians only', async () => {
    const finished = row('visit-1', { jobId: 'job-1', siteId: 'site-1', status: 'finished' });
    const { source } = store({ visit: [finished] });
    const locks = new RecordLocks(documentRules, source);
    expect(await locks.lockOf('technician', SYNC_ENTITIES.note, note, ['text'])).toBe('locked-by-sign-off');
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toBeNull();
  });

  it('holds nothing for a feature that registered no rule, and nothing not tied to a visit', async () => {
    const { source } = store({ visit: [visit], document: [row('doc-1', { jobId: 'job-1', issuedAt: '2026-03-14T10:00:00.000Z' })] });
    expect(await new RecordLocks(new Map(), source).lockOf('technician', SYNC_ENTITIES.note, note, ['text'])).toBeNull();
    const area = row('area-1', { siteId: 'site-1', name: 'Loft' });
    expect(await new RecordLocks(documentRules, source).lockOf('technician', SYNC_ENTITIES.area, area, ['name'])).toBeNull();
  });
});
