import { describe, expect, it } from 'vitest';
import { meetsFireMinimum, segregationMm } from './segregation.js';

// BS EN 50174-2 Table 4 (from memory): class b 100 / 75 / 50 / 0 mm and class c 50 / 38 / 25 / 0 mm without a
// divider, in open, perforated and solid metal containment; no separation for screened power or runs up to 35 m.
describe('separation of data from power', () => {
  const run = { powerCableKind: 'unscreened' as const, dataCableKind: 'unscreened-twisted-pair' as const, containment: 'none' as const, parallelRunM: 40 };

  it('keeps unscreened twisted pair 100 mm from unscreened power over 40 m with no divider', () => {
    const s = segregationMm(run);
    expect(s.minimumMm).toBe(100);
    expect(s.source).toContain('BS EN 50174-2');
    expect(s.source).toContain('Reg 528.1');
    expect(s.source).toContain('from memory');
  });

  it('less in metal containment, none behind a solid divider, less for screened data cable', () => {
    expect(segregationMm({ ...run, containment: 'perforated-metallic' }).minimumMm).toBe(50);
    expect(segregationMm({ ...run, containment: 'solid-metallic' }).minimumMm).toBe(0);
    expect(segregationMm({ ...run, dataCableKind: 'screened-twisted-pair' }).minimumMm).toBe(50);
  });

  it('asks none for a short parallel run, screened power or fibre, and still names Reg 528.1', () => {
    expect(segregationMm({ ...run, parallelRunM: 20 })).toMatchObject({ minimumMm: 0, note: expect.stringContaining('Reg 528.1') });
    expect(segregationMm({ ...run, powerCableKind: 'screened' }).minimumMm).toBe(0);
    expect(segregationMm({ ...run, dataCableKind: 'fibre' }).minimumMm).toBe(0);
  });

  it('refuses a negative run', () => {
    expect(() => segregationMm({ ...run, parallelRunM: -1 })).toThrow(/parallelRunM/);
  });
});

describe('fire performance of installed cable (BS 6701, from memory: Eca at least)', () => {
  it('accepts Eca and better, refuses Fca', () => {
    expect(meetsFireMinimum('Cca')).toBe(true);
    expect(meetsFireMinimum('Eca')).toBe(true);
    expect(meetsFireMinimum('Fca')).toBe(false);
  });
});
