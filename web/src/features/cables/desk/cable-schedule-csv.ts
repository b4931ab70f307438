import Papa from 'papaparse';
import { VERDICT_WORDS } from '@/components/verdicts/verdict-words';
import type { CableRun } from '../api/get-cable-runs';
import { cableStatusWords } from '../cable-words';
import { wiremapWords } from './cable-schedule-words';

/** The columns of the exported schedule, in order. */
export const CSV_COLUMNS = [
  'Label', 'From area', 'From position', 'From termination', 'To area', 'To position', 'To termination', 'Medium', 'Scheme',
  'Length (m)', 'Link', 'Wiremap', 'Length check', 'Verdict', 'Status', 'Last tested',
] as const;

/**
 * A cell a spreadsheet would take as a formula: one starting with = + - @ (or tab or carriage return), also after
 * leading spaces (a no-break or ideographic space too), or in the full-width forms some spreadsheets read as the
 * same characters.
 */
export const FORMULA_START = /^[\s\u00a0\u3000]*[=+\-@\t\r\uff1d\uff0b\uff0d\uff20]/u;

const LINK_WORDS: Record<string, string> = { 'permanent-link': 'Permanent link', channel: 'Channel' };

function lengthCheck(run: CableRun): string {
  const l = run.assessment.length;
  if (!l) return run.assessment.notes[0] ?? '';
  return `${VERDICT_WORDS[l.verdict]}: limit ${l.limit} ${l.unit} (${l.source})`;
}

/**
 * The cable schedule as CSV for a spreadsheet or the customer's IT people: one row per run with both ends, the
 * measurements, the wiremap with its faults named and the server's verdict. A byte-order mark lets spreadsheet
 * programs read Ω and accents; cells that would start a formula are quoted so that opening the file runs nothing.
 */
export function cableScheduleCsv(runs: readonly CableRun[]): string {
  const data = runs.map((r) => [
    r.label,
    r.endAAreaName ?? '',
    r.endADescription ?? '',
    r.endATermination ?? '',
    r.endBAreaName ?? '',
    r.endBDescription ?? '',
    r.endBTermination ?? '',
    r.medium ?? '',
    r.scheme ?? '',
    r.lengthM ?? '',
    r.linkKind ? (LINK_WORDS[r.linkKind] ?? r.linkKind) : '',
    wiremapWords(r),
    lengthCheck(r),
    VERDICT_WORDS[r.assessment.verdict],
    cableStatusWords(r.status),
    r.testedAt ?? '',
  ]);
  return `\uFEFF${Papa.unparse({ fields: [...CSV_COLUMNS], data }, { escapeFormulae: FORMULA_START, newline: '\r\n' })}`;
}

const slug = (text: string) =>
  text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .toLowerCase();

/** "LED-0042-brightwater-dental-harbour-yard-cable-schedule-2026-12-02.csv" */
export function cableScheduleFileName(reference: string | null, siteName: string | null, on: Date = new Date()): string {
  const day = `${on.getFullYear()}-${String(on.getMonth() + 1).padStart(2, '0')}-${String(on.getDate()).padStart(2, '0')}`;
  const parts = [reference?.trim().replace(/[^A-Za-z0-9-]+/g, '-'), siteName ? slug(siteName) : null, 'cable-schedule', day].filter(Boolean);
  return `${parts.join('-')}.csv`;
}

/** Hands the file to the browser to save. */
export function downloadCsv(csv: string, fileName: string): void {
  const url = URL.createObjectURL(new Blob([csv], { type: 'text/csv;charset=utf-8' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  // Kept a moment: the browser reads the file after the click returns.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
