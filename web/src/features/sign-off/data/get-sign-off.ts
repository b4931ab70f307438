import { assessCableRun, assessCircuitTest, type CableRunAssessment, type CircuitTestAssessment } from '@wiretrail/core';
import { useLiveQuery } from 'dexie-react-hooks';
import { type CableRunRow, type CircuitRow, db, type PointChangeRow, type VisitRow } from '@/lib/db';

/** One thing the office (or the certificate) will ask about. */
export interface Problem {
  kind: 'fail' | 'missing' | 'untested';
  what: string;
  detail: string;
}

export interface SignOffSummary {
  counts: { photos: number; notes: number; cables: number; points: number; circuits: number };
  circuits: { circuit: CircuitRow; assessment: CircuitTestAssessment }[];
  cables: { cable: CableRunRow; assessment: CableRunAssessment }[];
  points: PointChangeRow[];
  problems: Problem[];
}

const circuitName = (c: CircuitRow) => `Circuit ${c.number}${c.description ? ` (${c.description})` : ''}`;

/** Everything recorded on the visit, judged again, with every fail and every missing reading in words. */
export async function getSignOff(visit: VisitRow): Promise<SignOffSummary> {
  const [photos, notes, points, results, cables, circuits, site] = await Promise.all([
    db.photo.where('visitId').equals(visit.id).count(),
    db.note.where('visitId').equals(visit.id).count(),
    db.pointChange.where('visitId').equals(visit.id).toArray(),
    db.testResult.where('visitId').equals(visit.id).toArray(),
    db.cableRun.where('siteId').equals(visit.siteId).toArray(),
    db.circuit.where('siteId').equals(visit.siteId).toArray(),
    db.site.get(visit.siteId),
  ]);
  const byId = new Map(circuits.map((c) => [c.id, c]));
  const problems: Problem[] = [];
  const tested = results
    .filter((r) => r.circuitId && byId.has(r.circuitId))
    .map((r) => {
      const circuit = byId.get(r.circuitId!)!;
      const assessment = assessCircuitTest({
        circuit,
        readings: { ...r, irTestVoltageV: r.irTestVoltageV ?? null },
        earthing: site?.earthing,
      });
      for (const line of assessment.failing) {
        problems.push({ kind: 'fail', what: `${circuitName(circuit)}: ${line.label}`, detail: line.result.note });
      }
      for (const line of assessment.missing) {
        problems.push({ kind: 'missing', what: `${circuitName(circuit)}: ${line.label}`, detail: 'Not recorded yet.' });
      }
      return { circuit, assessment };
    })
    .sort((a, b) => a.circuit.number.localeCompare(b.circuit.number, 'en-GB', { numeric: true }));
  const testedIds = new Set(tested.map((t) => t.circuit.id));
  for (const circuitId of new Set(points.map((p) => p.circuitId).filter((id): id is string => !!id))) {
    const circuit = byId.get(circuitId);
    if (circuit && !testedIds.has(circuitId)) {
      problems.push({ kind: 'untested', what: circuitName(circuit), detail: 'Altered on this visit, but no test results are recorded for it.' });
    }
  }
  const mine = cables
    .filter((c) => c.lastVisitId === visit.id)
    .map((cable) => ({ cable, assessment: assessCableRun({ medium: cable.medium, scheme: cable.scheme, wiremap: cable.wiremap as never, lengthM: cable.lengthM, linkKind: cable.linkKind as never }) }))
    .sort((a, b) => a.cable.label.localeCompare(b.cable.label, 'en-GB', { numeric: true }));
  for (const { cable, assessment } of mine) {
    if (assessment.verdict === 'fail') {
      const faults = assessment.wiremap?.faults.map((f) => `${f.kind} on pins ${f.pins.join(', ')}`).join('; ');
      problems.push({ kind: 'fail', what: `Cable ${cable.label}`, detail: faults || assessment.length?.note || 'Its test fails.' });
    }
    if (assessment.missing.length > 0) problems.push({ kind: 'missing', what: `Cable ${cable.label}`, detail: `Still to record: ${assessment.missing.join(', ')}.` });
  }
  return {
    counts: { photos, notes, cables: mine.length, points: points.length, circuits: tested.length },
    circuits: tested,
    cables: mine,
    points,
    problems,
  };
}

export function useSignOff(visit: VisitRow): SignOffSummary | undefined {
  return useLiveQuery(() => getSignOff(visit), [visit]);
}
