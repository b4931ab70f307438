import { describe, expect, it } from '@jest/globals';
import type { Mutation } from '@wiretrail/core';
import type { SyncRecord } from './entities/sync-schemas.js';
import { checkMutation, checkNewRow, checkTechnicianWrite, isMutationId, MutationRefused } from './mutation-checks.js';
import type { TechnicianScope } from './scope.service.js';

const VISIT = '0190c0de-0000-7000-8000-000000000001';
const OTHER_VISIT = '0190c0de-0000-7000-8000-000000000002';
const SITE = '0190c0de-0000-7000-8000-000000000011';
const OTHER_SITE = '0190c0de-0000-7000-8000-000000000012';
const ROW = '0190c0de-0000-7000-8000-000000000021';
const HLC = '2026-03-14T09:26:53.589Z-0001-phone-a';

const mutation = (over: Partial<Mutation> & Record<string, unknown> = {}): Mutation =>
  ({ mutationId: 'mutation-0001', entity: 'note', id: ROW, baseVersion: 0, hlc: HLC, set: { visitId: VISIT, siteId: SITE, text: 'Lights off at the board' }, ...over }) as Mutation;

const refusal = (fn: () => unknown): string => {
  try {
    fn();
  } catch (err) {
    if (err instanceof MutationRefused) return err.message;
    throw err;
  }
  throw new Error('was not refused');
};

const scope: TechnicianScope = { visitIds: new Set([VISIT]), visitSite: new Map([[VISIT, SITE]]), siteIds: new Set([SITE]), customerIds: new Set(), ownVisitIds: new Set([VISIT]), jobIds: new Set() };
const stored = (fields: Record<string, unknown>): SyncRecord => ({
  id: ROW, organisationId: 'org', version: 3, fieldMeta: {}, deletedAt: null, createdById: null, updatedById: null, createdAt: new Date(), updatedAt: new Date(), ...fields,
});

describe('mutation checks', () => {
  it('accepts a well-formed mutation and says what it does', () => {
    const checked = checkMutation(mutation());
    expect(checked.spec.name).toBe('note');
    expect(checked.isDelete).toBe(false);
    expect(checked.set.text).toBe('Lights off at the board');
    expect(checkMutation(mutation({ set: undefined, delete: true, baseVersion: 3 })).isDelete).toBe(true);
  });

  it('refuses each malformed part with a message naming it', () => {
    expect(refusal(() => checkMutation(null as unknown as Mutation))).toMatch(/must be an object/);
    expect(refusal(() => checkMutation(mutation({ mutationId: 'short' })))).toMatch(/^mutationId/);
    expect(refusal(() => checkMutation(mutation({ mutationId: 'mutation\u0000001' })))).toMatch(/control characters/);
    expect(refusal(() => checkMutation(mutation({ entity: 'wallpaper' as never })))).toMatch(/^entity must be one of/);
    expect(refusal(() => checkMutation(mutation({ entity: 'conflict' })))).toBe('conflict rows are written by the server only; no push may create, change or delete one.');
    // Documents are issued, revised and e-mailed by their own routes; a push may not make, change or delete one.
    expect(refusal(() => checkMutation(mutation({ entity: 'document', set: { number: 'MW-9999' } })))).toMatch(/^document rows are written by the server only/);
    expect(refusal(() => checkMutation(mutation({ entity: 'document', set: undefined, delete: true })))).toMatch(/^document rows are written by the server only/);
    expect(refusal(() => checkMutation(mutation({ id: 'not-an-id' })))).toBe('id must be a UUID.');
    expect(refusal(() => checkMutation(mutation({ hlc: 'yesterday' })))).toMatch(/^hlc must look like/);
    expect(refusal(() => checkMutation(mutation({ baseVersion: -1 })))).toMatch(/^baseVersion/);
    expect(refusal(() => checkMutation(mutation({ set: {} })))).toMatch(/at least one field/);
    expect(refusal(() => checkMutation(mutation({ delete: true })))).toMatch(/not both/);
  });

  it('refuses the server\'s bookkeeping and values the registry does not allow', () => {
    expect(refusal(() => checkMutation(mutation({ set: { version: 99 } as never })))).toBe('note.version is kept by the server and cannot be set.');
    expect(refusal(() => checkMutation(mutation({ set: { text: 42 } as never })))).toMatch(/^note\.text/);
    expect(refusal(() => checkMutation(mutation({ set: { colour: 'red' } as never })))).toMatch(/colour/);
  });

  it('keeps mutation ids to what applied_mutation can store', () => {
    expect(isMutationId('a'.repeat(8))).toBe(true);
    expect(isMutationId('a'.repeat(64))).toBe(true);
    expect(isMutationId('a'.repeat(65))).toBe(false);
    expect(isMutationId(12345678)).toBe(false);
  });

  it('asks a new row for every required field', () => {
    expect(refusal(() => checkNewRow('note', { visitId: VISIT, siteId: SITE }))).toBe('A new note needs note.text.');
    expect(() => checkNewRow('note', { visitId: VISIT, siteId: SITE, text: 'x' })).not.toThrow();
  });
});

describe('technician writes', () => {
  const check = (m: Mutation, existing: SyncRecord | null, s: TechnicianScope | null = scope) => checkTechnicianWrite(s, checkMutation(m), existing);

  it('lets the office write anything', () => {
    expect(() => check(mutation({ entity: 'customer', set: { name: 'Ms Example' } }), null, null)).not.toThrow();
  });

  it('lets a technician add records to an assigned visit on its own site', () => {
    expect(() => check(mutation(), null)).not.toThrow();
  });

  it('refuses records of another visit, on another site, or moved from their visit', () => {
    expect(refusal(() => check(mutation({ set: { visitId: OTHER_VISIT, siteId: SITE, text: 'x' } }), null))).toBe('That visit is not assigned to you.');
    expect(refusal(() => check(mutation({ set: { visitId: VISIT, siteId: OTHER_SITE, text: 'x' } }), null))).toBe('note.siteId must be the site of its visit.');
    expect(refusal(() => check(mutation({ set: { visitId: OTHER_VISIT } }), stored({ visitId: VISIT, siteId: SITE })))).toBe('A note cannot move to another visit.');
  });

  it('refuses entities and fields that are the office\'s', () => {
    expect(refusal(() => check(mutation({ entity: 'customer', set: { name: 'x' } }), null))).toBe('A technician cannot change customer records; the office can.');
    expect(refusal(() => check(mutation({ entity: 'visit', id: VISIT, set: { plannedStart: '2026-03-14T09:00:00.000Z' } }), stored({ id: VISIT })))).toBe(
      'visit.plannedStart can be changed by the office only.',
    );
  });

  it('refuses deleting a visit or a site, and sites outside the technician\'s visits', () => {
    expect(refusal(() => check(mutation({ entity: 'visit', id: VISIT, set: undefined, delete: true }), stored({ id: VISIT })))).toBe('A technician cannot delete a visit.');
    expect(refusal(() => check(mutation({ entity: 'area', set: { siteId: OTHER_SITE, name: 'Loft' } }), null))).toBe('That site is not one of your visits.');
    expect(() => check(mutation({ entity: 'area', set: { siteId: SITE, name: 'Loft' } }), null)).not.toThrow();
  });
});
