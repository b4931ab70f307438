import type { Verdict } from '@wiretrail/core';

/** The one set of words for a verdict, on the phone, at the desk and in exported files. */
export const VERDICT_WORDS: Record<Verdict, string> = { pass: 'Pass', fail: 'Fail', check: 'Check' };

export const VERDICT_COLOURS = { pass: 'success', fail: 'error', check: 'warning' } as const satisfies Record<Verdict, string>;


const ANY_WORDS: Readonly<Record<string, string>> = VERDICT_WORDS;

/** Words for a verdict that arrived as plain text (a synced row's summary); one this app does not know is not shown. */
export const verdictWords = (verdict: string | null | undefined): string | null => (verdict ? (ANY_WORDS[verdict] ?? null) : null);
