import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { checkInsulation, insulationBand } from './insulation.js';

describe('checkInsulation', () => {
  it('needs 1.0 MΩ at 500 V DC on a 230 V circuit', () => {
    // BS 7671:2018+A2:2022 Table 64, circuits up to and including 500 V: 500 V test, 1.0 MΩ (C1)
    const result = checkInsulation({ megaohms: 1.0 });
    expect(result).toMatchObject({ verdict: 'pass', value: 1, limit: 1, unit: 'MΩ', testVoltageV: 500 });
    expect(result.source).toBe('BS 7671:2018+A2:2022 Table 64');
    expect(checkInsulation({ megaohms: 0.99 }).verdict).toBe('fail');
    expect(checkInsulation({ megaohms: 200, nominalV: 400 }).verdict).toBe('pass');
  });

  it('needs 0.5 MΩ at 250 V DC on a SELV or PELV circuit', () => {
    // BS 7671:2018+A2:2022 Table 64, SELV and PELV: 250 V test, 0.5 MΩ (C1; one course page says 1 MΩ, the table is followed)
    const result = checkInsulation({ megaohms: 0.5, nominalV: 12 });
    expect(result).toMatchObject({ verdict: 'pass', limit: 0.5, testVoltageV: 250, circuit: 'SELV and PELV circuits' });
    expect(checkInsulation({ megaohms: 0.49, nominalV: 24 }).verdict).toBe('fail');
  });

  it('needs 1.0 MΩ at 1000 V DC above 500 V', () => {
    // BS 7671:2018+A2:2022 Table 64, above 500 V: 1000 V test, 1.0 MΩ (C1)
    expect(insulationBand(690)).toMatchObject({ testVoltageV: 1000, minimumMegaohms: 1 });
    expect(checkInsulation({ megaohms: 0.8, nominalV: 690 }).verdict).toBe('fail');
  });

  it('fails a dead short and asks for a check while no reading is entered', () => {
    expect(checkInsulation({ megaohms: 0 }).verdict).toBe('fail');
    expect(checkInsulation({ megaohms: null })).toMatchObject({ verdict: 'check', value: null, limit: 1 });
  });

  it('rejects readings and voltages outside physical sense', () => {
    expect(() => checkInsulation({ megaohms: -1 })).toThrow(InvalidInputError);
    expect(() => checkInsulation({ megaohms: Number.NaN })).toThrow(/megaohms/);
    expect(() => checkInsulation({ megaohms: Number.POSITIVE_INFINITY })).toThrow(/megaohms/);
    expect(() => checkInsulation({ megaohms: 50, nominalV: 0 })).toThrow(/nominalV/);
    expect(() => checkInsulation({ megaohms: 50, nominalV: 3300 })).toThrow(/nominalV: .*Table 64 covers circuits up to 1000 V/);
  });
});

describe('checkInsulation over the instrument’s range', () => {
  it('passes ">299 MΩ" and ">999 MΩ" against the 1.0 MΩ minimum, keeping the limit as a lower bound', () => {
    // BS 7671:2018+A2:2022 Table 64, circuits up to and including 500 V: 1.0 MΩ at 500 V DC (C1). An over-range
    // display means at least the range's top (common trade practice: recorded as ">299 MΩ").
    const over = checkInsulation({ megaohms: 299, overRange: true });
    expect(over).toMatchObject({ verdict: 'pass', value: 299, limit: 1, unit: 'MΩ', source: 'BS 7671:2018+A2:2022 Table 64' });
    expect(over.note).toMatch(/^Over the instrument's range \(>299 MΩ\) at 500 V DC: above the 1\.0 MΩ minimum/);
    expect(checkInsulation({ megaohms: 999, overRange: true }).verdict).toBe('pass');
  });

  it('cannot judge an over-range on a range that ends below the minimum', () => {
    // Table 64: 1.0 MΩ; ">0.5 MΩ" says only that the insulation is above 0.5 MΩ.
    expect(checkInsulation({ megaohms: 0.5, overRange: true })).toMatchObject({ verdict: 'check', value: 0.5 });
  });
});
