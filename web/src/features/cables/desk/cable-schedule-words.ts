import { VERDICT_WORDS } from '@/components/verdicts/verdict-words';
import type { CableRun } from '../api/get-cable-runs';
import { faultWords } from '../cable-words';

/** One end of a run: its area, where on it, and what it ends in. */
export function endWords(area: string | null, description: string | null, termination: string | null): string {
  return [area, description, termination].filter(Boolean).join(' · ') || '—';
}

/** What the wiremap says, in one line: its verdict and every fault named, or why there is none. */
export function wiremapWords(run: Pick<CableRun, 'medium' | 'assessment'>): string {
  const w = run.assessment.wiremap;
  if (w) return w.faults.length ? w.faults.map(faultWords).join('; ') : VERDICT_WORDS[w.verdict];
  if (run.assessment.problems.length) return `Cannot read it: ${run.assessment.problems.join('; ')}`;
  if (!['Cat5e', 'Cat6', 'Cat6A'].includes(run.medium ?? '')) return 'No wiremap for this medium';
  return 'No wiremap recorded';
}

/** When a run was last tested, as the schedule shows it: "2 Dec 2026" and "14:10". */
export const testedDay = (iso: string) => new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
export const testedTime = (iso: string) => new Date(iso).toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' });
