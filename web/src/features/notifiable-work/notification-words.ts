import { NATION_WORDS, type NotifiableJob, NOTIFICATION_STATE_WORDS } from '@wiretrail/core';
import type { NotifiableFilter } from './api/get-notifiable-work';

export const FILTER_WORDS: Record<NotifiableFilter, string> = {
  all: 'All',
  overdue: 'Overdue',
  'to-notify': NOTIFICATION_STATE_WORDS['to-notify'],
  notified: NOTIFICATION_STATE_WORDS.notified,
  'certificate-received': 'Certificate received',
};

/** A calendar day (YYYY-MM-DD) as the office reads it: 20 Dec 2026. */
export function dayWords(day: string | null): string {
  if (!day) return '—';
  const [y, m, d] = day.split('-').map(Number);
  return new Date(Date.UTC(y!, m! - 1, d!)).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
}

/** What the job did that counts, in words: "1 new circuit", "consumer unit replaced". */
export function workWords(j: Pick<NotifiableJob, 'newCircuits' | 'boardReplaced'>): string {
  const parts = [j.newCircuits ? `${j.newCircuits} new circuit${j.newCircuits === 1 ? '' : 's'}` : null, j.boardReplaced ? 'consumer unit replaced' : null].filter(Boolean);
  return parts.join(', ') || 'nothing notifiable recorded';
}

/** Whether and why, in one line: the rules that apply, or that the nation is not covered. */
export function verdictWords(j: NotifiableJob): string {
  if (!j.verdict.covered) return `Not covered in ${NATION_WORDS[j.verdict.nation]}: check locally`;
  if (!j.verdict.notifiable) return 'Not notifiable';
  return j.verdict.reasons.map((r) => r.words.replace(/\.$/, '')).join('; ');
}

/** When it falls due, or why there is no date yet. */
export function dueWords(j: NotifiableJob): string {
  if (j.verdict.dueBy) return dayWords(j.verdict.dueBy);
  if (j.verdict.notifiable && !j.completedOn) return 'When the work is finished';
  return '—';
}
