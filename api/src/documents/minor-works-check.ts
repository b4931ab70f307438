import {
  assessCircuitTest,
  type CircuitReadings,
  type CircuitTestAssessment,
  type CircuitUnderTest,
  FINISHED_VISIT_STATUS,
  type ReadingField,
  type RuleSet,
} from '@wiretrail/core';

/** A synced row as the documents read it: its fields by name. */
export type RecordRow = { id: string } & Record<string, unknown>;

export interface CertifiedCircuit {
  circuit: RecordRow;
  /** The latest test of the circuit on the job's signed visits. */
  test: RecordRow;
  visit: RecordRow;
  assessment: CircuitTestAssessment;
  /** The visit's sign-off records a departure, so missing or failing readings are issued as they stand. */
  departureRecorded: boolean;
}

export interface MinorWorksJudgement {
  /** The job's finished and signed visits, oldest first. */
  visits: RecordRow[];
  circuits: CertifiedCircuit[];
  /** Why the certificate cannot be issued; empty when it can. */
  problems: string[];
}

export interface MinorWorksInput {
  visits: RecordRow[];
  tests: RecordRow[];
  pointChanges: RecordRow[];
  circuits: RecordRow[];
  earthing: string | null;
}

const READING_WORDS: Record<ReadingField, string> = {
  r1Ohm: 'r1',
  rnOhm: 'rn',
  r2Ohm: 'r2',
  r1r2Ohm: 'R1+R2',
  irLiveLiveMOhm: 'live–live insulation resistance',
  irLiveEarthMOhm: 'live–earth insulation resistance',
  irTestVoltageV: 'insulation test voltage',
  polarity: 'polarity',
  zsOhm: 'Zs',
  rcdTripMs: 'RCD operating time',
  rcdTripMs5x: 'RCD operating time at 5 IΔn',
  rcdButton: 'RCD test button',
};

const READING_FIELDS = Object.keys(READING_WORDS) as ReadingField[];
const text = (v: unknown) => (typeof v === 'string' ? v.trim() : '');
const when = (row: RecordRow) => text(row.testedAt) || text(row.createdAt);

/** Finished on site and signed: the technician's name, the time and the drawn signature are all there. */
export function isSigned(visit: RecordRow): boolean {
  return visit.status === FINISHED_VISIT_STATUS && !!text(visit.signedByName) && !!text(visit.signedAt) && !!text(visit.signatureSvg);
}

export function circuitName(circuit: RecordRow): string {
  const description = text(circuit.description);
  return `Circuit ${text(circuit.number) || '?'}${description ? ` (${description})` : ''}`;
}

export function readingsOf(test: RecordRow): CircuitReadings {
  return Object.fromEntries(READING_FIELDS.map((f) => [f, test[f] ?? null])) as CircuitReadings;
}

export function circuitUnderTest(circuit: RecordRow): CircuitUnderTest {
  const pick = <T>(f: string) => (circuit[f] ?? null) as T | null;
  return {
    kind: pick<string>('kind'),
    deviceType: pick<string>('deviceType'),
    deviceRatingA: pick<number>('deviceRatingA'),
    rcdRatingMa: pick<number>('rcdRatingMa'),
    rcdType: pick<string>('rcdType'),
    liveCsaMm2: pick<number>('liveCsaMm2'),
    cpcCsaMm2: pick<number>('cpcCsaMm2'),
  };
}

/**
 * What a minor works certificate for a job would say, worked out again on the server from the recorded readings
 * (never from the verdicts a phone stored), and every reason it cannot be issued yet: no signed visit, an altered
 * circuit without tests, a required reading missing or failing. Missing and failing readings are allowed where
 * the visit's sign-off records a departure; the certificate then prints them as they are.
 */
export function judgeMinorWorks(input: MinorWorksInput, rules: RuleSet): MinorWorksJudgement {
  const visits = input.visits.filter(isSigned).sort((a, b) => text(a.signedAt).localeCompare(text(b.signedAt)));
  if (visits.length === 0) {
    const finished = input.visits.some((v) => v.status === FINISHED_VISIT_STATUS);
    return {
      visits,
      circuits: [],
      problems: [
        finished
          ? 'No visit of this job has been signed off: a certificate needs the name, date and signature of the person who did and tested the work.'
          : 'No visit of this job has been finished and signed off on site yet, so there is nothing to certify.',
      ],
    };
  }
  const signed = new Map(visits.map((v) => [v.id, v]));
  const circuitsById = new Map(input.circuits.map((c) => [c.id, c]));
  const tests = input.tests.filter((t) => signed.has(t.visitId as string)).sort((a, b) => when(a).localeCompare(when(b)));
  const problems: string[] = [];

  const latest = new Map<string, RecordRow>();
  for (const t of tests) {
    if (typeof t.circuitId !== 'string') {
      problems.push(`A test result recorded ${when(t).slice(0, 10) || 'on a signed visit'} does not say which circuit it is for.`);
      continue;
    }
    latest.set(t.circuitId, t);
  }

  const altered = new Set(input.pointChanges.filter((p) => signed.has(p.visitId as string) && typeof p.circuitId === 'string').map((p) => p.circuitId as string));
  for (const id of altered) {
    if (!latest.has(id)) problems.push(`${circuitName(circuitsById.get(id) ?? { id })} was altered on this job but has no test results.`);
  }
  if (latest.size === 0 && altered.size === 0) {
    problems.push('No circuit was tested on the signed visits of this job: record the test results of the altered circuit first.');
  }

  const circuits: CertifiedCircuit[] = [];
  let readingProblems = false;
  for (const [circuitId, test] of latest) {
    const circuit = circuitsById.get(circuitId);
    if (!circuit) {
      problems.push(`A test result names a circuit that is no longer recorded on this site.`);
      continue;
    }
    const visit = signed.get(test.visitId as string)!;
    const departureRecorded = !!text(visit.departures);
    const assessment = assessCircuitTest({ circuit: circuitUnderTest(circuit), readings: readingsOf(test), earthing: input.earthing }, rules);
    circuits.push({ circuit, test, visit, assessment, departureRecorded });
    if (departureRecorded) continue;
    for (const line of assessment.missing) {
      const absent = line.fields.filter((f) => test[f] === null || test[f] === undefined).map((f) => READING_WORDS[f]);
      problems.push(`${circuitName(circuit)}: ${line.label} has no reading (${absent.join(', ')}).`);
      readingProblems = true;
    }
    for (const line of assessment.failing) {
      problems.push(`${circuitName(circuit)}: ${line.label} fails. ${line.result.note}`);
      readingProblems = true;
    }
  }
  if (readingProblems) {
    problems.push('Record the missing readings, put right what fails and test again, or record the departure from the standard in the visit’s sign-off to issue the certificate with it.');
  }
  circuits.sort((a, b) => text(a.circuit.number).localeCompare(text(b.circuit.number), 'en-GB', { numeric: true }));
  return { visits, circuits, problems };
}
