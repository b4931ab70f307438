/**
 * Records voided on site: made by mistake (a typo'd cable, a photo of the wrong board), kept for the office with the
 * reason, and left out of every count, list to print and document. The phone and the server ask the same questions.
 */
import { isBlankText } from '../text/typed-text.js';
import { FINISHED_VISIT_STATUS, type SyncEntityName } from './entities.js';

/** The records a technician may void, each of which carries `voidedAt` and `voidReason` in the registry. */
export const VOIDABLE_ENTITIES = ['cableRun', 'pointChange', 'photo', 'note', 'testResult'] as const satisfies readonly SyncEntityName[];
export type VoidableEntity = (typeof VOIDABLE_ENTITIES)[number];
export const VOID_FIELDS = ['voidedAt', 'voidReason'] as const;

export function isVoidable(entity: SyncEntityName): entity is VoidableEntity {
  return (VOIDABLE_ENTITIES as readonly string[]).includes(entity);
}

/** Whether a row, as either side holds it, has been voided. */
export function isVoided(row: { readonly voidedAt?: unknown }): boolean {
  return typeof row.voidedAt === 'string' && row.voidedAt !== '';
}

/** The rows that count: everything not voided. */
export function unvoided<T extends { readonly voidedAt?: unknown }>(rows: readonly T[]): T[] {
  return rows.filter((r) => !isVoided(r));
}

/** Whether a change touches the void of a record (voiding it, or putting it back). */
export function touchesVoid(set: Readonly<Record<string, unknown>>): boolean {
  return VOID_FIELDS.some((f) => Object.prototype.hasOwnProperty.call(set, f));
}

/** The longest reason the registry keeps. */
export const VOID_REASON_MAX = 500;

/** Why a typed reason will not do, or null: a void always says why, so the office can tell a typo from a cover-up. */
export function voidReasonProblem(reason: string): string | null {
  if (isBlankText(reason)) return 'Say why this record is void, like “typed the wrong label”.';
  if (reason.length > VOID_REASON_MAX) return `The reason must be at most ${VOID_REASON_MAX} characters.`;
  return null;
}

/** What a void change must say, as the engine sees it: the values it sets, over the row's stored ones. */
export interface VoidChange {
  readonly entity: SyncEntityName;
  /** The fields the change sets. */
  readonly set: Readonly<Record<string, unknown>>;
  /** The row as stored, or null for a new one. */
  readonly row: { readonly voidedAt?: unknown; readonly voidReason?: unknown } | null;
  /** The status of the visit the record was made on (a cable: the visit it was last recorded on), if known. */
  readonly visitStatus: string | null | undefined;
  readonly byTechnician: boolean;
  /** The number of an issued document that prints the record, if one does. */
  readonly heldBy?: string | null;
}

/**
 * Why a void (or putting one back) is refused, or null. A technician voids only before the visit is finished;
 * no one voids what an issued certificate or report prints, since an issued document never changes.
 */
export function voidRefusal(change: VoidChange): string | null {
  if (!touchesVoid(change.set)) return null;
  const what = ENTITY_WORDS[change.entity] ?? 'record';
  if (!isVoidable(change.entity)) return `A ${what} cannot be voided.`;
  if (change.heldBy !== undefined && change.heldBy !== null) {
    return `This ${what} is printed on issued document ${change.heldBy}, which never changes: the office can issue a revision that leaves it out.`;
  }
  if (change.byTechnician && change.visitStatus === FINISHED_VISIT_STATUS) {
    return `The visit this ${what} was recorded on is finished and signed, so it can no longer be voided on site: ask the office to put it right.`;
  }
  const voidedAt = Object.prototype.hasOwnProperty.call(change.set, 'voidedAt') ? change.set.voidedAt : change.row?.voidedAt;
  const reason = Object.prototype.hasOwnProperty.call(change.set, 'voidReason') ? change.set.voidReason : change.row?.voidReason;
  const voided = typeof voidedAt === 'string' && voidedAt !== '';
  if (voided && (typeof reason !== 'string' || voidReasonProblem(reason) !== null)) return `A void needs its reason: say why this ${what} is void.`;
  if (!voided && typeof reason === 'string' && reason !== '') return `A ${what} that is not void has no reason to be void: clear voidReason with voidedAt.`;
  return null;
}

const ENTITY_WORDS: Partial<Record<SyncEntityName, string>> = {
  cableRun: 'cable run',
  pointChange: 'point change',
  photo: 'photo',
  note: 'note',
  testResult: 'test result',
};

/** "Void: typed the wrong label", as every list that shows a voided record says it. */
export function voidWords(row: { readonly voidReason?: unknown }): string {
  const reason = typeof row.voidReason === 'string' ? row.voidReason.trim() : '';
  return reason ? `Void: ${reason}` : 'Void';
}
