/**
 * Text as people type it and as a screen shows it. One visible string can be spelt in several ways (a precomposed
 * "é" or "e" and a combining accent; a space, a no-break space or a zero-width one); the server keeps one spelling,
 * and refuses what only looks like a name or an address.
 */

/** Characters that show nothing: spaces of every width, zero-width and format characters, and the blank fillers. */
const INVISIBLE = /[\p{White_Space}\p{Cf}\u115F\u1160\u2800\u3164\uFFA0]/u;
const ALL_INVISIBLE = new RegExp(`^${INVISIBLE.source}*$`, 'u');

/** One spelling for what looks the same (Unicode NFC), so that a search or a comparison finds it either way it was typed. */
export function normaliseText(text: string): string {
  return text.normalize('NFC');
}

/** Whether text shows nothing at all on screen (empty, or spaces and zero-width characters only). */
export function isBlankText(text: string): boolean {
  return ALL_INVISIBLE.test(text);
}

/** A visible character somewhere in the text; for validators that take a pattern. */
export const VISIBLE_TEXT = new RegExp(`[^${INVISIBLE.source.slice(1, -1)}]`, 'u');

const SCRIPTS = ['Latin', 'Cyrillic', 'Greek', 'Armenian', 'Georgian', 'Hebrew', 'Arabic', 'Devanagari', 'Thai', 'Han', 'Hiragana', 'Katakana', 'Hangul'] as const;
const SCRIPT_PATTERNS = SCRIPTS.map((s) => [s, new RegExp(`\\p{Script=${s}}`, 'u')] as const);

function scriptOf(letter: string): string {
  for (const [name, pattern] of SCRIPT_PATTERNS) if (pattern.test(letter)) return name;
  return 'other';
}

/**
 * Whether an e-mail address mixes letters of different scripts: "аdmin@…" with a Cyrillic "а" looks like the
 * real admin's address and is a different one. An address wholly in one script (Latin, or Cyrillic) is fine.
 */
export function isMixedScriptEmail(address: string): boolean {
  const scripts = new Set<string>();
  for (const ch of normaliseText(address)) if (/\p{L}/u.test(ch)) scripts.add(scriptOf(ch));
  // Japanese writes one word in Han, Hiragana and Katakana together.
  const japanese = ['Han', 'Hiragana', 'Katakana'];
  if ([...scripts].every((s) => japanese.includes(s))) return false;
  return scripts.size > 1;
}
