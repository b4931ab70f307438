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

/**
 * Beyond this a length from a TDR is a misread figure, not a cable in a house or small office: structured cabling
 * stops at 100 m (ISO/IEC 11801-1:2017 channel), and coax, speaker or alarm runs in such buildings stay well under a
 * kilometre. Common trade practice, from memory (M); a check, never a verdict on the cable.
 */
export const PLAUSIBLE_TDR_LENGTH_M = 1000;

export interface TdrReading {
  /** The length worked out, or null when the figures cannot give one. */
  readonly lengthM: number | null;
  /** What is wrong with the figures, naming the one at fault; null when they are fine. */
  readonly problem: string | null;
  readonly field: 'nanoseconds' | 'nvp' | null;
}

/**
 * A TDR's round trip and the cable's NVP as typed: the length, or which figure is wrong. An NVP outside
 * 0 < NVP ≤ 1 is named as the NVP (a cable cannot carry a signal faster than light, or at none); a length no
 * building holds asks for the figure to be checked rather than judging a 1,034 km cable as too long.
 */
export function readTdr(input: { readonly nanoseconds: number | null; readonly nvp: number | null }, rules: RuleSet = DEFAULT_RULE_SET): TdrReading {
  const { nanoseconds, nvp } = input;
  if (nvp !== null && (!Number.isFinite(nvp) || nvp <= 0 || nvp > 1)) {
    return {
      lengthM: null,
      field: 'nvp',
      problem: `An NVP of ${Number.isFinite(nvp) ? nvp : 'that'} is wrong: it is the cable's speed as a fraction of the speed of light, above 0 and at most 1, like 0.69 (from the cable's datasheet).`,
    };
  }
  if (nanoseconds !== null && (!Number.isFinite(nanoseconds) || nanoseconds < 0)) {
    return { lengthM: null, field: 'nanoseconds', problem: 'A round trip cannot be negative: check the figure on the TDR.' };
  }
  if (nanoseconds === null || nvp === null) return { lengthM: null, field: null, problem: null };
  const lengthM = tdrLengthM({ nanoseconds, nvp }, rules);
  if (lengthM > PLAUSIBLE_TDR_LENGTH_M) {
    const km = (lengthM / 1000).toLocaleString('en-GB', { maximumFractionDigits: 0 });
    return {
      lengthM: null,
      field: 'nanoseconds',
      problem: `A round trip of ${nanoseconds.toLocaleString('en-GB')} ns at NVP ${nvp} gives ${km} km, longer than any cable in a building: check the figure.`,
    };
  }
  return { lengthM, field: null, problem: null };
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
