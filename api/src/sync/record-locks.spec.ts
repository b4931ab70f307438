import { describe, expect, it } from '@jest/globals';
import { SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import type { SyncRecord } from './entities/sync-schemas.js';
import { type LockReads, type LockRule, RecordLocks } from './record-locks.js';

const row = (id: string, fields: Record<string, unknown>): SyncRecord => ({
  id, organisationId: 'org', version: 1, fieldMeta: {}, deletedAt: null, createdById: null, updatedById: null, createdAt: new Date(), updatedAt: new Date(), ...fields,
});

const visit = row('visit-1', { jobId: 'job-1', siteId: 'site-1', status: 'on-site' });
const note = row('note-1', { visitId: 'visit-1', siteId: 'site-1', text: 'Lights off at the board' });
const circuit = row('circuit-1', { siteId: 'site-1', boardId: 'board-1', number: '2', deviceRatingA: 32 });
const site = row('site-1', { earthing: 'TN-C-S', zeOhm: 0.28, accessNotes: 'Key with the neighbour' });

/** Rows held in memory; every read of the database is noted. */
function store(tables: Partial<Record<SyncEntityName, SyncRecord[]>>) {
  const reads: string[] = [];
  const rows = (entity: SyncEntityName) => tables[entity] ?? [];
  const held = new Map<string, SyncRecord | null>();
  const source: LockReads = {
    em: {} as EntityManager,
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
  };
  return { source, reads };
}

/**
 * A rule as documents register one: issued documents hold themselves, but for their e-mail's progress, and the
 * records they print (here a table of `entity:id` to number), but for a site's access notes.
 */
function printing(prints: Map<string, string>, reads: string[]): LockRule {
  return {
    reason: 'locked-by-document',
    locksRow: (doc, fields) => doc.issuedAt != null && fields.some((f) => !f.startsWith('email')),
    holds: async (_em, records) => {
      reads.push(`held ${records.map((r) => r.id).join(',')}`);
      return new Map(records.map((r) => `${r.entity}:${r.id}`).filter((k) => prints.has(k)).map((k) => [k, prints.get(k)!]));
    },
    unheldFields: { site: ['accessNotes'] },
  };
}

describe('record locks', () => {
  it('judges a row with a rule of its own by that rule alone', async () => {
    const { source, reads } = store({});
    const locks = new RecordLocks(new Map([['document', printing(new Map(), reads)]]), source);
    const issued = row('doc-1', { jobId: 'job-1', issuedAt: '2026-03-14T10:00:00.000Z' });
    expect(await locks.lockOf('office', SYNC_ENTITIES.document, issued, ['number'])).toEqual({ reason: 'locked-by-document' });
    expect(await locks.lockOf('admin', SYNC_ENTITIES.document, issued, ['emailState', 'emailError'])).toBeNull();
    expect(await locks.lockOf('office', SYNC_ENTITIES.document, row('doc-2', { jobId: 'job-1', issuedAt: null }), ['title'])).toBeNull();
  });

  it('holds every record a document prints, site-wide ones included, for everyone, naming the document, from one read per batch', async () => {
    const { source, reads } = store({ visit: [visit] });
    const prints = new Map([['circuit:circuit-1', 'MW-0001'], ['site:site-1', 'MW-0001'], ['note:note-1', 'MW-0001']]);
    const locks = new RecordLocks(new Map([['document', printing(prints, reads)]]), source);
    await locks.preload([['note', note], ['circuit', circuit], ['site', site]], SYNC_ENTITIES);
    expect(reads).toEqual(['visit visit-1', 'held note-1,circuit-1,site-1']);
    expect(await locks.lockOf('technician', SYNC_ENTITIES.circuit, circuit, ['deviceRatingA'])).toEqual({ reason: 'locked-by-document', heldBy: 'MW-0001' });
    expect(await locks.lockOf('admin', SYNC_ENTITIES.site, site, ['earthing', 'zeOhm'])).toEqual({ reason: 'locked-by-document', heldBy: 'MW-0001' });
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toMatchObject({ heldBy: 'MW-0001' });
    // A delete changes no field, and is held like any change.
    expect(await locks.lockOf('office', SYNC_ENTITIES.circuit, circuit, [])).toMatchObject({ heldBy: 'MW-0001' });
    expect(reads).toHaveLength(2);
  });

  it('lets a field no document prints change on a held record', async () => {
    const { source, reads } = store({});
    const locks = new RecordLocks(new Map([['document', printing(new Map([['site:site-1', 'MW-0001']]), reads)]]), source);
    expect(await locks.lockOf('office', SYNC_ENTITIES.site, site, ['accessNotes'])).toBeNull();
    expect(await locks.lockOf('office', SYNC_ENTITIES.site, site, ['accessNotes', 'pfcKa'])).toMatchObject({ heldBy: 'MW-0001' });
  });

  it('reads what is held again once a document of the batch was written', async () => {
    const { source, reads } = store({});
    const prints = new Map<string, string>();
    const locks = new RecordLocks(new Map([['document', printing(prints, reads)]]), source);
    expect(await locks.lockOf('office', SYNC_ENTITIES.circuit, circuit, ['number'])).toBeNull();
    prints.set('circuit:circuit-1', 'MW-0002');
    expect(await locks.lockOf('office', SYNC_ENTITIES.circuit, circuit, ['number'])).toBeNull();
    locks.changed('note');
    expect(await locks.lockOf('office', SYNC_ENTITIES.circuit, circuit, ['number'])).toBeNull();
    locks.changed('document');
    expect(await locks.lockOf('office', SYNC_ENTITIES.circuit, circuit, ['number'])).toMatchObject({ heldBy: 'MW-0002' });
    expect(reads.filter((r) => r.startsWith('held'))).toHaveLength(2);
  });

  it('holds a signed-off visit\'s records against technicians only', async () => {
    const finished = row('visit-1', { jobId: 'job-1', siteId: 'site-1', status: 'finished' });
    const { source, reads } = store({ visit: [finished] });
    const locks = new RecordLocks(new Map([['document', printing(new Map(), reads)]]), source);
    expect(await locks.lockOf('technician', SYNC_ENTITIES.note, note, ['text'])).toEqual({ reason: 'locked-by-sign-off' });
    expect(await locks.lockOf('technician', SYNC_ENTITIES.visit, finished, ['observations'])).toEqual({ reason: 'locked-by-sign-off' });
    expect(await locks.lockOf('office', SYNC_ENTITIES.note, note, ['text'])).toBeNull();
  });

  it('holds nothing for a feature that registered no rule, and nothing no document prints', async () => {
    const { source, reads } = store({ visit: [visit] });
    expect(await new RecordLocks(new Map(), source).lockOf('technician', SYNC_ENTITIES.circuit, circuit, ['number'])).toBeNull();
    const area = row('area-1', { siteId: 'site-1', name: 'Loft' });
    const locks = new RecordLocks(new Map([['document', printing(new Map([['circuit:circuit-1', 'MW-0001']]), reads)]]), source);
    expect(await locks.lockOf('technician', SYNC_ENTITIES.area, area, ['name'])).toBeNull();
  });
});
