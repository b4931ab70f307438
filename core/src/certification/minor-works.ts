/**
 * What a minor works certificate would say about the circuit work recorded on some visits, and every reason it
 * cannot be issued: the phone's sign-off shows this for its visit, and the server works it out again, from the
 * readings and never from the verdicts a phone stored, before it issues the certificate for a job's signed visits.
 *
 * A certificate is a declaration that the work is safe, so nothing waives a required reading: a departure from the
 * standard is a design choice recorded beside the results (BS 7671 Regs 120.3, 133.1.3, 133.5), never a way past a
 * failed or unjudged test. An issuable judgment therefore never carries a Fail.
 */
import { dayOf, ruleSetInForce } from '../rules/rules-in-force.js';
import type { RuleSet } from '../rules/rule-set.js';
import { type DepartureEntry, FINISHED_VISIT_STATUS } from '../sync/entities.js';
import { isVoided } from '../sync/voided-records.js';
import { circuitReading } from './circuit-readings.js';
import { circuitName, circuitTestInput, type LooseRowOf, type TestResultRecord, textOf } from './circuit-records.js';
import { assessCircuitTest, type CircuitTestAssessment, type CircuitTestKey } from './circuit-test.js';

type VisitRecord = LooseRowOf<'visit'>;
type CircuitRecord = LooseRowOf<'circuit'>;
type BoardRecord = LooseRowOf<'board'>;

export interface MinorWorksRecords<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord> {
  readonly visits: readonly Visit[];
  readonly tests: readonly Test[];
  readonly pointChanges: readonly LooseRowOf<'pointChange'>[];
  /** The site's circuits. */
  readonly circuits: readonly Circuit[];
  /** The site's earthing arrangement. */
  readonly earthing: string | null | undefined;
  /** The site's boards, to see whether one was replaced on the visits judged. */
  readonly boards?: readonly BoardRecord[];
}

export interface CertifiedCircuit<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord> {
  readonly circuit: Circuit;
  /** The latest test of the circuit on the visits judged. */
  readonly test: Test;
  readonly visit: Visit;
  readonly assessment: CircuitTestAssessment;
}

export type MinorWorksFindingKind =
  | 'not-signed'
  | 'no-rules'
  | 'new-circuit'
  | 'board-replaced'
  | 'nothing-tested'
  | 'no-circuit'
  | 'unknown-circuit'
  | 'untested'
  | 'missing'
  | 'unjudged'
  | 'fail'
  | 'departure-incomplete'
  // An installation certificate's own: the work is minor works, a new circuit's details, the inspections, instruments, particulars.
  | 'not-installation-work'
  | 'details-missing'
  | 'inspection'
  | 'instruments'
  | 'particulars';

/** A departure as the certificate prints it, with the visit that recorded it. */
export interface RecordedDeparture extends DepartureEntry {
  readonly visitId: string;
}

export interface MinorWorksFinding {
  readonly kind: MinorWorksFindingKind;
  /** What it is about, as a list heads it: a circuit, or a circuit and one of its tests. */
  readonly what: string;
  /** The rest, as a list puts it beneath. */
  readonly detail: string;
  /** The whole of it in one sentence, as a refusal to issue says it. */
  readonly sentence: string;
  readonly circuitId: string | null;
  readonly line: CircuitTestKey | null;
}

export interface MinorWorksJudgement<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord> {
  /** The visits judged, oldest signature first. */
  readonly visits: Visit[];
  /** Each circuit tested, with its latest test, by circuit number. */
  readonly circuits: CertifiedCircuit<Visit, Test, Circuit>[];
  /** Every reason the certificate cannot be issued, each about one thing. */
  readonly findings: MinorWorksFinding[];
  /** Why the certificate cannot be issued, in words; empty when it can. */
  readonly problems: string[];
  readonly issuable: boolean;
  /** The departures from the standard the sign-offs record, complete ones only, to print beside the results. */
  readonly departures: RecordedDeparture[];
  /** The day the work was completed (the last signature, or the last test while not yet signed), YYYY-MM-DD. */
  readonly completedOn: string;
  /** The rule set in force on that day, whose edition the certificate states; null before the oldest one kept. */
  readonly rules: RuleSet | null;
}

export const READINGS_ADVICE =
  'Record the missing readings, put right what fails and test the circuit again: a departure from the standard never stands in for a test result.';

/** A departure's three parts, in the words a refusal uses. */
const DEPARTURE_PARTS: readonly [keyof DepartureEntry, string][] = [
  ['regulation', 'the regulation departed from'],
  ['instead', 'what is done instead'],
  ['noLessSafe', 'why that gives no less safety'],
];

/** A time as ISO text, which sorts as time does; a database driver may hand it over as a Date. */
const timeText = (v: unknown): string => (v instanceof Date ? v.toISOString() : textOf(v));

/** When a test was taken, for putting tests in order; the row's creation stands in for a time never entered. */
const takenAt = (test: TestResultRecord): string => timeText(test.testedAt) || timeText(test.createdAt);

/** Finished on site and signed: the technician's name, the time and the drawn signature are all there. */
export function isSigned(visit: VisitRecord): boolean {
  return visit.status === FINISHED_VISIT_STATUS && !!textOf(visit.signedByName) && !!textOf(visit.signedAt) && !!textOf(visit.signatureSvg);
}

function finding(kind: MinorWorksFindingKind, what: string, detail: string, sentence: string, more: Partial<MinorWorksFinding> = {}): MinorWorksFinding {
  return { kind, what, detail, sentence, circuitId: null, line: null, ...more };
}

interface Concluded<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord> {
  readonly visits: V[];
  readonly circuits: CertifiedCircuit<V, T, C>[];
  readonly findings: MinorWorksFinding[];
  readonly departures: RecordedDeparture[];
  readonly completedOn: string;
  readonly rules: RuleSet | null;
}

function concluded<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord>(c: Concluded<V, T, C>): MinorWorksJudgement<V, T, C> {
  const problems = c.findings.map((f) => f.sentence);
  if (c.findings.some((f) => f.kind === 'missing' || f.kind === 'unjudged' || f.kind === 'fail')) problems.push(READINGS_ADVICE);
  return { ...c, problems, issuable: problems.length === 0 };
}

/**
 * The structured departures of a visit's sign-off: complete ones to print, and a finding for each incomplete one, since
 * a departure that does not say what it departs from, what is done instead and why that is no less safe declares nothing.
 */
export function departuresOf(visit: VisitRecord): { complete: DepartureEntry[]; incomplete: { index: number; lacking: string[] }[] } {
  const entries: unknown[] = Array.isArray(visit.departureEntries) ? visit.departureEntries : [];
  const complete: DepartureEntry[] = [];
  const incomplete: { index: number; lacking: string[] }[] = [];
  entries.forEach((entry, index) => {
    const e = typeof entry === 'object' && entry !== null ? (entry as Record<string, unknown>) : {};
    const parts = DEPARTURE_PARTS.map(([key]) => textOf(e[key]));
    if (parts.every((p) => !p)) return; // an entry left blank is no entry
    const lacking = DEPARTURE_PARTS.filter((_, i) => !parts[i]).map(([, words]) => words);
    if (lacking.length) incomplete.push({ index, lacking });
    else complete.push({ regulation: parts[0]!, instead: parts[1]!, noLessSafe: parts[2]! });
  });
  return { complete, incomplete };
}

/**
 * The certificate for a job: only its finished and signed visits count, and without one there is nothing to certify.
 */
export function judgeMinorWorks<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord>(
  records: MinorWorksRecords<V, T, C>,
  rules?: RuleSet,
): MinorWorksJudgement<V, T, C> {
  const visits = records.visits.filter(isSigned);
  if (visits.length > 0) return judgeCircuitWork({ ...records, visits }, rules);
  const sentence = records.visits.some((v) => v.status === FINISHED_VISIT_STATUS)
    ? 'No visit of this job has been signed off: a certificate needs the name, date and signature of the person who did and tested the work.'
    : 'No visit of this job has been finished and signed off on site yet, so there is nothing to certify.';
  return concluded({ visits: [], circuits: [], findings: [finding('not-signed', 'No signed visit', sentence, sentence)], departures: [], completedOn: '', rules: rules ?? null });
}

/**
 * The circuit work recorded on the given visits, judged as their certificate would judge it: the latest test of
 * each circuit, every altered circuit without a test, every test that names no circuit, and each required reading
 * missing, unjudged or failing; work that needs an installation certificate instead; and incomplete departures.
 * Without a rule set given, the limits are those in force on the day the work was completed.
 */
export function judgeCircuitWork<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord>(
  records: MinorWorksRecords<V, T, C>,
  given?: RuleSet,
): MinorWorksJudgement<V, T, C> {
  const visits = [...records.visits].sort((a, b) => timeText(a.signedAt).localeCompare(timeText(b.signedAt)));
  const judged = new Map(visits.map((v) => [v.id, v]));
  const circuitsById = new Map(records.circuits.map((c) => [c.id, c]));
  const visitOf = (row: { readonly visitId?: unknown }) => (typeof row.visitId === 'string' ? judged.get(row.visitId) : undefined);
  // A voided record was made by mistake: it is neither evidence nor a circuit altered.
  const tests = records.tests.filter((t) => visitOf(t) && !isVoided(t)).sort((a, b) => takenAt(a).localeCompare(takenAt(b)));
  const findings: MinorWorksFinding[] = [];

  // Completed when last signed; a visit still being worked on is judged as if completed on its latest test.
  const lastSigned = visits.map((v) => timeText(v.signedAt)).filter(Boolean).at(-1);
  const completedOn = dayOf(lastSigned ?? (tests.length ? takenAt(tests[tests.length - 1]!) : '')) || dayOf(new Date());
  const rules = given ?? ruleSetInForce(completedOn);
  if (!rules) {
    const sentence = `No edition of the standard is kept for work completed on ${completedOn}, so the certificate cannot say which one it was done to.`;
    return concluded({ visits, circuits: [], findings: [finding('no-rules', 'No standard for that date', sentence, sentence)], departures: [], completedOn, rules: null });
  }

  // A new circuit or a replaced board is certified by an installation certificate, not by a minor works one.
  for (const circuit of records.circuits) {
    if (typeof circuit.newOnVisitId !== 'string' || !judged.has(circuit.newOnVisitId)) continue;
    const what = circuitName(circuit);
    findings.push(finding('new-circuit', what, 'Installed as a new circuit on this job: that needs an electrical installation certificate, not a minor works certificate.',
      `${what} is a new circuit: a minor works certificate covers an alteration or addition to an existing circuit, and a new circuit needs an electrical installation certificate.`, { circuitId: circuit.id }));
  }
  for (const board of records.boards ?? []) {
    if (typeof board.replacedOnVisitId !== 'string' || !judged.has(board.replacedOnVisitId)) continue;
    const what = `Board ${textOf(board.name) || '?'}`;
    findings.push(finding('board-replaced', what, 'Replaced on this job: a consumer unit replacement needs an electrical installation certificate, not a minor works certificate.',
      `${what} was replaced on this job: a consumer unit replacement needs an electrical installation certificate, not a minor works certificate.`));
  }

  // A retest replaces the test before it: the certificate carries what the circuit measured last.
  const latest = new Map<string, T>();
  for (const t of tests) {
    if (typeof t.circuitId !== 'string') {
      const what = `A test result recorded ${takenAt(t).slice(0, 10) || 'on a signed visit'}`;
      findings.push(finding('no-circuit', what, 'It does not say which circuit it is for.', `${what} does not say which circuit it is for.`));
      continue;
    }
    latest.set(t.circuitId, t);
  }

  const altered = new Set(records.pointChanges.flatMap((p) => (visitOf(p) && !isVoided(p) && typeof p.circuitId === 'string' ? [p.circuitId] : [])));
  for (const id of altered) {
    if (latest.has(id)) continue;
    const what = circuitName(circuitsById.get(id) ?? { id });
    findings.push(finding('untested', what, 'Altered, but no test results are recorded for it.', `${what} was altered on this job but has no test results.`, { circuitId: id }));
  }
  if (latest.size === 0 && altered.size === 0) {
    const sentence = 'No circuit was tested on the signed visits of this job: record the test results of the altered circuit first.';
    findings.push(finding('nothing-tested', 'No circuit tested', sentence, sentence));
  }

  const circuits: CertifiedCircuit<V, T, C>[] = [];
  for (const [circuitId, test] of latest) {
    const circuit = circuitsById.get(circuitId);
    if (!circuit) {
      findings.push(finding('unknown-circuit', 'A test result', 'It names a circuit that is no longer recorded on this site.', 'A test result names a circuit that is no longer recorded on this site.', { circuitId }));
      continue;
    }
    const visit = visitOf(test)!;
    const input = circuitTestInput(circuit, test, records.earthing);
    const assessment = assessCircuitTest(input, rules);
    circuits.push({ circuit, test, visit, assessment });
    const name = circuitName(circuit);
    for (const line of assessment.missing) {
      const absent = line.fields.filter((f) => input.readings[f] === null || input.readings[f] === undefined).map((f) => circuitReading(f).words);
      const what = `${name}: ${line.label}`;
      findings.push(finding('missing', what, `Not recorded yet: ${absent.join(', ')}.`, `${what} has no reading (${absent.join(', ')}).`, { circuitId, line: line.key }));
    }
    // A reading that is there but could not be judged (no limit for the device, a suspicious figure) is not a pass.
    for (const line of assessment.lines) {
      const counted = line.required || line.fields.every((f) => input.readings[f] !== null && input.readings[f] !== undefined);
      if (!counted || line.missing || line.result.verdict !== 'check') continue;
      const what = `${name}: ${line.label}`;
      findings.push(finding('unjudged', what, line.result.note, `${what} has not been judged. ${line.result.note}`, { circuitId, line: line.key }));
    }
    for (const line of assessment.failing) {
      const what = `${name}: ${line.label}`;
      findings.push(finding('fail', what, line.result.note, `${what} fails. ${line.result.note}`, { circuitId, line: line.key }));
    }
  }
  circuits.sort((a, b) => textOf(a.circuit.number).localeCompare(textOf(b.circuit.number), 'en-GB', { numeric: true }));

  const departures: RecordedDeparture[] = [];
  for (const visit of visits) {
    const { complete, incomplete } = departuresOf(visit);
    departures.push(...complete.map((d) => ({ ...d, visitId: visit.id })));
    for (const { index, lacking } of incomplete) {
      const what = `Departure ${index + 1} from the standard`;
      findings.push(finding('departure-incomplete', what, `It does not say ${lacking.join(' or ')}.`, `${what} does not say ${lacking.join(' or ')}.`));
    }
  }
  return concluded({ visits, circuits, findings, departures, completedOn, rules });
}
