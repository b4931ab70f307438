import type { LockRule } from '../sync/record-locks.js';

/** An issued document's own fields that still change: how its e-mail is getting on. */
const FIELDS_AFTER_ISSUE = new Set(['emailState', 'emailedTo', 'emailedAt', 'emailError']);

/**
 * A signed certificate never changes after issue, nor do the records behind it: an issued document locks itself
 * (but for its e-mail's progress) and every record of its job's visits, for everyone. A change attempted anyway
 * reaches the office as a `locked-by-document` conflict.
 */
export const DOCUMENT_LOCK: LockRule = {
  reason: 'locked-by-document',
  locksRow: (document, fields) => document.issuedAt != null && fields.some((f) => !FIELDS_AFTER_ISSUE.has(f)),
  locksJob: (document) => document.issuedAt != null,
};
