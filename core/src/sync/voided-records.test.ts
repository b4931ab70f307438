import { describe, expect, it } from 'vitest';
import { SYNC_ENTITIES } from './entities.js';
import { isVoided, touchesVoid, unvoided, VOIDABLE_ENTITIES, voidReasonProblem, voidRefusal, voidWords } from './voided-records.js';

const VOID = { voidedAt: '2026-03-14T10:45:00.000Z', voidReason: 'Typed RC-3 for RC-03' };

describe('voided records', () => {
  it('are the five kinds a technician makes on site, each with its void fields in the registry', () => {
    for (const entity of VOIDABLE_ENTITIES) {
      expect(SYNC_ENTITIES[entity].fields.voidedAt).toMatchObject({ type: { kind: 'datetime' }, technician: true });
      expect(SYNC_ENTITIES[entity].fields.voidReason).toMatchObject({ type: { kind: 'string', max: 500 }, technician: true });
    }
    expect(SYNC_ENTITIES.circuit.fields).not.toHaveProperty('voidedAt');
  });

  it('are left out of what counts', () => {
    const rows = [{ id: 'a' }, { id: 'b', ...VOID }, { id: 'c', voidedAt: null }];
    expect(unvoided(rows).map((r) => r.id)).toEqual(['a', 'c']);
    expect(isVoided({ voidedAt: '' })).toBe(false);
    expect(voidWords(VOID)).toBe('Void: Typed RC-3 for RC-03');
  });

  it('always say why', () => {
    expect(voidReasonProblem('  ')).toMatch(/^Say why this record is void/);
    expect(voidReasonProblem('x'.repeat(501))).toMatch(/at most 500/);
    expect(voidReasonProblem('Photo of the wrong board')).toBeNull();
  });

  it('are voided by a technician while the visit is open, and refused once it is finished', () => {
    const open = { entity: 'cableRun' as const, set: VOID, row: { voidedAt: null }, visitStatus: 'on-site', byTechnician: true };
    expect(voidRefusal(open)).toBeNull();
    expect(voidRefusal({ ...open, visitStatus: 'finished' })).toMatch(/finished and signed, so it can no longer be voided on site/);
    // The office puts a signed visit's records right.
    expect(voidRefusal({ ...open, visitStatus: 'finished', byTechnician: false })).toBeNull();
  });

  it('are refused for everyone once an issued document prints the record', () => {
    const held = { entity: 'testResult' as const, set: VOID, row: {}, visitStatus: 'finished', byTechnician: false, heldBy: 'MW-0007' };
    expect(voidRefusal(held)).toMatch(/printed on issued document MW-0007, which never changes/);
  });

  it('need a reason, and a record put back keeps none', () => {
    const base = { entity: 'note' as const, row: null, visitStatus: 'on-site', byTechnician: true };
    expect(voidRefusal({ ...base, set: { voidedAt: VOID.voidedAt } })).toMatch(/needs its reason/);
    expect(voidRefusal({ ...base, set: { voidedAt: VOID.voidedAt, voidReason: ' ' } })).toMatch(/needs its reason/);
    expect(voidRefusal({ ...base, row: VOID, set: { voidedAt: null } })).toMatch(/clear voidReason with voidedAt/);
    expect(voidRefusal({ ...base, row: VOID, set: { voidedAt: null, voidReason: null } })).toBeNull();
    expect(voidRefusal({ ...base, entity: 'circuit', set: VOID })).toMatch(/cannot be voided/);
    expect(touchesVoid({ label: 'RC-03' })).toBe(false);
    expect(voidRefusal({ ...base, set: { text: 'x' }, visitStatus: 'finished' })).toBeNull();
  });
});
