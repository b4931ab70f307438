import { describe, expect, it } from 'vitest';
import { dayOf, ruleSetInForce, UK_RULE_SETS } from './rules-in-force.js';
import { UK_BS7671_2018_A2_2022 } from './uk-bs7671-2018-a2-2022.js';
import { UK_BS7671_2018_A3_2024 } from './uk-bs7671-2018-a3-2024.js';

describe('ruleSetInForce', () => {
  it('takes the amendment in force on the day: A2:2022 from 28 March 2022, A3:2024 from 31 July 2024 (both M)', () => {
    expect(ruleSetInForce('2022-03-27')).toBeNull();
    expect(ruleSetInForce('2022-03-28')).toBe(UK_BS7671_2018_A2_2022);
    expect(ruleSetInForce('2024-07-30T23:59:59.000Z')).toBe(UK_BS7671_2018_A2_2022);
    expect(ruleSetInForce('2024-07-31')).toBe(UK_BS7671_2018_A3_2024);
    expect(ruleSetInForce(new Date('2026-12-05T12:00:00Z'))).toBe(UK_BS7671_2018_A3_2024);
    expect(ruleSetInForce('not a date')).toBeNull();
  });

  it('does not depend on the order the rule sets are listed in', () => {
    expect(ruleSetInForce('2025-01-01', [...UK_RULE_SETS].reverse())).toBe(UK_BS7671_2018_A3_2024);
  });

  it('reads the day of an ISO time or a Date', () => {
    expect(dayOf('2024-07-31T08:00:00.000Z')).toBe('2024-07-31');
    expect(dayOf(new Date(Number.NaN))).toBe('');
    expect(dayOf(null)).toBe('');
  });
});

describe('UK_BS7671_2018_A3_2024', () => {
  it('names its edition and cites it in every source, never A2', () => {
    expect(UK_BS7671_2018_A3_2024.edition).toBe('BS 7671:2018+A3:2024');
    expect(UK_BS7671_2018_A3_2024.id).toBe('uk-bs7671-2018-a3-2024');
    expect(JSON.stringify(UK_BS7671_2018_A3_2024)).not.toMatch(/A2:2022/);
    expect(UK_BS7671_2018_A3_2024.earthFaultLoop.circuitBreakers.B.source).toBe('BS 7671:2018+A3:2024 Table 41.3');
  });

  it('keeps every table our checks use as A2:2022 printed it (A3 changed none of them, M)', () => {
    // Only the edition named in the sources may differ, wherever a source sits (a `source` key or a plain citation).
    const valuesOf = (rules: unknown): unknown =>
      JSON.parse(
        JSON.stringify(rules, (k, v: unknown) =>
          k === 'id' || k === 'name' || k === 'edition' || k === 'effectiveFrom' ? undefined : typeof v === 'string' ? v.replaceAll('BS 7671:2018+A3:2024', 'BS 7671:2018+A2:2022') : v,
        ),
      );
    expect(valuesOf(UK_BS7671_2018_A3_2024)).toEqual(valuesOf(UK_BS7671_2018_A2_2022));
    // BS 7671:2018+A3:2024 Table 41.3, B32 = 1.37 Ω (unchanged from A2:2022, D from Cmin × U0 / 5 In).
    expect(UK_BS7671_2018_A3_2024.earthFaultLoop.circuitBreakers.B.times['0.4']![32]).toBe(1.37);
  });

  it('is frozen', () => {
    expect(Object.isFrozen(UK_BS7671_2018_A3_2024.earthFaultLoop.fuses)).toBe(true);
  });
});
