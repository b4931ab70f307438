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
  /** Needed only when an accessory is on the reverse face. */
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

export type SegmentDirection = 'horizontal' | 'vertical' | 'diagonal' | 'point';

export interface RouteSegment {
  readonly from: WallPoint;
  readonly to: WallPoint;
  readonly direction: SegmentDirection;
  readonly inZone: boolean;
}

/** `value` is the cable depth and `limit` the depth below which the zone rules apply (mm). */
export interface SafeZoneCheck extends CheckResult {
  readonly findings: readonly Finding[];
  readonly segments: readonly RouteSegment[];
  /** False when the cable is deep enough, or protected well enough, that the zones do not matter. */
  readonly zonesApply: boolean;
}

interface Interval {
  readonly from: number;
  readonly to: number;
}

export function checkSafeZone(input: SafeZoneInput, rules: RuleSet = DEFAULT_RULE_SET): SafeZoneCheck {
  const zoneRules = rules.safeZones;
  const wall = readWall(input.wall);
  const depthMm = requireNonNegative('depthMm', input.depthMm);
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

  // Zones reach through a thin wall, so accessories on the far face count only then.
  const throughWall = wall.thicknessMm !== undefined && wall.thicknessMm <= zoneRules.throughWallMaxThicknessMm.value;
  const serving = accessories.filter((a) => !a.onReverseFace || throughWall);
  const { columns, rows } = zoneBands(wall, serving, rules);
  const segments = route.slice(1).map((to, i) => judgeSegment(route[i] as WallPoint, to, columns, rows));

  const depthBase = { value: depthMm, limit: zoneRules.maxDepthMm.value, unit: 'mm' };
  const findings: Finding[] = [];

  if (protection !== 'none') {
    findings.push({
      name: 'protection',
      verdict: 'pass',
      ...depthBase,
      source: zoneRules.protectionMethodsSource,
      note: `The cable is protected by ${PROTECTION_WORDS[protection]}, so it may run anywhere in the wall at any depth.`,
    });
    return summarise(findings, segments, false, depthBase, zoneRules.protectionMethodsSource);
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

  const zonesApply = depthMm < zoneRules.maxDepthMm.value;
  if (!zonesApply) {
    findings.push({
      name: 'depth',
      verdict: 'pass',
      ...depthBase,
      source: zoneRules.maxDepthMm.source,
      note: `At ${depthMm} mm deep the cable is at least ${zoneRules.maxDepthMm.value} mm below the surface, so the zone rules do not apply.`,
    });
    return summarise(findings, segments, false, depthBase, zoneRules.maxDepthMm.source);
  }

  const outside = segments.filter((s) => !s.inZone);
  const diagonal = outside.some((s) => s.direction === 'diagonal');
  findings.push({
    name: 'route-in-zones',
    verdict: outside.length === 0 ? 'pass' : 'fail',
    value: outside.length,
    limit: 0,
    unit: 'segments outside a zone',
    source: zoneRules.maxDepthMm.source,
    note:
      outside.length === 0
        ? 'Every part of the route runs horizontally or vertically within a permitted zone.'
        : diagonal
          ? `${partsOutside(outside.length)} the zones, including a diagonal run, which is never in a zone.`
          : `${partsOutside(outside.length)} the zones: keep to the top ${zoneRules.topOfWallBandMm.value} mm, ${zoneRules.angleBandMm.value} mm from a corner, or in line with the accessory.`,
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
      : `A cable less than ${zoneRules.maxDepthMm.value} mm deep that relies on the zones also needs ${zoneRules.rcdMaxMa.value} mA RCD protection.`,
  });
  return summarise(findings, segments, true, depthBase, zoneRules.maxDepthMm.source);
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
): SafeZoneCheck {
  const verdict = worstVerdict(findings.map((f) => f.verdict));
  const first = findings.find((f) => f.verdict === verdict) ?? findings[0];
  return {
    verdict,
    ...depthBase,
    source: [...new Set([source, ...findings.map((f) => f.source)])].join('; '),
    note: first?.note ?? '',
    findings,
    segments,
    zonesApply,
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

function judgeSegment(from: WallPoint, to: WallPoint, columns: Interval[], rows: Interval[]): RouteSegment {
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
    widthMm: requirePositive('wall.widthMm', wall.widthMm),
    heightMm: requirePositive('wall.heightMm', wall.heightMm),
    thicknessMm: wall.thicknessMm === undefined ? undefined : requirePositive('wall.thicknessMm', wall.thicknessMm),
    hasMetallicParts: wall.hasMetallicParts === true,
    angleAtLeft: wall.angleAtLeft !== false,
    angleAtRight: wall.angleAtRight !== false,
  };
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
