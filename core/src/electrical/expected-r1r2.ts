/**
 * What a radial's R1+R2 should read from the cable's own resistance, and a check of a reading against it.
 */
import { optionalReading, requireFinite, roundTo, type CheckResult, type Reading } from '../check.js';
import type { RuleSet, SourcedLimit } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { r1r2ForRun, r1r2PerMetre } from './conductor-resistance.js';

export interface R1R2ExpectedInput {
  readonly liveCsaMm2: number;
  readonly cpcCsaMm2: number;
  /** One-way length of the cable from the board to the furthest point (m). */
  readonly lengthM: number;
  /** Conductor temperature when tested; 20 °C by default, as a test done cold. */
  readonly tempC?: number;
}

export interface R1R2Expected extends CheckResult {
  /** The cable's own R1+R2 (Ω); also `limit` in the check. */
  readonly expectedOhm: number;
  readonly perMetreMohm: number;
}

/**
 * How far a reading may stray from the cable's own figure before it asks for a look: terminations and leads add
 * a little, a longer route than recorded adds more. Our own choice, from trade practice; not a published figure.
 */
export const R1R2_READING_BAND: SourcedLimit & { readonly ratio: number } = {
  value: 0.05,
  ratio: 0.25,
  unit: 'Ω',
  source: 'common trade practice (±25 % of the cable’s own R1+R2, at least ±0.05 Ω), no published tolerance',
};

/** The R1+R2 a radial of this cable and length should read; `measured` (optional) is judged against it. */
export function r1r2Expected(input: R1R2ExpectedInput & { readonly measured?: Reading }, rules: RuleSet = DEFAULT_RULE_SET): R1R2Expected {
  const tempC = requireFinite('tempC', input.tempC ?? 20);
  const perMetreMohm = r1r2PerMetre(input.liveCsaMm2, input.cpcCsaMm2, tempC, rules);
  const expectedOhm = r1r2ForRun({ liveCsaMm2: input.liveCsaMm2, cpcCsaMm2: input.cpcCsaMm2, lengthM: input.lengthM, tempC }, rules);
  const measured = optionalReading('measured', input.measured);
  const shown = `${roundTo(expectedOhm, 2).toFixed(2)} Ω`;
  const cable = `${input.lengthM} m of ${input.liveCsaMm2}/${input.cpcCsaMm2} mm²`;
  const base = {
    limit: roundTo(expectedOhm, 2),
    unit: 'Ω',
    source: `${rules.conductors.copperResistance.source}; ${rules.circuitTests.protectiveConductorSource}`,
    expectedOhm,
    perMetreMohm,
  };
  if (measured === null) {
    return { ...base, verdict: 'check', value: null, note: `Expect about ${shown} for ${cable} at ${tempC} °C.` };
  }
  if (measured === 0) {
    return { ...base, verdict: 'check', value: 0, note: 'R1+R2 of 0 Ω cannot be right; null the test leads and measure again.' };
  }
  const band = Math.max(R1R2_READING_BAND.value, expectedOhm * R1R2_READING_BAND.ratio);
  const difference = roundTo(measured - expectedOhm, 2);
  if (Math.abs(difference) <= roundTo(band, 2)) {
    return { ...base, verdict: 'pass', value: measured, note: `R1+R2 of ${measured} Ω agrees with ${shown} expected for ${cable}: the cpc is continuous.` };
  }
  return {
    ...base,
    verdict: 'check',
    value: measured,
    source: `${base.source}; ${R1R2_READING_BAND.source}`,
    note:
      difference > 0
        ? `R1+R2 of ${measured} Ω is well above ${shown} expected for ${cable}: look for a loose or high-resistance joint, a smaller cpc or a longer route than recorded.`
        : `R1+R2 of ${measured} Ω is well below ${shown} expected for ${cable}: parallel earth paths or a shorter route than recorded; check the length.`,
  };
}
