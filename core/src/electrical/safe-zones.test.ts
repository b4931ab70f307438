import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { checkSafeZone, type SafeZoneInput, WALL_LIMITS } from './safe-zones.js';

// A 3 m wide, 2.4 m high lounge wall with a double socket-outlet (146 × 86 mm plate) centred 450 mm up, 1.5 m along.
const WALL = { widthMm: 3000, heightMm: 2400, thicknessMm: 100 };
const SOCKET = { x: 1500, y: 450, widthMm: 146, heightMm: 86, label: 'double socket-outlet' };
const DROP_FROM_CEILING: SafeZoneInput = {
  wall: WALL,
  accessories: [SOCKET],
  route: [
    { x: 1500, y: 2400 },
    { x: 1500, y: 493 },
  ],
  depthMm: 25,
  rcdProtected: true,
};

describe('checkSafeZone', () => {
  it('passes a vertical drop in line with the socket, 25 mm deep, with 30 mA RCD protection', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: zone vertically in line with the accessory, < 50 mm deep, 30 mA RCD (C1)
    const result = checkSafeZone(DROP_FROM_CEILING);
    expect(result).toMatchObject({ verdict: 'pass', value: 25, limit: 50, unit: 'mm', zonesApply: true });
    expect(result.findings.map((f) => [f.name, f.verdict])).toEqual([
      ['route-in-zones', 'pass'],
      ['rcd', 'pass'],
    ]);
    expect(result.segments).toEqual([
      { from: { x: 1500, y: 2400 }, to: { x: 1500, y: 493 }, direction: 'vertical', inZone: true, acceptable: true },
    ]);
    expect(result.source).toMatch(/BS 7671:2018\+A2:2022 Reg 522\.6\.202/);
  });

  it('fails the same route without RCD protection', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: cables relying on the zones need 30 mA RCD protection (C1; supervision condition M)
    const result = checkSafeZone({ ...DROP_FROM_CEILING, rcdProtected: false });
    expect(result.verdict).toBe('fail');
    expect(result.findings.find((f) => f.name === 'rcd')?.verdict).toBe('fail');
    expect(checkSafeZone({ ...DROP_FROM_CEILING, rcdRatedMa: 100 }).verdict).toBe('fail');
  });

  it('never accepts a diagonal run', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: zones are horizontal or vertical to the accessory (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      route: [
        { x: 1400, y: 2400 },
        { x: 1500, y: 493 },
      ],
    });
    expect(result.verdict).toBe('fail');
    expect(result.segments[0]).toMatchObject({ direction: 'diagonal', inZone: false });
    expect(result.note).toMatch(/diagonal/);
  });

  it('passes a run along the top 150 mm of the wall that then drops to the socket', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: zone within 150 mm of the top of the wall (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      route: [
        { x: 0, y: 2300 },
        { x: 1500, y: 2300 },
        { x: 1500, y: 493 },
      ],
    });
    expect(result.verdict).toBe('pass');
  });

  it('fails a horizontal run across the middle of the wall', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: 1200 mm up is neither in line with the socket nor near the top or an angle (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      route: [
        { x: 100, y: 2400 },
        { x: 100, y: 1200 },
        { x: 1500, y: 1200 },
        { x: 1500, y: 493 },
      ],
    });
    expect(result.verdict).toBe('fail');
    expect(result.segments.map((s) => s.inZone)).toEqual([true, false, true]);
    expect(result.findings[0]).toMatchObject({ name: 'route-in-zones', value: 1, limit: 0 });
  });

  it('passes a run down the 150 mm beside a corner and across in line with the socket', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: within 150 mm of an angle of two adjoining walls, and horizontally in line (C1)
    const route = [
      { x: 150, y: 2400 },
      { x: 150, y: 450 },
      { x: 1427, y: 450 },
    ];
    expect(checkSafeZone({ ...DROP_FROM_CEILING, route }).verdict).toBe('pass');
    // no adjoining wall at that end (say a door opening): no corner zone
    expect(checkSafeZone({ ...DROP_FROM_CEILING, wall: { ...WALL, angleAtLeft: false }, route }).verdict).toBe('fail');
    // 151 mm from the corner is outside the zone
    const off = [
      { x: 151, y: 2400 },
      { x: 151, y: 450 },
    ];
    expect(checkSafeZone({ ...DROP_FROM_CEILING, route: off }).verdict).toBe('fail');
  });

  it('allows a short vertical jog inside the socket’s horizontal zone', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: the whole jog stays within the 86 mm band in line with the socket (C1)
    const route = [
      { x: 150, y: 470 },
      { x: 600, y: 470 },
      { x: 600, y: 430 },
      { x: 1427, y: 430 },
    ];
    expect(checkSafeZone({ ...DROP_FROM_CEILING, route }).verdict).toBe('pass');
  });

  it('does not apply the zones to a cable 50 mm or more below the surface', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202 applies below 50 mm only (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      wall: { ...WALL, thicknessMm: 150 },
      depthMm: 50,
      rcdProtected: false,
      route: [
        { x: 0, y: 0 },
        { x: 800, y: 900 },
      ],
    });
    expect(result).toMatchObject({ verdict: 'pass', zonesApply: false });
    expect(result.findings.map((f) => f.name)).toEqual(['depth']);
  });

  it('needs RCD protection at any depth in a wall with metal parts', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.203 (C1)
    const metal = { ...WALL, thicknessMm: 150, hasMetallicParts: true };
    const deep = { ...DROP_FROM_CEILING, wall: metal, depthMm: 60 };
    const without = checkSafeZone({ ...deep, rcdProtected: false });
    expect(without.verdict).toBe('fail');
    expect(without.findings[0]).toMatchObject({ name: 'metallic-wall', verdict: 'fail' });
    expect(without.source).toMatch(/522\.6\.203/);
    expect(checkSafeZone(deep).verdict).toBe('pass');
  });

  it('accepts any route for a cable in earthed conduit or with mechanical protection', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.204 methods (C1)
    for (const protection of ['earthed-metallic-covering', 'earthed-conduit-or-trunking', 'mechanical-protection', 'selv-pelv'] as const) {
      const result = checkSafeZone({
        ...DROP_FROM_CEILING,
        wall: { ...WALL, hasMetallicParts: true },
        rcdProtected: false,
        protection,
        route: [
          { x: 700, y: 2400 },
          { x: 1500, y: 493 },
        ],
      });
      expect(result).toMatchObject({ verdict: 'pass', zonesApply: false });
      expect(result.source).toMatch(/522\.6\.204/);
    }
  });

  it('counts an accessory on the far face only through a wall up to 100 mm thick', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: zones extend to the reverse side of walls ≤ 100 mm thick (C1)
    const input: SafeZoneInput = {
      ...DROP_FROM_CEILING,
      accessories: [{ x: 2200, y: 1200, widthMm: 86, heightMm: 86, onReverseFace: true }],
      route: [
        { x: 2200, y: 2400 },
        { x: 2200, y: 1243 },
      ],
    };
    expect(checkSafeZone(input).verdict).toBe('pass');
    expect(checkSafeZone({ ...input, wall: { ...WALL, thicknessMm: 140 } }).verdict).toBe('fail');
  });

  it('says "within" 150 mm of the top and of a corner when a route leaves the zones', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202(i): zones "within 150 mm from the top of the wall" and "within 150 mm of an angle" (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      route: [
        { x: 700, y: 2400 },
        { x: 700, y: 1200 },
      ],
    });
    expect(result.verdict).toBe('fail');
    expect(result.note).toMatch(/keep within 150 mm of the top of the wall, within 150 mm of a corner, or in line with the accessory/);
    expect(result.note).not.toMatch(/keep to/);
  });

  it('gives a zone failure the figures of the route, not the depth', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: the 50 mm depth is met by a 25 mm cable; what fails is 1 part outside the zones (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      route: [
        { x: 700, y: 2400 },
        { x: 700, y: 1200 },
      ],
    });
    expect(result).toMatchObject({ verdict: 'fail', value: 1, limit: 0, unit: 'part outside a zone' });
    // without RCD protection but in the zones: the figures are the RCD's, 30 mA (Reg 522.6.202, C1)
    expect(checkSafeZone({ ...DROP_FROM_CEILING, rcdProtected: false })).toMatchObject({ verdict: 'fail', value: null, limit: 30, unit: 'mA' });
  });

  it('marks every stretch acceptable when the cable is deep enough that the zones do not apply', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: 60 mm below the surface of a 150 mm wall is 90 mm from the other face (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      wall: { ...WALL, thicknessMm: 150 },
      depthMm: 60,
      route: [
        { x: 700, y: 2400 },
        { x: 700, y: 1200 },
        { x: 1500, y: 1200 },
      ],
    });
    expect(result).toMatchObject({ verdict: 'pass', zonesApply: false, fromOtherFaceMm: 90 });
    expect(result.segments.map((s) => [s.inZone, s.acceptable])).toEqual([
      [false, true],
      [false, true],
    ]);
  });

  it('holds a cable within 50 mm of the other face of a thin partition to the zones', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: "at a depth of less than 50 mm from a surface of the wall or partition" — either face (C1)
    // A 75 mm stud partition (common trade size, from memory), cable 60 mm below this face: 15 mm from the back face.
    const partition = { ...WALL, thicknessMm: 75 };
    const across = [
      { x: 700, y: 2400 },
      { x: 700, y: 1200 },
    ];
    const result = checkSafeZone({ ...DROP_FROM_CEILING, wall: partition, depthMm: 60, route: across });
    expect(result).toMatchObject({ verdict: 'fail', zonesApply: true, fromOtherFaceMm: 15 });
    expect(result.note).toMatch(/15 mm from the other face of this 75 mm wall/);
    expect(result.segments[0]).toMatchObject({ inZone: false, acceptable: false });
    // In line with the socket, which is in line on both faces of a wall up to 100 mm thick (Reg 522.6.202, C1): passes.
    expect(checkSafeZone({ ...DROP_FROM_CEILING, wall: partition, depthMm: 60 }).verdict).toBe('pass');
    // And it needs the 30 mA RCD like any cable relying on the zones (Reg 522.6.202, C1).
    expect(checkSafeZone({ ...DROP_FROM_CEILING, wall: partition, depthMm: 60, rcdProtected: false }).verdict).toBe('fail');
    // 50 mm from the back face is not "less than 50 mm" (Reg 522.6.202, C1): a 110 mm wall, 60 mm deep.
    expect(checkSafeZone({ ...DROP_FROM_CEILING, wall: { ...WALL, thicknessMm: 110 }, depthMm: 60, route: across }).verdict).toBe('pass');
  });

  it('judges the other face of a thick wall by the accessories on that face', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: zones reach the reverse side only through walls up to 100 mm thick (C1)
    const thick = { ...WALL, thicknessMm: 140 };
    const backSocket = { x: 2200, y: 1200, widthMm: 86, heightMm: 86, onReverseFace: true };
    const down = [
      { x: 2200, y: 2400 },
      { x: 2200, y: 1243 },
    ];
    // 120 mm deep: 20 mm from the back face, in line with the socket there
    expect(checkSafeZone({ ...DROP_FROM_CEILING, wall: thick, depthMm: 120, accessories: [SOCKET, backSocket], route: down }).verdict).toBe('pass');
    // the front socket's zone does not reach the back of a 140 mm wall
    const front = [
      { x: 1500, y: 2400 },
      { x: 1500, y: 493 },
    ];
    expect(checkSafeZone({ ...DROP_FROM_CEILING, wall: thick, depthMm: 120, accessories: [SOCKET, backSocket], route: front }).verdict).toBe('fail');
  });

  it('asks for the thickness before passing a cable 50 mm or more below this face', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: without the thickness, the distance from the other face is unknown (C1)
    const result = checkSafeZone({
      ...DROP_FROM_CEILING,
      wall: { widthMm: 3000, heightMm: 2400 },
      depthMm: 60,
      route: [
        { x: 700, y: 2400 },
        { x: 700, y: 1200 },
      ],
    });
    expect(result).toMatchObject({ verdict: 'check', zonesApply: false, fromOtherFaceMm: null });
    expect(result.note).toMatch(/enter the wall’s thickness/);
    expect(result.segments[0]).toMatchObject({ inZone: false, acceptable: null });
  });

  it('still needs the RCD at any depth in a metal-framed partition', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.203: metallic parts, irrespective of depth (C1)
    const result = checkSafeZone({ ...DROP_FROM_CEILING, wall: { ...WALL, thicknessMm: 75, hasMetallicParts: true }, depthMm: 60, rcdProtected: false });
    expect(result.verdict).toBe('fail');
    expect(result.findings.map((f) => f.name)).toEqual(['metallic-wall', 'route-in-zones', 'rcd']);
  });

  it('refuses figures no wall has', () => {
    // Plausibility bounds of our own (WALL_LIMITS), not from the standard.
    const bad = (change: Partial<SafeZoneInput>) => () => checkSafeZone({ ...DROP_FROM_CEILING, ...change });
    expect(bad({ wall: { ...WALL, thicknessMm: undefined }, depthMm: 99_999 })).toThrow(/depthMm: 99999 mm is deeper than any wall/);
    expect(bad({ wall: { ...WALL, widthMm: 299 } })).toThrow(/wall\.widthMm: must be from 300 to 30000 mm/);
    expect(bad({ wall: { ...WALL, heightMm: 10_001 } })).toThrow(/wall\.heightMm/);
    expect(bad({ wall: { ...WALL, thicknessMm: 2_000 } })).toThrow(/wall\.thicknessMm/);
    expect(WALL_LIMITS.depthMm.max).toBe(1_000);
  });

  it('rejects routes and walls outside physical sense', () => {
    const bad = (change: Partial<SafeZoneInput>) => () => checkSafeZone({ ...DROP_FROM_CEILING, ...change });
    expect(bad({ depthMm: -5 })).toThrow(InvalidInputError);
    expect(bad({ depthMm: Number.NaN })).toThrow(/depthMm/);
    expect(bad({ depthMm: 120 })).toThrow(/depthMm: 120 mm is deeper than the 100 mm wall/);
    expect(bad({ route: [{ x: 10, y: 10 }] })).toThrow(/route/);
    expect(bad({ route: [{ x: 10, y: 10 }, { x: 3500, y: 10 }] })).toThrow(/route\[1\]/);
    expect(bad({ route: [{ x: 10, y: 10 }, { x: Number.NaN, y: 10 }] })).toThrow(/route\[1\]\.x/);
    expect(bad({ wall: { widthMm: 0, heightMm: 2400 } })).toThrow(/wall\.widthMm/);
    expect(bad({ accessories: [{ ...SOCKET, widthMm: -86 }] })).toThrow(/accessories\[0\]\.widthMm/);
    expect(bad({ accessories: [{ ...SOCKET, y: 2600 }] })).toThrow(/accessories\[0\]/);
    expect(
      bad({ wall: { widthMm: 3000, heightMm: 2400 }, accessories: [{ ...SOCKET, onReverseFace: true }] }),
    ).toThrow(/wall\.thicknessMm/);
    expect(bad({ protection: 'tape' as 'none' })).toThrow(/protection/);
  });
});
