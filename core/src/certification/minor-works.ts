/**
 * What a minor works certificate would say about the circuit work recorded on some visits, and every reason it
 * cannot be issued: the phone's sign-off shows this for its visit, and the server works it out again, from the
 * readings and never from the verdicts a phone stored, before it issues the certificate for a job's signed visits.
 */
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import type { RuleSet } from '../rules/rule-set.js';
import { FINISHED_VISIT_STATUS } from '../sync/entities.js';
import { circuitReading } from './circuit-readings.js';
import { circuitName, circuitTestInput, type LooseRowOf, type TestResultRecord, textOf } from './circuit-records.js';
import { assessCircuitTest, type CircuitTestAssessment, type CircuitTestKey } from './circuit-test.js';

type VisitRecord = LooseRowOf<'visit'>;
type CircuitRecord = LooseRowOf<'circuit'>;

export interface MinorWorksRecords<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord> {
  readonly visits: readonly Visit[];
  readonly tests: readonly Test[];
  readonly pointChanges: readonly LooseRowOf<'pointChange'>[];
  /** The site's circuits. */
  readonly circuits: readonly Circuit[];
  /** The site's earthing arrangement. */
  readonly earthing: string | null | undefined;
}

export interface CertifiedCircuit<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord> {
  readonly circuit: Circuit;
  /** The latest test of the circuit on the visits judged. */
  readonly test: Test;
  readonly visit: Visit;
  readonly assessment: CircuitTestAssessment;
  /** The visit's sign-off records a departure, so missing or failing readings are issued as they stand. */
  readonly departureRecorded: boolean;
}

export type MinorWorksFindingKind = 'not-signed' | 'nothing-tested' | 'no-circuit' | 'unknown-circuit' | 'untested' | 'missing' | 'fail';

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
  /** A missing or failing reading on a visit whose sign-off records a departure: it goes on the certificate as it stands. */
  readonly excused: boolean;
}

export interface MinorWorksJudgement<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord> {
  /** The visits judged, oldest signature first. */
  readonly visits: Visit[];
  /** Each circuit tested, with its latest test, by circuit number. */
  readonly circuits: CertifiedCircuit<Visit, Test, Circuit>[];
  /** Everything a technician or the office should look at, excused or not. */
  readonly findings: MinorWorksFinding[];
  /** Why the certificate cannot be issued, in words; empty when it can. */
  readonly problems: string[];
  readonly issuable: boolean;
}

const READINGS_ADVICE =
  'Record the missing readings, put right what fails and test again, or record the departure from the standard in the visit’s sign-off to issue the certificate with it.';

/** A time as ISO text, which sorts as time does; a database driver may hand it over as a Date. */
const timeText = (v: unknown): string => (v instanceof Date ? v.toISOString() : textOf(v));

/** When a test was taken, for putting tests in order; the row's creation stands in for a time never entered. */
const takenAt = (test: TestResultRecord): string => timeText(test.testedAt) || timeText(test.createdAt);

/** Finished on site and signed: the technician's name, the time and the drawn signature are all there. */
export function isSigned(visit: VisitRecord): boolean {
  return visit.status === FINISHED_VISIT_STATUS && !!textOf(visit.signedByName) && !!textOf(visit.signedAt) && !!textOf(visit.signatureSvg);
}

function finding(kind: MinorWorksFindingKind, what: string, detail: string, sentence: string, more: Partial<MinorWorksFinding> = {}): MinorWorksFinding {
  return { kind, what, detail, sentence, circuitId: null, line: null, excused: false, ...more };
}

function concluded<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord>(
  visits: V[],
  circuits: CertifiedCircuit<V, T, C>[],
  findings: MinorWorksFinding[],
): MinorWorksJudgement<V, T, C> {
  const refusing = findings.filter((f) => !f.excused);
  const problems = refusing.map((f) => f.sentence);
  if (refusing.some((f) => f.kind === 'missing' || f.kind === 'fail')) problems.push(READINGS_ADVICE);
  return { visits, circuits, findings, problems, issuable: problems.length === 0 };
}

/**
 * The certificate for a job: only its finished and signed visits count, and without one there is nothing to certify.
 */
export function judgeMinorWorks<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord>(
  records: MinorWorksRecords<V, T, C>,
  rules: RuleSet = DEFAULT_RULE_SET,
): MinorWorksJudgement<V, T, C> {
  const visits = records.visits.filter(isSigned);
  if (visits.length > 0) return judgeCircuitWork({ ...records, visits }, rules);
  const sentence = records.visits.some((v) => v.status === FINISHED_VISIT_STATUS)
    ? 'No visit of this job has been signed off: a certificate needs the name, date and signature of the person who did and tested the work.'
    : 'No visit of this job has been finished and signed off on site yet, so there is nothing to certify.';
  return concluded([], [], [finding('not-signed', 'No signed visit', sentence, sentence)]);
}

/**
 * The circuit work recorded on the given visits, judged as their certificate would judge it: the latest test of
 * each circuit, every altered circuit without a test, every test that names no circuit, and each required reading
 * missing or failing. Missing and failing readings are excused where the visit's sign-off records a departure.
 */
export function judgeCircuitWork<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord>(
  records: MinorWorksRecords<V, T, C>,
  rules: RuleSet = DEFAULT_RULE_SET,
): MinorWorksJudgement<V, T, C> {
  const visits = [...records.visits].sort((a, b) => timeText(a.signedAt).localeCompare(timeText(b.signedAt)));
  const judged = new Map(visits.map((v) => [v.id, v]));
  const circuitsById = new Map(records.circuits.map((c) => [c.id, c]));
  const visitOf = (row: { readonly visitId?: unknown }) => (typeof row.visitId === 'string' ? judged.get(row.visitId) : undefined);
  const tests = records.tests.filter((t) => visitOf(t)).sort((a, b) => takenAt(a).localeCompare(takenAt(b)));
  const findings: MinorWorksFinding[] = [];

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

  const altered = new Set(records.pointChanges.flatMap((p) => (visitOf(p) && typeof p.circuitId === 'string' ? [p.circuitId] : [])));
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
    const departureRecorded = !!textOf(visit.departures);
    const input = circuitTestInput(circuit, test, records.earthing);
    const assessment = assessCircuitTest(input, rules);
    circuits.push({ circuit, test, visit, assessment, departureRecorded });
    const name = circuitName(circuit);
    for (const line of assessment.missing) {
      const absent = line.fields.filter((f) => input.readings[f] === null || input.readings[f] === undefined).map((f) => circuitReading(f).words);
      const what = `${name}: ${line.label}`;
      findings.push(finding('missing', what, `Not recorded yet: ${absent.join(', ')}.`, `${what} has no reading (${absent.join(', ')}).`, { circuitId, line: line.key, excused: departureRecorded }));
    }
    for (const line of assessment.failing) {
      const what = `${name}: ${line.label}`;
      findings.push(finding('fail', what, line.result.note, `${what} fails. ${line.result.note}`, { circuitId, line: line.key, excused: departureRecorded }));
    }
  }
  circuits.sort((a, b) => textOf(a.circuit.number).localeCompare(textOf(b.circuit.number), 'en-GB', { numeric: true }));
  return concluded(visits, circuits, findings);
}
