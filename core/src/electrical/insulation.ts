/**
 * Insulation resistance against the minimum for the circuit's test voltage.
 */
import { InvalidInputError, optionalReading, requirePositive, type CheckResult, type Reading } from '../check.js';
import type { InsulationBand, RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface InsulationInput {
  /** Lowest reading between any pair of conductors (MΩ); null while not yet measured. */
  readonly megaohms: Reading;
  /** Nominal voltage of the circuit (V); 50 V or less is taken as SELV or PELV. */
  readonly nominalV?: number;
  /**
   * The tester showed over-range ('>299 MΩ', '>999 MΩ'): `megaohms` is then the limit of its range, and the
   * insulation is at least that. Common trade practice records it so, with the instrument's limit.
   */
  readonly overRange?: boolean;
}

export interface InsulationCheck extends CheckResult {
  readonly testVoltageV: number;
  readonly circuit: string;
}

/** The band of the insulation table a circuit of `nominalV` falls in. */
export function insulationBand(nominalV: number = 230, rules: RuleSet = DEFAULT_RULE_SET): InsulationBand {
  const v = requirePositive('nominalV', nominalV);
  const band = rules.insulation.bands.find((b) => v <= b.upToNominalV);
  if (band === undefined) {
    const top = rules.insulation.bands.at(-1)?.upToNominalV ?? 0;
    throw new InvalidInputError('nominalV', `${rules.insulation.source} covers circuits up to ${top} V, got ${v} V`);
  }
  return band;
}

export function checkInsulation(input: InsulationInput, rules: RuleSet = DEFAULT_RULE_SET): InsulationCheck {
  const megaohms = optionalReading('megaohms', input.megaohms);
  const band = insulationBand(input.nominalV ?? 230, rules);
  const base = {
    limit: band.minimumMegaohms,
    unit: 'MΩ',
    source: rules.insulation.source,
    testVoltageV: band.testVoltageV,
    circuit: band.circuit,
  };
  const min = band.minimumMegaohms.toFixed(1);
  if (megaohms === null) {
    return { ...base, verdict: 'check', value: null, note: `Enter the insulation resistance measured at ${band.testVoltageV} V DC.` };
  }
  if (input.overRange) {
    // A lower bound passes when the range itself reaches the minimum; below it, the display says nothing either way.
    const reaches = megaohms >= band.minimumMegaohms;
    return {
      ...base,
      verdict: reaches ? 'pass' : 'check',
      value: megaohms,
      note: reaches
        ? `Over the instrument's range (>${megaohms} MΩ) at ${band.testVoltageV} V DC: above the ${min} MΩ minimum for ${band.circuit}.`
        : `Over a range that ends at ${megaohms} MΩ says nothing against the ${min} MΩ minimum: measure on a range that reaches it.`,
    };
  }
  const ok = megaohms >= band.minimumMegaohms;
  return {
    ...base,
    verdict: ok ? 'pass' : 'fail',
    value: megaohms,
    note: ok
      ? `${megaohms} MΩ at ${band.testVoltageV} V DC meets the ${min} MΩ minimum for ${band.circuit}.`
      : `${megaohms} MΩ at ${band.testVoltageV} V DC is below the ${min} MΩ minimum for ${band.circuit}: find the fault before energising.`,
  };
}
