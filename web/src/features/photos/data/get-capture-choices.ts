import { useLiveQuery } from 'dexie-react-hooks';
import { db } from '@/lib/db';
import type { PhotoSubjectType } from '@/lib/photos/add-photo';

export interface AreaChoice {
  id: string;
  name: string;
}

export interface SubjectChoice {
  type: PhotoSubjectType;
  id: string;
  label: string;
}

export interface CaptureChoices {
  areas: AreaChoice[];
  subjects: SubjectChoice[];
}

const POINT_ACTION_WORDS: Record<string, string> = { add: 'New', move: 'Moved', remove: 'Removed', replace: 'Replaced' };

/** What a photo on this visit can be about: the site's areas, and its circuits, cable runs and this visit's point changes. */
export async function getCaptureChoices(visitId: string, siteId: string): Promise<CaptureChoices> {
  const [areas, circuits, boards, cableRuns, pointChanges] = await Promise.all([
    db.area.where('siteId').equals(siteId).toArray(),
    db.circuit.where('siteId').equals(siteId).toArray(),
    db.board.where('siteId').equals(siteId).toArray(),
    db.cableRun.where('siteId').equals(siteId).toArray(),
    db.pointChange.where('visitId').equals(visitId).toArray(),
  ]);
  const boardName = new Map(boards.map((b) => [b.id, b.name]));
  const byName = (a: { label: string }, b: { label: string }) => a.label.localeCompare(b.label, 'en-GB', { numeric: true });
  return {
    areas: areas.map((a) => ({ id: a.id, name: String(a.name ?? 'Area') })).sort((a, b) => a.name.localeCompare(b.name, 'en-GB')),
    subjects: [
      ...circuits
        .map((c) => ({
          type: 'circuit' as const,
          id: c.id,
          label: `Circuit ${c.number}${c.description ? ` · ${c.description}` : ''}${boards.length > 1 && boardName.get(c.boardId) ? ` (${boardName.get(c.boardId)})` : ''}`,
        }))
        .sort(byName),
      ...cableRuns.map((r) => ({ type: 'cableRun' as const, id: r.id, label: `Cable run ${String(r.label ?? '')}`.trim() })).sort(byName),
      ...pointChanges.map((p) => ({
        type: 'pointChange' as const,
        id: p.id,
        label: `${POINT_ACTION_WORDS[String(p.action)] ?? 'Point'}: ${String(p.accessoryKind ?? 'point')}`,
      })),
    ],
  };
}

export function useCaptureChoices(visitId: string, siteId: string): CaptureChoices | undefined {
  return useLiveQuery(() => getCaptureChoices(visitId, siteId), [visitId, siteId]);
}
