import { parseMoney } from '@wiretrail/core';

/**
 * Money and rates as the office types them: pounds and pence ("12.50") and per cents ("20", "17.5"), turned into
 * the whole pence and hundredths of a per cent the API keeps, and back, without floating point.
 */
export const MONEY_TEXT = /^£?\s*\d{1,9}(,\d{3})*(\.\d{1,2})?$/;
export const PERCENT_TEXT = /^\d{1,3}(\.\d{1,2})?$/;

/** 1250 to "12.50"; nothing to "". */
export function moneyText(minor: number | null | undefined): string {
  if (minor === null || minor === undefined) return '';
  const sign = minor < 0 ? '-' : '';
  const abs = Math.abs(minor);
  return `${sign}${Math.trunc(abs / 100)}.${String(abs % 100).padStart(2, '0')}`;
}

/** "12.5" or "£1,250" to pence; the text must match MONEY_TEXT first. */
export const penceOf = (text: string): number => parseMoney(text.replace(/\s/g, ''));

/** "17.5" to 1750 hundredths of a per cent, exactly. */
export function basisPointsOf(text: string): number {
  const [whole, fraction = ''] = text.trim().split('.');
  return Number(whole) * 100 + Number(fraction.padEnd(2, '0'));
}

/** 1750 to "17.5". */
export function percentText(basisPoints: number): string {
  const fraction = String(basisPoints % 100).padStart(2, '0').replace(/0+$/, '');
  return `${Math.trunc(basisPoints / 100)}${fraction ? `.${fraction}` : ''}`;
}
