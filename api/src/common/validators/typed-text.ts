import { normaliseText, isMixedScriptEmail, VISIBLE_TEXT } from '@wiretrail/core';
import { Transform } from 'class-transformer';
import { Matches, ValidateBy } from 'class-validator';

/** Trimmed and in one spelling (NFC), so that what looks the same is stored the same. */
export const NormalisedText = () => Transform(({ value }) => (typeof value === 'string' ? normaliseText(value).trim() : value));

/** An e-mail address in one spelling, lower case. */
export const NormalisedEmail = () => Transform(({ value }) => (typeof value === 'string' ? normaliseText(value).trim().toLowerCase() : value));

/** Refuses text that shows nothing: spaces of every width and zero-width characters only. */
export const VisibleText = () => Matches(VISIBLE_TEXT, { message: '$property must not be empty' });

/** Refuses an address that mixes scripts, such as a Cyrillic "а" in a Latin address that looks like someone else's. */
export const SingleScriptEmail = () =>
  ValidateBy({
    name: 'singleScriptEmail',
    validator: {
      validate: (value: unknown) => typeof value !== 'string' || !isMixedScriptEmail(value),
      defaultMessage: () => '$property mixes letters of different alphabets; type the address in one',
    },
  });
