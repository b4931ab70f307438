import { describe, expect, it } from 'vitest';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import {
  checkDrillingPoint,
  checkMarkedRoute,
  DRILLING_CAUTION,
  distanceToRoute,
  type MarkedRoute,
  type PhotoMarkupShape,
  photoMarkupProblems,
  photoScale,
  snapPoint,
  snapRoute,
  wallMapping,
} from './hidden-routes.js';
import { hiddenRoutesByWall } from './hidden-routes-map.js';

// A 1600 × 1200 px photo of a 3000 × 2400 mm kitchen wall taken square-on: the left corner at x = 100 px, the floor at
// y = 1100 px, and 2 mm to the pixel both ways (a 500 mm dimension spans 250 px). Figures invented for the examples.
const DATUMS = [
  { id: 'd1', datum: 'left-corner', lineAt: 100, to: { x: 350, y: 600 }, mm: 500 },
  { id: 'd2', datum: 'floor', lineAt: 1100, to: { x: 850, y: 875 }, mm: 450 },
] as const;
// A double socket box (146 × 86 mm plate: 73 × 43 px) centred 1500 mm along, 450 mm up: (850, 875) px.
const SOCKET = { id: 'a1', centre: { x: 850, y: 875 }, widthPx: 73, heightPx: 43, label: 'double socket-outlet' };
// Dropped vertically from the ceiling (y = 2400 mm, 0 px... ) to the top of the socket box.
const DROP: MarkedRoute = { id: 'r1', points: [{ x: 850, y: 0 }, { x: 850, y: 853 }], circuitId: 'c1', depthMm: 25 };
const MARKUP: PhotoMarkupShape = { routes: [DROP], datums: [...DATUMS], accessories: [SOCKET], wallWidthMm: 3000, wallHeightMm: 2400, wallThicknessMm: 100 };

describe('snapping', () => {
  it('keeps the longer direction of a stroke, as cables in zones run horizontally or vertically', () => {
    expect(snapPoint({ x: 100, y: 100 }, { x: 400, y: 130 })).toEqual({ x: 400, y: 100 });
    expect(snapPoint({ x: 100, y: 100 }, { x: 120, y: 500 })).toEqual({ x: 100, y: 500 });
    // A perfect diagonal is taken as horizontal.
    expect(snapPoint({ x: 0, y: 0 }, { x: 50, y: 50 })).toEqual({ x: 50, y: 0 });
  });

  it('snaps a whole route point by point, merging runs that carry on and dropping points that add no length', () => {
    expect(snapRoute([{ x: 10, y: 10 }, { x: 12, y: 200 }, { x: 11, y: 300 }, { x: 11, y: 300 }, { x: 400, y: 290 }])).toEqual([
      { x: 10, y: 10 },
      { x: 10, y: 300 },
      { x: 400, y: 300 },
    ]);
  });
});

describe('from photo pixels to wall millimetres', () => {
  it('takes the scale from the typed dimensions', () => {
    // 500 mm over 250 px and 450 mm over 225 px: 2 mm a pixel (D, from the example's own figures)
    expect(photoScale([...DATUMS])).toEqual({ mmPerPxX: 2, mmPerPxY: 2 });
  });

  it('takes the scale from the edges of a socket box too, which alone do not place a point on the wall', () => {
    // 100 mm over 50 px from the side of the box and 60 mm over 30 px below it: 2 mm a pixel (D, from the example's own figures)
    const boxOnly = [
      { id: 'b1', datum: 'box-side', lineAt: 812, to: { x: 862, y: 700 }, mm: 100 },
      { id: 'b2', datum: 'box-top-or-bottom', lineAt: 896, to: { x: 850, y: 926 }, mm: 60 },
    ] as const;
    expect(photoScale([...boxOnly])).toEqual({ mmPerPxX: 2, mmPerPxY: 2 });
    const placed = wallMapping({ ...MARKUP, datums: [...boxOnly] });
    expect(placed).toEqual({ ok: false, missing: 'Measure from a corner of the wall.' });
    // With the wall's corner and floor as well, the box's dimensions join the scale and the points are placed.
    const both = wallMapping({ ...MARKUP, datums: [...DATUMS, ...boxOnly] });
    if (!both.ok) throw new Error(both.missing);
    expect(both.toWall({ x: 850, y: 875 })).toEqual({ x: 1500, y: 450 });
  });

  it('uses one axis for both when only one is measured (square pixels of a square-on photo)', () => {
    expect(photoScale([DATUMS[0]])).toEqual({ mmPerPxX: 2, mmPerPxY: 2 });
    expect(photoScale([])).toBeNull();
  });

  it('places points from the left corner and the floor, or from the right corner and the ceiling with the wall size', () => {
    const m = wallMapping(MARKUP);
    if (!m.ok) throw new Error(m.missing);
    // (850 - 100) × 2 = 1500 mm along; (1100 - 875) × 2 = 450 mm up (D)
    expect(m.toWall({ x: 850, y: 875 })).toEqual({ x: 1500, y: 450 });
    const fromRight = wallMapping({
      wallWidthMm: 3000,
      wallHeightMm: 2400,
      datums: [
        { id: 'r', datum: 'right-corner', lineAt: 1600, to: { x: 1350, y: 500 }, mm: 500 },
        { id: 'c', datum: 'ceiling', lineAt: 0, to: { x: 1350, y: 100 }, mm: 200 },
      ],
    });
    if (!fromRight.ok) throw new Error(fromRight.missing);
    // x = 3000 - (1600 - 1350) × 2 = 2500 mm; y = 2400 - 100 × 2 = 2200 mm (D)
    expect(fromRight.toWall({ x: 1350, y: 100 })).toEqual({ x: 2500, y: 2200 });
    expect(wallMapping({ datums: [{ id: 'r', datum: 'right-corner', lineAt: 1600, to: { x: 1350, y: 500 }, mm: 500 }] })).toMatchObject({ ok: false });
  });
});

describe('checkMarkedRoute', () => {
  it('passes a drop in line with the socket, 25 mm deep, on a 30 mA RCD circuit', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: zone vertically in line with an accessory, < 50 mm deep needs 30 mA RCD (C1)
    const result = checkMarkedRoute(MARKUP, DROP, { rcdRatingMa: 30 });
    expect(result).toMatchObject({ verdict: 'pass', routeId: 'r1' });
    expect(result.wallRoute).toEqual([{ x: 1500, y: 2200 }, { x: 1500, y: 494 }]);
    expect(result.source).toMatch(/Reg 522\.6\.202/);
  });

  it('fails a shallow route outside every zone, and a shallow one without RCD protection', () => {
    // A horizontal run 1000 mm up, across the middle of the wall: outside every zone (BS 7671:2018+A2:2022 Reg 522.6.202, C1)
    const across: MarkedRoute = { id: 'r2', points: [{ x: 300, y: 600 }, { x: 1200, y: 600 }], circuitId: 'c1', depthMm: 20 };
    const outside = checkMarkedRoute(MARKUP, across, { rcdRatingMa: 30 });
    expect(outside.verdict).toBe('fail');
    expect(outside.safeZone?.findings.find((f) => f.name === 'route-in-zones')?.verdict).toBe('fail');
    const noRcd = checkMarkedRoute(MARKUP, DROP, { rcdRatingMa: null });
    expect(noRcd.verdict).toBe('fail');
    expect(noRcd.safeZone?.findings.find((f) => f.name === 'rcd')?.verdict).toBe('fail');
  });

  it('lets the zones go for a cable 50 mm or more from both faces of the wall', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: the zones bind cables less than 50 mm from a surface (C1); 150 mm wall, 60 mm deep
    const across: MarkedRoute = { id: 'r2', points: [{ x: 300, y: 600 }, { x: 1200, y: 600 }], circuitId: 'c1', depthMm: 60 };
    const deep = checkMarkedRoute({ ...MARKUP, wallThicknessMm: 150 }, across, null);
    expect(deep).toMatchObject({ verdict: 'pass', value: 60, limit: 50 });
    expect(DEFAULT_RULE_SET.safeZones.maxDepthMm.value).toBe(50);
  });

  it('takes a data cable as SELV or PELV unless told otherwise', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.204: SELV or PELV cables need not keep to the zones (C1)
    const data = checkMarkedRoute(MARKUP, { id: 'r3', points: [{ x: 300, y: 600 }, { x: 1200, y: 600 }], cableRunId: 'k1', depthMm: 10 });
    expect(data.verdict).toBe('pass');
    expect(data.source).toMatch(/522\.6\.204/);
  });

  it('asks for what it lacks rather than guessing', () => {
    expect(checkMarkedRoute({ ...MARKUP, datums: [] }, DROP).note).toMatch(/Measure from/);
    expect(checkMarkedRoute({ ...MARKUP, wallHeightMm: null }, DROP).note).toMatch(/width and height/);
    expect(checkMarkedRoute(MARKUP, { ...DROP, depthMm: null }).note).toMatch(/how deep/);
    expect(checkMarkedRoute(MARKUP, { ...DROP, points: [{ x: 850, y: 0 }] }).verdict).toBe('check');
    // 2000 px right of the corner is 3800 mm along a 3000 mm wall.
    expect(checkMarkedRoute(MARKUP, { ...DROP, points: [{ x: 2000, y: 0 }, { x: 2000, y: 500 }] }).note).toMatch(/off the 3000 × 2400 mm wall/);
  });
});

describe('drilling distance', () => {
  // Worked examples (D: plain geometry, Pythagoras on the wall's face).
  it('measures square to a straight run', () => {
    // Vertical run at x = 1500 from 494 to 2200 mm; a point 100 mm to its side at 1200 mm up is 100 mm away.
    expect(distanceToRoute({ x: 1600, y: 1200 }, [{ x: 1500, y: 2200 }, { x: 1500, y: 494 }])).toBe(100);
  });

  it('measures to the nearest end beyond a run', () => {
    // Run from (0, 0) to (300, 0); the point (600, 400) is beyond its end: √(300² + 400²) = 500 mm.
    expect(distanceToRoute({ x: 600, y: 400 }, [{ x: 0, y: 0 }, { x: 300, y: 0 }])).toBe(500);
    // Below the bottom of the drop: 494 - 300 = 194 mm.
    expect(distanceToRoute({ x: 1500, y: 300 }, [{ x: 1500, y: 2200 }, { x: 1500, y: 494 }])).toBe(194);
  });

  it('takes the nearest part of a route that turns a corner', () => {
    // Along the top (y = 2300) from x = 200 to 1500, then down to 494; the point (1000, 2000) is 300 mm below the top run
    // and 500 mm left of the drop: 300 mm.
    const route = [{ x: 200, y: 2300 }, { x: 1500, y: 2300 }, { x: 1500, y: 494 }];
    expect(distanceToRoute({ x: 1000, y: 2000 }, route)).toBe(300);
  });

  it('fails a tapped point within the clearance and passes one beyond it, always with the caution', () => {
    // Tapped 50 px (100 mm) to the right of the drop at 1200 mm up (y = 1100 - 600 = 500 px).
    const near = checkDrillingPoint(MARKUP, { tapped: { x: 900, y: 500 } }, 150);
    expect(near).toMatchObject({ verdict: 'fail', value: 100, limit: 150, point: { x: 1600, y: 1200 } });
    expect(near.caution).toBe(DRILLING_CAUTION);
    expect(near.caution).toMatch(/cable detector/);
    expect(near.caution).toMatch(/isolate safely/);
    expect(near.caution).toMatch(/competent person/);
    const clear = checkDrillingPoint(MARKUP, { tapped: { x: 900, y: 500 } }, 80);
    expect(clear).toMatchObject({ verdict: 'pass', value: 100 });
    expect(clear.source).toMatch(/trade practice/);
  });

  it('takes a point typed as distances from the same datums', () => {
    // 1300 mm from the right-hand corner of a 3000 mm wall is 1700 mm along; 200 mm from the drop at x = 1500 (D).
    const typed = checkDrillingPoint(MARKUP, { typed: { fromRightMm: 1300, fromFloorMm: 1200 } }, 100);
    expect(typed).toMatchObject({ verdict: 'pass', value: 200, point: { x: 1700, y: 1200 } });
    expect(checkDrillingPoint(MARKUP, { typed: { fromLeftMm: 1500 } }).verdict).toBe('check');
    expect(checkDrillingPoint({ ...MARKUP, datums: [] }, { tapped: { x: 1, y: 1 } }).note).toMatch(/not measured/);
    expect(() => checkDrillingPoint(MARKUP, { tapped: { x: 1, y: 1 } }, 0)).toThrow(/clearanceMm/);
  });
});

describe('photoMarkupProblems', () => {
  it('accepts a well-formed markup and names each bad part', () => {
    expect(photoMarkupProblems(MARKUP)).toEqual([]);
    expect(
      photoMarkupProblems({
        routes: [{ id: 'x', points: [{ x: -5, y: 0 }], depthMm: 2000 }],
        datums: [{ id: 'd', datum: 'floor', lineAt: 10, to: { x: 1, y: 1 }, mm: 0 }],
      }),
    ).toEqual(['routes[0].points must be at most 60 points on the photo', 'routes[0].depthMm must be from 0 to 1000 mm', 'datums[0].mm must be more than 0 and at most 30000 mm']);
  });
});

describe('hiddenRoutesByWall', () => {
  const entry = (id: string, areaId: string | null, wallName: string | null, takenAt: string, routes: MarkedRoute[]) => ({
    photo: { id, areaId, takenAt },
    markup: { id: `m-${id}`, wallName, routes },
  });
  const ring = { id: 'r', points: [], circuitId: 'ring' };
  const cat6 = { id: 'k', points: [], cableRunId: 'cat6' };
  const entries = [
    entry('p1', 'kitchen', 'Hob wall', '2026-03-01T10:00:00Z', [ring]),
    entry('p2', 'kitchen', 'hob wall', '2026-03-02T10:00:00Z', [cat6]),
    entry('p3', 'hall', 'By the door', '2026-03-01T09:00:00Z', [ring, cat6]),
    entry('p4', null, null, '2026-03-05T09:00:00Z', [ring]),
    entry('p5', 'hall', 'Empty', '2026-03-05T09:00:00Z', []),
  ];
  const areas = new Map([['kitchen', 'Kitchen'], ['hall', 'Hall']]);

  it('lists walls by area, photos newest first, leaving out photos with nothing drawn', () => {
    const walls = hiddenRoutesByWall(entries, areas);
    expect(walls.map((w) => [w.areaName, w.wallName, w.entries.map((e) => e.photo.id)])).toEqual([
      ['Hall', 'By the door', ['p3']],
      ['Kitchen', 'Hob wall', ['p2', 'p1']],
      ['No area given', 'Wall not named', ['p4']],
    ]);
  });

  it('keeps only what one circuit or cable runs through', () => {
    expect(hiddenRoutesByWall(entries, areas, { cableRunId: 'cat6' }).flatMap((w) => w.entries.map((e) => e.photo.id))).toEqual(['p3', 'p2']);
    expect(hiddenRoutesByWall(entries, areas, { circuitId: 'ring' }).flatMap((w) => w.entries.map((e) => e.photo.id))).toEqual(['p3', 'p1', 'p4']);
  });
});
