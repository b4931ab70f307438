import { describe, expect, it } from 'vitest';
import { circuitReadingField } from './readings';

const messageOf = (field: Parameters<typeof circuitReadingField>[0], text: string) => circuitReadingField(field).safeParse(text).error?.issues[0]?.message ?? null;

describe('circuitReadingField', () => {
  it("names a typed reading and its unit as core's catalogue does, within the field registry's bounds", () => {
    expect(messageOf('zsOhm', '-0.2')).toBe('Zs cannot be negative.');
    expect(messageOf('zsOhm', 'abc')).toBe('Zs must be a number, like 0.45.');
    // The registry's bound: no r1 reading above 100 Ω is stored (core's sync registry, testResult.r1Ohm).
    expect(messageOf('r1Ohm', '120')).toBe('r1 above 100 Ω is not a real reading; check the figure.');
    expect(messageOf('irLiveEarthMOhm', '250')).toBeNull();
    expect(circuitReadingField('rcdTripMs', true).safeParse('').error?.issues[0]?.message).toBe('Enter the RCD time.');
  });
});
