import { describe, expect, it } from '@jest/globals';
import { type Mutation, SYNC_ENTITIES } from '@wiretrail/core';
import type { EntityManager, FindOperator } from 'typeorm';
import { MutationRefused } from './mutation-checks.js';
import { checkReferences, type KnownRows, referencedIds } from './reference-checks.js';

const ORG = 'org-1';
const SITE = '0190c0de-0000-7000-8000-000000000011';
const MISSING_SITE = '0190c0de-0000-7000-8000-000000000019';
const VISIT = '0190c0de-0000-7000-8000-000000000001';
const TECH = '0190c0de-0000-7000-8000-0000000000a1';
const HLC = '2026-03-14T09:26:53.589Z-0001-phone-a';

/** Answers counts from a list of rows per entity, and notes which entities were asked about. */
function database(rows: Record<string, string[]>) {
  const asked: string[] = [];
  const count = (entity: string) => async (where: { id: FindOperator<string[]>; organisationId: string }) => {
    asked.push(entity);
    expect(where.organisationId).toBe(ORG);
    return new Set((where.id.value as string[]).filter((id) => rows[entity]?.includes(id))).size;
  };
  const em = { countBy: (_user: unknown, where: never) => count('user')(where), getRepository: (entity: string) => ({ countBy: count(entity) }) };
  return { asked, em: em as unknown as EntityManager };
}

const refusal = async (work: Promise<unknown>): Promise<string> => {
  try {
    await work;
  } catch (err) {
    if (err instanceof MutationRefused) return err.message;
    throw err;
  }
  throw new Error('was not refused');
};

describe('reference checks', () => {
  it('collects the ids a batch points at, per entity, leaving out what could not be an id', () => {
    const mutations = [
      { mutationId: 'm-00000001', entity: 'area', id: VISIT, baseVersion: 0, hlc: HLC, set: { siteId: SITE, name: 'Loft' } },
      { mutationId: 'm-00000002', entity: 'visit', id: VISIT, baseVersion: 0, hlc: HLC, set: { technicianIds: [TECH, 'nobody'], siteId: 'garbage' } },
      null,
      { mutationId: 'm-00000003', entity: 'conflict', id: VISIT, baseVersion: 0, hlc: HLC, set: { rowId: SITE } },
    ] as unknown as Mutation[];
    const ids = referencedIds(mutations);
    expect([...ids.keys()].sort()).toEqual(['site', 'user']);
    expect([...ids.get('site')!]).toEqual([SITE]);
    expect([...ids.get('user')!]).toEqual([TECH]);
  });

  it('accepts references to rows of the organisation and remembers them for the rest of the batch', async () => {
    const { em, asked } = database({ site: [SITE], user: [TECH] });
    const known: KnownRows = new Set();
    await checkReferences(em, ORG, 'area', SYNC_ENTITIES.area, { siteId: SITE, name: 'Loft' }, known);
    await checkReferences(em, ORG, 'area', SYNC_ENTITIES.area, { siteId: SITE, name: 'Cellar' }, known);
    await checkReferences(em, ORG, 'visit', SYNC_ENTITIES.visit, { technicianIds: [TECH, TECH] }, known);
    expect(asked).toEqual(['site', 'user']);
    expect(known.has(`site:${SITE}`)).toBe(true);
  });

  it('asks nothing about rows the batch already knows, or fields left empty', async () => {
    const { em, asked } = database({});
    await checkReferences(em, ORG, 'area', SYNC_ENTITIES.area, { siteId: SITE, name: 'Loft' }, new Set([`site:${SITE}`]));
    await checkReferences(em, ORG, 'board', SYNC_ENTITIES.board, { areaId: null, name: 'Main board' }, new Set());
    expect(asked).toEqual([]);
  });

  it('refuses a reference to a row that is not there, naming the field', async () => {
    const { em } = database({ site: [SITE] });
    expect(await refusal(checkReferences(em, ORG, 'area', SYNC_ENTITIES.area, { siteId: MISSING_SITE, name: 'Loft' }, new Set()))).toBe(
      'area.siteId points at a site that does not exist.',
    );
    expect(await refusal(checkReferences(em, ORG, 'board', SYNC_ENTITIES.board, { areaId: MISSING_SITE }, new Set()))).toBe('board.areaId points at an area that does not exist.');
  });
});
