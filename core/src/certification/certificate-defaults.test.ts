import { describe, expect, it } from 'vitest';
import { PROTECTIVE_DEVICES } from '../sync/entities.js';
import { AFDD_STANDARD, DEVICE_STANDARDS, deviceStandardFor, rcdStandardFor, standardDisconnectionTime } from './certificate-defaults.js';

describe('the product standards offered for a circuit’s devices', () => {
  it('names the standard each kind of device is made to', () => {
    // Circuit-breakers types B, C and D: BS EN 60898-1:2003+A13:2012, clause 3.5.5 (instantaneous tripping types).
    expect(deviceStandardFor('B')).toBe('BS EN 60898-1');
    expect(deviceStandardFor('C')).toBe('BS EN 60898-1');
    expect(deviceStandardFor('D')).toBe('BS EN 60898-1');
    // A fuse is named by its own standard: BS 88-2:2010, BS 88-3:2010, BS 3036:1958, BS 1362:1973 (BS 7671:2018+A2:2022 Tables 41.2 and 41.4 list them so).
    for (const fuse of ['BS 88-2', 'BS 88-3', 'BS 3036', 'BS 1362']) expect(deviceStandardFor(fuse)).toBe(fuse);
    expect(deviceStandardFor(null)).toBeNull();
    expect(deviceStandardFor('toString')).toBeNull();
    expect(Object.keys(DEVICE_STANDARDS).sort()).toEqual([...PROTECTIVE_DEVICES].sort());
  });

  it('offers the RCCB standard for types A and AC, and BS EN 62423 for types F and B', () => {
    // BS EN 61008-1:2012 (RCCBs); BS EN 62423:2012 (type F and type B RCDs); BS EN 62606:2013 (AFDDs).
    expect(rcdStandardFor('A')).toBe('BS EN 61008-1');
    expect(rcdStandardFor('AC')).toBe('BS EN 61008-1');
    expect(rcdStandardFor(null)).toBe('BS EN 61008-1');
    expect(rcdStandardFor('F')).toBe('BS EN 62423');
    expect(rcdStandardFor('B')).toBe('BS EN 62423');
    expect(rcdStandardFor('B S')).toBe('BS EN 62423');
    expect(AFDD_STANDARD).toBe('BS EN 62606');
  });
});

describe('standardDisconnectionTime', () => {
  it('offers Table 41.1 for final circuits up to 32 A, and for a ring up to 63 A', () => {
    // BS 7671:2018+A2:2022 Table 41.1, U0 230 V: 0.4 s TN, 0.2 s TT (from memory, M).
    expect(standardDisconnectionTime({ kind: 'radial', deviceRatingA: 32 }, 'TN-C-S')).toMatchObject({ seconds: 0.4 });
    expect(standardDisconnectionTime({ kind: 'lighting', deviceRatingA: 6 }, 'TN-S')).toMatchObject({ seconds: 0.4 });
    expect(standardDisconnectionTime({ kind: 'radial', deviceRatingA: 20 }, 'TT')).toMatchObject({ seconds: 0.2 });
    expect(standardDisconnectionTime({ kind: 'ring', deviceRatingA: 40 }, 'TN-C-S')!.source).toMatch(/Reg 411\.3\.2\.2 and Table 41\.1/);
  });

  it('offers 5 s on TN and 1 s on TT above 63 A, and nothing it cannot know', () => {
    // BS 7671:2018+A2:2022 Reg 411.3.2.3 (TN, 5 s) and Reg 411.3.2.4 (TT, 1 s) (from memory, M).
    expect(standardDisconnectionTime({ kind: 'other', deviceRatingA: 80 }, 'TN-S')).toMatchObject({ seconds: 5 });
    expect(standardDisconnectionTime({ kind: 'other', deviceRatingA: 100 }, 'TT')).toMatchObject({ seconds: 1 });
    // A 40 A radial may or may not serve socket-outlets: no offer.
    expect(standardDisconnectionTime({ kind: 'radial', deviceRatingA: 40 }, 'TN-C-S')).toBeNull();
    expect(standardDisconnectionTime({ kind: 'radial', deviceRatingA: 32 }, null)).toBeNull();
    expect(standardDisconnectionTime({ kind: 'radial', deviceRatingA: null }, 'TT')).toBeNull();
  });
});
