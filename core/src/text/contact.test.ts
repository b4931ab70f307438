import { describe, expect, it } from 'vitest';
import { checkPhone, checkPostcode } from './contact.js';

describe('postcodes', () => {
  it('writes a UK postcode as Royal Mail does, whatever the case and spacing typed', () => {
    // Royal Mail's format: outward code, a space, inward code of a digit and two letters (Royal Mail PAF guide)
    expect(checkPostcode('wm41qt')).toEqual({ value: 'WM4 1QT' });
    expect(checkPostcode(' SW1A 1AA ')).toEqual({ value: 'SW1A 1AA' });
    expect(checkPostcode('EC1A1BB')).toEqual({ value: 'EC1A 1BB' });
  });

  it('refuses text that is not a postcode', () => {
    for (const bad of ['Wendmouth', '12345', 'WM4', 'call me']) expect(checkPostcode(bad)).toEqual({ problem: 'is not a UK postcode, like WM4 1QT' });
  });
});

describe('phone numbers', () => {
  it('writes a UK number as it is dialled, and keeps a foreign one international', () => {
    // Ofcom's numbers for drama: 07700 900000–900999 (mobile), 01632 960000–960999 (geographic)
    expect(checkPhone('07700900871')).toEqual({ value: '07700 900871' });
    expect(checkPhone('+44 7700 900871')).toEqual({ value: '07700 900871' });
    expect(checkPhone('01632 960123')).toEqual({ value: '01632 960123' });
    expect(checkPhone('+353 1 234 5678')).toEqual({ value: '+353 1 234 5678' });
  });

  it('refuses words and numbers too short to dial', () => {
    for (const bad of ['call me maybe', '12345', '0770']) expect(checkPhone(bad)).toEqual({ problem: 'is not a phone number, like 07700 900871 or 01632 960123' });
  });
});
