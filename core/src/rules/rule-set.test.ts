import { describe, expect, it } from 'vitest';
import { freezeRuleSet } from './rule-set.js';
import { UK_BS7671_2018_A2_2022 } from './uk-bs7671-2018-a2-2022.js';

describe('freezeRuleSet', () => {
  it('freezes a new rule set all the way down and returns it', () => {
    const copy = structuredClone(UK_BS7671_2018_A2_2022);
    const frozen = freezeRuleSet({ ...copy, id: 'example' });
    expect(Object.isFrozen(frozen)).toBe(true);
    expect(Object.isFrozen(frozen.voltageDrop.flatTwinAndEarth.rows)).toBe(true);
    expect(() => {
      (frozen.ring.endToEndTolerance as { value: number }).value = 0.5;
    }).toThrow(TypeError);
  });
});
