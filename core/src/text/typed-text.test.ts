import { describe, expect, it } from 'vitest';
import { isBlankText, isMixedScriptEmail, normaliseText, VISIBLE_TEXT } from './typed-text.js';

describe('typed text', () => {
  it('calls text blank when it shows nothing: spaces of every width, zero-width and format characters', () => {
    for (const blank of ['', ' ', '\u00a0\u2003\u200b', '\u200b\u200c\u200d\ufeff', '\u3000\u2800', '\t\n']) {
      expect(isBlankText(blank)).toBe(true);
      expect(VISIBLE_TEXT.test(blank)).toBe(false);
    }
    for (const name of ['Okonjo', '\u00a0J\u200b', '·']) {
      expect(isBlankText(name)).toBe(false);
      expect(VISIBLE_TEXT.test(name)).toBe(true);
    }
  });

  it('keeps one spelling of what looks the same (Unicode NFC)', () => {
    expect(normaliseText('Rene\u0301e')).toBe('Ren\u00e9e');
    expect(normaliseText('Ren\u00e9e')).toBe('Ren\u00e9e');
  });

  it('refuses an e-mail address that mixes scripts, as a look-alike of a real one', () => {
    expect(isMixedScriptEmail('admin@larkfield.example')).toBe(false);
    expect(isMixedScriptEmail('\u0430dmin@larkfield.example')).toBe(true); // Cyrillic а
    expect(isMixedScriptEmail('admin@l\u0430rkfield.example')).toBe(true);
    expect(isMixedScriptEmail('\u043f\u0440\u0438\u043c\u0435\u0440@\u043f\u0440\u0438\u043c\u0435\u0440.\u0440\u0444')).toBe(false);
    expect(isMixedScriptEmail('\u03b1lpha@example.com')).toBe(true); // Greek α
  });
});
