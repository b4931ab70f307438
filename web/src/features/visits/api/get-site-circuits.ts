import { useLiveQuery } from 'dexie-react-hooks';
import { type BoardRow, type CircuitRow, db } from '@/lib/db';

export interface BoardWithCircuits {
  board: BoardRow;
  circuits: CircuitRow[];
}

const byNumber = (a: CircuitRow, b: CircuitRow) => a.number.localeCompare(b.number, 'en-GB', { numeric: true });

/** The site's boards with their circuits in way order; circuits whose board is not on the phone are listed apart. */
export async function getSiteCircuits(siteId: string): Promise<{ boards: BoardWithCircuits[]; loose: CircuitRow[] }> {
  const [boards, circuits] = await Promise.all([db.board.where('siteId').equals(siteId).toArray(), db.circuit.where('siteId').equals(siteId).toArray()]);
  boards.sort((a, b) => a.name.localeCompare(b.name, 'en-GB'));
  const known = new Set(boards.map((b) => b.id));
  return {
    boards: boards.map((board) => ({ board, circuits: circuits.filter((c) => c.boardId === board.id).sort(byNumber) })),
    loose: circuits.filter((c) => !known.has(c.boardId)).sort(byNumber),
  };
}

export function useSiteCircuits(siteId: string) {
  return useLiveQuery(() => getSiteCircuits(siteId), [siteId]);
}
