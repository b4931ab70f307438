import type { DocumentKind } from './api/get-job-documents';

export const DOCUMENT_KINDS: Array<{ kind: DocumentKind; name: string; issue: string; about: string }> = [
  {
    kind: 'minor-works',
    name: 'Minor works certificate',
    issue: 'Issue minor works certificate',
    about: 'For the circuits altered and tested on the job’s signed visits, with every reading judged again.',
  },
  {
    kind: 'cabling-report',
    name: 'Cabling test report',
    issue: 'Issue cabling report',
    about: 'The site’s cable schedule: each cable’s ends, length and wiremap.',
  },
  {
    kind: 'photo-record',
    name: 'Photo record',
    issue: 'Issue photo record',
    about: 'The job’s photos with their captions, areas and times.',
  },
];

export const kindName = (kind: DocumentKind) => DOCUMENT_KINDS.find((k) => k.kind === kind)?.name ?? kind;

const stamp = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "2 Dec 2026, 14:05". */
export function issuedTime(iso: string | null): string {
  if (!iso) return '';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '' : stamp.format(d);
}
