import { describe, expect, it } from 'vitest';
import { checksBeforeWork } from './checks-before-work.js';

const circuit = { id: 'c1', kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
const site = { id: 's1', earthing: 'TN-C-S', zeOhm: 0.35 };
const extension = {
  id: 'p1',
  connection: 'ring-extension',
  supplies: 'sockets',
  location: 'indoors',
  dwelling: true,
  beforeR1Ohm: 0.3705,
  beforeRnOhm: 0.3705,
  beforeR2Ohm: 0.605,
  addedRouteM: 8,
  installationMethod: '102',
};

describe('checksBeforeWork', () => {
  it('predicts Zs for a ring extension from its before readings, and judges the rest', () => {
    // Ring of 2.5/1.5 from the trade reference §2a test vector (D); 8 m added: (r1 + r2) / 4 = 0.2829 Ω; Zs = 0.35 + 1.2 ×
    // 0.2829 = 0.689 Ω ≤ 1.37 Ω for B32 (BS 7671:2018+A2:2022 Table 41.3, C1)
    const checks = checksBeforeWork({ point: extension, circuit, site });
    const byKey = Object.fromEntries(checks.lines.map((l) => [l.key, l]));
    expect(byKey['predicted-zs']?.figure).toBe('Predicted Zs 0.69 Ω');
    expect(byKey['predicted-zs']?.result.verdict).toBe('pass');
    expect(byKey['predicted-zs']?.result.source).toContain('Table 41.3');
    // Sockets need 30 mA (Reg 411.3.3, C1) and the circuit has it
    expect(byKey.rcd?.figure).toBe('30 mA RCD required: the circuit has one');
    expect(byKey.rcd?.result.source).toContain('Reg 411.3.3');
    expect(byKey.rcd?.result.source).toContain('Reg 421.1.7');
    // Method 102, 2.5 mm²: 21 A ≥ 20 A for a ring (Table 4D5, C2)
    expect(byKey.cable?.result.verdict).toBe('pass');
    // Half the 8 m out and back at 20 A on 18 mV/A/m (Table 4D5, C2): 1.44 V, 0.63 % (D)
    expect(byKey.cable?.figure).toBe('Iz 21 A, voltage drop 0.63 %');
    // 230 / 0.689 = 334 A ≥ 5 × 32 A: 0.1 s; √(334² × 0.1) / 115 = 0.92 mm² ≤ 1.5 mm² (Reg 543.1.3, Table 54.3 k = 115, C2)
    expect(byKey.cpc?.result.verdict).toBe('pass');
    expect(byKey.cpc?.figure).toBe('Minimum cpc 0.92 mm² at 334 A');
    expect(checks.verdict).toBe('pass');
  });

  it('warns clearly when RCD protection is required and the circuit has none', () => {
    const checks = checksBeforeWork({ point: extension, circuit: { ...circuit, rcdRatingMa: null }, site });
    const rcd = checks.lines.find((l) => l.key === 'rcd');
    expect(rcd?.result.verdict).toBe('fail');
    expect(rcd?.figure).toBe('30 mA RCD required: the circuit has none');
    expect(checks.verdict).toBe('fail');
  });

  it('checks an unfused spur against the ring’s points, and predicts Zs from the R1+R2 where it joins', () => {
    // 0.45 Ω where it joins + 5 m of 2.5/1.5 (5 × 19.51 mΩ/m = 0.0976 Ω, IEC 60228:2004, C1); Zs = 0.35 + 1.2 × 0.5476 = 1.007 Ω
    const spur = { id: 'p2', connection: 'unfused-spur', supplies: 'sockets', joinR1R2Ohm: 0.45, addedRouteM: 5, ringPoints: 6, ringUnfusedSpurs: 7, spurFeeds: 1 };
    const checks = checksBeforeWork({ point: spur, circuit, site });
    const zs = checks.lines.find((l) => l.key === 'predicted-zs');
    expect(zs?.result.value).toBeCloseTo(1.00711, 4);
    const spurs = checks.lines.find((l) => l.key === 'spurs');
    // IET On-Site Guide §7.2.2 (C2): no more unfused spurs than points on the ring
    expect(spurs?.result.verdict).toBe('fail');
    expect(spurs?.figure).toBe('7 unfused spurs on 6 points');
  });

  it('waits, with a plain reason, for what is missing', () => {
    const checks = checksBeforeWork({ point: { id: 'p3', connection: 'radial' }, circuit: null, site: null });
    expect(checks.lines.map((l) => [l.key, l.result.verdict])).toEqual([
      ['predicted-zs', 'check'],
      ['rcd', 'check'],
    ]);
    expect(checks.lines[0]?.result.note).toMatch(/R1\+R2 measured where the new cable joins/);
    expect(checks.lines[1]?.result.note).toMatch(/what the point supplies/);
  });

  it('refuses to guess a fuse’s disconnection time, and says why a value cannot be worked out', () => {
    const fuse = checksBeforeWork({ point: { ...extension }, circuit: { ...circuit, deviceType: 'BS 3036', deviceRatingA: 30 }, site });
    // A fuse's Zs table (BS 7671:2018+A2:2022 Table 41.2) judges the Zs, but its disconnection time is read from its own curve
    expect(fuse.lines.find((l) => l.key === 'predicted-zs')?.result.verdict).not.toBe('check');
    expect(fuse.lines.find((l) => l.key === 'cpc')?.result.note).toMatch(/BS 3036 fuse’s disconnection time .* from its curve/);
    const odd = checksBeforeWork({ point: { ...extension, liveCsaMm2: 3 }, circuit, site });
    expect(odd.lines.find((l) => l.key === 'predicted-zs')?.result.note).toMatch(/not listed/);
  });
});
