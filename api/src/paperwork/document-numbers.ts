import type { EntityManager } from 'typeorm';
import { DocumentCounter } from './entities/document-counter.entity.js';

/**
 * Takes the next number of a kind of document in an organisation (certificates, reports, quotes, invoices,
 * credit notes each count on their own). Call it inside the issuing transaction, after every refusal: a refused
 * or failed issue rolls the counter back with everything else, so numbers have neither gaps nor repeats.
 */
export async function takeNextNumber(em: EntityManager, organisationId: string, kind: string, prefix: string): Promise<string> {
  const where = { organisationId, kind };
  const moved = await em.update(DocumentCounter, where, { value: () => 'value + 1' });
  if (!moved.affected) await em.insert(DocumentCounter, { ...where, value: 1 });
  const { value } = await em.findOneByOrFail(DocumentCounter, where);
  return `${prefix}-${String(value).padStart(4, '0')}`;
}
