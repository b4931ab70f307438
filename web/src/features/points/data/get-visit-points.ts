import { isVoided } from '@wiretrail/core';
import { useLiveQuery } from 'dexie-react-hooks';
import { type AreaRow, type CircuitRow, db, type PointChangeRow, type SiteRow, type TestResultRow } from '@/lib/db';

export interface RingBaseline {
  r1: number;
  rn: number;
  r2: number;
  /** When and on which visit they were read. */
  at: string;
  visitId: string;
}

export interface VisitPoints {
  points: PointChangeRow[];
  circuits: CircuitRow[];
  areas: AreaRow[];
  /** The site, for its Ze and earthing in the checks before the work. */
  site: SiteRow | null;
  /** The latest end-to-end ring readings on the phone, per circuit: the base for predicting an extension. */
  ringBaselines: Map<string, RingBaseline>;
}

const byNumber = (a: CircuitRow, b: CircuitRow) => a.number.localeCompare(b.number, 'en-GB', { numeric: true });

export function latestRingReadings(results: TestResultRow[]): Map<string, RingBaseline> {
  const out = new Map<string, RingBaseline>();
  for (const r of results) {
    if (!r.circuitId || isVoided(r) || r.r1Ohm == null || r.rnOhm == null || r.r2Ohm == null) continue;
    const at = r.testedAt ?? r.updatedAt ?? r.createdAt ?? '';
    const seen = out.get(r.circuitId);
    if (!seen || at > seen.at) out.set(r.circuitId, { r1: r.r1Ohm, rn: r.rnOhm, r2: r.r2Ohm, at, visitId: r.visitId });
  }
  return out;
}

export async function getVisitPoints(visitId: string, siteId: string): Promise<VisitPoints> {
  const [points, circuits, areas, results, site] = await Promise.all([
    db.pointChange.where('visitId').equals(visitId).toArray(),
    db.circuit.where('siteId').equals(siteId).toArray(),
    db.area.where('siteId').equals(siteId).toArray(),
    db.testResult.where('siteId').equals(siteId).toArray(),
    db.site.get(siteId),
  ]);
  points.sort((a, b) => (a.createdAt ?? '').localeCompare(b.createdAt ?? '') || a.id.localeCompare(b.id));
  return {
    points,
    circuits: circuits.sort(byNumber),
    areas: areas.sort((a, b) => a.name.localeCompare(b.name, 'en-GB')),
    site: site ?? null,
    ringBaselines: latestRingReadings(results),
  };
}

export function useVisitPoints(visitId: string, siteId: string): VisitPoints | undefined {
  return useLiveQuery(() => getVisitPoints(visitId, siteId), [visitId, siteId]);
}

/** undefined while reading, null for a new point or one not on this phone. */
export function usePointChange(pointId: string | null): PointChangeRow | null | undefined {
  return useLiveQuery(async () => (pointId ? ((await db.pointChange.get(pointId)) ?? null) : null), [pointId]);
}
