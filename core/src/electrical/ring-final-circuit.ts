/**
 * Ring final circuit continuity: the end-to-end checks (step 1), the readings to expect once the ends
 * are cross-connected (steps 2 and 3), and what an extension does to them.
 */
import {
  InvalidInputError,
  optionalReading,
  requireNonNegative,
  roundTo,
  worstVerdict,
  type Finding,
  type Reading,
  type Verdict,
} from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { resistancePerMetre } from './conductor-resistance.js';

export interface RingReadings {
  /** End-to-end resistance of the line conductor (Ω); null while not yet measured. */
  readonly r1: Reading;
  readonly rn: Reading;
  readonly r2: Reading;
  readonly liveCsaMm2: number;
  readonly cpcCsaMm2: number;
}

export interface RingCheck {
  readonly verdict: Verdict;
  readonly findings: readonly Finding[];
  /** (r1 + r2) / 4: step 3 reading at the mid-point, the circuit's R1+R2. */
  readonly expectedR1R2: number | null;
  /** (r1 + rn) / 4: step 2 reading at every socket-outlet on the ring. */
  readonly expectedR1Rn: number | null;
  /** r1·r2 / (r1 + r2): the lowest step 3 reading, at the outlets next to the board. */
  readonly expectedR1R2NearBoard: number | null;
  /** r2 / r1 expected from the conductor resistances. */
  readonly expectedR2Ratio: number;
}

const ROUNDING = 2;

/** Step 1 of the ring test, and the readings steps 2 and 3 should give. */
export function checkRing(input: RingReadings, rules: RuleSet = DEFAULT_RULE_SET): RingCheck {
  const r1 = optionalReading('r1', input.r1);
  const rn = optionalReading('rn', input.rn);
  const r2 = optionalReading('r2', input.r2);
  const expectedR2Ratio =
    resistancePerMetre(input.cpcCsaMm2, 20, rules) / resistancePerMetre(input.liveCsaMm2, 20, rules);

  const findings = [checkLineNeutral(r1, rn, rules), checkCpcRatio(r1, r2, expectedR2Ratio, input, rules)];

  return {
    verdict: worstVerdict(findings.map((f) => f.verdict)),
    findings,
    expectedR1R2: r1 !== null && r2 !== null ? (r1 + r2) / 4 : null,
    expectedR1Rn: r1 !== null && rn !== null ? (r1 + rn) / 4 : null,
    expectedR1R2NearBoard: r1 !== null && r2 !== null && r1 + r2 > 0 ? (r1 * r2) / (r1 + r2) : null,
    expectedR2Ratio,
  };
}

function checkLineNeutral(r1: number | null, rn: number | null, rules: RuleSet): Finding {
  const tolerance = rules.ring.endToEndTolerance;
  const base = { name: 'r1-rn', limit: tolerance.value, unit: 'Ω', source: tolerance.source };
  if (r1 === null || rn === null) {
    return { ...base, verdict: 'check', value: null, note: 'Enter both r1 and rn end to end to compare them.' };
  }
  if (r1 === 0 || rn === 0) {
    return {
      ...base,
      verdict: 'check',
      value: Math.abs(r1 - rn),
      note: 'A reading of 0 Ω end to end is not possible on a real ring; check the ends are separated and the leads nulled.',
    };
  }
  const difference = Math.abs(r1 - rn);
  const ok = roundTo(difference, ROUNDING) <= tolerance.value;
  return {
    ...base,
    verdict: ok ? 'pass' : 'fail',
    value: difference,
    note: ok
      ? `r1 and rn differ by ${fmt(difference)} Ω, within ${tolerance.value} Ω, so neither conductor looks broken or badly joined.`
      : `r1 and rn differ by ${fmt(difference)} Ω, more than ${tolerance.value} Ω, which points to a loose or broken joint, or an interconnection, on one of them.`,
  };
}

function checkCpcRatio(
  r1: number | null,
  r2: number | null,
  ratio: number,
  sizes: { readonly liveCsaMm2: number; readonly cpcCsaMm2: number },
  rules: RuleSet,
): Finding {
  const cable = `${sizes.liveCsaMm2}/${sizes.cpcCsaMm2} mm²`;
  const base = { name: 'r2-ratio', unit: 'Ω', source: `${rules.ring.r2RatioTolerance.source}; ${rules.conductors.copperResistance.source}` };
  if (r1 === null || r2 === null) {
    return { ...base, verdict: 'check', value: null, limit: null, note: 'Enter both r1 and r2 end to end to compare them.' };
  }
  if (r1 === 0 || r2 === 0) {
    return {
      ...base,
      verdict: 'check',
      value: null,
      limit: null,
      note: 'A reading of 0 Ω end to end is not possible on a real ring; check the ends are separated and the leads nulled.',
    };
  }
  const expected = r1 * ratio;
  const allowed = Math.max(expected * rules.ring.r2RatioTolerance.value, rules.ring.r2AbsoluteTolerance.value);
  const deviation = r2 - expected;
  const summary = `r2 is ${fmt(r2)} Ω against ${fmt(expected)} Ω expected (${roundTo(ratio, 2)} × r1 for ${cable})`;
  if (Math.abs(deviation) <= allowed) {
    return { ...base, verdict: 'pass', value: Math.abs(deviation), limit: allowed, note: `${summary}, which agrees with the cable size.` };
  }
  if (deviation < 0) {
    return {
      ...base,
      verdict: 'check',
      value: Math.abs(deviation),
      limit: allowed,
      note: `${summary}; a low r2 often means parallel earth paths through metalwork, so confirm the cpc size and look for them.`,
    };
  }
  return {
    ...base,
    verdict: 'fail',
    value: Math.abs(deviation),
    limit: allowed,
    note: `${summary}; a high r2 points to a loose or broken cpc joint or a smaller cpc than recorded.`,
  };
}

export interface RingExtensionInput {
  readonly r1: number;
  readonly rn: number;
  readonly r2: number;
  readonly liveCsaMm2: number;
  readonly cpcCsaMm2: number;
  /** Extra cable route added to the ring (out to the new outlet and back), in metres. */
  readonly addedRouteM: number;
}

export interface RingExtension {
  /** Predicted end-to-end readings after the extension (Ω). */
  readonly r1: number;
  readonly rn: number;
  readonly r2: number;
  /** Predicted (r1 + r2) / 4 after the extension: the new R1+R2 of the circuit. */
  readonly expectedR1R2: number;
  readonly expectedR1Rn: number;
  /** What the extension adds to each line/neutral conductor and to the cpc (Ω). */
  readonly addedLiveOhm: number;
  readonly addedCpcOhm: number;
}

/**
 * Predicts the end-to-end readings once the ring is broken at one point and carried through a new outlet.
 * Each conductor gains the added length at its 20 °C resistance, matching a test done cold.
 */
export function extendRing(input: RingExtensionInput, rules: RuleSet = DEFAULT_RULE_SET): RingExtension {
  const r1 = requireNonNegative('r1', input.r1);
  const rn = requireNonNegative('rn', input.rn);
  const r2 = requireNonNegative('r2', input.r2);
  const addedRouteM = requireNonNegative('addedRouteM', input.addedRouteM);
  const addedLiveOhm = (resistancePerMetre(input.liveCsaMm2, 20, rules) * addedRouteM) / 1000;
  const addedCpcOhm = (resistancePerMetre(input.cpcCsaMm2, 20, rules) * addedRouteM) / 1000;
  const next = { r1: r1 + addedLiveOhm, rn: rn + addedLiveOhm, r2: r2 + addedCpcOhm };
  return {
    ...next,
    expectedR1R2: (next.r1 + next.r2) / 4,
    expectedR1Rn: (next.r1 + next.rn) / 4,
    addedLiveOhm,
    addedCpcOhm,
  };
}

export interface ExtendedRingReadings {
  /** The end-to-end readings measured after the extension (Ω); null while not yet measured. */
  readonly r1: Reading;
  readonly rn: Reading;
  readonly r2: Reading;
}

/**
 * Compares the end-to-end readings taken after an extension with what it should have made them. An extension only
 * adds cable, so a reading clearly lower than predicted asks for a look (common trade practice, not a limit in the
 * standard): a lead not nulled, the wrong pair of ends, a parallel path, or before-readings that were not the ring's.
 * "Clearly" is the 0.05 Ω the end-to-end readings are held to (GN3 step 1).
 */
export function checkAgainstExtension(measured: ExtendedRingReadings, predicted: RingExtension, rules: RuleSet = DEFAULT_RULE_SET): Finding {
  const tolerance = rules.ring.endToEndTolerance;
  const source = `Common trade practice (an extension only adds resistance); ${tolerance.value} Ω margin from ${tolerance.source}`;
  const conductors = (['r1', 'rn', 'r2'] as const).map((name) => ({ name, value: optionalReading(name, measured[name]), expected: predicted[name] }));
  const low = conductors.filter((c) => c.value !== null && c.expected - c.value > tolerance.value);
  const base = { name: 'extension', unit: 'Ω', source };
  if (low.length > 0) {
    const worst = low.reduce((a, b) => (a.expected - a.value! >= b.expected - b.value! ? a : b));
    return {
      ...base,
      verdict: 'check',
      value: worst.value,
      limit: roundTo(worst.expected, ROUNDING),
      note: `${low.map((c) => `${c.name} ${fmt(c.value!)} Ω`).join(', ')} ${low.length === 1 ? 'is' : 'are'} lower than the ${low.map((c) => `${fmt(c.expected)} Ω`).join(', ')} predicted after the extension, which only adds cable: check that the leads were nulled, that the ends measured are this ring’s, for a parallel path, and that the readings before were right.`,
    };
  }
  const missing = conductors.some((c) => c.value === null);
  return {
    ...base,
    verdict: missing ? 'check' : 'pass',
    value: null,
    limit: null,
    note: missing ? 'Enter r1, rn and r2 to compare them with the prediction.' : 'The end-to-end readings are no lower than the extension predicts.',
  };
}

export interface CrossConnectedInput {
  /** End-to-end resistances of the two conductors joined for the test: r1 and r2 for step 3, r1 and rn for step 2. */
  readonly endToEndA: number;
  readonly endToEndB: number;
  /** How far round the ring the outlet is, from 0 (at the board) to 1 (back at the board). */
  readonly fraction: number;
}

/**
 * The reading to expect at an outlet with the ring ends cross-connected:
 * R(x) = [x·a + (1−x)·b]·[(1−x)·a + x·b] / (a + b). Equal conductors read (a + b)/4 everywhere;
 * unequal ones read (a + b)/4 at the mid-point and a·b/(a + b) next to the board.
 */
export function crossConnectedReading(input: CrossConnectedInput): number {
  const a = requireNonNegative('endToEndA', input.endToEndA);
  const b = requireNonNegative('endToEndB', input.endToEndB);
  const x = requireNonNegative('fraction', input.fraction);
  if (x > 1) throw new InvalidInputError('fraction', `must be between 0 and 1, got ${x}`);
  if (a + b === 0) throw new InvalidInputError('endToEndA', 'the two end-to-end resistances cannot both be 0 Ω');
  return ((x * a + (1 - x) * b) * ((1 - x) * a + x * b)) / (a + b);
}

function fmt(ohms: number): string {
  return roundTo(ohms, ROUNDING).toFixed(ROUNDING);
}
