import { durationWords, timeOnSite } from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import { type JobFile, jobVisits } from '../paperwork/job-file.js';
import { shortDateWords } from '../paperwork/pdf/document-words.js';
import type { RateBook } from '../pricing/rate-book.js';
import { syncRepository } from '../sync/entities/sync-schemas.js';
import { labourSource, type LeftOut, leftOutWords, liveInvoices, partSource } from './billed-work.js';
import type { LineDraft } from './invoice-lines.js';
import { quantityText } from './invoice-lines.js';

/** What the job's visits add up to, with what could not be priced said in words for the office to see to. */
export interface JobBill {
  lines: LineDraft[];
  warnings: string[];
  /** What was not taken because a live invoice already holds it, per visit and invoice. */
  leftOut: string[];
}

const timeWords = (iso: string, timeZone: string) => new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit' }).format(new Date(iso));

/** The VAT rate a part or labour falls back to: the organisation's highest active rate (usually standard). */
function fallbackVat(book: RateBook): string | null {
  return [...book.vat.values()].filter((r) => r.active).sort((a, b) => b.basisPoints - a.basisPoints)[0]?.code ?? null;
}

/**
 * Lines for a quote or invoice from the job as recorded: labour for each visit from its arrival and departure at
 * the default labour rate, and the parts used on its visits priced from the price list (the same item on several
 * visits becomes one line). Nothing here is final: the office edits the lines before issuing.
 */
export async function linesFromJob(em: EntityManager, file: JobFile, book: RateBook): Promise<JobBill> {
  const tz = file.organisation.timeZone;
  const org = file.organisation.id;
  const visits = (await jobVisits(em, file))
    .filter((v) => v.status !== 'cancelled')
    .sort((a, b) => String(a.actualStart ?? a.plannedStart ?? '').localeCompare(String(b.actualStart ?? b.plannedStart ?? '')));
  const lines: LineDraft[] = [];
  const warnings: string[] = [];
  const fallback = fallbackVat(book);
  const held = await liveInvoices(em, org, file.job.id);
  const leftOut: LeftOut[] = [];
  const dayOf = new Map<string, string>();

  for (const visit of visits) {
    const start = visit.actualStart;
    const end = visit.actualEnd;
    const day = shortDateWords(start ?? visit.plannedStart ?? visit.createdAt, tz) || 'an unscheduled day';
    dayOf.set(visit.id, day);
    const holder = held.get(labourSource(visit.id));
    if (holder) {
      leftOut.push({ visitId: visit.id, day, labour: true, parts: 0, invoice: holder });
      continue;
    }
    if (!start || !end) {
      warnings.push(`The visit on ${day} has no ${start ? 'departure' : 'arrival'} time recorded, so its labour is not included.`);
      continue;
    }
    const labour = book.defaultLabour;
    if (!labour) {
      warnings.push('There is no labour rate yet, so labour is not included: add one under Price list, then build again or add the labour as a line.');
      break;
    }
    const people = Math.max(1, Array.isArray(visit.technicianIds) ? visit.technicianIds.length : 1);
    try {
      const t = timeOnSite(start, end, people);
      lines.push({
        kind: 'labour',
        description: `Labour on ${day}: ${durationWords(t.minutes)} on site, ${timeWords(start, tz)}–${timeWords(end, tz)}${people > 1 ? `, ${people} people` : ''} (${labour.name})`,
        quantity: t.quantity,
        unit: 'h',
        unitPriceMinor: labour.hourlyMinor,
        vatRateCode: labour.vatRateCode,
        visitId: visit.id,
        labourRateId: labour.id,
      });
    } catch {
      warnings.push(`The visit on ${day} has its departure before its arrival, so its labour is not included.`);
    }
  }

  const used = visits.length
    ? await syncRepository(em, 'materialLine').find({ where: { visitId: In(visits.map((v) => v.id)), organisationId: org, deletedAt: IsNull() }, order: { createdAt: 'ASC', id: 'ASC' } })
    : [];
  const parts = used.filter((p) => {
    const holder = held.get(partSource(p.id));
    if (holder) leftOut.push({ visitId: p.visitId, day: dayOf.get(p.visitId) ?? 'an unscheduled day', labour: false, parts: 1, invoice: holder });
    return !holder;
  });
  const itemIds = [...new Set(parts.map((p) => p.priceItemId).filter((id): id is string => typeof id === 'string'))];
  const items = new Map(
    (itemIds.length ? await syncRepository(em, 'priceItem').find({ where: { id: In(itemIds), organisationId: org }, withDeleted: true }) : []).map((i) => [i.id, i]),
  );
  // The same part used on several visits is one line: quantities add up in thousandths, exactly.
  const grouped = new Map<string, { draft: LineDraft; thousandths: bigint; partUseIds: string[] }>();
  for (const p of parts) {
    const item = typeof p.priceItemId === 'string' ? items.get(p.priceItemId) : undefined;
    const unit = item?.unit ?? p.unit ?? null;
    const key = item ? `item:${item.id}:${unit}` : `typed:${String(p.description).trim().toLowerCase()}:${unit}`;
    const thousandths = BigInt(Math.round(Number(p.quantity) * 1000));
    const seen = grouped.get(key);
    if (seen) {
      seen.thousandths += thousandths;
      seen.partUseIds.push(p.id);
      continue;
    }
    const vat = item?.vatRateCode ?? fallback ?? '';
    grouped.set(key, {
      thousandths,
      partUseIds: [p.id],
      draft: {
        kind: 'material',
        description: String(item?.name ?? p.description),
        quantity: '0',
        unit,
        unitPriceMinor: typeof item?.sellMinor === 'number' ? item.sellMinor : 0,
        vatRateCode: vat,
        visitId: null,
        priceItemId: item?.id ?? null,
      },
    });
    if (!item) warnings.push(`“${String(p.description)}” was typed on site and is not on the price list: give it a price.`);
    else if (typeof item.sellMinor !== 'number') warnings.push(`“${String(item.name)}” has no sell price on the price list: give it a price.`);
  }
  for (const { draft, thousandths, partUseIds } of grouped.values()) lines.push({ ...draft, quantity: quantityText(thousandths), partUseIds });
  if (!visits.length) warnings.push('This job has no visits yet, so there is no labour or parts to add: add fixed-price lines instead.');
  return { lines, warnings, leftOut: leftOutWords(leftOut, tz) };
}
