import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { MergePolicy } from './entities.js';
import { formatHlc } from './hlc.js';
import { decideField, type FieldStamp, type IncomingField, sameDevice } from './merge.js';

// These are Wiretrail's own merge rules (DEVELOPERS.md, "Sync in one page"), not a published standard: the
// properties below are what phones and the server rely on to end up holding the same value.

const T0 = Date.parse('2026-03-14T09:00:00.000Z');
const ROLES = ['technician', 'office', 'admin'] as const;

const policy = fc.constantFrom<MergePolicy>('office', 'observed');
const role = fc.constantFrom(...ROLES);
const value = fc.oneof(fc.string({ maxLength: 8 }), fc.integer(), fc.constant(null), fc.array(fc.integer(), { maxLength: 3 }));
const clock = (deviceId: string) =>
  fc.record({ ms: fc.integer({ min: T0, max: T0 + 86_400_000 }), counter: fc.integer({ min: 0, max: 20 }) }).map((c) => formatHlc({ ...c, deviceId }));

/** One writer's change of the field, made without having seen the other's. */
const write = (deviceId: string) => fc.record({ value, hlc: clock(deviceId), role, userId: fc.constantFrom('u1', 'u2', 'u3') });
type Write = { value: unknown; hlc: string; role: string; userId: string };

interface Stored {
  value: unknown;
  meta: FieldStamp | undefined;
}

/** Applies writes in the order given, as the server does: each one numbered, each seen against what is stored. */
function applyInOrder(spec: { policy: MergePolicy }, start: Stored, baseVersion: number, writes: Write[]): { stored: Stored; outcomes: ReturnType<typeof decideField>[] } {
  let stored = start;
  let seq = baseVersion;
  const outcomes = [];
  for (const w of writes) {
    const incoming: IncomingField = { ...w, baseVersion };
    const outcome = decideField(spec, stored.value, stored.meta, incoming);
    outcomes.push(outcome);
    if (outcome.apply) stored = { value: w.value, meta: { v: ++seq, hlc: w.hlc, by: w.userId, role: w.role } };
  }
  return { stored, outcomes };
}

describe('field merge', () => {
  it('ends with the same value whichever of two concurrent writes reaches the server first', () => {
    fc.assert(
      fc.property(policy, value, write('phone-a'), write('phone-b'), (p, initial, a, b) => {
        const start: Stored = { value: initial, meta: { v: 1, hlc: formatHlc({ ms: T0 - 1000, counter: 0, deviceId: 'desk' }), by: 'u0', role: 'office' } };
        const ab = applyInOrder({ policy: p }, start, 1, [a, b]).stored.value;
        const ba = applyInOrder({ policy: p }, start, 1, [b, a]).stored.value;
        expect(JSON.stringify(ab)).toBe(JSON.stringify(ba));
        // Deterministic: the same writes in the same order give the same answer again.
        expect(JSON.stringify(applyInOrder({ policy: p }, start, 1, [a, b]).stored.value)).toBe(JSON.stringify(ab));
      }),
    );
  });

  it('always applies a field nobody else changed since the writer last saw it', () => {
    fc.assert(
      fc.property(policy, value, write('phone-a'), fc.integer({ min: 0, max: 1000 }), fc.integer({ min: 0, max: 1000 }), fc.boolean(), (p, current, w, v, extra, never) => {
        const meta: FieldStamp | undefined = never ? undefined : { v, hlc: formatHlc({ ms: T0 + 999_999_999, counter: 0, deviceId: 'desk' }), by: 'u9', role: 'admin' };
        const outcome = decideField({ policy: p }, current, meta, { ...w, baseVersion: v + extra });
        expect(outcome).toEqual({ apply: true });
      }),
    );
  });

  it('always applies a device\'s own later change: its changes are in sequence, never concurrent', () => {
    fc.assert(
      fc.property(policy, value, write('phone-a'), role, (p, current, w, earlierRole) => {
        const meta: FieldStamp = { v: 50, hlc: formatHlc({ ms: T0 + 999_999_999, counter: 0, deviceId: 'phone-a' }), by: 'u9', role: earlierRole };
        expect(sameDevice(meta.hlc, w.hlc)).toBe(true);
        expect(decideField({ policy: p }, current, meta, { ...w, baseVersion: 3 })).toEqual({ apply: true });
      }),
    );
  });

  it('reports the value not kept whenever two concurrent writes disagree', () => {
    fc.assert(
      fc.property(policy, write('phone-a'), write('phone-b'), (p, a, b) => {
        fc.pre(JSON.stringify(a.value ?? null) !== JSON.stringify(b.value ?? null));
        const { outcomes } = applyInOrder({ policy: p }, { value: null, meta: undefined }, 0, [a, b]);
        const second = outcomes[1]!;
        // The first write found nothing concurrent; the second did, and one of the two values is set aside.
        expect(outcomes[0]).toEqual({ apply: true });
        expect(second.conflict).toBeDefined();
        expect(second.conflict!.kept).toBe(second.apply ? 'incoming' : 'current');
      }),
    );
  });

  it('never reports a conflict when concurrent writes agree', () => {
    fc.assert(
      fc.property(policy, write('phone-a'), write('phone-b'), (p, a, b) => {
        const { outcomes } = applyInOrder({ policy: p }, { value: null, meta: undefined }, 0, [a, { ...b, value: a.value }]);
        expect(outcomes.every((o) => o.conflict === undefined)).toBe(true);
      }),
    );
  });

  it('keeps the office\'s value of an office-owned field against a technician, whatever the clocks say', () => {
    fc.assert(
      fc.property(write('desk'), write('phone-a'), fc.constantFrom('office', 'admin'), (office, tech, officeRole) => {
        fc.pre(JSON.stringify(office.value ?? null) !== JSON.stringify(tech.value ?? null));
        const meta: FieldStamp = { v: 7, hlc: office.hlc, by: office.userId, role: officeRole };
        const outcome = decideField({ policy: 'office' }, office.value, meta, { ...tech, role: 'technician', baseVersion: 6 });
        expect(outcome).toEqual({ apply: false, conflict: { kept: 'current', reason: 'office-owned' } });
      }),
    );
  });

  it('lets the later clock win an observed field, whoever wrote it', () => {
    const early = formatHlc({ ms: T0, counter: 0, deviceId: 'desk' });
    const late = formatHlc({ ms: T0 + 60_000, counter: 0, deviceId: 'phone-a' });
    const meta: FieldStamp = { v: 7, hlc: early, by: 'u1', role: 'admin' };
    expect(decideField({ policy: 'observed' }, 0.41, meta, { value: 0.38, hlc: late, userId: 'u2', role: 'technician', baseVersion: 6 })).toEqual({
      apply: true,
      conflict: { kept: 'incoming', reason: 'later-edit-wins' },
    });
  });
});
