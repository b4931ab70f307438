/**
 * Cable length from a TDR reading, and the structured-cabling length limits.
 */
import { InvalidInputError, requireNonNegative, requireOneOf, requireFinite, roundTo, type CheckResult } from '../check.js';
import type { LinkKind, RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface TdrInput {
  /** Round-trip time of the reflected pulse (ns). */
  readonly nanoseconds: number;
  /** Nominal velocity of propagation as a fraction of c, from the cable's datasheet (typically 0.65–0.80). */
  readonly nvp: number;
}

/** L = NVP × c × t / 2, with c = 299 792 458 m/s and t the round-trip time. */
export function tdrLengthM(input: TdrInput, rules: RuleSet = DEFAULT_RULE_SET): number {
  const nanoseconds = requireNonNegative('nanoseconds', input.nanoseconds);
  const nvp = requireFinite('nvp', input.nvp);
  if (nvp <= 0 || nvp > 1) {
    throw new InvalidInputError('nvp', `must be a fraction of the speed of light, above 0 and at most 1, got ${nvp}`);
  }
  return (nvp * rules.cabling.speedOfLight.value * nanoseconds * 1e-9) / 2;
}

export interface LinkInput {
  readonly lengthM: number;
  readonly kind: LinkKind;
}

export function checkLink(input: LinkInput, rules: RuleSet = DEFAULT_RULE_SET): CheckResult {
  const lengthM = requireNonNegative('lengthM', input.lengthM);
  const kind = requireOneOf('kind', input.kind, ['channel', 'permanent-link'] as const);
  const limit = rules.cabling.lengthLimitsM[kind];
  const what = kind === 'channel' ? 'a channel' : 'a permanent link';
  const ok = lengthM <= limit.value;
  const shown = roundTo(lengthM, 2);
  return {
    verdict: ok ? 'pass' : 'fail',
    value: lengthM,
    limit: limit.value,
    unit: 'm',
    source: limit.source,
    note: ok
      ? `${shown} m is within the ${limit.value} m allowed for ${what}.`
      : `${shown} m is longer than the ${limit.value} m allowed for ${what}.`,
  };
}
