import { describe, expect, it } from 'vitest';
import * as uk from './uk-bs7671-2018-a2-2022.js';
import { DEFAULT_RULE_SET, UK_BS7671_2018_A2_2022 } from './uk-bs7671-2018-a2-2022.js';
import type { RuleSet } from './rule-set.js';
import { checkZs } from '../electrical/earth-fault-loop.js';

function isSourced(value: unknown): value is { source: string } {
  return typeof value === 'object' && value !== null && 'source' in value;
}

describe('UK_BS7671_2018_A2_2022', () => {
  it('is the default rule set and names its edition', () => {
    expect(DEFAULT_RULE_SET).toBe(UK_BS7671_2018_A2_2022);
    expect(UK_BS7671_2018_A2_2022.id).toBe('uk-bs7671-2018-a2-2022');
    expect(UK_BS7671_2018_A2_2022.edition).toBe('BS 7671:2018+A2:2022');
    expect(UK_BS7671_2018_A2_2022.country).toBe('GB');
  });

  it('gives every exported limit and table a source', () => {
    const sourced = Object.entries(uk).filter(([, value]) => isSourced(value));
    expect(sourced.length).toBeGreaterThan(20);
    for (const [name, value] of sourced) {
      expect((value as { source: string }).source, name).toMatch(/\S{3,}/);
    }
  });

  it('names the published table or clause in every circuit-breaker source', () => {
    for (const table of Object.values(UK_BS7671_2018_A2_2022.earthFaultLoop.circuitBreakers)) {
      expect(table.source).toBe('BS 7671:2018+A2:2022 Table 41.3');
    }
  });

  it('keeps the insulation bands in ascending order of voltage', () => {
    const limits = UK_BS7671_2018_A2_2022.insulation.bands.map((b) => b.upToNominalV);
    expect(limits).toEqual([...limits].sort((a, b) => a - b));
  });

  it('cannot be changed at run time, down to its tables', () => {
    expect(Object.isFrozen(UK_BS7671_2018_A2_2022)).toBe(true);
    expect(Object.isFrozen(UK_BS7671_2018_A2_2022.conductors.copperResistance.rows)).toBe(true);
    expect(Object.isFrozen(UK_BS7671_2018_A2_2022.earthFaultLoop.circuitBreakers.B.times['0.4'])).toBe(true);
    expect(Object.isFrozen(uk.RING_END_TO_END_TOLERANCE_OHM)).toBe(true);
  });

  it('lets a caller pass another rule set without changing the call', () => {
    // A made-up rule set that only changes the cold-test factor: the same call follows it.
    const stricter: RuleSet = {
      ...UK_BS7671_2018_A2_2022,
      id: 'example-stricter',
      earthFaultLoop: {
        ...UK_BS7671_2018_A2_2022.earthFaultLoop,
        coldTestFactor: { ...UK_BS7671_2018_A2_2022.earthFaultLoop.coldTestFactor, value: 0.5 },
      },
    };
    const input = { measured: 1.0, device: 'B', ratingA: 32 } as const;
    expect(checkZs(input).verdict).toBe('pass');
    expect(checkZs(input, stricter).verdict).toBe('fail');
  });
});
