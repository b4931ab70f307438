/**
 * Routes drawn on a photo of an open wall or chase, before it is covered: where each cable runs, measured from
 * datums the technician picked, and what the safe-zone rules and a drill make of it years later.
 *
 * Photo coordinates are the photo's own pixels (x to the right, y down from the top-left corner), so the markup stays
 * true to the stored original whatever size it is shown at. Wall coordinates are millimetres as `checkSafeZone` takes
 * them: x from the left end of the wall, y up from the floor. Pixels become millimetres through the typed datum
 * dimensions, on the assumption that the photo was taken square-on to the wall (a photo at a slant skews them).
 */
import { InvalidInputError, roundTo, type CheckResult, type Verdict } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { checkSafeZone, type ConcealedCableProtection, type SafeZoneCheck, WALL_LIMITS, type WallAccessory, type WallPoint } from './safe-zones.js';

// Types, not interfaces, so that they are plain JSON values a synced row and a mutation may carry.
export type PhotoPoint = { x: number; y: number };

/** The fixed lines a dimension is measured from: a corner (an angle with the next wall), the floor or the ceiling. */
// The wall's own edges place a point on the wall; the edges of a socket box outlined on the photo measure the scale
// only, since the box's own place on the wall comes from the wall's edges.
export const DATUM_KINDS = ['left-corner', 'right-corner', 'floor', 'ceiling', 'box-side', 'box-top-or-bottom'] as const;
export type DatumKind = (typeof DATUM_KINDS)[number];

export const CONCEALED_PROTECTIONS = ['none', 'earthed-metallic-covering', 'earthed-conduit-or-trunking', 'mechanical-protection', 'selv-pelv'] as const;

/** One cable's route as drawn: straight runs between the points, each tied to the cable run or circuit it is. */
export type MarkedRoute = {
  id: string;
  points: PhotoPoint[];
  cableRunId?: string | null;
  circuitId?: string | null;
  /** Depth of the cable below the finished surface (mm), as measured in the open chase. */
  depthMm?: number | null;
  protection?: ConcealedCableProtection | null;
};

/** A dimension from a datum: where the datum's line is on the photo, the point measured to, and the typed distance. */
export type DatumMark = {
  id: string;
  datum: DatumKind;
  /** The datum's line on the photo: its x for a corner, its y for the floor or the ceiling. */
  lineAt: number;
  to: PhotoPoint;
  mm: number;
};

/** A socket box, switch or other accessory the routes serve, drawn as its plate's outline on the photo. */
export type MarkedAccessory = {
  id: string;
  centre: PhotoPoint;
  widthPx: number;
  heightPx: number;
  label?: string | null;
};

/** What the check of a markup needs: the drawing, and the wall's figures as typed. */
export type PhotoMarkupShape = {
  readonly routes?: readonly MarkedRoute[] | null;
  readonly datums?: readonly DatumMark[] | null;
  readonly accessories?: readonly MarkedAccessory[] | null;
  readonly wallWidthMm?: number | null;
  readonly wallHeightMm?: number | null;
  readonly wallThicknessMm?: number | null;
};

/** Bounds of what may be drawn on one photo: our own, so that a synced markup stays small. */
export const MARKUP_LIMITS = Object.freeze({ routes: 40, pointsPerRoute: 60, datums: 40, accessories: 20, datumMm: 30_000 });

/** Whether a datum's distance is measured across the wall (from an upright line: a corner, the side of a box). */
export const measuredAcross = (d: DatumKind): boolean => d === 'left-corner' || d === 'right-corner' || d === 'box-side';
const horizontalDatum = measuredAcross;

/** The next point of a route, snapped to run horizontally or vertically from the last, as cables in zones run. */
export function snapPoint(from: PhotoPoint, to: PhotoPoint): PhotoPoint {
  return Math.abs(to.x - from.x) >= Math.abs(to.y - from.y) ? { x: to.x, y: from.y } : { x: from.x, y: to.y };
}

/**
 * Snaps every point after the first to the one before it; drops points that add no length, and merges a point that
 * carries on in the same direction into the run before it, so a route is as few straight runs as it needs.
 */
export function snapRoute(points: readonly PhotoPoint[]): PhotoPoint[] {
  const out: PhotoPoint[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    const next = last ? snapPoint(last, p) : { x: p.x, y: p.y };
    if (last && next.x === last.x && next.y === last.y) continue;
    const before = out[out.length - 2];
    if (last && before && ((before.x === last.x && last.x === next.x) || (before.y === last.y && last.y === next.y))) out[out.length - 1] = next;
    else out.push(next);
  }
  return out;
}

/** How many millimetres one pixel is on each axis, from the dimensions typed; null where nothing measures it. */
export interface PhotoScale {
  readonly mmPerPxX: number;
  readonly mmPerPxY: number;
}

export function photoScale(datums: readonly DatumMark[]): PhotoScale | null {
  const along = (horizontal: boolean) =>
    datums
      .filter((d) => horizontalDatum(d.datum) === horizontal && d.mm > 0)
      .map((d) => ({ px: Math.abs((horizontal ? d.to.x : d.to.y) - d.lineAt), mm: d.mm }))
      .filter((d) => d.px > 0);
  const ratio = (ds: { px: number; mm: number }[]) => (ds.length ? ds.reduce((s, d) => s + d.mm, 0) / ds.reduce((s, d) => s + d.px, 0) : null);
  const x = ratio(along(true));
  const y = ratio(along(false));
  // A square-on photo has square pixels: one axis measured gives the other.
  if (x === null && y === null) return null;
  return { mmPerPxX: x ?? (y as number), mmPerPxY: y ?? (x as number) };
}

/** Turns photo pixels into wall millimetres, or says what is missing for it. */
export type WallMapping = { readonly ok: true; readonly toWall: (p: PhotoPoint) => WallPoint; readonly scale: PhotoScale } | { readonly ok: false; readonly missing: string };

export function wallMapping(markup: PhotoMarkupShape): WallMapping {
  const datums = markup.datums ?? [];
  const scale = photoScale(datums);
  if (!scale) return { ok: false, missing: 'Measure from a corner, the floor or the ceiling to a point on the photo and type the distance.' };
  const first = (kind: DatumKind) => datums.find((d) => d.datum === kind);
  const left = first('left-corner');
  const right = first('right-corner');
  const floor = first('floor');
  const ceiling = first('ceiling');
  const width = markup.wallWidthMm ?? null;
  const height = markup.wallHeightMm ?? null;
  let xOf: ((px: number) => number) | null = null;
  if (left) xOf = (px) => (px - left.lineAt) * scale.mmPerPxX;
  else if (right && width !== null) xOf = (px) => width - (right.lineAt - px) * scale.mmPerPxX;
  let yOf: ((py: number) => number) | null = null;
  if (floor) yOf = (py) => (floor.lineAt - py) * scale.mmPerPxY;
  else if (ceiling && height !== null) yOf = (py) => height - (py - ceiling.lineAt) * scale.mmPerPxY;
  if (!xOf) return { ok: false, missing: right ? 'Type the wall’s width: the route is measured from the right-hand corner.' : 'Measure from a corner of the wall.' };
  if (!yOf) return { ok: false, missing: ceiling ? 'Type the wall’s height: the route is measured from the ceiling.' : 'Measure from the floor or the ceiling.' };
  const toX = xOf;
  const toY = yOf;
  return { ok: true, scale, toWall: (p) => ({ x: roundTo(toX(p.x), 0), y: roundTo(toY(p.y), 0) }) };
}

/** What a route's own circuit says about its RCD, for the zones' RCD condition. */
export interface RouteCircuit {
  readonly rcdRatingMa?: number | null;
}

/** A route's check as shown on the photo: the safe-zone check when it could be made, or what it still needs. */
export type MarkedRouteCheck = CheckResult & {
  readonly routeId: string;
  /** The route in wall millimetres, when the datums place it. */
  readonly wallRoute: readonly WallPoint[] | null;
  readonly safeZone: SafeZoneCheck | null;
};

// Drawing a route to the very edge of a wall lands a finger's width past it: that much is the wall's edge.
const EDGE_SLACK_MM = 50;

/**
 * Checks one drawn route with `checkSafeZone`: its points and the accessories placed on the wall by the datums, its
 * depth, and its circuit's RCD. A data or other extra-low-voltage cable (tied to a cable run) is SELV or PELV unless the
 * technician says otherwise, so the zones do not bind it; the check still places it.
 */
export function checkMarkedRoute(markup: PhotoMarkupShape, route: MarkedRoute, circuit: RouteCircuit | null = null, rules: RuleSet = DEFAULT_RULE_SET): MarkedRouteCheck {
  const source = rules.safeZones.maxDepthMm.source;
  const base = { routeId: route.id, value: null, limit: rules.safeZones.maxDepthMm.value, unit: 'mm', source };
  const notYet = (note: string, wallRoute: WallPoint[] | null = null): MarkedRouteCheck => ({ ...base, verdict: 'check', note, wallRoute, safeZone: null });
  if (route.points.length < 2) return notYet('Draw at least one straight run for this route.');
  const mapping = wallMapping(markup);
  if (!mapping.ok) return notYet(mapping.missing);
  const wallRoute = route.points.map(mapping.toWall);
  const width = markup.wallWidthMm ?? null;
  const height = markup.wallHeightMm ?? null;
  if (width === null || height === null) return notYet('Type the wall’s width and height: the zones run from its corners and its top.', wallRoute);
  if (route.depthMm === null || route.depthMm === undefined) return notYet(`Type how deep the cable is: the zones bind a cable less than ${rules.safeZones.maxDepthMm.value} mm below the surface.`, wallRoute);
  const off = wallRoute.find((p) => p.x < -EDGE_SLACK_MM || p.y < -EDGE_SLACK_MM || p.x > width + EDGE_SLACK_MM || p.y > height + EDGE_SLACK_MM);
  if (off) return notYet(`The route reaches (${off.x}, ${off.y}) mm, off the ${width} × ${height} mm wall: check the datum distances and the wall’s size.`, wallRoute);
  const clamp = (p: WallPoint) => ({ x: Math.min(width, Math.max(0, p.x)), y: Math.min(height, Math.max(0, p.y)) });
  const onWall = wallRoute.map(clamp);
  const accessories: WallAccessory[] = (markup.accessories ?? []).map((a) => {
    const c = clamp(mapping.toWall(a.centre));
    return { x: c.x, y: c.y, widthMm: Math.max(1, a.widthPx * mapping.scale.mmPerPxX), heightMm: Math.max(1, a.heightPx * mapping.scale.mmPerPxY), label: a.label ?? undefined };
  });
  const rcd = circuit?.rcdRatingMa ?? null;
  try {
    const safeZone = checkSafeZone(
      {
        wall: { widthMm: width, heightMm: height, ...(markup.wallThicknessMm ? { thicknessMm: markup.wallThicknessMm } : {}) },
        accessories,
        route: onWall,
        depthMm: route.depthMm,
        rcdProtected: rcd !== null,
        ...(rcd !== null ? { rcdRatedMa: rcd } : {}),
        protection: route.protection ?? (route.cableRunId && !route.circuitId ? 'selv-pelv' : 'none'),
      },
      rules,
    );
    return { routeId: route.id, verdict: safeZone.verdict, value: safeZone.value, limit: safeZone.limit, unit: safeZone.unit, source: safeZone.source, note: safeZone.note, wallRoute: onWall, safeZone };
  } catch (err) {
    if (err instanceof InvalidInputError) return notYet(err.message, onWall);
    throw err;
  }
}

/**
 * The distance from a point to a drawn route (mm): to the nearest point of any of its straight runs, measured on the
 * wall's face (depth aside).
 */
export function distanceToRoute(point: WallPoint, route: readonly WallPoint[]): number {
  if (route.length === 0) throw new InvalidInputError('route', 'needs at least one point');
  if (route.length === 1) return Math.hypot(point.x - route[0]!.x, point.y - route[0]!.y);
  let best = Infinity;
  for (let i = 1; i < route.length; i++) best = Math.min(best, distanceToSegment(point, route[i - 1]!, route[i]!));
  return best;
}

function distanceToSegment(p: WallPoint, a: WallPoint, b: WallPoint): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const lengthSq = dx * dx + dy * dy;
  // The foot of the perpendicular, held to the segment's ends.
  const t = lengthSq === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / lengthSq));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/** Where a drill would go, typed as distances from the same datums the routes were measured from. */
export type DrillingPoint = {
  readonly fromLeftMm?: number | null;
  readonly fromRightMm?: number | null;
  readonly fromFloorMm?: number | null;
  readonly fromCeilingMm?: number | null;
};

/** The wall point typed distances name, or what is missing for it. */
export function drillingPointOnWall(typed: DrillingPoint, markup: PhotoMarkupShape): WallPoint | string {
  const width = markup.wallWidthMm ?? null;
  const height = markup.wallHeightMm ?? null;
  const x = typed.fromLeftMm ?? (typed.fromRightMm !== null && typed.fromRightMm !== undefined && width !== null ? width - typed.fromRightMm : null);
  const y = typed.fromFloorMm ?? (typed.fromCeilingMm !== null && typed.fromCeilingMm !== undefined && height !== null ? height - typed.fromCeilingMm : null);
  if (x === null) return typed.fromRightMm !== null && typed.fromRightMm !== undefined ? 'Type the wall’s width to measure from the right-hand corner.' : 'Type the distance from the left- or right-hand corner.';
  if (y === null) return typed.fromCeilingMm !== null && typed.fromCeilingMm !== undefined ? 'Type the wall’s height to measure from the ceiling.' : 'Type the height from the floor or the distance down from the ceiling.';
  return { x, y };
}

/** The clearance a drilling check uses unless the technician chooses another: our own default (common trade practice, not a published figure). */
export const DEFAULT_DRILLING_CLEARANCE_MM = 100;
export const DRILLING_CLEARANCE_SOURCE = 'Wiretrail default clearance (common trade practice, not a published limit): the technician chooses it';

/** Said with every drilling check, whatever it finds. */
export const DRILLING_CAUTION =
  'These records can be incomplete or wrong: a cable may have been moved or added since, or never marked. Scan the spot with a cable detector and isolate safely before drilling; the regulations in force, local codes and a competent person decide.';

export interface RouteNearby {
  readonly routeId: string;
  readonly distanceMm: number;
}

export type DrillingCheck = CheckResult & {
  readonly point: WallPoint | null;
  /** The recorded routes on this photo, nearest first. */
  readonly routes: readonly RouteNearby[];
  readonly caution: string;
};

/**
 * Whether a recorded route passes within `clearanceMm` of a point: tapped on the photo (pixels) or typed as distances
 * from the datums (`DrillingPoint`). A route within the clearance fails the point; none within it passes it, which
 * says only that nothing recorded is there.
 */
export function checkDrillingPoint(
  markup: PhotoMarkupShape,
  at: { readonly tapped: PhotoPoint } | { readonly typed: DrillingPoint },
  clearanceMm: number = DEFAULT_DRILLING_CLEARANCE_MM,
): DrillingCheck {
  if (!Number.isFinite(clearanceMm) || clearanceMm <= 0 || clearanceMm > WALL_LIMITS.widthMm.max) {
    throw new InvalidInputError('clearanceMm', `must be more than 0 and at most ${WALL_LIMITS.widthMm.max} mm`);
  }
  const base = { limit: clearanceMm, unit: 'mm', source: DRILLING_CLEARANCE_SOURCE, caution: DRILLING_CAUTION };
  const unknown = (note: string, point: WallPoint | null = null): DrillingCheck => ({ ...base, verdict: 'check', value: null, note, point, routes: [] });
  const mapping = wallMapping(markup);
  if (!mapping.ok) return unknown(`The routes on this photo are not measured yet. ${mapping.missing}`);
  const point = 'tapped' in at ? mapping.toWall(at.tapped) : drillingPointOnWall(at.typed, markup);
  if (typeof point === 'string') return unknown(point);
  const routes = (markup.routes ?? [])
    .filter((r) => r.points.length > 0)
    .map((r) => ({ routeId: r.id, distanceMm: roundTo(distanceToRoute(point, r.points.map(mapping.toWall)), 0) }))
    .sort((a, b) => a.distanceMm - b.distanceMm);
  const nearest = routes[0];
  if (!nearest) return unknown('No route is drawn on this photo.', point);
  const within = routes.filter((r) => r.distanceMm <= clearanceMm);
  const verdict: Verdict = within.length ? 'fail' : 'pass';
  const note = within.length
    ? `${within.length === 1 ? 'A recorded route passes' : `${within.length} recorded routes pass`} within ${clearanceMm} mm of this point (the nearest ${nearest.distanceMm} mm away): do not drill here.`
    : `No recorded route passes within ${clearanceMm} mm of this point; the nearest is ${nearest.distanceMm} mm away.`;
  return { ...base, verdict, value: nearest.distanceMm, note, point, routes };
}

/** What a markup's shape must be before it is kept: each problem names its part. Both the phone and the server ask. */
export function photoMarkupProblems(markup: PhotoMarkupShape): string[] {
  const problems: string[] = [];
  const finite = (n: unknown) => typeof n === 'number' && Number.isFinite(n);
  const point = (p: unknown) => typeof p === 'object' && p !== null && finite((p as PhotoPoint).x) && finite((p as PhotoPoint).y) && (p as PhotoPoint).x >= 0 && (p as PhotoPoint).y >= 0;
  const routes = markup.routes ?? [];
  if (!Array.isArray(routes)) return ['routes must be a list'];
  if (routes.length > MARKUP_LIMITS.routes) problems.push(`routes: at most ${MARKUP_LIMITS.routes} on one photo`);
  routes.forEach((r, i) => {
    if (typeof r?.id !== 'string' || !r.id) problems.push(`routes[${i}] needs an id`);
    if (!Array.isArray(r?.points) || r.points.length > MARKUP_LIMITS.pointsPerRoute || !r.points.every(point)) {
      problems.push(`routes[${i}].points must be at most ${MARKUP_LIMITS.pointsPerRoute} points on the photo`);
    }
    if (r?.depthMm !== null && r?.depthMm !== undefined && (!finite(r.depthMm) || r.depthMm < WALL_LIMITS.depthMm.min || r.depthMm > WALL_LIMITS.depthMm.max)) {
      problems.push(`routes[${i}].depthMm must be from ${WALL_LIMITS.depthMm.min} to ${WALL_LIMITS.depthMm.max} mm`);
    }
    if (r?.protection && !(CONCEALED_PROTECTIONS as readonly string[]).includes(r.protection)) problems.push(`routes[${i}].protection must be one of: ${CONCEALED_PROTECTIONS.join(', ')}`);
  });
  const datums = markup.datums ?? [];
  if (!Array.isArray(datums)) return [...problems, 'datums must be a list'];
  if (datums.length > MARKUP_LIMITS.datums) problems.push(`datums: at most ${MARKUP_LIMITS.datums} on one photo`);
  datums.forEach((d, i) => {
    if (!(DATUM_KINDS as readonly string[]).includes(d?.datum)) problems.push(`datums[${i}].datum must be one of: ${DATUM_KINDS.join(', ')}`);
    if (!finite(d?.lineAt) || !point(d?.to)) problems.push(`datums[${i}] must be placed on the photo`);
    if (!finite(d?.mm) || d.mm <= 0 || d.mm > MARKUP_LIMITS.datumMm) problems.push(`datums[${i}].mm must be more than 0 and at most ${MARKUP_LIMITS.datumMm} mm`);
  });
  const accessories = markup.accessories ?? [];
  if (!Array.isArray(accessories)) return [...problems, 'accessories must be a list'];
  if (accessories.length > MARKUP_LIMITS.accessories) problems.push(`accessories: at most ${MARKUP_LIMITS.accessories} on one photo`);
  accessories.forEach((a, i) => {
    if (!point(a?.centre) || !finite(a?.widthPx) || !finite(a?.heightPx) || a.widthPx <= 0 || a.heightPx <= 0) problems.push(`accessories[${i}] must be an outline on the photo`);
  });
  return problems;
}

/** A route's name on a photo and on paper: the cable's label or the circuit's number and description. */
export function routeTieWords(
  route: Pick<MarkedRoute, 'cableRunId' | 'circuitId'>,
  cables: ReadonlyMap<string, { label: string }>,
  circuits: ReadonlyMap<string, { number: string; description?: string | null }>,
): string {
  if (route.circuitId) {
    const c = circuits.get(route.circuitId);
    return c ? `Circuit ${c.number}${c.description ? ` (${c.description})` : ''}` : 'A circuit no longer recorded';
  }
  if (route.cableRunId) return cables.get(route.cableRunId)?.label ? `Cable ${cables.get(route.cableRunId)!.label}` : 'A cable no longer recorded';
  return 'Not tied to a cable or circuit';
}

/** The colours routes are drawn in, in the order drawn, the same on the phone, the desk and paper; dark enough on a photo's light plaster. */
export const ROUTE_COLOURS = ['#d81b60', '#1565c0', '#2e7d32', '#e65100', '#6a1b9a', '#00838f', '#5d4037', '#283593'] as const;
export const routeColour = (index: number): string => ROUTE_COLOURS[index % ROUTE_COLOURS.length]!;

/** A datum in words: "from the left-hand corner". */
export const DATUM_WORDS: Readonly<Record<DatumKind, string>> = {
  'left-corner': 'from the left-hand corner',
  'right-corner': 'from the right-hand corner',
  floor: 'up from the floor',
  ceiling: 'down from the ceiling',
  'box-side': 'across from the side of a socket box',
  'box-top-or-bottom': 'from the top or bottom of a socket box',
};
