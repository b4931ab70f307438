/**
 * Fuse rating for a fixed load on a fused connection unit or plug.
 */
import { requirePositive, roundTo, type CheckResult } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface FuseForLoadInput {
  readonly watts: number;
  readonly nominalV?: number;
}

/** `value` is the load current (A) and `limit` the chosen fuse rating (A). */
export interface FuseChoice extends CheckResult {
  readonly currentA: number;
  /** The fuse to fit; null when no plug or connection-unit fuse can carry the load. */
  readonly fuseRatingA: number | null;
}

/**
 * The smallest plug/FCU fuse that carries the load (I = P / V).
 *
 * A load just above the largest rating but within the customary 3 kW allowance (3 kW is 13.04 A at 230 V)
 * gets the largest fuse with verdict `check`, not `fail`: 13 A is the normal fuse for a 3 kW appliance,
 * and only the rating plate and maker's instructions can settle the last few tens of milliamps.
 */
export function fuseForLoad(input: FuseForLoadInput, rules: RuleSet = DEFAULT_RULE_SET): FuseChoice {
  const watts = requirePositive('watts', input.watts);
  const nominalV = requirePositive('nominalV', input.nominalV ?? rules.nominalVoltageV.value);
  const { plugAndFcuRatingsA: ratings, ratingsSource, largestFuseCustomaryMaxW } = rules.fuses;
  const currentA = watts / nominalV;
  const amps = `${roundTo(currentA, 2).toFixed(2)} A`;
  const load = `${formatWatts(watts)} at ${nominalV} V draws ${amps}`;

  const fit = ratings.find((r) => currentA <= r);
  if (fit !== undefined) {
    return {
      verdict: 'pass',
      value: currentA,
      limit: fit,
      unit: 'A',
      source: ratingsSource,
      note: `${load}, so fit a ${fit} A fuse.`,
      currentA,
      fuseRatingA: fit,
    };
  }

  const largest = ratings.at(-1) ?? 0;
  // The allowance is a current, 3 kW at the rule set's nominal voltage, so a lower nominalV cannot stretch it.
  const allowanceA = largestFuseCustomaryMaxW.value / rules.nominalVoltageV.value;
  if (watts <= largestFuseCustomaryMaxW.value && currentA <= allowanceA + 1e-9) {
    return {
      verdict: 'check',
      value: currentA,
      limit: largest,
      unit: 'A',
      source: `${ratingsSource}; ${largestFuseCustomaryMaxW.source}`,
      note: `${load}, just over ${largest} A, yet a ${largest} A fuse is normal practice up to 3 kW: confirm the rating plate and the maker's instructions.`,
      currentA,
      fuseRatingA: largest,
    };
  }

  return {
    verdict: 'fail',
    value: currentA,
    limit: largest,
    unit: 'A',
    source: ratingsSource,
    note: `${load}, more than a ${largest} A fuse can carry, so it needs its own suitably rated circuit instead of a plug or fused connection unit.`,
    currentA,
    fuseRatingA: null,
  };
}

function formatWatts(watts: number): string {
  return watts >= 1000 ? `${roundTo(watts / 1000, 3)} kW` : `${watts} W`;
}
