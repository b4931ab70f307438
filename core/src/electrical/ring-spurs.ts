/**
 * The customary limits for unfused spurs from a ring final circuit.
 */
import { InvalidInputError, requireNonNegative, worstVerdict, type CheckResult, type Finding } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface SpursInput {
  /**
   * Socket-outlets and fused connection units connected directly in the ring, each accessory counted once
   * (a twin socket-outlet is one: the stricter of the two counts in use).
   */
  readonly socketsAndFcusOnRing: number;
  /** Unfused spurs on the ring, this one included. */
  readonly unfusedSpurs: number;
  /** Single or twin socket-outlets and fused connection units each unfused spur feeds, one entry per spur checked. */
  readonly spurFeeds: readonly number[];
  /** Whether any spur is taken from another spur. */
  readonly spurFromSpur: boolean;
}

export interface SpursCheck extends CheckResult {
  readonly findings: readonly Finding[];
}

function whole(field: string, value: unknown): number {
  const n = requireNonNegative(field, value);
  if (!Number.isInteger(n)) throw new InvalidInputError(field, `must be a whole number, got ${n}`);
  return n;
}

export function checkSpurs(input: SpursInput, rules: RuleSet = DEFAULT_RULE_SET): SpursCheck {
  const points = whole('socketsAndFcusOnRing', input.socketsAndFcusOnRing);
  const spurs = whole('unfusedSpurs', input.unfusedSpurs);
  if (!Array.isArray(input.spurFeeds)) throw new InvalidInputError('spurFeeds', 'must be a list of counts, one per spur');
  const feeds = input.spurFeeds.map((n, i) => whole(`spurFeeds[${i}]`, n));
  if (feeds.length > spurs) throw new InvalidInputError('spurFeeds', `lists ${feeds.length} spurs but unfusedSpurs is ${spurs}`);
  if (typeof input.spurFromSpur !== 'boolean') throw new InvalidInputError('spurFromSpur', 'must be true or false');
  const limits = rules.beforeWork.spurs;
  const perSpur = limits.accessoriesPerUnfusedSpur;

  const worst = feeds.length ? Math.max(...feeds) : 0;
  const findings: Finding[] = [
    {
      name: 'spur-count',
      verdict: spurs <= points ? 'pass' : 'fail',
      value: spurs,
      limit: points,
      unit: 'spurs',
      source: limits.spursNotMoreThanPoints,
      note:
        spurs <= points
          ? `${spurs} unfused spur${spurs === 1 ? '' : 's'} against ${points} point${points === 1 ? '' : 's'} on the ring: no more spurs than points.`
          : `${spurs} unfused spurs against only ${points} point${points === 1 ? '' : 's'} on the ring: more spurs than points. Use a fused spur or extend the ring.`,
    },
    {
      name: 'spur-feeds',
      verdict: worst <= perSpur.value ? 'pass' : 'fail',
      value: worst,
      limit: perSpur.value,
      unit: 'accessories',
      source: perSpur.source,
      note:
        worst <= perSpur.value
          ? 'Each unfused spur feeds one single or twin socket-outlet or one fused connection unit.'
          : `An unfused spur feeds ${worst} accessories; it may feed only one single or twin socket-outlet or one fused connection unit. Use a fused connection unit to feed more.`,
    },
    {
      name: 'spur-from-spur',
      verdict: input.spurFromSpur ? 'fail' : 'pass',
      value: null,
      limit: null,
      unit: '',
      source: limits.noSpurFromSpur,
      note: input.spurFromSpur ? 'A spur is taken from another spur: take it from the ring itself, or through a fused connection unit.' : 'No spur is taken from another spur.',
    },
  ];
  const verdict = worstVerdict(findings.map((f) => f.verdict));
  const failed = findings.filter((f) => f.verdict === 'fail');
  return {
    verdict,
    value: spurs,
    limit: points,
    unit: 'spurs',
    source: failed.length ? failed.map((f) => f.source).join('; ') : `${limits.spursNotMoreThanPoints}; ${perSpur.source}`,
    note: failed.length ? failed.map((f) => f.note).join(' ') : 'The spurs keep to the customary limits for a ring final circuit.',
    findings,
  };
}
