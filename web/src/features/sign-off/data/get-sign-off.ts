import {
  assessCableRun,
  type CableRunAssessment,
  judgeCircuitWork,
  type MinorWorksFindingKind,
  type MinorWorksJudgement,
} from '@wiretrail/core';
import { useLiveQuery } from 'dexie-react-hooks';
import { type CableRunRow, type CircuitRow, db, type PointChangeRow, type TestResultRow, type VisitRow } from '@/lib/db';

/** One thing the office (or the certificate) will ask about. */
export interface Problem {
  kind: Exclude<MinorWorksFindingKind, 'not-signed' | 'nothing-tested'>;
  what: string;
  detail: string;
}

export interface SignOffSummary {
  counts: { photos: number; notes: number; cables: number; points: number; circuits: number };
  /** The visit's circuit work judged as the server will judge it before it issues a certificate. */
  certificate: MinorWorksJudgement<VisitRow, TestResultRow, CircuitRow>;
  cables: { cable: CableRunRow; assessment: CableRunAssessment }[];
  points: PointChangeRow[];
  problems: Problem[];
}

/** Everything recorded on the visit, judged again, with every fail and every missing reading in words. */
export async function getSignOff(visit: VisitRow): Promise<SignOffSummary> {
  const [photos, notes, points, results, cables, circuits, site, boards] = await Promise.all([
    db.photo.where('visitId').equals(visit.id).count(),
    db.note.where('visitId').equals(visit.id).count(),
    db.pointChange.where('visitId').equals(visit.id).toArray(),
    db.testResult.where('visitId').equals(visit.id).toArray(),
    db.cableRun.where('siteId').equals(visit.siteId).toArray(),
    db.circuit.where('siteId').equals(visit.siteId).toArray(),
    db.site.get(visit.siteId),
    db.board.where('siteId').equals(visit.siteId).toArray(),
  ]);
  const certificate = judgeCircuitWork({ visits: [visit], tests: results, pointChanges: points, circuits, earthing: site?.earthing, boards });
  // A visit of data cabling alone has no circuit to certify: whether the job has one is the office's question.
  const problems: Problem[] = certificate.findings.flatMap((f) =>
    f.kind === 'not-signed' || f.kind === 'nothing-tested' ? [] : [{ kind: f.kind, what: f.what, detail: f.detail }],
  );
  const mine = cables
    .filter((c) => c.lastVisitId === visit.id)
    .map((cable) => ({ cable, assessment: assessCableRun({ medium: cable.medium, scheme: cable.scheme, wiremap: cable.wiremap, lengthM: cable.lengthM, linkKind: cable.linkKind }) }))
    .sort((a, b) => a.cable.label.localeCompare(b.cable.label, 'en-GB', { numeric: true }));
  for (const { cable, assessment } of mine) {
    if (assessment.verdict === 'fail') {
      const faults = assessment.wiremap?.faults.map((f) => `${f.kind} on pins ${f.pins.join(', ')}`).join('; ');
      problems.push({ kind: 'fail', what: `Cable ${cable.label}`, detail: faults || assessment.length?.note || 'Its test fails.' });
    }
    if (assessment.missing.length > 0) problems.push({ kind: 'missing', what: `Cable ${cable.label}`, detail: `Still to record: ${assessment.missing.join(', ')}.` });
  }
  return {
    counts: { photos, notes, cables: mine.length, points: points.length, circuits: certificate.circuits.length },
    certificate,
    cables: mine,
    points,
    problems,
  };
}

export function useSignOff(visit: VisitRow): SignOffSummary | undefined {
  return useLiveQuery(() => getSignOff(visit), [visit]);
}
