import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

/**
 * Nominal cross-sectional areas of conductors up to 300 mm² (IEC 60228:2004 Table 1 and following, the series cables
 * are made in; from memory, M).
 */
export const CONDUCTOR_SIZES_MM2 = [1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240, 300] as const;

/** RCD types by the residual current they detect (BS EN 61008-1 / 61009-1, with F and B from BS EN 62423), S where time-delayed. */
const RCD_TYPE = /^(AC|A|F|B)( ?S)?$/;

/** The RCD types a form offers, the usual first; each passes the check below. */
export const RCD_TYPE_CHOICES = ['A', 'AC', 'F', 'B', 'A S', 'AC S', 'F S', 'B S'] as const;

export type CircuitDetailField = 'deviceRatingA' | 'rcdType' | 'liveCsaMm2' | 'cpcCsaMm2';

export interface CircuitDetailsToCheck {
  deviceType?: string | null;
  deviceRatingA?: number | null;
  rcdType?: string | null;
  liveCsaMm2?: number | null;
  cpcCsaMm2?: number | null;
}

/** The ratings a device is made in, as the rule set's maximum Zs tables list them; null for a device they do not list. */
export function standardRatings(deviceType: string, rules: RuleSet = DEFAULT_RULE_SET): number[] | null {
  const { circuitBreakers, fuses } = rules.earthFaultLoop;
  const table = (circuitBreakers as Record<string, (typeof circuitBreakers)['B'] | undefined>)[deviceType] ?? (fuses as Record<string, (typeof circuitBreakers)['B'] | undefined>)[deviceType];
  if (!table) return null;
  const ratings = new Set<number>();
  for (const column of Object.values(table.times)) for (const r of Object.keys(column ?? {})) ratings.add(Number(r));
  return [...ratings].sort((a, b) => a - b);
}

/**
 * What in a circuit's details cannot be so: a rating the device is not made in, an RCD type that is not one, a
 * conductor size cables are not made in, or a cpc larger than the live conductors it runs with. Each message names
 * its field, for the form to show beside it.
 */
export function circuitDetailProblems(c: CircuitDetailsToCheck, rules: RuleSet = DEFAULT_RULE_SET): Partial<Record<CircuitDetailField, string>> {
  const problems: Partial<Record<CircuitDetailField, string>> = {};
  const ratings = c.deviceType ? standardRatings(c.deviceType, rules) : null;
  if (ratings && c.deviceRatingA != null && !ratings.includes(c.deviceRatingA)) {
    problems.deviceRatingA = `Rating: this device is not made in ${c.deviceRatingA} A. Choose one of ${ratings.join(', ')} A.`;
  }
  if (c.rcdType && !RCD_TYPE.test(c.rcdType.trim().toUpperCase())) problems.rcdType = 'RCD type must be AC, A, F or B, with S if it is time-delayed.';
  for (const [field, label] of [
    ['liveCsaMm2', 'Live size'],
    ['cpcCsaMm2', 'Cpc size'],
  ] as const) {
    const size = c[field];
    if (size != null && !(CONDUCTOR_SIZES_MM2 as readonly number[]).includes(size)) problems[field] = `${label}: cables are not made in ${size} mm². Sizes run 1, 1.5, 2.5, 4, 6, 10, 16 mm² and up.`;
  }
  if (!problems.cpcCsaMm2 && !problems.liveCsaMm2 && c.cpcCsaMm2 != null && c.liveCsaMm2 != null && c.cpcCsaMm2 > c.liveCsaMm2) {
    problems.cpcCsaMm2 = `Cpc size: ${c.cpcCsaMm2} mm² is larger than the ${c.liveCsaMm2} mm² live conductors it runs with; check both sizes.`;
  }
  return problems;
}
