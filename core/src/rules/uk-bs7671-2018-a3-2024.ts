/**
 * United Kingdom: BS 7671:2018 incorporating Amendment 3 (2024). A3 added requirements (unidirectional and
 * bidirectional protective devices, Reg 530.3.201; stationary secondary batteries, Chapter 57) and revised the
 * model forms of Appendix 6, but left every table our checks use as A2:2022 printed it (core/README.md lists them).
 * So this rule set is A2's limits, each citing A3 as the edition it is taken from.
 */
import { freezeRuleSet, type RuleSet } from './rule-set.js';
import { UK_BS7671_2018_A2_2022 } from './uk-bs7671-2018-a2-2022.js';

const A2 = 'BS 7671:2018+A2:2022';
const A3 = 'BS 7671:2018+A3:2024';

/** A copy of a rule set whose every source text names another edition of the same standard. */
function citingEdition<T>(value: T, from: string, to: string): T {
  if (typeof value === 'string') return value.replaceAll(from, to) as T;
  if (Array.isArray(value)) return value.map((v: unknown) => citingEdition(v, from, to)) as T;
  if (typeof value === 'object' && value !== null) {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, citingEdition(v, from, to)])) as T;
  }
  return value;
}

export const UK_BS7671_2018_A3_2024: RuleSet = freezeRuleSet({
  ...citingEdition(UK_BS7671_2018_A2_2022, A2, A3),
  id: 'uk-bs7671-2018-a3-2024',
  name: 'United Kingdom: BS 7671:2018+A3:2024 with IET On-Site Guide and Guidance Note 3; TIA-568 / ISO/IEC 11801 cabling',
  edition: A3,
  // Published and in force from 31 July 2024 (M: from memory, not confirmed against the BSI notice).
  effectiveFrom: '2024-07-31',
});
