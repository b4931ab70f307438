/**
 * Voltage drop along flat twin-and-earth cable from the tabulated mV/A/m.
 */
import { requireNonNegative, requireOneOf, requirePositive, roundTo, tableRow, type CheckResult } from '../check.js';
import type { RuleSet, VoltageDropUse } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface VoltageDropInput {
  readonly csaMm2: number;
  /** Design current Ib (A). */
  readonly currentA: number;
  /** One-way length of the run (m). */
  readonly lengthM: number;
  readonly use: VoltageDropUse;
  readonly nominalV?: number;
}

/** `value` and `limit` are in percent of the nominal voltage; `volts` and `limitVolts` give the same in volts. */
export interface VoltageDrop extends CheckResult {
  readonly volts: number;
  readonly percent: number;
  readonly limitVolts: number;
  readonly mvPerAPerM: number;
}

/** Vd = mV/A/m × Ib × L / 1000, judged against 3 % for lighting and 5 % for other uses. */
export function voltageDrop(input: VoltageDropInput, rules: RuleSet = DEFAULT_RULE_SET): VoltageDrop {
  const csa = requirePositive('csaMm2', input.csaMm2);
  const currentA = requireNonNegative('currentA', input.currentA);
  const lengthM = requireNonNegative('lengthM', input.lengthM);
  const use = requireOneOf('use', input.use, ['lighting', 'other'] as const);
  const nominalV = requirePositive('nominalV', input.nominalV ?? rules.nominalVoltageV.value);
  const table = rules.voltageDrop.flatTwinAndEarth;
  const mvPerAPerM = tableRow('csaMm2', csa, table);
  const limit = rules.voltageDrop.limitsPercent[use];

  const volts = (mvPerAPerM * currentA * lengthM) / 1000;
  const percent = (volts / nominalV) * 100;
  const limitVolts = (limit.value / 100) * nominalV;
  // Rounded so a run sized exactly to the limit is not failed by binary noise.
  const ok = roundTo(percent, 9) <= limit.value;
  const shown = `${roundTo(volts, 2).toFixed(2)} V (${roundTo(percent, 2).toFixed(2)} %)`;
  return {
    verdict: ok ? 'pass' : 'fail',
    value: percent,
    limit: limit.value,
    unit: '%',
    source: `${table.source}; ${limit.source}`,
    note: ok
      ? `${shown} over ${lengthM} m of ${csa} mm² at ${currentA} A is within the ${limit.value} % allowed for ${use === 'lighting' ? 'lighting' : 'this use'}.`
      : `${shown} over ${lengthM} m of ${csa} mm² at ${currentA} A is more than the ${limit.value} % allowed for ${use === 'lighting' ? 'lighting' : 'this use'}: use a larger cable or a shorter run.`,
    volts,
    percent,
    limitVolts,
    mvPerAPerM,
  };
}
