/**
 * A cable run's test judged as a whole: its wiremap (for twisted pair) and its length against the link limit.
 */
import { InvalidInputError, worstVerdict, type CheckResult, type Verdict } from '../check.js';
import type { LinkKind, RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { checkLink } from './link-length.js';
import type { ConductorColour, PinScheme } from './pin-schemes.js';
import { classifyWiremap, type WiremapResult } from './wiremap.js';

/** Media terminated on 8-position modular connectors, where a wiremap applies. */
export const TWISTED_PAIR_MEDIA = ['Cat5e', 'Cat6', 'Cat6A'] as const;

/** What the phone stores in a cable run's `wiremap` field. */
export interface RecordedWiremap {
  readonly nearEnd: readonly (ConductorColour | null)[];
  readonly farEnd: readonly (ConductorColour | null)[];
  readonly shorts?: readonly (readonly [number, number])[];
  readonly opens?: readonly number[];
}

export interface CableRunTestInput {
  readonly medium?: string | null;
  readonly scheme?: PinScheme | null;
  readonly wiremap?: RecordedWiremap | null;
  readonly lengthM?: number | null;
  readonly linkKind?: LinkKind | null;
}

export interface CableRunAssessment {
  readonly verdict: Verdict;
  readonly wiremap: WiremapResult | null;
  readonly length: CheckResult | null;
  /** Plain sentences for what still has to be recorded. */
  readonly missing: readonly string[];
  /** A recorded value the checks could not read (say, a colour on two pins). */
  readonly problems: readonly string[];
  /** What the checks cannot judge for this medium. */
  readonly notes: readonly string[];
}

export function isTwistedPair(medium: string | null | undefined): boolean {
  return (TWISTED_PAIR_MEDIA as readonly string[]).includes(medium ?? '');
}

export function assessCableRun(input: CableRunTestInput, rules: RuleSet = DEFAULT_RULE_SET): CableRunAssessment {
  const missing: string[] = [];
  const problems: string[] = [];
  const notes: string[] = [];
  let wiremap: WiremapResult | null = null;
  if (isTwistedPair(input.medium)) {
    if (!input.scheme) missing.push('the termination scheme (T568A or T568B)');
    if (!input.wiremap) missing.push('the wiremap');
    if (input.scheme && input.wiremap) {
      try {
        wiremap = classifyWiremap({ scheme: input.scheme, ...input.wiremap }, rules);
        if (wiremap.verdict === 'check') missing.push('the conductor colours at each end');
      } catch (err) {
        if (!(err instanceof InvalidInputError)) throw err;
        problems.push(err.message);
      }
    }
  }
  let length: CheckResult | null = null;
  if (input.lengthM === null || input.lengthM === undefined) {
    missing.push('the length');
  } else if (isTwistedPair(input.medium)) {
    length = checkLink({ lengthM: input.lengthM, kind: input.linkKind ?? 'permanent-link' }, rules);
  } else {
    notes.push(`No published length limit for ${input.medium ?? 'this medium'} in ${rules.id}: judge it against the maker’s figures.`);
  }
  const verdicts: Verdict[] = [wiremap?.verdict, length?.verdict].filter((v): v is Verdict => v !== undefined);
  if (missing.length > 0 || problems.length > 0) verdicts.push('check');
  return { verdict: worstVerdict(verdicts.length ? verdicts : ['check']), wiremap, length, missing, problems, notes };
}
