/**
 * The site's map of hidden routes: every wall with marked photos, by area, each wall's photos newest first, and a
 * filter by cable or circuit. The phone (from its own database) and the desk (from the API) both group with this.
 */
import type { MarkedRoute } from './hidden-routes.js';

export interface MarkedPhotoEntry {
  readonly photo: { readonly id: string; readonly areaId?: string | null; readonly takenAt?: string | null; readonly createdAt?: string | Date | null };
  readonly markup: { readonly id: string; readonly wallName?: string | null; readonly areaId?: string | null; readonly routes?: readonly MarkedRoute[] | null };
}

/** Show only what one cable run or one circuit runs through. */
export type RouteTie = { readonly cableRunId: string } | { readonly circuitId: string };

export interface HiddenRoutesWall<T extends MarkedPhotoEntry> {
  readonly key: string;
  readonly areaId: string | null;
  readonly areaName: string;
  readonly wallName: string;
  readonly entries: readonly T[];
}

export const NO_AREA_WORDS = 'No area given';
export const UNNAMED_WALL_WORDS = 'Wall not named';

export function routeIsTied(route: Pick<MarkedRoute, 'cableRunId' | 'circuitId'>, tie: RouteTie): boolean {
  return 'cableRunId' in tie ? route.cableRunId === tie.cableRunId : route.circuitId === tie.circuitId;
}

const when = (e: MarkedPhotoEntry) => {
  const made = e.photo.createdAt;
  return e.photo.takenAt ?? (made instanceof Date ? made.toISOString() : made) ?? '';
};

/**
 * Groups marked photos by area and wall (areas by name, the photos with no area last) with each wall's photos newest
 * first. With a tie, only photos with a route of that cable or circuit are kept, and walls left empty go.
 */
export function hiddenRoutesByWall<T extends MarkedPhotoEntry>(entries: readonly T[], areaNames: ReadonlyMap<string, string>, tie: RouteTie | null = null): HiddenRoutesWall<T>[] {
  const walls = new Map<string, { areaId: string | null; areaName: string; wallName: string; entries: T[] }>();
  for (const e of entries) {
    const routes = e.markup.routes ?? [];
    if (!routes.length) continue;
    if (tie && !routes.some((r) => routeIsTied(r, tie))) continue;
    const areaId = e.markup.areaId ?? e.photo.areaId ?? null;
    const wallName = e.markup.wallName?.trim() || UNNAMED_WALL_WORDS;
    const key = `${areaId ?? ''}\u0000${wallName.toLocaleLowerCase('en-GB')}`;
    const wall = walls.get(key) ?? { areaId, areaName: (areaId && areaNames.get(areaId)) || NO_AREA_WORDS, wallName, entries: [] };
    wall.entries.push(e);
    walls.set(key, wall);
  }
  return [...walls.entries()]
    .map(([key, w]) => ({ key, ...w, entries: [...w.entries].sort((a, b) => when(b).localeCompare(when(a)) || b.photo.id.localeCompare(a.photo.id)) }))
    .sort((a, b) => Number(a.areaId === null) - Number(b.areaId === null) || a.areaName.localeCompare(b.areaName, 'en-GB') || a.wallName.localeCompare(b.wallName, 'en-GB'));
}
