import { BadRequestException } from '@nestjs/common';
import { formatRate } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import { LabourRate } from './entities/labour-rate.entity.js';
import { VatRate } from './entities/vat-rate.entity.js';
import { inTurn } from '../common/in-turn.js';

/** The organisation's VAT and labour rates as they stand, read inside the caller's transaction. */
export interface RateBook {
  vat: Map<string, VatRate>;
  labour: LabourRate[];
  /** The rate a visit's time on site is priced at: the default one, else the first active one. */
  defaultLabour: LabourRate | null;
}

export async function loadRateBook(em: EntityManager, organisationId: string): Promise<RateBook> {
  const [vat, labour] = await inTurn(
    () => em.find(VatRate, { where: { organisationId }, order: { basisPoints: 'DESC', code: 'ASC' } }),
    () => em.find(LabourRate, { where: { organisationId }, order: { name: 'ASC', id: 'ASC' } }),
  );
  const active = labour.filter((l) => l.active);
  return { vat: new Map(vat.map((r) => [r.code, r])), labour, defaultLabour: active.find((l) => l.isDefault) ?? active[0] ?? null };
}

/** A VAT rate code the organisation offers for new lines, or a refusal that names the field and lists the choices. */
export function activeVatRate(book: RateBook, code: string, field = 'vatRateCode'): VatRate {
  const rate = book.vat.get(code);
  if (rate?.active) return rate;
  const offered = [...book.vat.values()].filter((r) => r.active).map((r) => `${r.code} (${formatRate(r.basisPoints)})`);
  throw new BadRequestException(`${field} must be one of this organisation's VAT rates: ${offered.join(', ') || 'none set up yet'}; got ${JSON.stringify(code)}.`);
}
