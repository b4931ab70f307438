/**
 * What a technician has typed into the sign-off and not yet finished, kept on this phone per visit, so that leaving
 * the tab, another section or a reload loses nothing. A signature drawn and not yet finished with is kept too, as its
 * strokes, so it can be drawn again in the box as it was; it means nothing until the visit is finished.
 */
import type { PointGroup } from 'signature_pad';
import type { SignOffValues } from './sign-off-form';

export type SignOffDraft = Partial<SignOffValues> & { signatureStrokes?: PointGroup[] };

const isStroke = (g: unknown): g is PointGroup => {
  const s = g as Partial<PointGroup> | null;
  return !!s && typeof s === 'object' && Array.isArray(s.points) && s.points.every((p) => typeof p?.x === 'number' && typeof p?.y === 'number');
};

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
      signedByPosition: textOf('signedByPosition'),
      existingInstallationComments: textOf('existingInstallationComments'),
      permittedExceptions: textOf('permittedExceptions'),
      riskAssessmentRef: textOf('riskAssessmentRef'),
      departureEntries: entries,
      signatureSvg: textOf('signatureSvg') ?? null,
      signatureStrokes: Array.isArray(draft.signatureStrokes) && draft.signatureStrokes.every(isStroke) ? (draft.signatureStrokes as PointGroup[]) : undefined,
    };
  } catch {
    // Storage may be unavailable (private mode) or hold something unreadable: start from the visit as recorded.
    return null;
  }
}

export function writeSignOffDraft(visitId: string, values: SignOffDraft): void {
  try {
    localStorage.setItem(keyOf(visitId), JSON.stringify(values));
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
