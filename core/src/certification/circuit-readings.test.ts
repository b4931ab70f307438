import { describe, expect, it } from 'vitest';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { SYNC_ENTITIES } from '../sync/entities.js';
import { CIRCUIT_READINGS, circuitReading, mayBeOverRange, overRangeLimit, readingBounds, readingWords } from './circuit-readings.js';
import { circuitTestInput } from './circuit-records.js';
import { assessCircuitTest } from './circuit-test.js';

const RING = { id: 'c1', kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
// Every reading given, so every line is judged. Limits: ring within 0.05 Ω (IET GN3 9th ed. 2022 step 1); insulation
// ≥ 1.0 MΩ at 500 V (BS 7671:2018+A2:2022 Table 64); Zs ≤ 1.10 Ω (Table 41.3 B32 × 0.8, Appendix 3, trade practice);
// RCD ≤ 300 ms at IΔn (Reg 643.8) and ≤ 40 ms at 5 IΔn (BS EN 61008-1, from memory, M).
const ALL = {
  id: 't1', r1Ohm: 0.37, rnOhm: 0.37, r2Ohm: 0.61, r1r2Ohm: 0.25, irLiveLiveMOhm: 200, irLiveEarthMOhm: 200, irTestVoltageV: 500,
  polarity: 'correct', zsOhm: 0.52, rcdTripMs: 24, rcdTripMs5x: 12, rcdButton: 'operates', r2LeadOhm: 0.24, afddButton: 'operates',
};
// R2 by the long lead is judged only where R1+R2 was not taken.
const BY_LEAD = { ...ALL, r1r2Ohm: null };

describe('the catalogue of circuit readings', () => {
  it('lists every reading a test result records, once', () => {
    const fields = CIRCUIT_READINGS.map((r) => r.field);
    expect(new Set(fields).size).toBe(fields.length);
    for (const f of fields) expect(SYNC_ENTITIES.testResult.fields[f], f).toBeDefined();
    // Beside the readings, whether an insulation reading was over the instrument's range.
    expect(Object.keys(circuitTestInput(RING, ALL, 'TN-C-S').readings).sort()).toEqual([...fields, 'irLiveEarthOverRange', 'irLiveLiveOverRange'].sort());
  });

  it('names, for each reading, lines the circuit test really judges it on, in the unit they judge it in', () => {
    for (const spec of CIRCUIT_READINGS) {
      const { lines } = assessCircuitTest(circuitTestInput(RING, spec.field === 'r2LeadOhm' ? BY_LEAD : ALL, 'TN-C-S'));
      for (const key of spec.judgedBy) {
        const line = lines.find((l) => l.key === key);
        expect(line, `${spec.field} on ${key}`).toBeDefined();
        if (spec.field !== 'irTestVoltageV') expect(line!.fields, `${spec.field} on ${key}`).toContain(spec.field);
        if (spec.unit && spec.field !== 'irTestVoltageV') expect(line!.result.unit).toBe(spec.unit);
      }
    }
  });

  it('gives each reading the published source of its limit', () => {
    // Insulation: BS 7671:2018+A2:2022 Table 64; Zs: Table 41.3; RCD at IΔn: Reg 643.8.
    expect(circuitReading('irLiveEarthMOhm').source(DEFAULT_RULE_SET)).toMatch(/Table 64/);
    expect(circuitReading('zsOhm').source(DEFAULT_RULE_SET)).toMatch(/Table 41\.3/);
    expect(circuitReading('rcdTripMs').source(DEFAULT_RULE_SET)).toMatch(/643/);
  });

  it('takes the bounds of a typed figure from the field registry, which the server enforces', () => {
    expect(readingBounds('zsOhm')).toEqual({ min: 0, max: 2000, whole: false });
    expect(readingBounds('irTestVoltageV')).toEqual({ min: 50, max: 5000, whole: true });
    expect(readingBounds('polarity')).toBeNull();
  });
});

describe('over-range readings', () => {
  it('reads what a technician types off an over-range display', () => {
    expect(overRangeLimit('>299')).toBe(299);
    expect(overRangeLimit(' > 999 MΩ')).toBe(999);
    expect(overRangeLimit('≥299')).toBe(299);
    expect(overRangeLimit('>=2000')).toBe(2000);
    expect(overRangeLimit('299')).toBeNull();
    expect(overRangeLimit('>')).toBeNull();
    expect(mayBeOverRange('irLiveEarthMOhm')).toBe(true);
    expect(mayBeOverRange('zsOhm')).toBe(false);
  });

  it('prints a reading as the instrument showed it', () => {
    expect(readingWords({ irLiveLiveMOhm: 299, irLiveLiveOverRange: true }, 'irLiveLiveMOhm')).toBe('>299 MΩ');
    expect(readingWords({ irLiveLiveMOhm: 200, irLiveLiveOverRange: false }, 'irLiveLiveMOhm')).toBe('200 MΩ');
    expect(readingWords({ zsOhm: 0.52 }, 'zsOhm')).toBe('0.52 Ω');
    expect(readingWords({ polarity: 'correct' }, 'polarity')).toBe('correct');
    expect(readingWords({}, 'zsOhm')).toBe('');
  });
});
