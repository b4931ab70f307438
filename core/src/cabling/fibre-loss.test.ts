import { describe, expect, it } from 'vitest';
import { checkFibreLink, fibreLossBudget } from './fibre-loss.js';

// ANSI/TIA-568.3-D (from memory): multimode 3.0 dB/km at 850 nm and 1.5 dB/km at 1300 nm; inside plant single-mode
// 1.0 dB/km at 1310 and 1550 nm, outside plant 0.5 dB/km; 0.75 dB per mated connector pair; 0.3 dB per splice.
describe('a Tier 1 fibre loss budget', () => {
  const om3 = { lengthM: 150, mode: 'multimode' as const, connectorPairs: 2, splices: 0 };

  it('a 150 m multimode OM3 link with two connector pairs allows 1.95 dB at 850 nm (0.45 + 1.5)', () => {
    expect(fibreLossBudget({ ...om3, wavelengthNm: 850 })).toMatchObject({ allowedDb: 1.95, fibreDb: 0.45, connectorsDb: 1.5, splicesDb: 0 });
  });

  it('and 1.725 dB at 1300 nm (0.225 + 1.5)', () => {
    expect(fibreLossBudget({ ...om3, wavelengthNm: 1300 }).allowedDb).toBe(1.725);
  });

  it('a 2 km single-mode run with two pairs and two splices: 2.0 + 1.5 + 0.6 inside, 1.0 + 1.5 + 0.6 outside plant', () => {
    const sm = { lengthM: 2000, mode: 'singlemode' as const, wavelengthNm: 1310, connectorPairs: 2, splices: 2 };
    expect(fibreLossBudget(sm).allowedDb).toBe(4.1);
    expect(fibreLossBudget({ ...sm, plant: 'outside' }).allowedDb).toBe(3.1);
  });

  it('names every source it used', () => {
    expect(fibreLossBudget({ ...om3, wavelengthNm: 850 }).sources.every((s) => s.startsWith('ANSI/TIA-568.3-D'))).toBe(true);
  });

  it('refuses a wavelength the mode is not tested at, and part of a connector', () => {
    expect(() => fibreLossBudget({ ...om3, wavelengthNm: 1310 })).toThrow(/850 or 1300/);
    expect(() => fibreLossBudget({ ...om3, wavelengthNm: 850, connectorPairs: 1.5 })).toThrow(/whole number/);
    expect(() => fibreLossBudget({ ...om3, wavelengthNm: 850, lengthM: -1 })).toThrow();
  });
});

describe('a measured fibre loss', () => {
  const link = { lengthM: 150, mode: 'multimode' as const, wavelengthNm: 850, connectorPairs: 2, splices: 0 };

  it('passes within the budget with its margin', () => {
    expect(checkFibreLink({ ...link, measuredLossDb: 1.2 })).toMatchObject({ verdict: 'pass', value: 1.2, limit: 1.95, marginDb: 0.75 });
  });

  it('fails over it, saying by how much and what to do', () => {
    const r = checkFibreLink({ ...link, measuredLossDb: 2.4 });
    expect(r).toMatchObject({ verdict: 'fail', marginDb: -0.45 });
    expect(r.note).toContain('0.45 dB over');
  });

  it('asks for a reading when none was taken', () => {
    expect(checkFibreLink({ ...link, measuredLossDb: null })).toMatchObject({ verdict: 'check', value: null, limit: 1.95 });
  });
});
