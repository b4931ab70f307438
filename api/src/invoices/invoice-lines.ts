import { BadRequestException } from '@nestjs/common';
import { type DocumentTotals, documentTotals, type InvoiceLineInput, lineTotals, MoneyError, quantityThousandths } from '@wiretrail/core';
import type { RateBook } from '../pricing/rate-book.js';
import { activeVatRate } from '../pricing/rate-book.js';
import { messageOf } from '../common/exception-message.js';

/** A line as the office edits it, or as it is built from the job: before VAT is looked up and totals worked out. */
export interface LineDraft extends Omit<InvoiceLineInput, 'quantity'> {
  /** An exact decimal, up to three places; negative on a credit note. */
  quantity: string | number;
  /** Kept rather than looked up: a credit note credits VAT at the rate its invoice charged. */
  vatBasisPoints?: number;
}

export interface PricedLine extends Omit<LineDraft, 'quantity' | 'vatBasisPoints'> {
  quantity: string;
  vatBasisPoints: number;
  netMinor: number;
  vatMinor: number;
  grossMinor: number;
}

/** "12.500" and 12.5 are both "12.5": one spelling of each quantity, so lines compare and print alike. */
export function quantityText(thousandths: bigint): string {
  const negative = thousandths < 0n;
  const abs = negative ? -thousandths : thousandths;
  const fraction = (abs % 1000n).toString().padStart(3, '0').replace(/0+$/, '');
  return `${negative ? '-' : ''}${abs / 1000n}${fraction ? `.${fraction}` : ''}`;
}

export const MAX_LINES = 200;

/**
 * Looks up each line's VAT rate and works out its net, VAT and gross in pence with core's rule (VAT per line to
 * the nearer penny), and the document's totals. Refusals name the line and field: "lines[2].quantity: …".
 * `sign` is 1 for quotes and invoices, whose quantities are positive, and -1 for credit notes.
 */
export function priceLines(drafts: readonly LineDraft[], book: RateBook, sign: 1 | -1): { lines: PricedLine[]; totals: DocumentTotals } {
  if (drafts.length > MAX_LINES) throw new BadRequestException(`lines: at most ${MAX_LINES} lines.`);
  const problems: string[] = [];
  const lines: PricedLine[] = [];
  drafts.forEach((d, i) => {
    const at = `lines[${i}]`;
    try {
      const qty = quantityThousandths(d.quantity, `${at}.quantity`);
      if (qty === 0n) throw new MoneyError(`${at}.quantity`, 'must not be nothing');
      if ((qty < 0n ? -1 : 1) !== sign) throw new MoneyError(`${at}.quantity`, sign === 1 ? 'must be more than nothing' : 'must be below nothing on a credit note, which takes back what was charged');
      const vatBasisPoints = d.vatBasisPoints ?? activeVatRate(book, d.vatRateCode, `${at}.vatRateCode`).basisPoints;
      const quantity = quantityText(qty);
      try {
        lines.push({ ...d, quantity, vatBasisPoints, ...lineTotals({ quantity, unitPriceMinor: d.unitPriceMinor, vatBasisPoints }) });
      } catch (err) {
        throw err instanceof MoneyError && err.field === 'line' ? new MoneyError(at, 'comes to more than can be held: check its quantity and price') : err;
      }
    } catch (err) {
      if (err instanceof MoneyError) problems.push(err.message);
      else if (err instanceof BadRequestException) problems.push(String(messageOf(err)));
      else throw err;
    }
  });
  if (problems.length) throw new BadRequestException(problems);
  const totals = documentTotals(lines.map((l) => ({ quantity: l.quantity, unitPriceMinor: l.unitPriceMinor, vatBasisPoints: l.vatBasisPoints })));
  if (!Number.isSafeInteger(totals.grossMinor)) throw new BadRequestException(['lines: together they come to more than can be held.']);
  return { lines, totals };
}
