/**
 * What a technician has typed into the sign-off and not yet finished, kept on this phone per visit, so that leaving
 * the tab, another section or a reload loses nothing. The signature is never kept: signing is done at the end.
 */
import type { SignOffValues } from './sign-off-form';

export type SignOffDraft = Partial<Omit<SignOffValues, 'signatureSvg'>>;

const keyOf = (visitId: string) => `wiretrail.sign-off-draft.${visitId}`;

export function readSignOffDraft(visitId: string): SignOffDraft | null {
  try {
    const raw = localStorage.getItem(keyOf(visitId));
    const parsed: unknown = raw ? JSON.parse(raw) : null;
    if (typeof parsed !== 'object' || parsed === null) return null;
    const draft = parsed as Record<string, unknown>;
    const textOf = (k: string) => (typeof draft[k] === 'string' ? (draft[k] as string) : undefined);
    const entries = Array.isArray(draft.departureEntries)
      ? draft.departureEntries.map((d: unknown) => {
          const e = typeof d === 'object' && d !== null ? (d as Record<string, unknown>) : {};
          const part = (k: string) => (typeof e[k] === 'string' ? (e[k] as string) : '');
          return { regulation: part('regulation'), instead: part('instead'), noLessSafe: part('noLessSafe') };
        })
      : undefined;
    return {
      arrivedAt: textOf('arrivedAt'),
      leftAt: textOf('leftAt'),
      workDescription: textOf('workDescription'),
      observations: textOf('observations'),
      signedByName: textOf('signedByName'),
      departureEntries: entries,
    };
  } catch {
    // Storage may be unavailable (private mode) or hold something unreadable: start from the visit as recorded.
    return null;
  }
}

export function writeSignOffDraft(visitId: string, values: Partial<SignOffValues>): void {
  const { signatureSvg: _signature, ...kept } = values;
  try {
    localStorage.setItem(keyOf(visitId), JSON.stringify(kept));
  } catch {
    // A full or unavailable storage only loses the draft, never the form as it is on screen.
  }
}

export function clearSignOffDraft(visitId: string): void {
  try {
    localStorage.removeItem(keyOf(visitId));
  } catch {
    // Nothing to clear.
  }
}
