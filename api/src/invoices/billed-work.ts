import { ConflictException } from '@nestjs/common';
import { type EntityManager, In } from 'typeorm';
import { shortDateWords } from '../paperwork/pdf/document-words.js';
import { syncRepository } from '../sync/entities/sync-schemas.js';
import { Invoice } from './entities/invoice.entity.js';
import { InvoiceLine } from './entities/invoice-line.entity.js';

/**
 * A visit's work is invoiced once. Each line built from the job names where it came from: a labour line its visit,
 * a part line the part uses (materialLine rows) it adds up. A source is held by a live invoice: a draft, or an
 * issued one not fully credited. A credit note taking back the whole invoice gives its sources back.
 */
export type SourceKey = `labour:${string}` | `part:${string}`;

export const labourSource = (visitId: string): SourceKey => `labour:${visitId}`;
export const partSource = (partUseId: string): SourceKey => `part:${partUseId}`;

export function sourcesOf(line: Pick<InvoiceLine, 'kind' | 'visitId' | 'partUseIds'>): SourceKey[] {
  return [...(line.kind === 'labour' && line.visitId ? [labourSource(line.visitId)] : []), ...(line.partUseIds ?? []).map(partSource)];
}

/** How an invoice is named to the office: its number once issued, or the draft and the day it was started. */
export function invoiceName(invoice: Invoice, timeZone: string): string {
  return invoice.number ?? `the draft invoice started ${shortDateWords(invoice.createdAt, timeZone)}`;
}

/** The job's live invoices, with what each holds; `issuedOnly` leaves drafts out (issuing judges against issued ones). */
export async function liveInvoices(em: EntityManager, organisationId: string, jobId: string, opts: { issuedOnly?: boolean; except?: string } = {}): Promise<Map<SourceKey, Invoice>> {
  const invoices = (await em.find(Invoice, { where: { organisationId, jobId, kind: 'invoice', ...(opts.issuedOnly ? { status: 'issued' } : {}) } })).filter((i) => i.id !== opts.except);
  const issued = invoices.filter((i) => i.status === 'issued').map((i) => i.id);
  const credits = issued.length ? await em.find(Invoice, { where: { organisationId, creditsInvoiceId: In(issued), kind: 'credit-note', status: 'issued' } }) : [];
  const credited = new Map<string, number>();
  for (const c of credits) credited.set(c.creditsInvoiceId!, (credited.get(c.creditsInvoiceId!) ?? 0) - c.grossMinor);
  // Fully credited: the customer owes nothing for these lines any more, so the work may be invoiced again.
  const live = invoices.filter((i) => i.status === 'draft' || (credited.get(i.id) ?? 0) < i.grossMinor);
  const held = new Map<SourceKey, Invoice>();
  if (!live.length) return held;
  const byId = new Map(live.map((i) => [i.id, i]));
  // Oldest first, so that a source on two live invoices is named by the one that took it first.
  live.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || a.id.localeCompare(b.id));
  const lines = await em.find(InvoiceLine, { where: { invoiceId: In(live.map((i) => i.id)) } });
  const order = new Map(live.map((i, n) => [i.id, n]));
  lines.sort((a, b) => order.get(a.invoiceId)! - order.get(b.invoiceId)!);
  for (const l of lines) for (const key of sourcesOf(l)) if (!held.has(key)) held.set(key, byId.get(l.invoiceId)!);
  return held;
}

/** What was left out of a build, per visit and per invoice holding it: "Visit 3 Dec 2026: labour and 2 parts already on INV-0002." */
export interface LeftOut {
  visitId: string;
  day: string;
  labour: boolean;
  parts: number;
  invoice: Invoice;
}

export function leftOutWords(items: LeftOut[], timeZone: string): string[] {
  const grouped = new Map<string, LeftOut>();
  for (const item of items) {
    const key = `${item.visitId}:${item.invoice.id}`;
    const seen = grouped.get(key);
    if (seen) {
      seen.labour ||= item.labour;
      seen.parts += item.parts;
    } else grouped.set(key, { ...item });
  }
  return [...grouped.values()].map((g) => {
    const what = [g.labour ? 'labour' : '', g.parts ? `${g.parts} ${g.parts === 1 ? 'part' : 'parts'}` : ''].filter(Boolean).join(' and ');
    return `Visit ${g.day}: ${what} already on ${invoiceName(g.invoice, timeZone)}, so not taken again.`;
  });
}

/**
 * Refuses to issue an invoice carrying a visit's labour or a part use already on another issued, live invoice
 * (409 naming it), so that two drafts built before either was issued cannot both ask for the same money.
 */
export async function refuseBilledTwice(em: EntityManager, invoice: Invoice, lines: InvoiceLine[], timeZone: string): Promise<void> {
  if (invoice.kind !== 'invoice') return;
  const mine = lines.flatMap((l) => sourcesOf(l).map((key) => ({ key, line: l })));
  if (!mine.length) return;
  const held = await liveInvoices(em, invoice.organisationId, invoice.jobId, { issuedOnly: true, except: invoice.id });
  const clashes = mine.filter(({ key }) => held.has(key));
  if (!clashes.length) return;
  const visitIds = [...new Set(clashes.map(({ line }) => line.visitId).filter((v): v is string => !!v))];
  const partIds = clashes.filter(({ key }) => key.startsWith('part:')).map(({ key }) => key.slice(5));
  const parts = partIds.length ? await syncRepository(em, 'materialLine').find({ where: { id: In(partIds) }, select: { id: true, visitId: true } }) : [];
  const visitOfPart = new Map(parts.map((p) => [p.id, p.visitId]));
  const allVisitIds = [...new Set([...visitIds, ...parts.map((p) => p.visitId)])];
  const visits = allVisitIds.length ? await syncRepository(em, 'visit').find({ where: { id: In(allVisitIds) }, withDeleted: true }) : [];
  const dayOf = new Map(visits.map((v) => [v.id, shortDateWords(v.actualStart ?? v.plannedStart ?? v.createdAt, timeZone) || 'unscheduled']));
  const words = leftOutWords(
    clashes.map(({ key, line }) => {
      const visitId = key.startsWith('labour:') ? key.slice(7) : (visitOfPart.get(key.slice(5)) ?? line.visitId ?? '');
      return { visitId, day: dayOf.get(visitId) ?? 'unknown', labour: key.startsWith('labour:'), parts: key.startsWith('part:') ? 1 : 0, invoice: held.get(key)! };
    }),
    timeZone,
  ).map((w) => w.replace(', so not taken again.', '.'));
  const others = [...new Set(clashes.map(({ key }) => held.get(key)!.number))].join(', ');
  throw new ConflictException(
    `This invoice asks again for work already invoiced on ${others}: ${words.join(' ')} Remove those lines, or credit ${others} in full first.`,
  );
}
