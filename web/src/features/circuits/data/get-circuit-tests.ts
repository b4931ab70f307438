import { isVoided } from '@wiretrail/core';
import { useLiveQuery } from 'dexie-react-hooks';
import { type BoardRow, type CircuitRow, db, type PointChangeRow, type SiteRow, type TestResultRow } from '@/lib/db';

export interface CircuitTests {
  site: SiteRow | undefined;
  boards: { board: BoardRow; circuits: CircuitRow[] }[];
  /** Circuits whose board is not on the phone. */
  loose: CircuitRow[];
  /** This visit's results, one per circuit. */
  results: Map<string, TestResultRow>;
  /** This visit's point changes per circuit: circuits that were altered need results. */
  altered: Map<string, PointChangeRow[]>;
}

const byNumber = (a: CircuitRow, b: CircuitRow) => a.number.localeCompare(b.number, 'en-GB', { numeric: true });

export async function getCircuitTests(visitId: string, siteId: string): Promise<CircuitTests> {
  const [site, boards, circuits, results, points] = await Promise.all([
    db.site.get(siteId),
    db.board.where('siteId').equals(siteId).toArray(),
    db.circuit.where('siteId').equals(siteId).toArray(),
    db.testResult.where('visitId').equals(visitId).toArray(),
    db.pointChange.where('visitId').equals(visitId).toArray(),
  ]);
  boards.sort((a, b) => a.name.localeCompare(b.name, 'en-GB'));
  const known = new Set(boards.map((b) => b.id));
  const altered = new Map<string, PointChangeRow[]>();
  for (const p of points) if (p.circuitId && !isVoided(p)) altered.set(p.circuitId, [...(altered.get(p.circuitId) ?? []), p]);
  return {
    site,
    boards: boards.map((board) => ({ board, circuits: circuits.filter((c) => c.boardId === board.id).sort(byNumber) })),
    loose: circuits.filter((c) => !known.has(c.boardId)).sort(byNumber),
    // A voided result was made by mistake: the circuit waits for its readings again.
    results: new Map(results.filter((r) => r.circuitId && !isVoided(r)).map((r) => [r.circuitId!, r])),
    altered,
  };
}

export function useCircuitTests(visitId: string, siteId: string): CircuitTests | undefined {
  return useLiveQuery(() => getCircuitTests(visitId, siteId), [visitId, siteId]);
}
