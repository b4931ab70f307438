/**
 * Whether the cpc survives the fault: the adiabatic equation S = √(I²t) / k.
 */
import { InvalidInputError, optionalReading, requireOneOf, requirePositive, roundTo, type CheckResult, type Reading } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import type { CpcArrangement, CpcInsulation } from '../rules/uk-bs7671-before-work.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export const CPC_ARRANGEMENTS: readonly CpcArrangement[] = ['in-cable', 'separate', 'armour'];
export const CPC_INSULATIONS: readonly CpcInsulation[] = ['70C-thermoplastic', '90C-thermoplastic', '90C-thermosetting'];
export type { CpcArrangement, CpcInsulation };

export interface NamedK {
  readonly arrangement: CpcArrangement;
  readonly insulation: CpcInsulation;
}

/** The tabulated k for a cpc, by how it is run and what insulates it or the cable around it. */
export function cpcK(named: NamedK, rules: RuleSet = DEFAULT_RULE_SET): { readonly k: number; readonly source: string; readonly description: string } {
  const arrangement = requireOneOf('k.arrangement', named.arrangement, CPC_ARRANGEMENTS);
  const insulation = requireOneOf('k.insulation', named.insulation, CPC_INSULATIONS);
  const table = rules.beforeWork.cpcK[arrangement];
  return { k: table.values[insulation], source: table.source, description: `${table.material}, ${table.arrangement}, ${insulation.replace('C-', ' °C ')}` };
}

export interface AdiabaticInput {
  /** Prospective earth fault current (A), usually U0 / Zs. */
  readonly faultCurrentA: number;
  /** Time the device takes to disconnect that current (s), read from its time/current curve. */
  readonly disconnectionS: number;
  /** k as a number, or named so the table is looked up. */
  readonly k: number | NamedK;
  /** The cpc to judge (mm²); without it only the minimum is given. */
  readonly cpcCsaMm2?: Reading;
}

export interface AdiabaticCheck extends CheckResult {
  /** Minimum cpc cross-section S (mm²); also `limit`. */
  readonly minimumMm2: number;
  readonly k: number;
}

export function adiabaticCpc(input: AdiabaticInput, rules: RuleSet = DEFAULT_RULE_SET): AdiabaticCheck {
  const current = requirePositive('faultCurrentA', input.faultCurrentA);
  const t = requirePositive('disconnectionS', input.disconnectionS);
  // The equation assumes no heat leaves the conductor, which holds only for short faults.
  if (t > 5) throw new InvalidInputError('disconnectionS', `the adiabatic equation applies up to 5 s, got ${t}`);
  let k: number;
  let kSource: string;
  if (typeof input.k === 'number') {
    k = requirePositive('k', input.k);
    kSource = 'k as given';
  } else if (typeof input.k === 'object' && input.k !== null) {
    const found = cpcK(input.k, rules);
    k = found.k;
    kSource = `${found.source} (k = ${found.k}, ${found.description})`;
  } else {
    throw new InvalidInputError('k', 'must be a number or { arrangement, insulation }');
  }
  const cpc = optionalReading('cpcCsaMm2', input.cpcCsaMm2);
  const minimumMm2 = Math.sqrt(current * current * t) / k;
  const shown = `${roundTo(minimumMm2, 2)} mm²`;
  const source = `${rules.beforeWork.adiabaticSource}; ${kSource}`;
  const base = { limit: minimumMm2, unit: 'mm²', source, minimumMm2, k };
  const sum = `√(${roundTo(current, 1)}² × ${t}) / ${k} = ${shown}`;
  if (cpc === null) return { ...base, verdict: 'check', value: null, note: `The cpc must be at least ${sum}; enter its size to judge it.` };
  const ok = cpc >= minimumMm2;
  return {
    ...base,
    verdict: ok ? 'pass' : 'fail',
    value: cpc,
    note: ok
      ? `A ${cpc} mm² cpc is at least ${sum}, so it survives the fault until the device disconnects.`
      : `A ${cpc} mm² cpc is less than ${sum}: it could be damaged before the device disconnects. Use a larger cpc or a faster device.`,
  };
}
