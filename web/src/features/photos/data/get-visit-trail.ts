import { useLiveQuery } from 'dexie-react-hooks';
import {
  type CableRunRow,
  type CircuitRow,
  db,
  type NoteRow,
  type PhotoRow,
  type PointChangeRow,
  type TestResultRow,
  type VisitRow,
} from '@/lib/db';

/** Moments in the visit's own life: arriving, reading the cautions, signing off. */
export type VisitEvent = 'arrived' | 'cautions-read' | 'signed-off';

export type TrailItem =
  | { kind: 'photo'; id: string; at: string; photo: PhotoRow }
  | { kind: 'note'; id: string; at: string; note: NoteRow }
  | { kind: 'circuit'; id: string; at: string; circuit: CircuitRow }
  | { kind: 'pointChange'; id: string; at: string; change: PointChangeRow }
  | { kind: 'cableRun'; id: string; at: string; cable: CableRunRow }
  | { kind: 'testResult'; id: string; at: string; result: TestResultRow }
  | { kind: 'event'; id: string; at: string; event: VisitEvent };

export interface VisitTrail {
  items: TrailItem[];
  areaNames: Map<string, string>;
  subjectNames: Map<string, string>;
}

const DAY_MS = 86_400_000;
const startOfDay = (iso: string) => {
  const d = new Date(iso);
  return new Date(d.getFullYear(), d.getMonth(), d.getDate()).getTime();
};

/**
 * Circuits belong to the site, not the visit: those added on the visit's day(s) by its technicians (or on this
 * phone, not yet back from the server) count as recorded on it.
 */
function visitWindow(visit: VisitRow): [number, number] | null {
  const start = visit.actualStart ?? visit.plannedStart;
  if (!start) return null;
  const end = visit.actualEnd ?? visit.plannedEnd ?? start;
  return [startOfDay(start), startOfDay(end) + DAY_MS];
}

function events(visit: VisitRow): TrailItem[] {
  const moments: [VisitEvent, string | null | undefined][] = [
    ['arrived', visit.actualStart],
    ['cautions-read', visit.cautionsReadAt],
    ['signed-off', visit.signedAt],
  ];
  return moments.filter((m): m is [VisitEvent, string] => !!m[1]).map(([event, at]) => ({ kind: 'event', id: `${visit.id}-${event}`, at, event }));
}

/** Everything recorded on a visit, newest first: photos by when they were taken, the rest by when they were recorded. */
export async function getVisitTrail(visit: VisitRow): Promise<VisitTrail> {
  const [photos, notes, changes, results, cables, circuits, areas] = await Promise.all([
    db.photo.where('visitId').equals(visit.id).toArray(),
    db.note.where('visitId').equals(visit.id).toArray(),
    db.pointChange.where('visitId').equals(visit.id).toArray(),
    db.testResult.where('visitId').equals(visit.id).toArray(),
    db.cableRun.where('siteId').equals(visit.siteId).toArray(),
    db.circuit.where('siteId').equals(visit.siteId).toArray(),
    db.area.where('siteId').equals(visit.siteId).toArray(),
  ]);
  const window = visitWindow(visit);
  const items: TrailItem[] = [
    ...photos.map((photo) => ({ kind: 'photo' as const, id: photo.id, at: photo.takenAt ?? photo.createdAt ?? '', photo })),
    // By when each was made on the phone; the server's createdAt is when it arrived, which a sync makes the same for all.
    ...notes.map((note) => ({ kind: 'note' as const, id: note.id, at: note.recordedAt ?? note.createdAt ?? '', note })),
    ...changes.map((change) => ({ kind: 'pointChange' as const, id: change.id, at: change.recordedAt ?? change.createdAt ?? '', change })),
    ...results.map((result) => ({ kind: 'testResult' as const, id: result.id, at: result.testedAt ?? result.recordedAt ?? result.updatedAt ?? result.createdAt ?? '', result })),
    // Cable runs outlive visits: the ones last recorded on this visit belong to its trail.
    ...cables.filter((c) => c.lastVisitId === visit.id).map((cable) => ({ kind: 'cableRun' as const, id: cable.id, at: cable.testedAt ?? cable.recordedAt ?? cable.updatedAt ?? cable.createdAt ?? '', cable })),
    ...circuits
      .filter((c) => {
        const t = c.createdAt ? Date.parse(c.createdAt) : NaN;
        const by = c.createdById;
        return window !== null && t >= window[0] && t < window[1] && (!by || (visit.technicianIds ?? []).includes(by));
      })
      .map((circuit) => ({ kind: 'circuit' as const, id: circuit.id, at: circuit.recordedAt ?? circuit.createdAt ?? '', circuit })),
    ...events(visit),
  ];
  items.sort((a, b) => b.at.localeCompare(a.at) || b.id.localeCompare(a.id));
  return {
    items,
    areaNames: new Map(areas.map((a) => [a.id, String(a.name ?? 'Area')])),
    subjectNames: new Map([
      ...circuits.map((c) => [c.id, `Circuit ${c.number}`] as [string, string]),
      ...cables.map((c) => [c.id, `Cable ${c.label}`] as [string, string]),
      ...changes.map((c) => [c.id, String(c.accessoryKind ?? 'Point')] as [string, string]),
    ]),
  };
}

export function useVisitTrail(visit: VisitRow): VisitTrail | undefined {
  return useLiveQuery(() => getVisitTrail(visit), [visit]);
}
