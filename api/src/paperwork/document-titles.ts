import type { DOCUMENT_KINDS } from '@wiretrail/core';

export const MINOR_WORKS_TITLE = 'Minor works certificate';
// Wiremap and length are what a cable's record holds; only passing performance results to a named limit set on
// every link make the same kind of document a certification, and then it carries that title.
export const CABLING_REPORT_TITLE = 'Wiremap and length record';
export const CABLING_CERTIFICATION_TITLE = 'Cabling certification report';
export const PHOTO_RECORD_TITLE = 'Photo record';
export const INSTALLATION_CERTIFICATE_TITLE = 'Electrical installation certificate';
export const HIDDEN_ROUTES_TITLE = 'Hidden routes record';

/** What each kind of document is called: on its PDF, in the e-mail it goes with, and where an invoice lists it. */
export const DOCUMENT_TITLES: Record<(typeof DOCUMENT_KINDS)[number], string> = {
  'minor-works': MINOR_WORKS_TITLE,
  'cabling-report': CABLING_REPORT_TITLE,
  'photo-record': PHOTO_RECORD_TITLE,
  'installation-certificate': INSTALLATION_CERTIFICATE_TITLE,
  'hidden-routes': HIDDEN_ROUTES_TITLE,
};

/**
 * The title of a stored document row by its kind, and for a cabling report by its own title, which says whether it
 * certifies its links; a kind this version does not know reads as plain "Document".
 */
export function documentTitle(kind: unknown, rowTitle?: string | null): string {
  if (kind === 'cabling-report' && rowTitle?.startsWith(CABLING_CERTIFICATION_TITLE)) return CABLING_CERTIFICATION_TITLE;
  return Object.entries(DOCUMENT_TITLES).find(([k]) => k === kind)?.[1] ?? 'Document';
}
