import { assessCableRun, T568A, T568B } from '@wiretrail/core';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { CableRun } from '../api/get-cable-runs';
import { CSV_COLUMNS, cableScheduleCsv, cableScheduleFileName } from '../desk/cable-schedule-csv';

/** A run as the server answers it, with its assessment made by the same core function the server uses. */
function run(label: string, fields: Partial<CableRun>): CableRun {
  const row = {
    id: label, version: 1, siteId: 's', label, medium: 'Cat6', endAAreaId: null, endADescription: null, endATermination: null,
    endBAreaId: null, endBDescription: null, endBTermination: null, status: 'tested', traceMethod: null, lengthM: null, nvp: null,
    tdrNs: null, scheme: 'T568B', linkKind: 'permanent-link', verdict: null, testedAt: null, lastVisitId: null, endAAreaName: null, endBAreaName: null,
    ...fields,
  } as Omit<CableRun, 'assessment'> & { wiremap?: unknown };
  return { ...row, assessment: assessCableRun({ medium: row.medium, scheme: row.scheme as 'T568B', wiremap: row.wiremap as never, lengthM: row.lengthM, linkKind: row.linkKind as 'permanent-link' }) };
}

const parse = (csv: string) => Papa.parse<string[]>(csv.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data;

describe('the cable schedule CSV', () => {
  const good = run('RC-01', {
    endAAreaName: 'Comms cupboard', endADescription: 'Patch panel port 1', endATermination: 'Patch panel',
    endBAreaName: 'Reception', endBDescription: 'Desk faceplate, left', endBTermination: 'RJ45 module',
    lengthM: 23.5, testedAt: '2026-12-02T14:10:00.000Z', ...({ wiremap: { nearEnd: [...T568B], farEnd: [...T568B] } } as object),
  });
  // A T568A end on a T568B end is a crossed pair, pins 1,2 ↔ 3,6 (ANSI/TIA-568 pin assignments);
  // 92.3 m is over the 90 m permanent link limit (ANSI/TIA-568, ISO/IEC 11801).
  const crossed = run('RC-04', {
    endAAreaName: 'Comms cupboard', endADescription: 'Patch panel port 4', endBAreaName: 'Surgery 1', endBDescription: 'Wall plate, by the chair',
    lengthM: 92.3, ...({ wiremap: { nearEnd: [...T568A], farEnd: [...T568B] } } as object),
  });
  const coax = run('TV-1', { medium: 'coax', scheme: null, linkKind: null, status: 'traced', endBDescription: '=HYPERLINK("http://example.com")' });

  it('has a header and one row per run, every column in order', () => {
    const rows = parse(cableScheduleCsv([good, crossed, coax]));
    expect(rows[0]).toEqual([...CSV_COLUMNS]);
    expect(rows).toHaveLength(4);
    expect(rows[1]).toEqual([
      'RC-01', 'Comms cupboard', 'Patch panel port 1', 'Patch panel', 'Reception', 'Desk faceplate, left', 'RJ45 module', 'Cat6', 'T568B',
      '23.5', 'Permanent link', 'Pass', expect.stringMatching(/^Pass: limit 90 m \(/), 'Pass', 'Tested', '2026-12-02T14:10:00.000Z',
    ]);
  });

  it('names the wiremap fault and the failed length', () => {
    const row = parse(cableScheduleCsv([crossed]))[1]!;
    const col = (name: (typeof CSV_COLUMNS)[number]) => row[CSV_COLUMNS.indexOf(name)];
    expect(col('Wiremap')).toBe('Crossed pairs, pins 1, 2, 3, 6 (near end)');
    expect(col('Length check')).toMatch(/^Fail: limit 90 m \(.*(TIA-568|11801)/);
    expect(col('Verdict')).toBe('Fail');
    expect(col('To position')).toBe('Wall plate, by the chair');
  });

  it('says why there is no wiremap or length limit for coax, and quotes what would start a formula', () => {
    const row = parse(cableScheduleCsv([coax]))[1]!;
    const col = (name: (typeof CSV_COLUMNS)[number]) => row[CSV_COLUMNS.indexOf(name)];
    expect(col('Wiremap')).toBe('No wiremap for this medium');
    expect(col('Length check')).toBe('');
    expect(col('Verdict')).toBe('Check');
    expect(col('Status')).toBe('Traced');
    // Opened in a spreadsheet this stays text.
    expect(col('To position')).toBe(`'=HYPERLINK("http://example.com")`);
  });

  it('quotes a formula hidden behind leading spaces or written in full-width characters', () => {
    const sneaky = [' =1+1', '\u00a0\u00a0@SUM(A1)', '\u3000+cmd', '\uff1d1+1', '\uff0b1', '\uff20A1', ' \uff1dHYPERLINK("http://example.com")'];
    const rows = parse(cableScheduleCsv(sneaky.map((text) => ({ ...coax, endBDescription: text }))));
    const col = CSV_COLUMNS.indexOf('To position');
    expect(rows.slice(1).map((r) => r[col])).toEqual(sneaky.map((text) => `'${text}`));
    // Ordinary text that merely contains these characters stays as it was.
    const plain = parse(cableScheduleCsv([{ ...coax, endBDescription: 'Socket 2 = spare, +1 later' }]))[1]!;
    expect(plain[col]).toBe('Socket 2 = spare, +1 later');
  });

  it('starts with a byte-order mark and ends lines as spreadsheets expect', () => {
    const csv = cableScheduleCsv([good]);
    expect(csv.startsWith('\uFEFFLabel,From area,')).toBe(true);
    expect(csv.split('\r\n')).toHaveLength(2);
    // The comma inside a description is quoted, not a new column.
    expect(csv).toContain('"Desk faceplate, left"');
  });

  it('is named by the job, the site and the day', () => {
    expect(cableScheduleFileName('LED-0042', 'Brightwater Dental, Harbour Yard', new Date(2026, 11, 2))).toBe('LED-0042-brightwater-dental-harbour-yard-cable-schedule-2026-12-02.csv');
    expect(cableScheduleFileName(null, 'Fernhill Close', new Date(2026, 0, 9))).toBe('fernhill-close-cable-schedule-2026-01-09.csv');
    expect(cableScheduleFileName('LED/0042', null, new Date(2026, 0, 9))).toBe('LED-0042-cable-schedule-2026-01-09.csv');
  });
});
