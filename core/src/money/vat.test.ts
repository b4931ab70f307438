import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { documentTotals, formatMoney, formatRate, lineTotals, MoneyError, parseMoney, quantityThousandths, UK_VAT_RATES } from './vat.js';

// Sources: HMRC VAT Notice 700 (The VAT Guide), paragraph 17.5 "Rounding of amounts of VAT", as referred to by the
// HMRC internal manual VATREC12010 (line-level VAT may be rounded to the nearer 1p; it must not be rounded down to
// whole pennies line by line). The paragraph's wording is given here from memory; VATREC12010 was read.
// Rates: 20 % standard, 5 % reduced, 0 % zero (HMRC VAT rates; from memory).

describe('lineTotals', () => {
  it('works out net, VAT and gross in whole pence: 3 × £41.15 at 20 % (worked example; VAT Notice 700 §17.5)', () => {
    // 3 × 4115p = 12 345p; 20 % of 12 345p = 2469p exactly.
    expect(lineTotals({ quantity: 3, unitPriceMinor: 4115, vatBasisPoints: 2000 })).toEqual({ netMinor: 12345, vatMinor: 2469, grossMinor: 14814 });
  });

  it('rounds a line’s VAT to the nearer penny, never down to whole pennies by rule (VAT Notice 700 §17.5; VATREC12010)', () => {
    // 20 % of 3p = 0.6p → 1p; 20 % of 2p = 0.4p → 0p.
    expect(lineTotals({ quantity: 1, unitPriceMinor: 3, vatBasisPoints: 2000 }).vatMinor).toBe(1);
    expect(lineTotals({ quantity: 1, unitPriceMinor: 2, vatBasisPoints: 2000 }).vatMinor).toBe(0);
    // 20 % of £10.03 = 200.6p → 201p, not the 200p a round-down would give.
    expect(lineTotals({ quantity: 1, unitPriceMinor: 1003, vatBasisPoints: 2000 }).vatMinor).toBe(201);
  });

  it('takes an exact half penny up, and away from zero on a credit (the rule written in vat.ts; VAT Notice 700 §17.5 allows the nearer 1p)', () => {
    // 5 % of 10p = 0.5p → 1p; a credit of the same line gives -1p, so it cancels its invoice exactly.
    expect(lineTotals({ quantity: 1, unitPriceMinor: 10, vatBasisPoints: 500 }).vatMinor).toBe(1);
    expect(lineTotals({ quantity: -1, unitPriceMinor: 10, vatBasisPoints: 500 })).toEqual({ netMinor: -10, vatMinor: -1, grossMinor: -11 });
  });

  it('prices cable by the metre: 12.5 m at 85p is 1062.5p, rounded to 1063p before VAT (rule in vat.ts)', () => {
    expect(lineTotals({ quantity: '12.5', unitPriceMinor: 85, vatBasisPoints: 2000 })).toEqual({ netMinor: 1063, vatMinor: 213, grossMinor: 1276 });
  });

  it('charges nothing at the zero rate', () => {
    expect(lineTotals({ quantity: 2, unitPriceMinor: 4999, vatBasisPoints: 0 })).toEqual({ netMinor: 9998, vatMinor: 0, grossMinor: 9998 });
  });

  it('refuses quantities and prices it cannot hold exactly', () => {
    expect(() => lineTotals({ quantity: '1.2345', unitPriceMinor: 100, vatBasisPoints: 2000 })).toThrow(MoneyError);
    expect(() => lineTotals({ quantity: 1, unitPriceMinor: 10.5, vatBasisPoints: 2000 })).toThrow(/whole number of pence/);
    expect(() => lineTotals({ quantity: 1, unitPriceMinor: 100, vatBasisPoints: 20.5 })).toThrow(/hundredths of a per cent/);
    expect(() => lineTotals({ quantity: 'two', unitPriceMinor: 100, vatBasisPoints: 2000 })).toThrow(/quantity/);
  });

  it('is exact where floating point is not: 0.1 + 0.2 of a £1 item is 30p', () => {
    expect(quantityThousandths('0.3')).toBe(300n);
    expect(lineTotals({ quantity: '0.3', unitPriceMinor: 100, vatBasisPoints: 0 }).netMinor).toBe(30);
  });
});

describe('lineTotals at the edges of a penny', () => {
  it('rounds the net of a part-unit quantity before the VAT is worked out (the rule in vat.ts)', () => {
    // 0.005 × 100p = 0.5p → 1p net; 20 % of 1p = 0.2p → 0p VAT.
    expect(lineTotals({ quantity: '0.005', unitPriceMinor: 100, vatBasisPoints: 2000 })).toEqual({ netMinor: 1, vatMinor: 0, grossMinor: 1 });
    // 0.004 × 100p = 0.4p → 0p: a line can round to nothing.
    expect(lineTotals({ quantity: '0.004', unitPriceMinor: 100, vatBasisPoints: 2000 })).toEqual({ netMinor: 0, vatMinor: 0, grossMinor: 0 });
  });

  it('rounds 2.5p of VAT up and 2.4p down (nearer 1p; VAT Notice 700 §17.5)', () => {
    // 5 % of 50p = 2.5p → 3p; 5 % of 49p = 2.45p → 2p.
    expect(lineTotals({ quantity: 1, unitPriceMinor: 50, vatBasisPoints: 500 }).vatMinor).toBe(3);
    expect(lineTotals({ quantity: 1, unitPriceMinor: 49, vatBasisPoints: 500 }).vatMinor).toBe(2);
    // 17.5 % (the standard rate until 4 January 2011; from memory) of 10p = 1.75p → 2p.
    expect(lineTotals({ quantity: 1, unitPriceMinor: 10, vatBasisPoints: 1750 }).vatMinor).toBe(2);
  });

  it('stays exact for large invoices and refuses what it cannot hold', () => {
    // £9,999,999.99 × 1000 at 20 %: BigInt arithmetic, no floating point.
    expect(lineTotals({ quantity: 1000, unitPriceMinor: 999_999_999, vatBasisPoints: 2000 })).toEqual({
      netMinor: 999_999_999_000, vatMinor: 199_999_999_800, grossMinor: 1_199_999_998_800,
    });
    expect(() => lineTotals({ quantity: 999_999_999, unitPriceMinor: 9_007_199_254_740, vatBasisPoints: 2000 })).toThrow(/too large/);
  });

  it('gives nothing for no lines', () => {
    expect(documentTotals([])).toEqual({ lines: [], netMinor: 0, vatMinor: 0, grossMinor: 0, byRate: [] });
  });
});

describe('documentTotals', () => {
  it('adds the lines’ rounded VAT, which may differ from VAT on the total by a penny (VAT Notice 700 §17.5: line-level rounding)', () => {
    // Two lines of £10.03: 201p VAT each, 402p in all; 20 % of the £20.06 total would be 401.2p.
    const totals = documentTotals([
      { quantity: 1, unitPriceMinor: 1003, vatBasisPoints: 2000 },
      { quantity: 1, unitPriceMinor: 1003, vatBasisPoints: 2000 },
    ]);
    expect(totals).toMatchObject({ netMinor: 2006, vatMinor: 402, grossMinor: 2408 });
  });

  it('shows net and VAT per rate, as a VAT invoice lists them (VAT Notice 700 §16.3, from memory)', () => {
    const totals = documentTotals([
      { quantity: 2, unitPriceMinor: 6500, vatBasisPoints: 2000 },
      { quantity: 1, unitPriceMinor: 2000, vatBasisPoints: 500 },
      { quantity: 1, unitPriceMinor: 1500, vatBasisPoints: 0 },
    ]);
    expect(totals.byRate).toEqual([
      { basisPoints: 0, netMinor: 1500, vatMinor: 0 },
      { basisPoints: 500, netMinor: 2000, vatMinor: 100 },
      { basisPoints: 2000, netMinor: 13000, vatMinor: 2600 },
    ]);
    expect(totals).toMatchObject({ netMinor: 16500, vatMinor: 2700, grossMinor: 19200 });
  });

  it('always balances: gross is net plus VAT, line by line and in total, and a credit note cancels its invoice (property)', () => {
    const line = fc.record({
      quantity: fc.integer({ min: 1, max: 99_999 }).map((n) => (n / 1000).toFixed(3)),
      unitPriceMinor: fc.integer({ min: 0, max: 10_000_000 }),
      vatBasisPoints: fc.constantFrom(...UK_VAT_RATES.map((r) => r.basisPoints)),
    });
    fc.assert(
      fc.property(fc.array(line, { minLength: 1, maxLength: 20 }), (lines) => {
        const t = documentTotals(lines);
        const credit = documentTotals(lines.map((l) => ({ ...l, quantity: `-${l.quantity}` })));
        return (
          t.grossMinor === t.netMinor + t.vatMinor &&
          t.lines.every((l) => l.grossMinor === l.netMinor + l.vatMinor && Number.isInteger(l.vatMinor)) &&
          credit.grossMinor === -t.grossMinor &&
          credit.vatMinor === -t.vatMinor
        );
      }),
    );
  });
});

describe('money as text', () => {
  it('reads and writes pounds and pence without floating point', () => {
    expect(parseMoney('12.5')).toBe(1250);
    expect(parseMoney('£1,234.05')).toBe(123405);
    expect(parseMoney('-0.99')).toBe(-99);
    expect(() => parseMoney('12.345')).toThrow(MoneyError);
    expect(() => parseMoney('ten')).toThrow(/like 12.50/);
    expect(formatMoney(123405)).toBe('£1,234.05');
    expect(formatMoney(-99)).toBe('-£0.99');
    expect(formatRate(2000)).toBe('20 %');
    expect(formatRate(0)).toBe('0 %');
  });
});
