/**
 * Money on quotes and invoices: integer minor units (pence) throughout, never floating point, with VAT worked
 * out line by line.
 *
 * The rounding rule: each line's net amount is quantity × unit price, rounded to the nearest penny; its VAT is
 * net × rate, rounded to the nearest penny, a half penny going away from zero (up, for a charge); the invoice's
 * VAT is the sum of the lines' VAT. Rounding each line's VAT to the nearer penny is one of the line-level methods
 * HMRC's VAT Guide allows (VAT Notice 700, paragraph 17.5 "Rounding of amounts of VAT" in the edition the
 * HMRC VAT Trader Records manual VATREC12010 refers to); it never rounds VAT down to whole pennies line by line,
 * which the guide does not allow, and it does not use the concession of rounding the invoice's total VAT down.
 * A credit note rounds the same way, so it undoes its invoice to the penny.
 */

/** A VAT rate as data: the organisation keeps its own list (standard, reduced, zero), so a change of rate is not a code change. */
export interface VatRate {
  readonly code: string;
  readonly name: string;
  /** Hundredths of a per cent: 2000 is 20 %. */
  readonly basisPoints: number;
}

export const VAT_ROUNDING_RULE = {
  name: 'VAT per line, to the nearest penny (half a penny away from zero); the invoice VAT is the sum of the lines',
  source: 'HMRC VAT Notice 700 (The VAT Guide), paragraph 17.5 "Rounding of amounts of VAT"; HMRC manual VATREC12010',
} as const;

/** The UK's rates as the demo organisation's starting data (HMRC VAT rates on goods and services; from memory). */
export const UK_VAT_RATES: readonly VatRate[] = Object.freeze([
  { code: 'standard', name: 'Standard rate', basisPoints: 2000 },
  { code: 'reduced', name: 'Reduced rate', basisPoints: 500 },
  { code: 'zero', name: 'Zero rate', basisPoints: 0 },
]);

export class MoneyError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
    this.name = 'MoneyError';
  }
}

/** Divides and rounds to the nearest whole unit, a half going away from zero; exact for any size, in BigInt. */
function divideRounded(numerator: bigint, denominator: bigint): bigint {
  const negative = numerator < 0n !== denominator < 0n;
  const n = numerator < 0n ? -numerator : numerator;
  const d = denominator < 0n ? -denominator : denominator;
  const q = (n * 2n + d) / (d * 2n);
  return negative ? -q : q;
}

const QUANTITY = /^-?\d{1,9}(\.\d{1,3})?$/;

/** A quantity as thousandths: "12.5" metres is 12 500. Up to three decimal places, as price lists give them. */
export function quantityThousandths(quantity: string | number, field = 'quantity'): bigint {
  const text = typeof quantity === 'number' ? String(quantity) : quantity.trim();
  if (!QUANTITY.test(text)) throw new MoneyError(field, `must be a number with at most three decimal places, got ${JSON.stringify(quantity)}`);
  const [whole, fraction = ''] = text.replace('-', '').split('.');
  const value = BigInt(whole!) * 1000n + BigInt(fraction.padEnd(3, '0'));
  return text.startsWith('-') ? -value : value;
}

function requireMinor(field: string, value: unknown): bigint {
  if (typeof value !== 'number' || !Number.isSafeInteger(value)) throw new MoneyError(field, `must be a whole number of pence, got ${String(value)}`);
  return BigInt(value);
}

function requireRate(field: string, value: unknown): bigint {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 0 || value > 10_000) {
    throw new MoneyError(field, `must be a rate in hundredths of a per cent from 0 to 10 000, got ${String(value)}`);
  }
  return BigInt(value);
}

export interface LineInput {
  readonly quantity: string | number;
  /** Price of one unit before VAT, in pence. */
  readonly unitPriceMinor: number;
  readonly vatBasisPoints: number;
}

export interface LineTotals {
  readonly netMinor: number;
  readonly vatMinor: number;
  readonly grossMinor: number;
}

export function lineTotals(line: LineInput): LineTotals {
  const qty = quantityThousandths(line.quantity);
  const unit = requireMinor('unitPriceMinor', line.unitPriceMinor);
  const rate = requireRate('vatBasisPoints', line.vatBasisPoints);
  const net = divideRounded(qty * unit, 1000n);
  const vat = divideRounded(net * rate, 10_000n);
  const gross = net + vat;
  if (gross > BigInt(Number.MAX_SAFE_INTEGER) || gross < -BigInt(Number.MAX_SAFE_INTEGER)) throw new MoneyError('line', 'is too large to hold');
  return { netMinor: Number(net), vatMinor: Number(vat), grossMinor: Number(gross) };
}

export interface DocumentTotals {
  readonly lines: readonly LineTotals[];
  readonly netMinor: number;
  readonly vatMinor: number;
  readonly grossMinor: number;
  /** Net and VAT per rate, as an invoice must show them, in ascending rate. */
  readonly byRate: readonly { readonly basisPoints: number; readonly netMinor: number; readonly vatMinor: number }[];
}

export function documentTotals(lines: readonly LineInput[]): DocumentTotals {
  const totals = lines.map(lineTotals);
  const byRate = new Map<number, { netMinor: number; vatMinor: number }>();
  totals.forEach((t, i) => {
    const rate = lines[i]!.vatBasisPoints;
    const seen = byRate.get(rate) ?? { netMinor: 0, vatMinor: 0 };
    byRate.set(rate, { netMinor: seen.netMinor + t.netMinor, vatMinor: seen.vatMinor + t.vatMinor });
  });
  const sum = (k: keyof LineTotals) => totals.reduce((s, t) => s + t[k], 0);
  return {
    lines: totals,
    netMinor: sum('netMinor'),
    vatMinor: sum('vatMinor'),
    grossMinor: sum('grossMinor'),
    byRate: [...byRate.entries()].sort(([a], [b]) => a - b).map(([basisPoints, v]) => ({ basisPoints, ...v })),
  };
}

const MONEY = /^-?\d{1,12}(\.\d{1,2})?$/;

/** "12.5" or "£12.50" to 1250 pence; at most two decimal places. */
export function parseMoney(text: string, field = 'amount'): number {
  const t = text.trim().replace(/^£/, '').replace(/,/g, '');
  if (!MONEY.test(t)) throw new MoneyError(field, `must be an amount in pounds and pence, like 12.50, got ${JSON.stringify(text)}`);
  const [whole, fraction = ''] = t.replace('-', '').split('.');
  const pence = Number(whole) * 100 + Number(fraction.padEnd(2, '0'));
  return t.startsWith('-') ? -pence : pence;
}

const POUNDS = new Intl.NumberFormat('en-GB', { style: 'currency', currency: 'GBP' });

/** 1250 to "£12.50"; from whole pence, so no floating-point residue can show. */
export function formatMoney(minor: number): string {
  const sign = minor < 0 ? '-' : '';
  const abs = Math.abs(minor);
  return sign + POUNDS.format(Math.trunc(abs / 100) + (abs % 100) / 100);
}

/** 2000 to "20 %". */
export function formatRate(basisPoints: number): string {
  return `${basisPoints % 100 === 0 ? basisPoints / 100 : (basisPoints / 100).toFixed(2)} %`;
}
