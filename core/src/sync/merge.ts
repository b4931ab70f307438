import type { FieldSpec } from './entities.js';
import { compareHlc, parseHlc } from './hlc.js';

/**
 * What the server keeps about the last write of one field of a synced row: the change sequence that wrote it (so
 * a push knows whether it changed since the device's base version), the clock, the author and the author's role.
 */
export interface FieldStamp {
  v: number;
  hlc: string;
  by: string;
  role: string;
}

const RANK: Record<string, number> = { technician: 1, office: 2, admin: 3 };

export interface IncomingField {
  value: unknown;
  hlc: string;
  userId: string;
  role: string;
  baseVersion: number;
}

export type FieldOutcome =
  | { apply: true; conflict?: undefined }
  | { apply: true; conflict: { kept: 'incoming'; reason: string } }
  | { apply: false; conflict: { kept: 'current'; reason: string } }
  | { apply: false; conflict?: undefined };

export function sameValue(a: unknown, b: unknown): boolean {
  return JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}

/**
 * Decides one field of a push against what the server holds. The rules, in order:
 * 1. Nobody else wrote the field since the device's base version (or the same device did, earlier in its own
 *    sequence): apply it.
 * 2. Someone did, but the values agree: apply (nothing is lost).
 * 3. Observed fields (readings, statuses, answers): the later hybrid logical clock wins; ties are already broken
 *    by the device id inside the clock string.
 * 4. Office-owned fields (customer details, addresses, schedule, price): the stored value stays unless the
 *    incoming author's role outranks the stored author's; between equal roles the later clock wins, so that the
 *    outcome does not depend on which device reached the server first.
 * Whenever a different value is not kept, the caller stores it in a Conflict row.
 */
export function decideField(spec: Pick<FieldSpec, 'policy'>, current: unknown, meta: FieldStamp | undefined, incoming: IncomingField): FieldOutcome {
  if (!meta || meta.v <= incoming.baseVersion || sameDevice(meta.hlc, incoming.hlc)) return { apply: true };
  if (sameValue(current, incoming.value)) return { apply: true };
  if (spec.policy === 'observed') {
    return compareHlc(incoming.hlc, meta.hlc) > 0
      ? { apply: true, conflict: { kept: 'incoming', reason: 'later-edit-wins' } }
      : { apply: false, conflict: { kept: 'current', reason: 'later-edit-wins' } };
  }
  const incomingRank = RANK[incoming.role] ?? 0;
  const currentRank = RANK[meta.role] ?? 0;
  const wins = incomingRank === currentRank ? compareHlc(incoming.hlc, meta.hlc) > 0 : incomingRank > currentRank;
  return wins
    ? { apply: true, conflict: { kept: 'incoming', reason: 'office-owned' } }
    : { apply: false, conflict: { kept: 'current', reason: 'office-owned' } };
}

/** Two clocks from one device: its changes are already in order, never concurrent with each other. */
export function sameDevice(a: string, b: string): boolean {
  const x = parseHlc(a);
  const y = parseHlc(b);
  return !!x && !!y && x.deviceId === y.deviceId;
}
