import { describe, expect, it } from 'vitest';
import { fieldName, parseTyped, showValue, whenFromClock } from '../components/conflict-words';

describe('conflict wording', () => {
  it('names fields in plain words', () => {
    expect(fieldName('description')).toBe('Description');
    expect(fieldName('deviceRatingA')).toBe('Device rating a');
    expect(fieldName('*')).toBe('Whole record');
  });

  it('turns typed text into the field type, or says why not', () => {
    expect(parseTyped('circuit', 'deviceRatingA', ' 32 ')).toEqual({ value: 32 });
    expect(parseTyped('circuit', 'deviceRatingA', 'thirty')).toEqual({ error: 'Device rating a must be a number.' });
    expect(parseTyped('circuit', 'kind', 'ring')).toEqual({ value: 'ring' });
    expect(parseTyped('circuit', 'kind', 'spiral')).toMatchObject({ error: expect.stringContaining('ring, radial') });
    expect(parseTyped('circuit', 'description', '  Cooker  ')).toEqual({ value: 'Cooker' });
    expect(parseTyped('circuit', 'number', '')).toEqual({ error: 'Number must not be empty.' });
  });

  it('shows values and clocks readably', () => {
    expect(showValue(null)).toBe('(empty)');
    expect(showValue({ zs: 0.4 })).toBe('{"zs":0.4}');
    expect(whenFromClock('2026-12-02T10:05:00.000Z-0001-phone1')).toMatch(/2 Dec 2026/);
    expect(whenFromClock('not a clock')).toBeNull();
  });
});
