/**
 * One circuit's test results judged together: which tests the certificate needs, which readings are missing,
 * and each verdict with its limit and source. The phone shows this as readings are typed; the server works it
 * out again before it issues a certificate.
 */
import { InvalidInputError, worstVerdict, type CheckResult, type Reading, type Verdict } from '../check.js';
import type { ProtectiveDevice, RcdType, RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { checkZs } from '../electrical/earth-fault-loop.js';
import { checkInsulation } from '../electrical/insulation.js';
import { checkPolarity, checkR1R2, type PolarityResult } from '../electrical/protective-conductor.js';
import { checkRcd, maxZsForRcd } from '../electrical/rcd.js';
import { r1r2Expected } from '../electrical/expected-r1r2.js';
import { checkRing, type RingCheck } from '../electrical/ring-final-circuit.js';
import { circuitReading, readingBounds } from './circuit-readings.js';

/** The circuit as recorded (any field may still be unknown). */
export interface CircuitUnderTest {
  readonly kind?: string | null;
  readonly deviceType?: string | null;
  readonly deviceRatingA?: number | null;
  readonly rcdRatingMa?: number | null;
  /** As written on the device: 'A', 'AC', 'F', 'B'; a type S (time-delayed) RCD contains 'S'. */
  readonly rcdType?: string | null;
  readonly liveCsaMm2?: number | null;
  readonly cpcCsaMm2?: number | null;
  /** One-way cable length to the furthest point (m): a radial's R1+R2 is judged against the cable's own resistance. */
  readonly lengthM?: number | null;
  /** 'rcd' where the circuit relies on its RCD for fault protection (Table 41.5); otherwise its overcurrent device. */
  readonly faultProtection?: string | null;
}

export interface CircuitReadings {
  readonly r1Ohm?: Reading;
  readonly rnOhm?: Reading;
  readonly r2Ohm?: Reading;
  readonly r1r2Ohm?: Reading;
  readonly irLiveLiveMOhm?: Reading;
  readonly irLiveEarthMOhm?: Reading;
  readonly irTestVoltageV?: number | null;
  /** The insulation tester showed over-range ('>299 MΩ'): the reading is its limit, a lower bound. */
  readonly irLiveLiveOverRange?: boolean | null;
  readonly irLiveEarthOverRange?: boolean | null;
  readonly polarity?: PolarityResult | null;
  readonly zsOhm?: Reading;
  readonly rcdTripMs?: Reading;
  readonly rcdTripMs5x?: Reading;
  readonly rcdButton?: 'operates' | 'fails' | null;
  /** R2 by the long-lead method, where R1+R2 was not taken. */
  readonly r2LeadOhm?: Reading;
  readonly afddButton?: 'operates' | 'fails' | null;
}

/** The over-range flags qualify a reading; they are not readings of their own. */
export type OverRangeFlag = 'irLiveLiveOverRange' | 'irLiveEarthOverRange';
export type ReadingField = Exclude<keyof CircuitReadings, OverRangeFlag>;
/** The readings an instrument may show as over its range, and the flag that says it did. */
export const OVER_RANGE_FLAGS = { irLiveLiveMOhm: 'irLiveLiveOverRange', irLiveEarthMOhm: 'irLiveEarthOverRange' } as const satisfies Partial<Record<ReadingField, OverRangeFlag>>;
export type OverRangeReading = keyof typeof OVER_RANGE_FLAGS;

export type CircuitTestKey =
  | 'ring-r1-rn'
  | 'ring-r2'
  | 'r1r2'
  | 'ir-live-live'
  | 'ir-live-earth'
  | 'polarity'
  | 'zs'
  | 'rcd-1x'
  | 'rcd-5x'
  | 'rcd-button'
  | 'afdd-button';

export interface CircuitTestLine {
  readonly key: CircuitTestKey;
  readonly label: string;
  /** The readings this line judges, so a screen can put its verdict beside them. */
  readonly fields: readonly ReadingField[];
  readonly required: boolean;
  /** Required, and at least one of its readings has not been entered. */
  readonly missing: boolean;
  readonly result: CheckResult;
}

export interface CircuitTestAssessment {
  readonly ruleSetId: string;
  /** Worst verdict of the required lines and of any optional line that has a reading. */
  readonly verdict: Verdict;
  readonly lines: readonly CircuitTestLine[];
  readonly missing: readonly CircuitTestLine[];
  readonly failing: readonly CircuitTestLine[];
  /** Lines whose reading cannot be real (above what any instrument reads): shown as not judged, never as a fail. */
  readonly notJudged: readonly CircuitTestLine[];
  readonly ring: RingCheck | null;
}

export interface CircuitTestInput {
  readonly circuit: CircuitUnderTest;
  readonly readings: CircuitReadings;
  /** The site's earthing arrangement; a failing Zs on TT points to the RCD as the method to record, never assumes it. */
  readonly earthing?: string | null;
}

const given = (v: unknown): boolean => v !== null && v !== undefined;

/**
 * Why a figure cannot be a real reading (outside the field registry's bounds, which the server refuses to store), or
 * null. Such a figure is a slip of the finger, so it is not judged: a fail would blame the circuit for a typo.
 */
export function impossibleReading(field: ReadingField, value: unknown): string | null {
  if (typeof value !== 'number') return null;
  const bounds = readingBounds(field);
  if (!bounds) return null;
  const { words, unit } = circuitReading(field);
  const shown = `${value}${unit ? ` ${unit}` : ''}`;
  if (!Number.isFinite(value) || (bounds.min !== undefined && value < bounds.min) || (bounds.max !== undefined && value > bounds.max) || (bounds.whole && !Number.isInteger(value))) {
    return `${shown} is not a real ${words}: check the figure.`;
  }
  return null;
}

/** A check that could not be made; says why instead of guessing a limit. */
function cannotJudge(note: string, source: string, unit = ''): CheckResult {
  return { verdict: 'check', value: null, limit: null, unit, source, note };
}

function guarded(run: () => CheckResult, source: string, unit: string): CheckResult {
  try {
    return run();
  } catch (err) {
    if (err instanceof InvalidInputError) return cannotJudge(`Cannot judge this: ${err.message}.`, source, unit);
    throw err;
  }
}

export function assessCircuitTest(input: CircuitTestInput, rules: RuleSet = DEFAULT_RULE_SET): CircuitTestAssessment {
  const { circuit, readings: r } = input;
  const lines: CircuitTestLine[] = [];
  const impossible = new Map<ReadingField, string>();
  for (const [field, value] of Object.entries(r) as [ReadingField, unknown][]) {
    const why = impossibleReading(field, value);
    if (why) impossible.set(field, why);
  }
  const add = (key: CircuitTestKey, label: string, fields: ReadingField[], isRequired: boolean, result: CheckResult) => {
    const missing = isRequired && fields.some((f) => !given(r[f]));
    const refused = fields.flatMap((f) => impossible.get(f) ?? []);
    const judged = refused.length ? cannotJudge(`Not judged: ${refused.join(' ')}`, result.source, result.unit) : result;
    lines.push({ key, label, fields, required: isRequired, missing, result: judged });
  };

  let ring: RingCheck | null = null;
  if (circuit.kind === 'ring') {
    if (given(circuit.liveCsaMm2) && given(circuit.cpcCsaMm2)) {
      try {
        ring = checkRing({ r1: r.r1Ohm, rn: r.rnOhm, r2: r.r2Ohm, liveCsaMm2: circuit.liveCsaMm2!, cpcCsaMm2: circuit.cpcCsaMm2! }, rules);
      } catch (err) {
        if (!(err instanceof InvalidInputError)) throw err;
        const why = cannotJudge(`Cannot judge the ring: ${err.message}.`, rules.ring.endToEndTolerance.source, 'Ω');
        add('ring-r1-rn', 'Ring: r1 against rn', ['r1Ohm', 'rnOhm'], true, why);
        add('ring-r2', 'Ring: r2 against r1', ['r1Ohm', 'r2Ohm'], true, why);
      }
    } else {
      const why = cannotJudge('Record the circuit’s live and cpc sizes to compare the ring readings.', rules.ring.endToEndTolerance.source, 'Ω');
      add('ring-r1-rn', 'Ring: r1 against rn', ['r1Ohm', 'rnOhm'], true, why);
      add('ring-r2', 'Ring: r2 against r1', ['r1Ohm', 'r2Ohm'], true, why);
    }
    if (ring) {
      add('ring-r1-rn', 'Ring: r1 against rn', ['r1Ohm', 'rnOhm'], true, ring.findings[0]!);
      add('ring-r2', 'Ring: r2 against r1', ['r1Ohm', 'r2Ohm'], true, ring.findings[1]!);
    }
  }

  // Either reading shows the protective conductor continuous; R1+R2 is judged when both were taken. A radial whose
  // cable is known is judged against the cable's own R1+R2, so a wildly high reading is not passed.
  if (!given(r.r1r2Ohm) && given(r.r2LeadOhm)) {
    add('r1r2', 'R2 (protective conductor continuity, long lead)', ['r2LeadOhm'], true, guarded(() => r2LeadLine(r.r2LeadOhm, rules), rules.circuitTests.protectiveConductorSource, 'Ω'));
  } else {
    const radialCable = circuit.kind !== 'ring' && given(circuit.lengthM) && given(circuit.liveCsaMm2) && given(circuit.cpcCsaMm2);
    add('r1r2', 'R1+R2 (protective conductor continuity)', ['r1r2Ohm'], true,
      guarded(
        () =>
          radialCable
            ? r1r2Expected({ liveCsaMm2: circuit.liveCsaMm2!, cpcCsaMm2: circuit.cpcCsaMm2!, lengthM: circuit.lengthM!, measured: r.r1r2Ohm }, rules)
            : checkR1R2({ measured: r.r1r2Ohm, expectedForRing: ring?.expectedR1R2 ?? null }, rules),
        rules.circuitTests.protectiveConductorSource,
        'Ω',
      ));
  }

  for (const [key, label, field] of [
    ['ir-live-live', 'Insulation resistance, live to live', 'irLiveLiveMOhm'],
    ['ir-live-earth', 'Insulation resistance, live to earth', 'irLiveEarthMOhm'],
  ] as const) {
    const overRange = r[OVER_RANGE_FLAGS[field]] === true;
    add(key, label, [field], true, guarded(() => insulationLine(r[field], overRange, r.irTestVoltageV, key === 'ir-live-earth', rules), rules.insulation.source, 'MΩ'));
  }

  add('polarity', 'Polarity', ['polarity'], true, checkPolarity({ result: r.polarity }, rules));

  add('zs', 'Earth fault loop impedance Zs', ['zsOhm'], true, guarded(() => zsLine(input, rules), rules.earthFaultLoop.circuitBreakers.B.source, 'Ω'));

  if (given(circuit.rcdRatingMa)) {
    const rcdType: RcdType = /S/i.test(circuit.rcdType ?? '') ? 'S' : 'general';
    const ratedMa = circuit.rcdRatingMa!;
    add('rcd-1x', `RCD operating time at ${ratedMa} mA`, ['rcdTripMs'], true,
      guarded(() => checkRcd({ tripMs: r.rcdTripMs, multiple: 1, ratedMa, rcdType }, rules), rules.rcd.times.general[1].max.source, 'ms'));
    // Not required since A2:2022; judged when it was done.
    if (given(r.rcdTripMs5x)) {
      add('rcd-5x', `RCD operating time at 5 × ${ratedMa} mA`, ['rcdTripMs5x'], false,
        guarded(() => checkRcd({ tripMs: r.rcdTripMs5x, multiple: 5, ratedMa, rcdType }, rules), rules.rcd.times.general[5].max.source, 'ms'));
    }
    if (given(r.rcdButton)) {
      const ok = r.rcdButton === 'operates';
      add('rcd-button', 'RCD test button', ['rcdButton'], false, {
        verdict: ok ? 'pass' : 'fail',
        value: null,
        limit: null,
        unit: '',
        source: rules.circuitTests.rcdButtonSource,
        note: ok ? 'The RCD trips from its own test button.' : 'The RCD does not trip from its test button: replace it.',
      });
    }
  }

  // An AFDD is judged by its button when one is fitted and the button was tried.
  if (given(r.afddButton)) {
    const ok = r.afddButton === 'operates';
    add('afdd-button', 'AFDD test button', ['afddButton'], false, {
      verdict: ok ? 'pass' : 'fail',
      value: null,
      limit: null,
      unit: '',
      source: `${rules.edition} Appendix 6 (AFDD test button operation)`,
      note: ok ? 'The AFDD trips from its own test button.' : 'The AFDD does not trip from its test button: replace it.',
    });
  }

  const counted = lines.filter((l) => l.required || l.fields.every((f) => given(r[f])));
  return {
    ruleSetId: rules.id,
    verdict: worstVerdict(counted.map((l) => l.result.verdict)),
    lines,
    missing: lines.filter((l) => l.missing),
    failing: counted.filter((l) => l.result.verdict === 'fail'),
    notJudged: lines.filter((l) => l.fields.some((f) => impossible.has(f))),
    ring,
  };
}

function r2LeadLine(measured: Reading, rules: RuleSet): CheckResult {
  const check = checkR1R2({ measured, expectedForRing: null }, rules);
  if (check.value === null) return { ...check, note: 'Enter R2 to show the protective conductor is continuous.' };
  if (check.value === 0) return { ...check, note: 'R2 of 0 Ω cannot be right; null the long lead and measure again.' };
  return { ...check, note: `R2 of ${check.value} Ω by the long lead shows the protective conductor is continuous.` };
}

function insulationLine(megaohms: Reading, overRange: boolean, testV: number | null | undefined, liveToEarth: boolean, rules: RuleSet): CheckResult {
  const check = checkInsulation({ megaohms, overRange }, rules);
  if (!given(megaohms) || check.verdict === 'fail') return check;
  if (!given(testV)) {
    return { ...check, verdict: 'check', note: `${check.note} Record the test voltage used (${check.testVoltageV} V DC for this circuit).` };
  }
  if (testV! >= check.testVoltageV) return check;
  const reduced = rules.circuitTests.reducedInsulationTestV;
  if (liveToEarth && testV === reduced.value) {
    return {
      ...check,
      verdict: 'check',
      source: `${check.source}; ${reduced.source}`,
      note: `Tested at ${testV} V DC, not ${check.testVoltageV} V: allowed between live conductors and earth where connected equipment may be affected; say so in the observations.`,
    };
  }
  return { ...check, verdict: 'check', note: `Tested at ${testV} V DC; this circuit needs ${check.testVoltageV} V DC. Test again at that voltage.` };
}

function zsLine(input: CircuitTestInput, rules: RuleSet): CheckResult {
  const { circuit, readings } = input;
  if (circuit.faultProtection === 'rcd') {
    // The RCD disconnects the fault, so Zs is held to 50 V / IΔn (Table 41.5).
    const source = rules.rcd.maxZsByRatedMa.source;
    if (!given(circuit.rcdRatingMa)) return cannotJudge('Fault protection is recorded as by the RCD: record its rated residual current to check Zs.', source, 'Ω');
    const limit = maxZsForRcd({ ratedMa: circuit.rcdRatingMa! }, rules);
    const measured = readings.zsOhm;
    if (!given(measured)) return { verdict: 'check', value: null, limit, unit: 'Ω', source, note: `Enter the measured Zs to check it against ${limit} Ω.` };
    const ok = measured! <= limit;
    return {
      verdict: ok ? 'pass' : 'fail',
      value: measured!,
      limit,
      unit: 'Ω',
      source,
      note: ok
        ? `Zs ${measured} Ω is within ${limit} Ω for fault protection by a ${circuit.rcdRatingMa} mA RCD.`
        : `Zs ${measured} Ω is above ${limit} Ω for fault protection by a ${circuit.rcdRatingMa} mA RCD.`,
    };
  }
  if (!given(circuit.deviceType) || !given(circuit.deviceRatingA)) {
    return cannotJudge('Record the circuit’s protective device and rating to check Zs.', rules.earthFaultLoop.circuitBreakers.B.source, 'Ω');
  }
  const check = checkZs({ measured: readings.zsOhm, device: circuit.deviceType as ProtectiveDevice, ratingA: circuit.deviceRatingA! }, rules);
  if (check.verdict === 'fail' && input.earthing === 'TT' && given(circuit.rcdRatingMa)) {
    return { ...check, note: `${check.note} On a TT system an RCD usually gives fault protection: if this circuit relies on its RCD, record that as its method of fault protection.` };
  }
  return check;
}
