import { useLiveQuery } from 'dexie-react-hooks';
import { db, type MaterialLineRow, type PriceItemRow } from '@/lib/db';

export interface VisitParts {
  lines: MaterialLineRow[];
  /** The price list by category, active items only, for picking with no signal. */
  catalogue: { category: string; items: PriceItemRow[] }[];
  items: Map<string, PriceItemRow>;
}

export async function getVisitParts(visitId: string): Promise<VisitParts> {
  const [lines, items] = await Promise.all([db.materialLine.where('visitId').equals(visitId).toArray(), db.priceItem.toArray()]);
  lines.sort((a, b) => (a.createdAt ?? '').localeCompare(b.createdAt ?? '') || a.id.localeCompare(b.id));
  const groups = new Map<string, PriceItemRow[]>();
  for (const item of items.filter((i) => i.active !== false)) {
    const key = item.category ?? 'Other';
    groups.set(key, [...(groups.get(key) ?? []), item]);
  }
  return {
    lines,
    catalogue: [...groups.entries()]
      .sort(([a], [b]) => a.localeCompare(b, 'en-GB'))
      .map(([category, list]) => ({ category, items: list.sort((a, b) => a.name.localeCompare(b.name, 'en-GB')) })),
    items: new Map(items.map((i) => [i.id, i])),
  };
}

export function useVisitParts(visitId: string): VisitParts | undefined {
  return useLiveQuery(() => getVisitParts(visitId), [visitId]);
}
