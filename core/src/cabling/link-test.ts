/**
 * A link's performance test as recorded (the synced `linkTest` row): what it holds, the rules a record must meet,
 * the verdict on it, and our own CSV template for importing results one link per row. The template is ours: it
 * follows the record's fields, not any tester maker's export.
 */
import { isCalendarDate } from '../money/aged-debt.js';
import { type CheckResult, InvalidInputError, type Verdict, worstVerdict } from '../check.js';
import { END_FACE_RESULTS, FIBRE_POLARITY_RESULTS, fieldError, LINK_TEST_MEDIA, type RowFieldsOf, SYNC_REGISTRY } from '../sync/entities.js';
import { checkFibreLink, FIBRE_ATTENUATION_DB_PER_KM, type FibreLinkCheck } from './fibre-loss.js';
import {
  judgeLinkPerformance,
  LIMIT_SET_WORDS,
  LIMIT_SETS,
  type LimitSet,
  MARGIN_PARAMETERS,
  type MarginParameter,
  PARAMETER_WORDS,
  type ParameterCheck,
  type PerformanceParameter,
  UNBALANCE_PARAMETERS,
} from './link-performance.js';

/** The fields of a link test as either side holds them (nullable where the registry allows). */
export type LinkTestFacts = Partial<RowFieldsOf<'linkTest'>>;
type LinkTestField = keyof RowFieldsOf<'linkTest'> & string;

/** Each copper parameter with the fields that hold its worst value and its margin, in the order a report lists them. */
export const COPPER_PARAMETERS: readonly { name: PerformanceParameter; worst: LinkTestField | null; margin: LinkTestField | null; unit: string }[] = [
  ...MARGIN_PARAMETERS.map((name) => ({ name, worst: `${name}Db` as LinkTestField, margin: `${name}MarginDb` as LinkTestField, unit: 'dB' })),
  { name: 'propagationDelay', worst: 'propagationDelayNs', margin: null, unit: 'ns' },
  { name: 'delaySkew', worst: 'delaySkewNs', margin: null, unit: 'ns' },
  { name: 'dcLoopResistance', worst: 'dcLoopResistanceOhm', margin: null, unit: 'Ω' },
  ...UNBALANCE_PARAMETERS.map((name) => ({ name, worst: `${name}Ohm` as LinkTestField, margin: `${name}MarginOhm` as LinkTestField, unit: 'Ω' })),
];
export const PAIR_LENGTH_FIELDS = ['pair12LengthM', 'pair36LengthM', 'pair45LengthM', 'pair78LengthM'] as const;
const PERFORMANCE_PARAMETERS = [...COPPER_PARAMETERS.map((p) => p.name), 'pairLength'] as readonly string[];

export const LINK_TEST_MEDIUM_WORDS: Record<(typeof LINK_TEST_MEDIA)[number], string> = { copper: 'Copper (twisted pair)', fibre: 'Optical fibre' };
export const FIBRE_POLARITY_WORDS: Record<(typeof FIBRE_POLARITY_RESULTS)[number], string> = { correct: 'Correct', reversed: 'Reversed' };
export const END_FACE_WORDS: Record<(typeof END_FACE_RESULTS)[number], string> = {
  clean: 'Clean as found',
  cleaned: 'Clean once cleaned',
  'dirty-or-damaged': 'Dirty or damaged',
};

/** The Tier 1 loss budget's source, printed beside fibre results. */
export const FIBRE_TIER1_WORDS = 'ANSI/TIA-568.3-D Tier 1 loss budget';

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** A problem with a link test record, naming the field. */
export interface LinkTestProblem {
  readonly field: string;
  readonly message: string;
}

/**
 * What a link test must hold to be judged at all: copper names its limit set, fibre its mode, length, connector
 * pairs and at least one loss at a wavelength the mode is tested at. The phone, the desk, the import and the
 * server's push checks all ask this.
 */
export function linkTestProblems(t: LinkTestFacts): LinkTestProblem[] {
  const problems: LinkTestProblem[] = [];
  if (t.medium === 'copper') {
    if (!t.limitSet) problems.push({ field: 'limitSet', message: 'Name the limit set the link was tested to, for example ANSI/TIA-568.2-D Category 6 permanent link.' });
  } else if (t.medium === 'fibre') {
    if (!t.fibreMode) problems.push({ field: 'fibreMode', message: 'Say whether the fibre is multimode or single-mode.' });
    if (num(t.fibreLengthM) === null) problems.push({ field: 'fibreLengthM', message: 'Give the fibre link’s length in metres, for its loss budget.' });
    if (num(t.connectorPairs) === null) problems.push({ field: 'connectorPairs', message: 'Give the number of mated connector pairs, the two at the ends included.' });
    if (num(t.firstWavelengthNm) === null || num(t.firstLossDb) === null) {
      problems.push({ field: 'firstLossDb', message: 'Give the loss measured at the first wavelength and the wavelength itself.' });
    }
    const table = t.fibreMode ? FIBRE_ATTENUATION_DB_PER_KM[t.fibreMode] : undefined;
    for (const field of ['firstWavelengthNm', 'secondWavelengthNm'] as const) {
      const nm = num(t[field]);
      if (table && nm !== null && !table[nm]) problems.push({ field, message: `A ${t.fibreMode} link is tested at ${Object.keys(table).join(' or ')} nm, not ${nm} nm.` });
    }
    if ((num(t.secondWavelengthNm) === null) !== (num(t.secondLossDb) === null)) {
      problems.push({ field: 'secondLossDb', message: 'Give both the second wavelength and the loss measured at it, or neither.' });
    }
  }
  if (t.calibratedOn != null && !isCalendarDate(t.calibratedOn)) problems.push({ field: 'calibratedOn', message: 'The calibration date must be a date such as 2026-03-14.' });
  for (const name of t.withinAccuracy ?? []) {
    if (!PERFORMANCE_PARAMETERS.includes(name)) problems.push({ field: 'withinAccuracy', message: `"${name}" is not a parameter we record: use ${PERFORMANCE_PARAMETERS.join(', ')}.` });
  }
  return problems;
}


export interface LinkTestJudgement {
  readonly verdict: Verdict;
  readonly medium: 'copper' | 'fibre' | null;
  /** What the link was judged against, in words: the limit set, or the fibre's Tier 1 budget. */
  readonly against: string | null;
  /** Copper: each reported parameter; fibre: each wavelength's loss against the budget. */
  readonly checks: readonly (ParameterCheck | (FibreLinkCheck & { readonly name: string }))[];
  /** Polarity and end-face inspection of a fibre link; empty for copper. */
  readonly inspections: readonly (CheckResult & { readonly name: string })[];
  /** Results to a named limit set (or a fibre budget) that can be judged: what a certification report needs. */
  readonly certifiable: boolean;
  readonly anyWithinAccuracy: boolean;
  readonly problems: readonly string[];
}

/** Judges a link test: copper by core's link performance rules, fibre by its Tier 1 loss budget, polarity and end faces. */
export function judgeLinkTest(t: LinkTestFacts): LinkTestJudgement {
  const problems = linkTestProblems(t).map((p) => p.message);
  const empty = { checks: [], inspections: [], certifiable: false, anyWithinAccuracy: false } as const;
  if (t.medium === 'copper') {
    if (!t.limitSet) return { ...empty, verdict: 'check', medium: 'copper', against: null, problems };
    const marginsDb: Partial<Record<MarginParameter, number>> = {};
    for (const name of MARGIN_PARAMETERS) {
      const m = num(t[`${name}MarginDb`]);
      if (m !== null) marginsDb[name] = m;
    }
    const judged = judgeLinkPerformance({
      limitSet: t.limitSet,
      marginsDb,
      propagationDelayNs: num(t.propagationDelayNs),
      delaySkewNs: num(t.delaySkewNs),
      dcLoopResistanceOhm: num(t.dcLoopResistanceOhm),
      unbalanceMarginsOhm: { unbalanceWithinPair: num(t.unbalanceWithinPairMarginOhm), unbalanceBetweenPairs: num(t.unbalanceBetweenPairsMarginOhm) },
      pairLengthsM: PAIR_LENGTH_FIELDS.map((f) => num(t[f])),
      withinAccuracy: (t.withinAccuracy ?? []).filter((n): n is PerformanceParameter => PERFORMANCE_PARAMETERS.includes(n)),
    });
    return {
      verdict: judged.verdict,
      medium: 'copper',
      against: LIMIT_SET_WORDS[t.limitSet],
      checks: judged.checks,
      inspections: [],
      certifiable: judged.checks.length > 0,
      anyWithinAccuracy: judged.anyWithinAccuracy,
      problems,
    };
  }
  if (t.medium === 'fibre') {
    if (problems.length || !t.fibreMode) return { ...empty, verdict: 'check', medium: 'fibre', against: FIBRE_TIER1_WORDS, problems };
    const link = { lengthM: num(t.fibreLengthM) ?? 0, mode: t.fibreMode, connectorPairs: num(t.connectorPairs) ?? 0, splices: num(t.splices) ?? 0 };
    const checks: (FibreLinkCheck & { name: string })[] = [];
    for (const [nm, loss] of [[t.firstWavelengthNm, t.firstLossDb], [t.secondWavelengthNm, t.secondLossDb]] as const) {
      const wavelengthNm = num(nm);
      if (wavelengthNm === null) continue;
      try {
        checks.push({ ...checkFibreLink({ ...link, wavelengthNm, measuredLossDb: num(loss) }), name: `Loss at ${wavelengthNm} nm` });
      } catch (e) {
        if (!(e instanceof InvalidInputError)) throw e;
        problems.push(e.message);
      }
    }
    const inspections: (CheckResult & { name: string })[] = [
      t.polarity
        ? { name: 'Polarity', verdict: t.polarity === 'correct' ? 'pass' : 'fail', value: null, limit: null, unit: '', source: 'ANSI/TIA-568.3-D polarity', note: t.polarity === 'correct' ? 'Transmit reaches receive at each end.' : 'Polarity reversed: transmit meets transmit.' }
        : { name: 'Polarity', verdict: 'check', value: null, limit: null, unit: '', source: 'ANSI/TIA-568.3-D polarity', note: 'Polarity not recorded.' },
      t.endFaces
        ? {
            name: 'End faces',
            verdict: t.endFaces === 'dirty-or-damaged' ? 'fail' : 'pass',
            value: null,
            limit: null,
            unit: '',
            source: 'IEC 61300-3-35 end-face inspection (from memory)',
            note: t.endFaces === 'dirty-or-damaged' ? 'An end face is dirty or damaged: clean or re-terminate, then test again.' : `${END_FACE_WORDS[t.endFaces]}.`,
          }
        : { name: 'End faces', verdict: 'check', value: null, limit: null, unit: '', source: 'IEC 61300-3-35 end-face inspection (from memory)', note: 'End faces not inspected.' },
    ];
    return {
      verdict: problems.length ? 'check' : worstVerdict([...checks, ...inspections].map((c) => c.verdict)),
      medium: 'fibre',
      against: FIBRE_TIER1_WORDS,
      checks,
      inspections,
      certifiable: checks.some((c) => c.value !== null),
      anyWithinAccuracy: false,
      problems,
    };
  }
  return { ...empty, verdict: 'check', medium: null, against: null, problems: [...problems, 'Say whether the link is copper or fibre.'] };
}

/** The worst margin of a copper parameter as printed ("+3.4 dB"), or its value against its limit. */
export function checkWords(c: LinkTestJudgement['checks'][number]): string {
  if ('budget' in c) return c.value === null ? 'Not measured' : `${c.value} dB of ${c.limit} dB`;
  if (c.unit === 'dB' || (c.unit === 'Ω' && c.limit === 0)) return `${c.value! > 0 ? '+' : ''}${c.value} ${c.unit}`;
  return `${c.value} ${c.unit} (≤ ${c.limit} ${c.unit})`;
}

export function parameterWords(name: string): string {
  return (PARAMETER_WORDS as Record<string, string>)[name] ?? name;
}

// ---------------------------------------------------------------------------------------------------------------
// Our own CSV template: one row per link, the first column the cable's label, the rest the record's fields.

const snake = (field: string) => field.replace(/([A-Z])/g, '_$1').toLowerCase();

/** The record's fields the template carries, in the order of its columns (everything but where and when it was made). */
const IMPORTED_FIELDS = Object.keys(SYNC_REGISTRY.linkTest.fields).filter(
  (f) => !['visitId', 'siteId', 'cableRunId', 'recordedAt', 'voidedAt', 'voidReason'].includes(f),
) as LinkTestField[];

export interface LinkTestCsvColumn {
  readonly column: string;
  readonly field: LinkTestField | 'cableLabel';
  /** What goes in it, for the template's documentation. */
  readonly help: string;
}

function helpFor(field: LinkTestField): string {
  const spec = SYNC_REGISTRY.linkTest.fields[field].type as { kind: string; values?: readonly string[] };
  if (field === 'testedAt') return 'When the link was tested: 2026-03-14 or 2026-03-14T10:30:00Z.';
  if (field === 'calibratedOn') return 'The tester’s last calibration: 2026-01-20.';
  if (field === 'withinAccuracy') return `Parameters the tester marked within its accuracy, separated by semicolons: ${PERFORMANCE_PARAMETERS.join('; ')}.`;
  if (spec.kind === 'enum') return `One of: ${spec.values!.join(', ')}.`;
  if (spec.kind === 'string') return 'Text.';
  const c = COPPER_PARAMETERS.find((p) => p.worst === field || p.margin === field);
  if (c) return `${parameterWords(c.name)}: ${c.margin === field ? 'worst margin to the limit line' : 'worst value'}, ${c.unit}.`;
  if ((PAIR_LENGTH_FIELDS as readonly string[]).includes(field)) return `Length of pair ${field.slice(4, 6).split('').join(',')}, m.`;
  return spec.kind === 'integer' ? 'A whole number.' : 'A number, with a full stop for the decimal point.';
}

export const LINK_TEST_CSV_COLUMNS: readonly LinkTestCsvColumn[] = [
  { column: 'cable_label', field: 'cableLabel', help: 'The cable’s label as recorded on the site, e.g. RC-03. Required.' },
  ...IMPORTED_FIELDS.map((field) => ({ column: snake(field), field, help: helpFor(field) })),
];

/** The template's first line. */
export const LINK_TEST_CSV_HEADER = LINK_TEST_CSV_COLUMNS.map((c) => c.column).join(',');

/** A problem with one cell of an imported file, named by its line (the header is line 1) and column. */
export interface CsvCellProblem {
  readonly line: number;
  readonly column: string;
  readonly message: string;
}

/** Columns the file's header lacks or does not know; the cable label is the one a file must have. */
export function linkTestCsvHeaderProblems(header: readonly string[]): CsvCellProblem[] {
  const known = new Set(LINK_TEST_CSV_COLUMNS.map((c) => c.column));
  const problems: CsvCellProblem[] = header
    .filter((h) => !known.has(h.trim()))
    .map((h) => ({ line: 1, column: h, message: `"${h}" is not a column of the link test template.` }));
  if (!header.some((h) => h.trim() === 'cable_label')) problems.push({ line: 1, column: 'cable_label', message: 'The file has no cable_label column.' });
  const seen = new Set<string>();
  for (const h of header) {
    if (seen.has(h.trim())) problems.push({ line: 1, column: h, message: `The column "${h}" is given twice.` });
    seen.add(h.trim());
  }
  return problems;
}

export interface LinkTestCsvRow {
  readonly cableLabel: string;
  readonly fields: LinkTestFacts;
}

/** Reads one row of the template (cells by column name): the fields it gives, or every problem named by line and column. */
export function readLinkTestCsvRow(cells: Readonly<Record<string, string>>, line: number): { row: LinkTestCsvRow | null; problems: CsvCellProblem[] } {
  const problems: CsvCellProblem[] = [];
  const fields: Record<string, unknown> = {};
  const columnOf = new Map(LINK_TEST_CSV_COLUMNS.map((c) => [c.field, c.column]));
  const cableLabel = (cells.cable_label ?? '').trim();
  if (!cableLabel) problems.push({ line, column: 'cable_label', message: 'Give the cable’s label.' });
  for (const { column, field } of LINK_TEST_CSV_COLUMNS) {
    if (field === 'cableLabel') continue;
    const raw = (cells[column] ?? '').trim();
    if (raw === '') continue;
    const kind = (SYNC_REGISTRY.linkTest.fields[field].type as { kind: string }).kind;
    let value: unknown = raw;
    if (kind === 'number' || kind === 'integer') {
      value = /^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(raw) ? Number(raw) : Number.NaN;
      if (Number.isNaN(value)) {
        problems.push({ line, column, message: `"${raw}" is not a number.` });
        continue;
      }
    } else if (field === 'testedAt') {
      value = isCalendarDate(raw) ? `${raw}T12:00:00.000Z` : raw;
      if (Number.isNaN(Date.parse(String(value))) || !/^\d{4}-\d{2}-\d{2}/.test(raw)) {
        problems.push({ line, column, message: `"${raw}" is not a date such as 2026-03-14.` });
        continue;
      }
      value = new Date(String(value)).toISOString();
    } else if (field === 'calibratedOn' && !isCalendarDate(raw)) {
      problems.push({ line, column, message: `"${raw}" is not a date such as 2026-01-20.` });
      continue;
    } else if (field === 'withinAccuracy') {
      value = raw.split(/[;|]/).map((s) => s.trim()).filter(Boolean);
    }
    const wrong = fieldError('linkTest', field, value);
    if (wrong) {
      problems.push({ line, column, message: wrong.replace(`linkTest.${field}`, column) });
      continue;
    }
    fields[field] = value;
  }
  if (!fields.medium && !problems.some((p) => p.column === 'medium')) {
    // A row that names a limit set is copper, one that names a fibre mode is fibre: the column may be left empty.
    if (fields.limitSet) fields.medium = 'copper';
    else if (fields.fibreMode) fields.medium = 'fibre';
    else if (!(cells.limit_set ?? '').trim() && !(cells.fibre_mode ?? '').trim()) problems.push({ line, column: 'medium', message: 'Say copper or fibre (or give a limit_set or a fibre_mode).' });
  }
  if (!problems.length) {
    for (const p of linkTestProblems(fields as LinkTestFacts)) problems.push({ line, column: columnOf.get(p.field as LinkTestField) ?? p.field, message: p.message });
  }
  return problems.length ? { row: null, problems } : { row: { cableLabel, fields: fields as LinkTestFacts }, problems };
}

/** The words of a limit set, or of the fibre's budget. */
export function linkTestAgainstWords(t: Pick<LinkTestFacts, 'medium' | 'limitSet'>): string {
  if (t.medium === 'fibre') return FIBRE_TIER1_WORDS;
  return t.limitSet && (LIMIT_SETS as readonly string[]).includes(t.limitSet) ? LIMIT_SET_WORDS[t.limitSet as LimitSet] : 'No limit set named';
}

