/**
 * Safe zones for cables concealed in walls.
 *
 * Coordinates are millimetres on the face of the wall the cable is buried behind, seen from the room:
 * x from the left end of the wall, y up from the floor. The top of the wall is y = heightMm; the left and
 * right ends (x = 0, x = widthMm) are angles with adjoining walls unless said otherwise.
 */
import {
  InvalidInputError,
  requireFinite,
  requireNonNegative,
  requireOneOf,
  requirePositive,
  worstVerdict,
  type CheckResult,
  type Finding,
} from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface WallPoint {
  readonly x: number;
  readonly y: number;
}

export interface Wall {
  readonly widthMm: number;
  readonly heightMm: number;
  /**
   * Needed when an accessory is on the reverse face, and to judge a cable 50 mm or more below this face, which may
   * still be within 50 mm of the other one.
   */
  readonly thicknessMm?: number;
  /** Metal studs, metal lath or similar inside the wall (fixings do not count). */
  readonly hasMetallicParts?: boolean;
  /** Whether each end of the wall meets another wall (an angle); default true. */
  readonly angleAtLeft?: boolean;
  readonly angleAtRight?: boolean;
}

/** A point, accessory or switchgear the cable connects to. */
export interface WallAccessory {
  /** Centre of the accessory. */
  readonly x: number;
  readonly y: number;
  /** Outer size of the plate or enclosure: its zones are this wide and this tall. */
  readonly widthMm: number;
  readonly heightMm: number;
  readonly label?: string;
  /** On the other face of a thin wall, with its position given in this face's coordinates. */
  readonly onReverseFace?: boolean;
}

/** Ways of protecting a buried cable that make the zones unnecessary. */
export type ConcealedCableProtection =
  | 'none'
  | 'earthed-metallic-covering'
  | 'earthed-conduit-or-trunking'
  | 'mechanical-protection'
  | 'selv-pelv';

const PROTECTION_METHODS: readonly ConcealedCableProtection[] = [
  'none',
  'earthed-metallic-covering',
  'earthed-conduit-or-trunking',
  'mechanical-protection',
  'selv-pelv',
];

const PROTECTION_WORDS: Readonly<Record<ConcealedCableProtection, string>> = {
  none: 'no protection',
  'earthed-metallic-covering': 'an earthed metallic covering',
  'earthed-conduit-or-trunking': 'earthed conduit or trunking',
  'mechanical-protection': 'mechanical protection against nails and screws',
  'selv-pelv': 'being a SELV or PELV circuit',
};

export interface SafeZoneInput {
  readonly wall: Wall;
  readonly accessories: readonly WallAccessory[];
  /** The cable route as a polyline on the wall face. */
  readonly route: readonly WallPoint[];
  /** Depth of the cable below the wall surface (mm). */
  readonly depthMm: number;
  readonly rcdProtected: boolean;
  /** Rated residual current of that RCD (mA); default 30. */
  readonly rcdRatedMa?: number;
  readonly protection?: ConcealedCableProtection;
}

/**
 * Plausibility bounds for what is typed about a wall: our own, not the standard's. Below the minimum a wall has no
 * room for a zone drawing; above the maximum the figure is a slip of the finger (no room in a home or small office
 * has a 30 m wall, and no wall is a metre thick).
 */
export const WALL_LIMITS = Object.freeze({
  widthMm: { min: 300, max: 30_000 },
  heightMm: { min: 300, max: 10_000 },
  thicknessMm: { min: 25, max: 1_000 },
  depthMm: { min: 0, max: 1_000 },
});

export type SegmentDirection = 'horizontal' | 'vertical' | 'diagonal' | 'point';

export interface RouteSegment {
  readonly from: WallPoint;
  readonly to: WallPoint;
  readonly direction: SegmentDirection;
  /** Within a zone of every face the cable is near (this face's zones when it is near neither). */
  readonly inZone: boolean;
  /**
   * Whether this stretch may be where it is: in a zone, or where the zones do not apply; null while that depends on
   * what is not yet known (the thickness of the wall).
   */
  readonly acceptable: boolean | null;
}

/** `value`, `limit` and `unit` are those of the finding that decided the verdict (the depth when all pass). */
export interface SafeZoneCheck extends CheckResult {
  readonly findings: readonly Finding[];
  readonly segments: readonly RouteSegment[];
  /** False when the cable is deep enough, or protected well enough, that the zones do not matter. */
  readonly zonesApply: boolean;
  /** Distance from the other face (mm) where the thickness is known. */
  readonly fromOtherFaceMm: number | null;
}

interface Interval {
  readonly from: number;
  readonly to: number;
}

export function checkSafeZone(input: SafeZoneInput, rules: RuleSet = DEFAULT_RULE_SET): SafeZoneCheck {
  const zoneRules = rules.safeZones;
  const maxDepth = zoneRules.maxDepthMm.value;
  const wall = readWall(input.wall);
  const depthMm = requireNonNegative('depthMm', input.depthMm);
  if (depthMm > WALL_LIMITS.depthMm.max) {
    throw new InvalidInputError('depthMm', `${depthMm} mm is deeper than any wall (at most ${WALL_LIMITS.depthMm.max} mm)`);
  }
  if (wall.thicknessMm !== undefined && depthMm > wall.thicknessMm) {
    throw new InvalidInputError('depthMm', `${depthMm} mm is deeper than the ${wall.thicknessMm} mm wall`);
  }
  const accessories = readAccessories(input.accessories, wall);
  const route = readRoute(input.route, wall);
  const protection = requireOneOf('protection', input.protection ?? 'none', PROTECTION_METHODS);
  if (typeof input.rcdProtected !== 'boolean') {
    throw new InvalidInputError('rcdProtected', 'must be true or false');
  }
  const rcdRatedMa = requirePositive('rcdRatedMa', input.rcdRatedMa ?? 30);
  const rcdOk = input.rcdProtected && rcdRatedMa <= zoneRules.rcdMaxMa.value;

  // "Less than 50 mm from a surface": either face of the wall or partition, so the far face counts as well.
  const fromOtherFaceMm = wall.thicknessMm === undefined ? null : wall.thicknessMm - depthMm;
  const nearThisFace = depthMm < maxDepth;
  const nearOtherFace = fromOtherFaceMm !== null && fromOtherFaceMm < maxDepth;
  const otherFaceUnknown = !nearThisFace && fromOtherFaceMm === null;

  // Zones reach through a thin wall, so an accessory counts on the face it is on, and on both through a thin wall.
  const throughWall = wall.thicknessMm !== undefined && wall.thicknessMm <= zoneRules.throughWallMaxThicknessMm.value;
  const thisFace = zoneBands(wall, accessories.filter((a) => !a.onReverseFace || throughWall), rules);
  // The ends that are angles on this face are taken to be angles on the other face too.
  const otherFace = zoneBands(wall, accessories.filter((a) => a.onReverseFace || throughWall), rules);
  const faces = [...(nearThisFace || !nearOtherFace ? [thisFace] : []), ...(nearOtherFace ? [otherFace] : [])];
  const judged = route.slice(1).map((to, i) => {
    const from = route[i] as WallPoint;
    const onFaces = faces.map((f) => judgeSegment(from, to, f.columns, f.rows));
    return { ...onFaces[0]!, inZone: onFaces.every((s) => s.inZone) };
  });

  const depthBase = { value: depthMm, limit: maxDepth, unit: 'mm' };
  const findings: Finding[] = [];
  const settle = (zonesApply: boolean, source: string, undecided = false) => {
    const segments = judged.map((s) => ({ ...s, acceptable: s.inZone || (!zonesApply && !undecided) ? true : undecided ? null : false }));
    return summarise(findings, segments, zonesApply, depthBase, source, fromOtherFaceMm);
  };

  if (protection !== 'none') {
    findings.push({
      name: 'protection',
      verdict: 'pass',
      ...depthBase,
      source: zoneRules.protectionMethodsSource,
      note: `The cable is protected by ${PROTECTION_WORDS[protection]}, so it may run anywhere in the wall at any depth.`,
    });
    return settle(false, zoneRules.protectionMethodsSource);
  }

  if (wall.hasMetallicParts) {
    findings.push({
      name: 'metallic-wall',
      verdict: rcdOk ? 'pass' : 'fail',
      value: input.rcdProtected ? rcdRatedMa : null,
      limit: zoneRules.rcdMaxMa.value,
      unit: 'mA',
      source: zoneRules.metallicPartsSource,
      note: rcdOk
        ? `The wall has metal parts inside and the cable has ${zoneRules.rcdMaxMa.value} mA RCD protection, as such walls need at any depth.`
        : `The wall has metal parts inside, so at any depth the cable needs ${zoneRules.rcdMaxMa.value} mA RCD protection or an earthed or mechanical protection method.`,
    });
  }

  if (otherFaceUnknown) {
    findings.push({
      name: 'depth',
      verdict: 'check',
      ...depthBase,
      source: zoneRules.maxDepthMm.source,
      note: `At ${depthMm} mm deep the cable is at least ${maxDepth} mm below this face; enter the wall’s thickness, since a cable less than ${maxDepth} mm from the other face is held to the zones as well.`,
    });
    return settle(false, zoneRules.maxDepthMm.source, true);
  }

  if (!nearThisFace && !nearOtherFace) {
    findings.push({
      name: 'depth',
      verdict: 'pass',
      ...depthBase,
      source: zoneRules.maxDepthMm.source,
      note: `At ${depthMm} mm deep in a ${wall.thicknessMm} mm wall the cable is at least ${maxDepth} mm from both faces, so the zone rules do not apply.`,
    });
    return settle(false, zoneRules.maxDepthMm.source);
  }

  const outside = judged.filter((s) => !s.inZone);
  const diagonal = outside.some((s) => s.direction === 'diagonal');
  const where = nearOtherFace
    ? nearThisFace
      ? `The cable is less than ${maxDepth} mm from both faces of this ${wall.thicknessMm} mm partition, so it must keep to the zones of both. `
      : `The cable is ${fromOtherFaceMm} mm from the other face of this ${wall.thicknessMm} mm wall, so it must keep to the zones of that face. `
    : '';
  findings.push({
    name: 'route-in-zones',
    verdict: outside.length === 0 ? 'pass' : 'fail',
    value: outside.length,
    limit: 0,
    unit: outside.length === 1 ? 'part outside a zone' : 'parts outside a zone',
    source: zoneRules.maxDepthMm.source,
    note:
      outside.length === 0
        ? `${where}Every part of the route runs horizontally or vertically within a permitted zone.`
        : diagonal
          ? `${where}${partsOutside(outside.length)} the zones, including a diagonal run, which is never in a zone.`
          : `${where}${partsOutside(outside.length)} the zones: keep within ${zoneRules.topOfWallBandMm.value} mm of the top of the wall, within ${zoneRules.angleBandMm.value} mm of a corner, or in line with the accessory.`,
  });
  findings.push({
    name: 'rcd',
    verdict: rcdOk ? 'pass' : 'fail',
    value: input.rcdProtected ? rcdRatedMa : null,
    limit: zoneRules.rcdMaxMa.value,
    unit: 'mA',
    source: zoneRules.rcdMaxMa.source,
    note: rcdOk
      ? `The cable has ${zoneRules.rcdMaxMa.value} mA RCD protection, as a cable relying on the zones needs.`
      : `A cable less than ${maxDepth} mm from a face of the wall that relies on the zones also needs ${zoneRules.rcdMaxMa.value} mA RCD protection.`,
  });
  return settle(true, zoneRules.maxDepthMm.source);
}

function partsOutside(count: number): string {
  return count === 1 ? '1 part of the route lies outside' : `${count} parts of the route lie outside`;
}

function summarise(
  findings: Finding[],
  segments: readonly RouteSegment[],
  zonesApply: boolean,
  depthBase: { value: number; limit: number; unit: string },
  source: string,
  fromOtherFaceMm: number | null,
): SafeZoneCheck {
  const verdict = worstVerdict(findings.map((f) => f.verdict));
  const first = findings.find((f) => f.verdict === verdict) ?? findings[0];
  // The figures shown beside a failure are those of what failed: a route outside the zones is not a depth problem.
  const figures = first && verdict !== 'pass' ? { value: first.value, limit: first.limit, unit: first.unit } : depthBase;
  return {
    verdict,
    ...figures,
    source: [...new Set([source, ...findings.map((f) => f.source)])].join('; '),
    note: first?.note ?? '',
    findings,
    segments,
    zonesApply,
    fromOtherFaceMm,
  };
}

/** Vertical bands (x ranges, full height) and horizontal bands (y ranges, full width) that are zones. */
function zoneBands(
  wall: ReadWall,
  accessories: readonly WallAccessory[],
  rules: RuleSet,
): { columns: Interval[]; rows: Interval[] } {
  const angle = rules.safeZones.angleBandMm.value;
  const top = rules.safeZones.topOfWallBandMm.value;
  const columns: Interval[] = [];
  const rows: Interval[] = [{ from: Math.max(0, wall.heightMm - top), to: wall.heightMm }];
  if (wall.angleAtLeft) columns.push({ from: 0, to: Math.min(angle, wall.widthMm) });
  if (wall.angleAtRight) columns.push({ from: Math.max(0, wall.widthMm - angle), to: wall.widthMm });
  for (const a of accessories) {
    columns.push({ from: a.x - a.widthMm / 2, to: a.x + a.widthMm / 2 });
    rows.push({ from: a.y - a.heightMm / 2, to: a.y + a.heightMm / 2 });
  }
  return { columns, rows };
}

type JudgedSegment = Omit<RouteSegment, 'acceptable'>;

function judgeSegment(from: WallPoint, to: WallPoint, columns: Interval[], rows: Interval[]): JudgedSegment {
  if (from.x === to.x && from.y === to.y) return { from, to, direction: 'point', inZone: true };
  if (from.x !== to.x && from.y !== to.y) return { from, to, direction: 'diagonal', inZone: false };
  if (from.x === to.x) {
    const span = { from: Math.min(from.y, to.y), to: Math.max(from.y, to.y) };
    const inZone = columns.some((c) => contains(c, from.x)) || covers(rows, span);
    return { from, to, direction: 'vertical', inZone };
  }
  const span = { from: Math.min(from.x, to.x), to: Math.max(from.x, to.x) };
  const inZone = rows.some((r) => contains(r, from.y)) || covers(columns, span);
  return { from, to, direction: 'horizontal', inZone };
}

function contains(band: Interval, at: number): boolean {
  return at >= band.from && at <= band.to;
}

/** Whether the union of `bands` covers all of `span`. */
function covers(bands: readonly Interval[], span: Interval): boolean {
  let reached = span.from;
  const sorted = [...bands].sort((a, b) => a.from - b.from);
  for (const band of sorted) {
    if (band.from > reached) break;
    reached = Math.max(reached, band.to);
    if (reached >= span.to) return true;
  }
  return reached >= span.to;
}

interface ReadWall {
  readonly widthMm: number;
  readonly heightMm: number;
  readonly thicknessMm: number | undefined;
  readonly hasMetallicParts: boolean;
  readonly angleAtLeft: boolean;
  readonly angleAtRight: boolean;
}

function readWall(wall: Wall | undefined): ReadWall {
  if (typeof wall !== 'object' || wall === null) throw new InvalidInputError('wall', 'is required');
  return {
    widthMm: requireWithin('wall.widthMm', wall.widthMm, WALL_LIMITS.widthMm),
    heightMm: requireWithin('wall.heightMm', wall.heightMm, WALL_LIMITS.heightMm),
    thicknessMm: wall.thicknessMm === undefined ? undefined : requireWithin('wall.thicknessMm', wall.thicknessMm, WALL_LIMITS.thicknessMm),
    hasMetallicParts: wall.hasMetallicParts === true,
    angleAtLeft: wall.angleAtLeft !== false,
    angleAtRight: wall.angleAtRight !== false,
  };
}

function requireWithin(field: string, value: unknown, bounds: { readonly min: number; readonly max: number }): number {
  const n = requirePositive(field, value);
  if (n < bounds.min || n > bounds.max) {
    throw new InvalidInputError(field, `must be from ${bounds.min} to ${bounds.max} mm, got ${n}`);
  }
  return n;
}

function readAccessories(accessories: readonly WallAccessory[] | undefined, wall: ReadWall): WallAccessory[] {
  if (!Array.isArray(accessories)) throw new InvalidInputError('accessories', 'must be a list (it may be empty)');
  return accessories.map((a: WallAccessory, i) => {
    const field = `accessories[${i}]`;
    const x = requireFinite(`${field}.x`, a.x);
    const y = requireFinite(`${field}.y`, a.y);
    requirePositive(`${field}.widthMm`, a.widthMm);
    requirePositive(`${field}.heightMm`, a.heightMm);
    if (x < 0 || x > wall.widthMm || y < 0 || y > wall.heightMm) {
      throw new InvalidInputError(field, `centre (${x}, ${y}) is off the ${wall.widthMm} × ${wall.heightMm} mm wall`);
    }
    if (a.onReverseFace && wall.thicknessMm === undefined) {
      throw new InvalidInputError('wall.thicknessMm', `is needed because ${field} is on the reverse face`);
    }
    return a;
  });
}

function readRoute(route: readonly WallPoint[] | undefined, wall: ReadWall): WallPoint[] {
  if (!Array.isArray(route) || route.length < 2) {
    throw new InvalidInputError('route', 'needs at least two points');
  }
  return route.map((p: WallPoint, i) => {
    const x = requireFinite(`route[${i}].x`, p.x);
    const y = requireFinite(`route[${i}].y`, p.y);
    if (x < 0 || x > wall.widthMm || y < 0 || y > wall.heightMm) {
      throw new InvalidInputError(`route[${i}]`, `(${x}, ${y}) is off the ${wall.widthMm} × ${wall.heightMm} mm wall`);
    }
    return { x, y };
  });
}
