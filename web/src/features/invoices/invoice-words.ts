import { formatMoney, INVOICE_NAMES } from '@wiretrail/core';
import type { Account, InvoiceSummary, LineKind, PaymentMethod, Refund, RefundMethod } from './api/get-invoice';

export const LINE_KIND_NAMES: Record<LineKind, string> = { labour: 'Labour', material: 'Part', fixed: 'Fixed price' };
export const METHOD_NAMES: Record<PaymentMethod, string> = { card: 'Card (online)', cash: 'Cash', 'bank-transfer': 'Bank transfer', cheque: 'Cheque' };
export const REFUND_METHOD_NAMES: Record<RefundMethod, string> = { card: 'Back to the card', cash: 'Cash', 'bank-transfer': 'Bank transfer', cheque: 'Cheque' };

/** Where an invoice's money stands once paid and credited: still owed, owed back to the customer, or square. */
export function balanceWords(a: Pick<Account, 'owedMinor' | 'refundedMinor'>): string {
  if (a.owedMinor > 0) return `${formatMoney(a.owedMinor)} still owed`;
  if (a.owedMinor < 0) return `${formatMoney(-a.owedMinor)} paid too much: to refund`;
  return a.refundedMinor > 0 ? `Nothing owed and nothing left to refund (${formatMoney(a.refundedMinor)} refunded)` : 'Nothing owed';
}

/** A refund in the invoice's list: the state of one to a card, and why the provider refused one. */
export function refundStateWords(r: Pick<Refund, 'state' | 'failure'>): string {
  if (r.state === 'pending') return 'being made by the card payment service';
  if (r.state === 'failed') return `not made: ${r.failure ?? 'the card payment service refused it'}`;
  return '';
}

const day = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

/** "14 Mar 2026" from a calendar date "2026-03-14". */
export function dateWords(date: string | null | undefined): string {
  return date && /^\d{4}-\d{2}-\d{2}$/.test(date) ? day.format(new Date(`${date}T12:00:00Z`)) : '';
}

/** A card payment that came for more than was owed: what goes back to the card, and whether it has. */
export function refundWords(p: { refundMinor: number; refundedAt: string | null }): string {
  if (p.refundMinor <= 0) return '';
  return p.refundedAt ? `${formatMoney(p.refundMinor)} above what was owed refunded to the card` : `${formatMoney(p.refundMinor)} above what was owed to go back to the card`;
}

/** "Invoice INV-0003", or "Draft invoice". */
export function invoiceName(i: Pick<InvoiceSummary, 'kind' | 'number'>): string {
  return i.number ? `${INVOICE_NAMES[i.kind]} ${i.number}` : `Draft ${INVOICE_NAMES[i.kind].toLowerCase()}`;
}

/** As said within a sentence: "invoice INV-0004", "draft quote"; the number keeps its capitals. */
export function invoiceNameInText(i: Pick<InvoiceSummary, 'kind' | 'number'>): string {
  const kind = INVOICE_NAMES[i.kind].toLowerCase();
  return i.number ? `${kind} ${i.number}` : `draft ${kind}`;
}

export type Standing = { label: string; color: 'default' | 'success' | 'warning' | 'error' | 'info'; detail?: string };

/** Where an invoice stands, in words and a colour: paid, part paid, overdue by so many days, awaiting payment. */
export function standingOf(i: Pick<InvoiceSummary, 'kind' | 'status' | 'lapsed'> & { account: Account | null }): Standing {
  if (i.status === 'draft') return { label: 'Draft', color: 'default' };
  if (i.kind === 'quote') return i.lapsed ? { label: 'Lapsed', color: 'default' } : { label: 'Issued', color: 'info' };
  if (i.kind === 'credit-note') return { label: 'Issued', color: 'info' };
  const a = i.account!;
  const late = a.overdueDays > 0 ? `${a.overdueDays} ${a.overdueDays === 1 ? 'day' : 'days'} overdue` : undefined;
  switch (a.state) {
    case 'paid':
      return { label: 'Paid', color: 'success' };
    case 'credited':
      return { label: 'Credited', color: 'default' };
    case 'overpaid':
      return { label: 'Overpaid', color: 'warning', detail: [`${formatMoney(-a.owedMinor)} to refund`, a.refundedMinor > 0 && `${formatMoney(a.refundedMinor)} refunded so far`].filter(Boolean).join(' · ') };
    case 'refunded':
      return { label: 'Refunded', color: 'default', detail: `${formatMoney(a.refundedMinor)} given back` };
    case 'part-paid':
      return { label: late ? 'Part paid, overdue' : 'Part paid', color: late ? 'error' : 'warning', detail: [`${formatMoney(a.owedMinor)} owed`, late].filter(Boolean).join(' · ') };
    case 'awaiting':
      return { label: late ? 'Overdue' : 'Awaiting payment', color: late ? 'error' : 'info', detail: late };
  }
}
