import { describe, expect, it } from 'vitest';
import { basisPointsOf, MONEY_TEXT, moneyText, penceOf, PERCENT_TEXT, percentText } from './money-text';

// Plain arithmetic of pounds, pence and per cents; no published source is involved.
describe('money and rates as typed', () => {
  it('turns pounds and pence into whole pence and back', () => {
    expect(['12.50', '£12.5', '1,250', '0.05', '7'].map((t) => [MONEY_TEXT.test(t), penceOf(t)])).toEqual([[true, 1250], [true, 1250], [true, 125000], [true, 5], [true, 700]]);
    expect(['12.505', 'ten', '-3', '1,25'].map((t) => MONEY_TEXT.test(t))).toEqual([false, false, false, false]);
    expect([moneyText(1250), moneyText(5), moneyText(-7200), moneyText(null)]).toEqual(['12.50', '0.05', '-72.00', '']);
  });

  it('turns per cents into hundredths and back: 17.5 % is 1750', () => {
    expect(['20', '17.5', '0', '12.25'].map(basisPointsOf)).toEqual([2000, 1750, 0, 1225]);
    expect([2000, 1750, 0, 1225].map(percentText)).toEqual(['20', '17.5', '0', '12.25']);
    expect(['20', '5.5', '100'].every((t) => PERCENT_TEXT.test(t))).toBe(true);
    expect(['20 %', '5.555', '-1'].some((t) => PERCENT_TEXT.test(t))).toBe(false);
  });
});
