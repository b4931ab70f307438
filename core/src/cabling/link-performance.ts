/**
 * Performance results of a copper link against a named limit set. A field tester gives, for each frequency-dependent
 * parameter, the worst margin to the limit line of the set it tested to; propagation delay, delay skew and DC loop
 * resistance are judged here against the standard's own limits. A result inside the tester's accuracy is marked so
 * (our own term): the tester could not tell it from the limit, and the report says so.
 */
import { type CheckResult, InvalidInputError, requireFinite, roundTo, type Verdict, worstVerdict } from '../check.js';

export const LIMIT_SETS = [
  'tia-cat5e-permanent-link', 'tia-cat5e-channel', 'tia-cat6-permanent-link', 'tia-cat6-channel', 'tia-cat6a-permanent-link', 'tia-cat6a-channel',
  'iso-class-d-permanent-link', 'iso-class-d-channel', 'iso-class-e-permanent-link', 'iso-class-e-channel', 'iso-class-ea-permanent-link', 'iso-class-ea-channel',
] as const;
export type LimitSet = (typeof LIMIT_SETS)[number];

const TIA = 'ANSI/TIA-568.2-D';
const ISO = 'ISO/IEC 11801-1:2017';

export const LIMIT_SET_WORDS: Record<LimitSet, string> = {
  'tia-cat5e-permanent-link': `${TIA} Category 5e permanent link`,
  'tia-cat5e-channel': `${TIA} Category 5e channel`,
  'tia-cat6-permanent-link': `${TIA} Category 6 permanent link`,
  'tia-cat6-channel': `${TIA} Category 6 channel`,
  'tia-cat6a-permanent-link': `${TIA} Category 6A permanent link`,
  'tia-cat6a-channel': `${TIA} Category 6A channel`,
  'iso-class-d-permanent-link': `${ISO} Class D permanent link`,
  'iso-class-d-channel': `${ISO} Class D channel`,
  'iso-class-e-permanent-link': `${ISO} Class E permanent link`,
  'iso-class-e-channel': `${ISO} Class E channel`,
  'iso-class-ea-permanent-link': `${ISO} Class EA permanent link`,
  'iso-class-ea-channel': `${ISO} Class EA channel`,
};

/** Parameters a tester judges by margin to the set's limit line (dB); a negative margin fails. */
export const MARGIN_PARAMETERS = ['insertionLoss', 'next', 'psNext', 'acrF', 'psAcrF', 'returnLoss', 'acrN', 'psAcrN'] as const;
export type MarginParameter = (typeof MARGIN_PARAMETERS)[number];

/** DC resistance unbalance for PoE, judged by the tester's margin to the set's limit (Ω); a negative margin fails. */
export const UNBALANCE_PARAMETERS = ['unbalanceWithinPair', 'unbalanceBetweenPairs'] as const;
export type UnbalanceParameter = (typeof UNBALANCE_PARAMETERS)[number];

/** The four pairs by their pins, as a tester lists the length of each. */
export const PAIR_NAMES = ['1,2', '3,6', '4,5', '7,8'] as const;

export type PerformanceParameter = MarginParameter | UnbalanceParameter | 'propagationDelay' | 'delaySkew' | 'dcLoopResistance' | 'pairLength';

export const PARAMETER_WORDS: Record<PerformanceParameter, string> = {
  insertionLoss: 'Insertion loss',
  next: 'NEXT',
  psNext: 'PS NEXT',
  acrF: 'ACR-F',
  psAcrF: 'PS ACR-F',
  returnLoss: 'Return loss',
  acrN: 'ACR-N',
  psAcrN: 'PS ACR-N',
  propagationDelay: 'Propagation delay',
  delaySkew: 'Delay skew',
  dcLoopResistance: 'DC loop resistance',
  unbalanceWithinPair: 'DC resistance unbalance within a pair',
  unbalanceBetweenPairs: 'DC resistance unbalance between pairs',
  pairLength: 'Length per pair',
};

interface Sourced {
  readonly value: number;
  readonly source: string;
}

/** The standard's own limits for what is judged here, by link kind; the same in both families of standard (from memory). */
function ownLimits(set: LimitSet): { delayNs: Sourced; skewNs: Sourced; loopOhm: Sourced; lengthM: Sourced } {
  const channel = set.endsWith('-channel');
  const std = set.startsWith('tia') ? TIA : ISO;
  const kind = channel ? 'channel' : 'permanent link';
  return {
    delayNs: { value: channel ? 555 : 498, source: `${std}, ${kind} propagation delay at 10 MHz (from memory)` },
    skewNs: { value: channel ? 50 : 44, source: `${std}, ${kind} delay skew (from memory)` },
    loopOhm: { value: channel ? 25 : 21, source: `${std}, ${kind} DC loop resistance (from memory)` },
    lengthM: { value: channel ? 100 : 90, source: `${std}, ${kind} length (from memory)` },
  };
}

export interface LinkPerformanceInput {
  readonly limitSet: LimitSet;
  /** Worst margin of each parameter the tester reported, dB; leave out what it did not. */
  readonly marginsDb: Partial<Record<MarginParameter, number>>;
  readonly propagationDelayNs?: number | null;
  readonly delaySkewNs?: number | null;
  /** The highest pair's DC loop resistance, Ω. */
  readonly dcLoopResistanceOhm?: number | null;
  /** Worst margin of each DC resistance unbalance the tester reported, Ω. */
  readonly unbalanceMarginsOhm?: Partial<Record<UnbalanceParameter, number | null>>;
  /** Each pair's length as the tester measured it, m, in the order of PAIR_NAMES; a pair not reported is null. */
  readonly pairLengthsM?: readonly (number | null)[];
  /** Parameters the tester marked as within its accuracy of the limit. */
  readonly withinAccuracy?: readonly PerformanceParameter[];
}

export type ParameterCheck = CheckResult & { readonly name: PerformanceParameter; readonly marginDb: number | null; readonly withinAccuracy: boolean };

export interface LinkPerformance {
  readonly verdict: Verdict;
  readonly limitSet: LimitSet;
  readonly checks: readonly ParameterCheck[];
  /** True when any result is inside the tester's accuracy: the report says so beside it. */
  readonly anyWithinAccuracy: boolean;
}

/** Judges each reported parameter: margins below zero fail, and delay, skew and loop resistance above their limits fail. */
export function judgeLinkPerformance(input: LinkPerformanceInput): LinkPerformance {
  if (!(LIMIT_SETS as readonly string[]).includes(input.limitSet)) throw new InvalidInputError('limitSet', `must be one of ${LIMIT_SETS.join(', ')}, got ${String(input.limitSet)}`);
  const setWords = LIMIT_SET_WORDS[input.limitSet];
  const close = new Set(input.withinAccuracy ?? []);
  const checks: ParameterCheck[] = [];
  for (const name of MARGIN_PARAMETERS) {
    const m = input.marginsDb[name];
    if (m === undefined || m === null) continue;
    const margin = requireFinite(name, m);
    const ok = margin >= 0;
    checks.push({
      name,
      verdict: ok ? 'pass' : 'fail',
      value: margin,
      limit: 0,
      unit: 'dB',
      source: `${setWords}: limit line as the tester applied it`,
      note: `${PARAMETER_WORDS[name]}: worst margin ${margin > 0 ? '+' : ''}${roundTo(margin, 1)} dB${ok ? '' : ', below the limit line'}${close.has(name) ? ' (within the tester’s accuracy)' : ''}.`,
      marginDb: margin,
      withinAccuracy: close.has(name),
    });
  }
  for (const name of UNBALANCE_PARAMETERS) {
    const m = input.unbalanceMarginsOhm?.[name];
    if (m === undefined || m === null) continue;
    const margin = requireFinite(name, m);
    const ok = margin >= 0;
    checks.push({
      name,
      verdict: ok ? 'pass' : 'fail',
      value: margin,
      limit: 0,
      unit: 'Ω',
      source: `${setWords}: DC resistance unbalance limit as the tester applied it`,
      note: `${PARAMETER_WORDS[name]}: worst margin ${margin > 0 ? '+' : ''}${roundTo(margin, 3)} Ω${ok ? '' : ', over the limit'}${close.has(name) ? ' (within the tester’s accuracy)' : ''}.`,
      // A margin in ohms, not decibels: kept apart so nothing adds it to the dB margins.
      marginDb: null,
      withinAccuracy: close.has(name),
    });
  }
  const own = ownLimits(input.limitSet);
  const against = (name: 'propagationDelay' | 'delaySkew' | 'dcLoopResistance', reading: number | null | undefined, limit: Sourced, unit: string) => {
    if (reading === undefined || reading === null) return;
    const value = requireFinite(name, reading);
    if (value < 0) throw new InvalidInputError(name, `cannot be negative, got ${value}`);
    const ok = value <= limit.value;
    checks.push({
      name,
      verdict: ok ? 'pass' : 'fail',
      value,
      limit: limit.value,
      unit,
      source: limit.source,
      note: `${PARAMETER_WORDS[name]} ${value} ${unit} ${ok ? 'within' : 'over'} the ${limit.value} ${unit} limit${close.has(name) ? ' (within the tester’s accuracy)' : ''}.`,
      marginDb: null,
      withinAccuracy: close.has(name),
    });
  };
  against('propagationDelay', input.propagationDelayNs, own.delayNs, 'ns');
  against('delaySkew', input.delaySkewNs, own.skewNs, 'ns');
  against('dcLoopResistance', input.dcLoopResistanceOhm, own.loopOhm, 'Ω');
  const pairs = (input.pairLengthsM ?? []).map((l, i) => (l === null || l === undefined ? null : { pair: PAIR_NAMES[i] ?? String(i + 1), lengthM: requireFinite('pairLength', l) }));
  const measured = pairs.filter((p) => p !== null);
  if (measured.some((p) => p.lengthM < 0)) throw new InvalidInputError('pairLength', 'cannot be negative');
  if (measured.length) {
    // The longest pair is the one the length limit bites on; the others are listed for the record.
    const longest = measured.reduce((a, b) => (b.lengthM > a.lengthM ? b : a));
    const ok = longest.lengthM <= own.lengthM.value;
    checks.push({
      name: 'pairLength',
      verdict: ok ? 'pass' : 'fail',
      value: longest.lengthM,
      limit: own.lengthM.value,
      unit: 'm',
      source: own.lengthM.source,
      note: `Longest pair ${longest.pair} at ${roundTo(longest.lengthM, 1)} m ${ok ? 'within' : 'over'} the ${own.lengthM.value} m limit (pairs ${measured.map((p) => `${p.pair}: ${roundTo(p.lengthM, 1)} m`).join(', ')}).${close.has('pairLength') ? ' (within the tester’s accuracy)' : ''}`,
      marginDb: null,
      withinAccuracy: close.has('pairLength'),
    });
  }
  // Nothing reported is nothing proven: a link with no results is to be checked, never a pass.
  const verdict = checks.length ? worstVerdict(checks.map((c) => c.verdict)) : 'check';
  return { verdict, limitSet: input.limitSet, checks, anyWithinAccuracy: checks.some((c) => c.withinAccuracy) };
}
