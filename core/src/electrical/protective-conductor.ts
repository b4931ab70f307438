/**
 * Continuity of protective conductors (R1+R2), and polarity.
 */
import { optionalReading, requireOneOf, roundTo, type CheckResult, type Reading } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface R1R2Input {
  /** Measured R1+R2 (Ω), at the furthest point of a radial or the highest step 3 reading of a ring; null while not yet measured. */
  readonly measured: Reading;
  /** For a ring: (r1 + r2) / 4 from the end-to-end readings, which the highest step 3 reading should be close to. */
  readonly expectedForRing?: number | null;
}

/**
 * A finite R1+R2 shows the protective conductor is continuous. On a ring it is also compared with (r1 + r2) / 4:
 * a reading well off that is not a failure by itself (a spur reads higher), so it asks for a look.
 */
export function checkR1R2(input: R1R2Input, rules: RuleSet = DEFAULT_RULE_SET): CheckResult {
  const measured = optionalReading('measured', input.measured);
  const expected = input.expectedForRing === undefined || input.expectedForRing === null ? null : optionalReading('expectedForRing', input.expectedForRing);
  const tolerance = rules.circuitTests.ringR1R2Tolerance;
  const source =
    expected === null ? rules.circuitTests.protectiveConductorSource : `${rules.circuitTests.protectiveConductorSource}; ${tolerance.source}`;
  const base = { unit: 'Ω', source, limit: expected === null ? null : roundTo(expected, 2) };
  if (measured === null) return { ...base, verdict: 'check', value: null, note: 'Enter R1+R2 to show the protective conductor is continuous.' };
  if (measured === 0) {
    return { ...base, verdict: 'check', value: 0, note: 'R1+R2 of 0 Ω cannot be right; null the test leads and measure again.' };
  }
  if (expected === null) {
    return { ...base, verdict: 'pass', value: measured, note: `R1+R2 of ${measured} Ω shows the protective conductor is continuous.` };
  }
  const shown = roundTo(expected, 2).toFixed(2);
  const difference = roundTo(measured - expected, 2);
  if (Math.abs(difference) <= tolerance.value) {
    return { ...base, verdict: 'pass', value: measured, note: `R1+R2 of ${measured} Ω agrees with (r1 + r2) / 4 = ${shown} Ω, as a complete ring should.` };
  }
  return {
    ...base,
    verdict: 'check',
    value: measured,
    note:
      difference > 0
        ? `R1+R2 of ${measured} Ω is above (r1 + r2) / 4 = ${shown} Ω: a spur reads higher; otherwise look for a loose joint or a break in the ring.`
        : `R1+R2 of ${measured} Ω is below (r1 + r2) / 4 = ${shown} Ω: parallel earth paths through metalwork often do this; check the cpc joints.`,
  };
}

export type PolarityResult = 'correct' | 'incorrect';

/** Polarity is seen, not measured: every fuse, single-pole switch and centre contact on the line conductor. */
export function checkPolarity(input: { readonly result: PolarityResult | null | undefined }, rules: RuleSet = DEFAULT_RULE_SET): CheckResult {
  const base = { value: null, limit: null, unit: '', source: rules.circuitTests.polaritySource };
  if (input.result === null || input.result === undefined) return { ...base, verdict: 'check', note: 'Record whether the polarity is correct.' };
  const result = requireOneOf('result', input.result, ['correct', 'incorrect'] as const);
  return result === 'correct'
    ? { ...base, verdict: 'pass', note: 'Polarity correct: protective devices and single-pole switches are in the line conductor.' }
    : { ...base, verdict: 'fail', note: 'Polarity incorrect: correct the connections before the circuit is put into service.' };
}
