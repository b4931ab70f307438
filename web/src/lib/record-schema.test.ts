import { describe, expect, it } from 'vitest';
import { fieldsToSend, optionalChoice, optionalNumber, optionalText, requiredText } from './record-schema';

const issue = (r: { success: boolean; error?: { issues: { message: string }[] } }) => (r.success ? null : r.error!.issues[0]!.message);

describe('form fields from the field registry', () => {
  it('reads the limits of site.zeOhm (0 to 1000 Ω) and takes a decimal comma', () => {
    const ze = optionalNumber('site', 'zeOhm', 'Ze', { unit: 'Ω', example: 0.35 });
    expect(ze.parse('0,28')).toBe(0.28);
    expect(ze.parse(' 21.5 ')).toBe(21.5);
    expect(ze.parse('')).toBeNull();
    expect(ze.parse('1000')).toBe(1000);
    expect(issue(ze.safeParse('-1'))).toBe('Ze must be at least 0 Ω.');
    expect(issue(ze.safeParse('1000.1'))).toBe('Ze must be at most 1000 Ω.');
    for (const text of ['abc', '1e3', '0x10', '1.2.3', 'Infinity', '.']) expect([text, issue(ze.safeParse(text))]).toEqual([text, 'Ze must be a number, like 0.35 Ω.']);
  });

  it('reads a whole-number field as such (testResult.irTestVoltageV)', () => {
    const v = optionalNumber('testResult', 'irTestVoltageV', 'Test voltage', { unit: 'V' });
    expect(v.parse('500')).toBe(500);
    expect(issue(v.safeParse('500.5'))).toBe('Test voltage must be a whole number.');
    expect(issue(v.safeParse('10'))).toBe('Test voltage must be at least 50 V.');
  });

  it('trims text, empties to null, and holds the registry lengths', () => {
    expect(optionalText('site', 'postcode', 'Postcode').parse('  WM2 4HD ')).toBe('WM2 4HD');
    expect(optionalText('site', 'postcode', 'Postcode').parse('   ')).toBeNull();
    expect(issue(optionalText('site', 'postcode', 'Postcode').safeParse('x'.repeat(13)))).toBe('Postcode must be at most 12 characters.');
    expect(issue(requiredText('circuit', 'number', 'Circuit number').safeParse('  '))).toBe('Circuit number must not be empty.');
  });

  it("offers only the registry's choices", () => {
    const earthing = optionalChoice('site', 'earthing', 'Earthing arrangement');
    expect(earthing.parse('TT')).toBe('TT');
    expect(earthing.parse('')).toBeNull();
    expect(issue(earthing.safeParse('TN-C'))).toBe('Earthing arrangement must be one of: TN-C-S, TN-S, TT.');
  });

  it('sends everything given for a new record, and only what was touched for a recorded one', () => {
    const values = { name: 'Loft', level: null };
    expect(fieldsToSend(values, {}, true)).toEqual({ name: 'Loft' });
    expect(fieldsToSend(values, { level: true }, false)).toEqual({ level: null });
    expect(fieldsToSend(values, {}, false)).toEqual({});
  });

  it('refuses a field the registry does not have, so a typo cannot slip through', () => {
    expect(() => optionalNumber('site', 'zeOhms', 'Ze')).toThrow(/site.zeOhms is not in the field registry/);
  });
});
