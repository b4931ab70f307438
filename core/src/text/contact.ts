import { parsePhoneNumberFromString } from 'libphonenumber-js/min';
import { isValid as isValidPostcode, toNormalised } from 'postcode';

/**
 * A UK postcode as Royal Mail writes it ("wm41qt" → "WM4 1QT"), or why it is not one. Checked by shape with the
 * `postcode` package: a well-formed postcode that no longer exists still passes, as no list of them ships offline.
 */
export function checkPostcode(text: string): { value: string } | { problem: string } {
  const t = text.trim();
  if (!isValidPostcode(t)) return { problem: 'is not a UK postcode, like WM4 1QT' };
  return { value: toNormalised(t) ?? t.toUpperCase() };
}

/**
 * A phone number as it is dialled in the UK ("07700900871" → "07700 900871"), or why it is not one; a number from
 * abroad keeps its country code. Checked with libphonenumber-js, UK numbers by default, for a length that can be
 * dialled: not for being in service, which would refuse the ranges Ofcom keeps for examples and drama.
 */
export function checkPhone(text: string): { value: string } | { problem: string } {
  const t = text.trim();
  const parsed = /\d/.test(t) ? parsePhoneNumberFromString(t, 'GB') : undefined;
  if (!parsed || !parsed.isPossible()) return { problem: 'is not a phone number, like 07700 900871 or 01632 960123' };
  return { value: parsed.countryCallingCode === '44' ? parsed.formatNational() : parsed.formatInternational() };
}
