import { describe, expect, it } from 'vitest';
import { CIRCUIT_READINGS } from '@wiretrail/core';
import { circuitReadingField, instrumentReading } from './readings';

const messageOf = (field: Parameters<typeof circuitReadingField>[0], text: string) => circuitReadingField(field).safeParse(text).error?.issues[0]?.message ?? null;

describe('circuitReadingField', () => {
  it("names a typed reading and its unit as core's catalogue does, within the field registry's bounds", () => {
    expect(messageOf('zsOhm', '-0.2')).toBe('Zs cannot be negative.');
    expect(messageOf('zsOhm', 'abc')).toBe('Zs must be a number, like 0.45 Ω.');
    // The registry's bound: no r1 reading above 100 Ω is stored (core's sync registry, testResult.r1Ohm).
    expect(messageOf('r1Ohm', '120')).toBe('r1 above 100 Ω is not a real reading; check the figure.');
    expect(messageOf('irLiveEarthMOhm', '250')).toBeNull();
    expect(circuitReadingField('rcdTripMs', true).safeParse('').error?.issues[0]?.message).toBe('Enter the RCD time.');
  });

  it('gives each reading an example in its own unit', () => {
    expect(messageOf('rcdTripMs', 'fast')).toBe('The RCD time must be a number, like 18 ms.');
    expect(messageOf('irTestVoltageV', 'x')).toBe('Insulation test voltage must be a number, like 500 V.');
    expect(messageOf('irLiveLiveMOhm', 'big')).toBe("Insulation live to live must be a number, like 200 MΩ, or the tester's over-range display, like >299.");
    for (const { field, unit } of CIRCUIT_READINGS) {
      if (!unit) continue;
      const message = messageOf(field, 'x')!;
      expect(message, field).toMatch(new RegExp(`like [0-9.]+ ${unit}`));
      if (unit !== 'Ω') expect(message, field).not.toContain('0.45');
    }
  });

  it('takes an insulation tester’s over-range display within the registry’s bounds', () => {
    expect(messageOf('irLiveLiveMOhm', '>299')).toBeNull();
    expect(messageOf('irLiveEarthMOhm', '≥ 999')).toBeNull();
    expect(messageOf('irLiveEarthMOhm', '>20000')).toBe('Insulation live to earth above 10000 MΩ is not a real reading; check the figure.');
    // Only insulation testers show over-range here.
    expect(messageOf('zsOhm', '>2')).toBe('Zs must be a number, like 0.45 Ω.');
    expect(instrumentReading('>299')).toEqual({ value: 299, overRange: true });
    expect(instrumentReading('250')).toEqual({ value: 250, overRange: false });
  });
});
