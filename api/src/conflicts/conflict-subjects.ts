import type { ConflictSubject, SyncEntityName } from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';

type Named = Exclude<SyncEntityName, 'conflict'>;

const day = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'Europe/London' });
const firstWords = (text: string | null | undefined, n = 60) => (text && text.length > n ? `${text.slice(0, n - 1)}…` : (text ?? ''));

/**
 * Says which record each conflict is about in the office's words (a circuit by its number and description, on its
 * board, at its site, for its customer) rather than by id. Rows are read with deleted ones, since a deletion may be
 * what conflicted; a record that cannot be found is named by its kind alone.
 */
export async function conflictSubjects(em: EntityManager, organisationId: string, conflicts: Array<{ entity: string; rowId: string }>): Promise<Map<string, ConflictSubject>> {
  const cache = new Map<string, SyncRecord | null>();
  const load = async (entity: Named, ids: Array<string | null | undefined>): Promise<void> => {
    const wanted = [...new Set(ids.filter((id): id is string => !!id && !cache.has(`${entity}:${id}`)))];
    if (wanted.length === 0) return;
    const rows = await em.getRepository<SyncRecord>(entity).find({ where: { id: In(wanted), organisationId }, withDeleted: true });
    for (const id of wanted) cache.set(`${entity}:${id}`, null);
    for (const row of rows) cache.set(`${entity}:${row.id}`, row);
  };
  const get = <E extends Named>(entity: E, id: string | null | undefined) => (id ? ((cache.get(`${entity}:${id}`) ?? null) as SyncRecord<E> | null) : null);

  // Each kind, then what it points at, a level at a time.
  const byEntity = new Map<string, string[]>();
  for (const c of conflicts) byEntity.set(c.entity, [...(byEntity.get(c.entity) ?? []), c.rowId]);
  for (const [entity, ids] of byEntity) if (entity !== 'conflict') await load(entity as Named, ids);
  const all = (entity: Named) => [...cache].filter(([k, v]) => k.startsWith(`${entity}:`) && v).map(([, v]) => v as SyncRecord);
  await load('cableRun', all('linkTest').map((r) => (r as SyncRecord<'linkTest'>).cableRunId));
  await load('circuit', [...all('testResult'), ...all('pointChange')].map((r) => (r as SyncRecord<'testResult'>).circuitId));
  await load('visit', [...all('testResult'), ...all('pointChange'), ...all('photo'), ...all('note'), ...all('materialLine'), ...all('linkTest')].map((r) => (r as SyncRecord<'note'>).visitId));
  await load('board', all('circuit').map((r) => (r as SyncRecord<'circuit'>).boardId));
  await load('job', all('visit').map((r) => (r as SyncRecord<'visit'>).jobId));
  await load('site', [...all('circuit'), ...all('board'), ...all('area'), ...all('cableRun'), ...all('job'), ...all('visit')].map((r) => (r as SyncRecord<'board'>).siteId));
  await load('customer', [...all('site'), ...all('job')].map((r) => (r as SyncRecord<'site'>).customerId));

  const siteWords = (siteId: string | null | undefined): string[] => {
    const site = get('site', siteId);
    if (!site) return [];
    const customer = get('customer', site.customerId);
    return [site.name ?? site.address, customer?.name].filter((w): w is string => !!w);
  };
  const circuitWords = (circuitId: string | null | undefined) => {
    const c = get('circuit', circuitId);
    return c ? `circuit ${c.number}${c.description ? ` (${c.description})` : ''}` : 'a circuit';
  };
  const visitWords = (visitId: string | null | undefined): string[] => {
    const v = get('visit', visitId);
    if (!v) return [];
    const job = get('job', v.jobId);
    return [v.plannedStart ? `visit of ${day.format(new Date(v.plannedStart))}` : 'a visit', job ? [job.reference, job.title].filter(Boolean).join(' ') : null, ...siteWords(v.siteId)].filter((w): w is string => !!w);
  };

  const describe = (entity: string, rowId: string): ConflictSubject => {
    switch (entity) {
      case 'customer': {
        const r = get('customer', rowId);
        return { title: r ? `Customer ${r.name}` : 'A customer', context: [] };
      }
      case 'site': {
        const r = get('site', rowId);
        return { title: r ? `Site ${r.name ?? r.address}` : 'A site', context: r ? siteWords(r.id).slice(1) : [] };
      }
      case 'area': {
        const r = get('area', rowId);
        return { title: r ? `Area ${r.name}` : 'An area', context: r ? siteWords(r.siteId) : [] };
      }
      case 'board': {
        const r = get('board', rowId);
        return { title: r ? `Board ${r.name}` : 'A board', context: r ? siteWords(r.siteId) : [] };
      }
      case 'circuit': {
        const r = get('circuit', rowId);
        if (!r) return { title: 'A circuit', context: [] };
        const board = get('board', r.boardId);
        return { title: `Circuit ${r.number}${r.description ? ` · ${r.description}` : ''}`, context: [board ? `board ${board.name}` : null, ...siteWords(r.siteId)].filter((w): w is string => !!w) };
      }
      case 'job': {
        const r = get('job', rowId);
        return { title: r ? `Job ${[r.reference, r.title].filter(Boolean).join(' ')}` : 'A job', context: r ? siteWords(r.siteId) : [] };
      }
      case 'visit': {
        const r = get('visit', rowId);
        const words = visitWords(rowId);
        return { title: r ? `The ${words[0] ?? 'visit'}` : 'A visit', context: words.slice(1) };
      }
      case 'cableRun': {
        const r = get('cableRun', rowId);
        return { title: r ? `Cable ${r.label}` : 'A cable', context: r ? siteWords(r.siteId) : [] };
      }
      case 'pointChange': {
        const r = get('pointChange', rowId);
        return { title: r ? `Point change: ${r.accessoryKind ?? 'a point'} on ${circuitWords(r.circuitId)}` : 'A point change', context: r ? visitWords(r.visitId) : [] };
      }
      case 'testResult': {
        const r = get('testResult', rowId);
        return { title: r ? `Readings on ${circuitWords(r.circuitId)}` : 'Readings', context: r ? visitWords(r.visitId) : [] };
      }
      case 'photo': {
        const r = get('photo', rowId);
        return { title: r ? `Photo: ${firstWords(r.caption) || 'no caption'}` : 'A photo', context: r ? visitWords(r.visitId) : [] };
      }
      case 'note': {
        const r = get('note', rowId);
        return { title: r ? `Note: ${firstWords(r.text)}` : 'A note', context: r ? visitWords(r.visitId) : [] };
      }
      case 'materialLine': {
        const r = get('materialLine', rowId);
        return { title: r ? `Part used: ${r.description}` : 'A part used', context: r ? visitWords(r.visitId) : [] };
      }
      case 'linkTest': {
        const r = get('linkTest', rowId);
        const cable = r ? get('cableRun', r.cableRunId) : null;
        return { title: cable ? `Performance results of cable ${cable.label}` : 'Performance results of a link', context: r ? visitWords(r.visitId) : [] };
      }
      case 'priceItem': {
        const r = get('priceItem', rowId);
        return { title: r ? `Price list item ${r.name}` : 'A price list item', context: [] };
      }
      default:
        return { title: 'A record', context: [] };
    }
  };
  return new Map(conflicts.map((c) => [`${c.entity}:${c.rowId}`, describe(c.entity, c.rowId)]));
}
