import type { DocumentCoverage, DocumentKind } from './api/get-job-documents';

export const DOCUMENT_KINDS: Array<{ kind: DocumentKind; name: string; issue: string; about: string }> = [
  {
    kind: 'minor-works',
    name: 'Minor works certificate',
    issue: 'Issue minor works certificate',
    about: 'For the circuits altered and tested on the job’s signed visits, with every reading judged again.',
  },
  {
    kind: 'installation-certificate',
    name: 'Electrical installation certificate',
    issue: 'Issue installation certificate',
    about: 'For a new circuit or a replaced board: every circuit of the board scheduled with its readings judged again, the inspections, the supply and the origin.',
  },
  {
    kind: 'cabling-report',
    name: 'Cabling report',
    issue: 'Issue cabling report',
    about:
      'The cables recorded or tested on this job’s visits, or the site’s whole schedule. A cabling certification report when every link has passing performance results to a named limit set; otherwise the wiremap and length record, which says it certifies no category or class.',
  },
  {
    kind: 'photo-record',
    name: 'Photo record',
    issue: 'Issue photo record',
    about: 'The job’s photos with their captions, areas and times.',
  },
  {
    kind: 'hidden-routes',
    name: 'Hidden routes record',
    issue: 'Issue hidden routes record',
    about: 'Every marked photo of the site, large, with the cable routes, their cables or circuits, the measured distances and depths drawn over it.',
  },
];

export const kindName = (kind: DocumentKind) => DOCUMENT_KINDS.find((k) => k.kind === kind)?.name ?? kind;

/** An issued document's name: a cabling report is named by what it turned out to be, as its title says. */
export function documentName(d: { kind: DocumentKind; title?: string | null }): string {
  if (d.kind === 'cabling-report') return d.title?.startsWith('Cabling certification report') ? 'Cabling certification report' : 'Wiremap and length record';
  return kindName(d.kind);
}

const stamp = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "2 Dec 2026, 14:05". */
export function issuedTime(iso: string | null): string {
  if (!iso) return '';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '' : stamp.format(d);
}

/** What a cabling report covers, as the office chooses it at issue. */
export const COVERAGES: Array<{ value: DocumentCoverage; label: string; about: string }> = [
  { value: 'job', label: 'This job’s cables', about: 'The cables recorded or tested on this job’s visits.' },
  { value: 'site', label: 'The site’s whole cable schedule', about: 'Every cable recorded at the site, by any job, for a customer who asked for the lot.' },
];

/** Readings and ratings by the names and units the trade writes them with. */
const FIELD_WORDS: Record<string, string> = {
  deviceRatingA: 'Device rating (A)', rcdRatingMa: 'RCD rating (mA)', rcdType: 'RCD type', zeOhm: 'Ze (Ω)', pfcKa: 'PFC (kA)', zsOhm: 'Zs (Ω)',
  r1r2Ohm: 'R1+R2 (Ω)', r1Ohm: 'r1 (Ω)', rnOhm: 'rn (Ω)', r2Ohm: 'r2 (Ω)', lengthM: 'Length (m)', nvp: 'NVP',
};

/** `earthing` → "Earthing", `rcdRatingMa` → "RCD rating (mA)"; `*` is the record itself (a deletion). */
export function heldFieldName(field: string): string {
  if (field === '*') return 'The record itself';
  if (FIELD_WORDS[field]) return FIELD_WORDS[field];
  const words = field.replace(/([a-z])([A-Z0-9])/g, '$1 $2').replace(/Csa Mm2/, 'size (mm²)').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** A value as issued or as changed since, in words. */
export function heldValue(value: unknown): string {
  if (value === null || value === undefined || value === '') return '(empty)';
  if (value === 'deleted') return 'Deleted';
  if (value === 'kept') return 'Recorded';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}
