import { useEffect, useRef, useState } from 'react';

/**
 * What a technician has typed into a phone form and not yet saved, kept on this phone as it is typed, so that a tab
 * switch, another section, a reload or a closed tab loses nothing. One draft per form and record (or per visit for a
 * record not made yet); saving or discarding it forgets it.
 */
const PREFIX = 'wiretrail.draft.';

export function readDraft(key: string): Record<string, unknown> | null {
  try {
    const raw = localStorage.getItem(PREFIX + key);
    const parsed: unknown = raw ? JSON.parse(raw) : null;
    return typeof parsed === 'object' && parsed !== null && !Array.isArray(parsed) ? (parsed as Record<string, unknown>) : null;
  } catch {
    // Storage may be unavailable (private mode) or hold something unreadable: start from the record as recorded.
    return null;
  }
}

export function writeDraft(key: string, values: unknown): void {
  try {
    localStorage.setItem(PREFIX + key, JSON.stringify(values));
  } catch {
    // A full or unavailable storage loses only the draft, never the form as it is on screen.
  }
}

export function clearDraft(key: string): void {
  try {
    localStorage.removeItem(PREFIX + key);
  } catch {
    // Nothing to clear.
  }
}

const isRecord = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);

/**
 * The form's starting values with a draft laid over them field by field, only where the draft holds the same kind
 * of value: a draft from an older version of the form, or one edited by hand, cannot put a number where text goes.
 */
export function overlayDraft<T>(base: T, draft: unknown): T {
  if (!isRecord(base) || !isRecord(draft)) return base;
  const out: Record<string, unknown> = { ...base };
  for (const [name, was] of Object.entries(base)) {
    if (!(name in draft)) continue;
    const typed = draft[name];
    if (Array.isArray(was)) {
      if (Array.isArray(typed)) out[name] = typed;
    } else if (isRecord(was)) {
      out[name] = overlayDraft(was, typed);
    } else if (was === null || was === undefined) {
      // Nothing recorded says what kind it is; the form's own checks judge it when it is saved.
      out[name] = typed;
    } else if (typeof typed === typeof was || (typed === null && typeof was === 'string')) {
      out[name] = typed;
    }
  }
  return out as T;
}

/** The starting values for a form: the record as recorded, or what was typed into it and not saved. */
export function startingValues<T>(key: string | null, recorded: T): T {
  const draft = key ? readDraft(key) : null;
  return draft ? overlayDraft(recorded, draft) : recorded;
}

export interface FormDraft {
  /** The form opened with a draft that had not been saved. */
  restored: boolean;
  /** Forget the draft once what it held is saved; `now` (what the form shows next) becomes the new starting point. */
  settle: (now?: unknown) => void;
  /** Throw the draft away and go back to the record as recorded. */
  discard: () => void;
}

/**
 * Keeps a form's values as a draft whenever they change. `current` is everything the form holds (a react-hook-form's
 * watched values, and any state beside them such as a drawn wiremap); `recorded` is what it shows with no draft:
 * values equal to it keep no draft at all, so an untouched form never reports one restored.
 */
export function useFormDraft<T>(key: string | null, current: T, recorded: T, onDiscard: (recorded: T) => void): FormDraft {
  const [restored, setRestored] = useState(() => !!key && readDraft(key) !== null);
  const baseline = useRef<string>(JSON.stringify(recorded));
  const text = JSON.stringify(current);

  useEffect(() => {
    if (!key) return;
    if (text === baseline.current) clearDraft(key);
    else writeDraft(key, current);
    // `text` is `current` in words: a new object with the same values writes nothing new.
  }, [key, text]);

  return {
    restored,
    settle: (now) => {
      baseline.current = JSON.stringify(now === undefined ? current : now);
      if (key) clearDraft(key);
      setRestored(false);
    },
    discard: () => {
      baseline.current = JSON.stringify(recorded);
      if (key) clearDraft(key);
      onDiscard(recorded);
      setRestored(false);
    },
  };
}
