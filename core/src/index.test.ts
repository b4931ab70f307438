import { describe, expect, it } from 'vitest';
import * as core from './index.js';

describe('@wiretrail/core public API', () => {
  it('exports the functions the app, the server and outside checks call, under their fixed names', () => {
    const functions = [
      'resistancePerMetre',
      'r1r2PerMetre',
      'checkRing',
      'extendRing',
      'maxZs',
      'checkZs',
      'checkInsulation',
      'checkRcd',
      'voltageDrop',
      'fuseForLoad',
      'checkSafeZone',
      'classifyWiremap',
      'tdrLengthM',
      'checkLink',
    ];
    for (const name of functions) {
      expect(typeof (core as Record<string, unknown>)[name], name).toBe('function');
    }
  });

  it('exports the pin schemes, the default rule set, the error class and the disclaimer', () => {
    expect(core.T568A).toHaveLength(8);
    expect(core.T568B).toHaveLength(8);
    expect(core.DEFAULT_RULE_SET.id).toBe('uk-bs7671-2018-a2-2022');
    expect(new core.InvalidInputError('lengthM', 'must not be negative')).toBeInstanceOf(Error);
    expect(core.VERDICT_DISCLAIMER.length).toBeGreaterThan(0);
  });

  it('exports the role names the server and the app both decide by', () => {
    expect(core.ROLES).toEqual(['admin', 'office', 'technician']);
  });
});
