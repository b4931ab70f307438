import { type EntitySpec, type FieldValue, isSyncEntity, isUuid, type Mutation, type RefTarget, SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import { User } from '../users/entities/user.entity.js';
import { SYNC_SCHEMAS, type SyncRecord, textOrNull } from './entities/sync-schemas.js';
import { selectMany } from './bulk-write.js';
import { MutationRefused } from './mutation-checks.js';

/** `entity:id` of the rows a batch has found to exist in the caller's organisation. */
export type KnownRows = Set<string>;
/** `entity:id` → site, for rows of entities that belong to a site. */
export type RowSites = Map<string, string | null>;

/** Rows of these entities belong to one site; a row on a site may point only at ones on the same site. */
const onSite = (entity: RefTarget) => entity !== 'user' && SYNC_ENTITIES[entity].siteField === 'siteId';

/** The ids a batch's mutations point at, per entity pointed at; anything that could not be an id is left out. */
export function referencedIds(mutations: readonly Mutation[]): Map<RefTarget, Set<string>> {
  const refIds = new Map<RefTarget, Set<string>>();
  const add = (entity: RefTarget, id: unknown) => {
    if (!isUuid(id)) return;
    if (!refIds.has(entity)) refIds.set(entity, new Set());
    refIds.get(entity)!.add(id);
  };
  for (const m of mutations) {
    if (!m || !isSyncEntity(m.entity) || SYNC_ENTITIES[m.entity].serverOnly) continue;
    const fields = SYNC_ENTITIES[m.entity].fields;
    for (const [field, value] of Object.entries(m.set && typeof m.set === 'object' ? m.set : {})) {
      const type = Object.hasOwn(fields, field) ? fields[field]!.type : undefined;
      if (type?.kind === 'ref') add(type.entity, value);
      if (type?.kind === 'refs' && Array.isArray(value)) for (const id of value) add(type.entity, id);
    }
  }
  return refIds;
}

/** Finds, in one query per entity, which of a batch's references exist, so that checking each mutation asks nothing. */
export async function preloadReferences(
  em: EntityManager, organisationId: string, refIds: Map<RefTarget, Set<string>>, known: KnownRows, sites: RowSites,
): Promise<void> {
  for (const [entity, ids] of refIds) {
    const list = [...ids];
    if (entity === 'user') {
      for (const row of await selectMany(em, User, 'id', list, { organisationId })) known.add(`user:${row.id}`);
      continue;
    }
    for (const row of await selectMany<SyncRecord>(em, SYNC_SCHEMAS[entity], 'id', list, { organisationId, deletedAt: null })) {
      known.add(`${entity}:${row.id}`);
      if (onSite(entity)) sites.set(`${entity}:${row.id}`, textOrNull(row.siteId));
    }
  }
}

/**
 * Every id a row points at must be a row of the same organisation. Only what the batch has not already found is
 * looked up (a row made earlier in the batch, say), and what is found is remembered for the rest of it.
 */
export async function checkReferences(
  em: EntityManager, organisationId: string, entity: SyncEntityName, spec: EntitySpec, set: Record<string, FieldValue>, known: KnownRows,
  sites: RowSites = new Map(), rowSite: string | null = null,
): Promise<void> {
  for (const [field, value] of Object.entries(set)) {
    const type = spec.fields[field]!.type;
    if (value === null || (type.kind !== 'ref' && type.kind !== 'refs')) continue;
    // Checked by fieldError before this: a ref is an id, refs a list of ids.
    const all = typeof value === 'string' ? [value] : Array.isArray(value) ? value.filter((id): id is string => typeof id === 'string') : [];
    await checkSameSite(em, organisationId, entity, field, type.entity, all, sites, rowSite);
    const ids = all.filter((id) => !known.has(`${type.entity}:${id}`));
    if (ids.length === 0) continue;
    const found =
      type.entity === 'user'
        ? await em.countBy(User, { id: In(ids), organisationId })
        : await em.getRepository<SyncRecord>(type.entity).countBy({ id: In(ids), organisationId, deletedAt: IsNull() });
    if (found !== new Set(ids).size) throw new MutationRefused(`${entity}.${field} points at ${type.entity === 'area' ? 'an' : 'a'} ${type.entity} that does not exist.`);
    for (const id of ids) known.add(`${type.entity}:${id}`);
  }
}

/**
 * A row on a site points only at rows of the same site (a circuit at its own board): the office's forms refuse
 * otherwise, and a device's push is held to the same rule. What the batch has not read already is read here.
 */
async function checkSameSite(
  em: EntityManager, organisationId: string, entity: SyncEntityName, field: string, target: RefTarget, ids: string[], sites: RowSites, rowSite: string | null,
): Promise<void> {
  if (!rowSite || !onSite(target)) return;
  const unread = ids.filter((id) => !sites.has(`${target}:${id}`));
  if (unread.length) {
    const rows = await em.getRepository<SyncRecord>(target).find({ where: { id: In(unread), organisationId }, select: { id: true, siteId: true } });
    for (const r of rows) sites.set(`${target}:${r.id}`, textOrNull(r.siteId));
  }
  for (const id of ids) {
    const site = sites.get(`${target}:${id}`);
    if (site !== undefined && site !== rowSite) throw new MutationRefused(`${entity}.${field} points at ${target === 'area' ? 'an' : 'a'} ${target} on another site.`);
  }
}
