/**
 * Copper conductor resistance per metre and R1+R2 for a cable, corrected for temperature.
 */
import { InvalidInputError, requireFinite, requireNonNegative, requirePositive, tableRow } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

/** Resistance at `tempC` divided by resistance at the reference temperature (20 °C). */
export function temperatureMultiplier(tempC: number = 20, rules: RuleSet = DEFAULT_RULE_SET): number {
  const t = requireFinite('tempC', tempC);
  const { min, max } = rules.conductors.temperatureRangeC;
  if (t < min || t > max) {
    throw new InvalidInputError('tempC', `must be between ${min} and ${max} °C for the copper correction, got ${t}`);
  }
  return 1 + rules.conductors.temperatureCoefficient.value * (t - rules.conductors.referenceTempC);
}

/** mΩ/m of one plain copper conductor of `csaMm2` at `tempC`. */
export function resistancePerMetre(csaMm2: number, tempC: number = 20, rules: RuleSet = DEFAULT_RULE_SET): number {
  const csa = requirePositive('csaMm2', csaMm2);
  const r20 = tableRow('csaMm2', csa, rules.conductors.copperResistance);
  return r20 * temperatureMultiplier(tempC, rules);
}

/** mΩ/m of the line conductor and cpc together: what an R1+R2 test reads per metre of cable. */
export function r1r2PerMetre(
  liveCsaMm2: number,
  cpcCsaMm2: number,
  tempC: number = 20,
  rules: RuleSet = DEFAULT_RULE_SET,
): number {
  return resistancePerMetre(liveCsaMm2, tempC, rules) + resistancePerMetre(cpcCsaMm2, tempC, rules);
}

export interface CableRunInput {
  readonly liveCsaMm2: number;
  readonly cpcCsaMm2: number;
  readonly lengthM: number;
  readonly tempC?: number;
}

/** Expected R1+R2 (Ω) of a run of cable: per-metre value times length. */
export function r1r2ForRun(input: CableRunInput, rules: RuleSet = DEFAULT_RULE_SET): number {
  const lengthM = requireNonNegative('lengthM', input.lengthM);
  return (r1r2PerMetre(input.liveCsaMm2, input.cpcCsaMm2, input.tempC ?? 20, rules) * lengthM) / 1000;
}
