/**
 * RCD operating time, and the maximum Zs a circuit protected by an RCD may have.
 */
import {
  optionalReading,
  requireOneOf,
  requirePositive,
  tableRow,
  type CheckResult,
  type Reading,
} from '../check.js';
import type { RcdType, RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface RcdInput {
  /** Measured operating time (ms); null while not yet measured. */
  readonly tripMs: Reading;
  /** Test current as a multiple of the rated residual current. */
  readonly multiple: 1 | 5;
  /** Rated residual operating current IΔn (mA). */
  readonly ratedMa?: number;
  /** 'general' (no time delay) or 'S' (time-delayed, selective). */
  readonly rcdType?: RcdType;
}

export interface RcdCheck extends CheckResult {
  /** Shortest allowed time, for time-delayed devices. */
  readonly minimumMs: number | null;
}

/**
 * At IΔn a general-type RCD must operate within 300 ms, the one field test BS 7671 has required since A2:2022;
 * at 5 IΔn the product standard's 40 ms still applies and is checked when the test was made.
 */
export function checkRcd(input: RcdInput, rules: RuleSet = DEFAULT_RULE_SET): RcdCheck {
  const multiple = requireOneOf('multiple', input.multiple, [1, 5] as const);
  const rcdType = requireOneOf('rcdType', input.rcdType ?? 'general', ['general', 'S'] as const);
  const ratedMa = requirePositive('ratedMa', input.ratedMa ?? 30);
  const tripMs = optionalReading('tripMs', input.tripMs);
  const times = rules.rcd.times[rcdType][multiple];
  const base = {
    limit: times.max.value,
    unit: 'ms',
    source: times.min ? `${times.max.source}; ${times.min.source}` : times.max.source,
    minimumMs: times.min?.value ?? null,
  };
  const test = `${multiple === 1 ? '' : `${multiple} × `}${ratedMa} mA`;
  const device = rcdType === 'S' ? 'a type S RCD' : 'a general-type RCD';
  if (tripMs === null) {
    return { ...base, verdict: 'check', value: null, note: `Enter the operating time measured at ${test}.` };
  }
  if (tripMs === 0) {
    return {
      ...base,
      verdict: 'check',
      value: tripMs,
      note: 'An operating time of 0 ms cannot be right; test the RCD again.',
    };
  }
  if (tripMs > times.max.value) {
    return {
      ...base,
      verdict: 'fail',
      value: tripMs,
      note: `${tripMs} ms at ${test} is longer than the ${times.max.value} ms allowed for ${device}.`,
    };
  }
  if (times.min && tripMs < times.min.value) {
    return {
      ...base,
      verdict: 'check',
      value: tripMs,
      note: `${tripMs} ms at ${test} is quicker than the ${times.min.value} ms a type S RCD should wait; confirm the device type.`,
    };
  }
  return {
    ...base,
    verdict: 'pass',
    value: tripMs,
    note: `${tripMs} ms at ${test} is within the ${times.max.value} ms allowed for ${device}.`,
  };
}

/** Maximum Zs (Ω) for a circuit protected by an RCD of `ratedMa` (50 V / IΔn, as tabulated). */
export function maxZsForRcd(input: { readonly ratedMa: number }, rules: RuleSet = DEFAULT_RULE_SET): number {
  const ma = requirePositive('ratedMa', input.ratedMa);
  return tableRow('ratedMa', ma, rules.rcd.maxZsByRatedMa);
}
