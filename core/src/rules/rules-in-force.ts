/**
 * Which rule set governs work completed on a given day. A certificate states the standard and amendment in force
 * on its completion date, so rule sets are kept by the day they take effect, never replaced.
 */
import type { RuleSet } from './rule-set.js';
import { UK_BS7671_2018_A2_2022 } from './uk-bs7671-2018-a2-2022.js';
import { UK_BS7671_2018_A3_2024 } from './uk-bs7671-2018-a3-2024.js';

/** Every UK rule set, oldest first. */
export const UK_RULE_SETS: readonly RuleSet[] = [UK_BS7671_2018_A2_2022, UK_BS7671_2018_A3_2024];

/** The calendar day of a date or an ISO time, as the rule sets' `effectiveFrom` is written; '' when it is not one. */
export function dayOf(when: string | Date | null | undefined): string {
  if (when instanceof Date) return Number.isNaN(when.getTime()) ? '' : when.toISOString().slice(0, 10);
  return typeof when === 'string' && /^\d{4}-\d{2}-\d{2}/.test(when) ? when.slice(0, 10) : '';
}

/**
 * The rule set in force on the day given, or null when the day comes before the oldest one kept (no certificate is
 * stated against an amendment that was not yet published). The day is read from the time as written (UTC for the
 * product's ISO times), so work finished just after midnight in summer counts for the day before.
 */
export function ruleSetInForce(when: string | Date, ruleSets: readonly RuleSet[] = UK_RULE_SETS): RuleSet | null {
  const day = dayOf(when);
  if (!day) return null;
  let found: RuleSet | null = null;
  for (const rules of ruleSets) {
    if (rules.effectiveFrom <= day && (!found || rules.effectiveFrom > found.effectiveFrom)) found = rules;
  }
  return found;
}
