import {
  type CertifiedCircuit,
  circuitName,
  circuitReading,
  readingWords,
  type CircuitTestLine,
  EXISTING_INSTALLATION_REG,
  minorWorksDeclaration,
  PERMITTED_EXCEPTIONS_REG,
  type RuleSet,
} from '@wiretrail/core';
import { MINOR_WORKS_TITLE } from '../../paperwork/document-titles.js';
import type { JobFile } from '../../paperwork/job-file.js';
import { type DocumentLayout, INK, type Row } from '../../paperwork/pdf/document-layout.js';
import { dateTimeWords, dateWords, joined, limitWords, VERDICT_INK, VERDICT_WORDS } from '../../paperwork/pdf/document-words.js';
import { type Issue, issuedBy, startJobDocument } from '../../paperwork/pdf/job-heading.js';
import type { SyncRecord } from '../../sync/entities/sync-schemas.js';
import type { MinorWorksContent } from '../document-content.js';

export interface MinorWorksPdf {
  issue: Issue;
  file: JobFile;
  content: MinorWorksContent;
  rules: RuleSet;
  /** The signer's drawing from the phone, already made a PNG. */
  signature: Buffer;
}

export type Certified = CertifiedCircuit<SyncRecord<'visit'>, SyncRecord<'testResult'>, SyncRecord<'circuit'>>;
const KIND_WORDS: Record<string, string> = { ring: 'Ring final', radial: 'Radial', lighting: 'Lighting', other: 'Other' };

const text = (v: unknown): string => (typeof v === 'string' ? v.trim() : '');
const number = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

export function deviceWords(c: Certified['circuit']): string {
  const type = text(c.deviceType);
  const rating = number(c.deviceRatingA) === null ? '' : `${c.deviceRatingA} A`;
  const kind = !type ? '' : /^[BCD]$/.test(type) ? `Type ${type} circuit-breaker` : `${type} fuse`;
  return joined([kind, rating, text(c.deviceStandard)], ', ') || 'Not recorded';
}

export function rcdWords(c: Certified['circuit']): string {
  if (number(c.rcdRatingMa) === null) return 'None';
  const rated = number(c.rcdRatedCurrentA);
  return joined(
    [joined([`${c.rcdRatingMa} mA`, text(c.rcdType) ? `type ${text(c.rcdType)}` : ''], ' '), rated === null ? '' : `rated ${rated} A`, text(c.rcdStandard)],
    ', ',
  );
}

/** The circuit's recorded method of fault protection: automatic disconnection by its protective device or by its RCD. */
const FAULT_PROTECTION_WORDS: Record<string, string> = {
  'overcurrent-device': 'Automatic disconnection by the protective device',
  rcd: 'Automatic disconnection by the RCD',
};
export const faultProtectionWords = (c: Certified['circuit']): string => FAULT_PROTECTION_WORDS[text(c.faultProtection)] ?? 'Not recorded';

export const BONDING_WORDS: Record<string, string> = { adequate: 'Present and adequate', inadequate: 'Present, not adequate', absent: 'Not present', none: 'No such service' };
export const EARTHING_CONDUCTOR_WORDS: Record<string, string> = { adequate: 'Present and adequate', inadequate: 'Present, not adequate', absent: 'Not present' };
export const stateWords = (words: Record<string, string>, v: unknown) => words[text(v)] ?? 'Not recorded';

/** The test buttons' lines are printed even where nothing was tried, so the certificate says why there is no result. */
export function buttonRows(c: Certified): Row[] {
  const rows: Row[] = [];
  const keys = new Set(c.assessment.lines.map((l) => l.key));
  if (!keys.has('rcd-button')) rows.push({ cells: [{ text: 'RCD test button', weight: 'medium' }, number(c.circuit.rcdRatingMa) === null ? 'No RCD' : 'Not tried', '', ''] });
  if (!keys.has('afdd-button')) rows.push({ cells: [{ text: 'AFDD test button', weight: 'medium' }, text(c.circuit.afddStandard) ? 'Not tried' : 'No AFDD fitted', '', ''] });
  return rows;
}

function conductorWords(c: Certified['circuit']): string {
  const live = typeof c.liveCsaMm2 === 'number' ? c.liveCsaMm2 : null;
  const cpc = typeof c.cpcCsaMm2 === 'number' ? c.cpcCsaMm2 : null;
  return live === null && cpc === null ? '' : `${live ?? '?'} / ${cpc ?? '?'} mm²`;
}

function readingsOfLine(line: CircuitTestLine, test: Certified['test']): string {
  const shown = line.fields.map((f) => {
    const spec = circuitReading(f);
    // As the instrument showed it: an insulation reading over its range prints as ">299 MΩ".
    const value = readingWords(test, f);
    return value && line.fields.length > 1 ? `${spec.short} ${value}` : value;
  });
  const text = shown.filter(Boolean).join(' · ');
  if (text && line.key.startsWith('ir-') && typeof test.irTestVoltageV === 'number') return `${text} at ${test.irTestVoltageV} V`;
  return text;
}

export function testRows(c: Certified): Row[] {
  return c.assessment.lines.map((line) => ({
    cells: [
      { text: line.label + (line.required ? '' : ' (optional)'), weight: 'medium' },
      readingsOfLine(line, c.test) || (line.missing ? 'Not recorded' : ''),
      limitWords(line),
      { text: VERDICT_WORDS[line.result.verdict], weight: 'bold', color: VERDICT_INK[line.result.verdict] },
    ],
    detail: `${line.result.note} Source: ${line.result.source}.`,
  }));
}

/** A certificate for an alteration or addition to an existing circuit, in Wiretrail's own layout. */
/** The departures from the standard the signer declared, each with what is done instead and why it is no less safe. */
export function departuresTable(layout: DocumentLayout, departures: ReadonlyArray<{ regulation: string; instead: string; noLessSafe: string }>): void {
  layout.heading('Departures from the standard');
  if (departures.length === 0) return layout.paragraph('None.');
  layout.table(
    [
      { header: 'Regulation departed from', width: 1 },
      { header: 'What is done instead', width: 2 },
      { header: 'Why it gives no less safety', width: 2 },
    ],
    departures.map((d) => ({ cells: [{ text: d.regulation, weight: 'medium' }, d.instead, d.noLessSafe] })),
  );
}

/** One circuit's readings as judged: when and with what it was tested, then each test beside its limit and verdict. */
export function judgedReadings(layout: DocumentLayout, heading: string, c: Certified, tz: string): void {
  layout.heading(heading);
  layout.paragraph(
    joined([`Tested ${dateTimeWords(c.test.testedAt ?? c.test.createdAt, tz) || 'on the signed visit'}`, text(c.test.instrument) ? `with ${text(c.test.instrument)}` : '', `overall: ${VERDICT_WORDS[c.assessment.verdict]}`], ', ') + '.',
    'regular',
    INK.muted,
  );
  layout.table(
    [
      { header: 'Test', width: 2.2 },
      { header: 'Reading', width: 1.6 },
      { header: 'Limit', width: 2 },
      { header: 'Verdict', width: 0.7 },
    ],
    [...testRows(c), ...buttonRows(c)],
  );
}

export async function minorWorksPdf({ issue, file, content, rules, signature }: MinorWorksPdf): Promise<Buffer> {
  const tz = file.organisation.timeZone;
  const layout = await startJobDocument({ title: MINOR_WORKS_TITLE, subtitle: 'An alteration or addition to an existing circuit, inspected and tested', issue, file });

  const { visits, circuits } = content;
  const described = visits.map((v) => (typeof v.workDescription === 'string' ? v.workDescription.trim() : '')).filter(Boolean);
  layout.heading('The work');
  layout.paragraph(described.length ? described.join('\n\n') : joined([file.job.title, file.job.description], '. '));
  const days = [...new Set(visits.map((v) => dateWords(v.actualEnd ?? v.signedAt ?? v.plannedStart, tz)).filter(Boolean))];
  const completedOn = dateWords(content.completedOn, tz) || content.completedOn;
  layout.fields([
    ['Carried out on', days.join(', ')],
    // The amendment in force on the completion date, by its published name.
    ['Standard it was done to', `${rules.edition}, in force on ${completedOn}`],
  ]);

  const texts = (field: 'observations' | 'departures' | 'existingInstallationComments' | 'permittedExceptions' | 'riskAssessmentRef') => visits.map((v) => text(v[field])).filter(Boolean);

  layout.heading('Supply, earthing and bonding at the site');
  const { site } = file;
  const boardsOf = [...new Set(circuits.map((c) => c.circuit.boardId))].flatMap((id) => content.boards.get(id) ?? []);
  const zdb = boardsOf.map((b) => (b.zdbOhm === null ? `${b.name}: not recorded` : `${b.name}: ${b.zdbOhm} Ω`));
  layout.fields(
    [
      ['Earthing arrangement', text(site.earthing) || 'Not recorded'],
      ['External earth fault loop impedance Ze', number(site.zeOhm) === null ? 'Not recorded' : `${site.zeOhm} Ω`],
      ['Prospective fault current', number(site.pfcKa) === null ? 'Not recorded' : `${site.pfcKa} kA`],
      ['Earth fault loop impedance at the board Zdb', zdb.join('; ') || 'Not recorded'],
      ['Earthing conductor', stateWords(EARTHING_CONDUCTOR_WORDS, site.earthingConductor)],
      ['Main bonding to water', stateWords(BONDING_WORDS, site.bondingWater)],
      ['Main bonding to gas', stateWords(BONDING_WORDS, site.bondingGas)],
      ['Main bonding to oil', stateWords(BONDING_WORDS, site.bondingOil)],
      ['Main bonding to structural steel', stateWords(BONDING_WORDS, site.bondingSteel)],
      [
        text(site.bondingOtherWhat) ? `Main bonding to other parts: ${text(site.bondingOtherWhat)}` : 'Main bonding to other parts',
        stateWords(BONDING_WORDS, site.bondingOther),
      ],
    ],
    3,
  );

  layout.heading(`Comments on the existing installation (${EXISTING_INSTALLATION_REG})`);
  layout.paragraph(texts('existingInstallationComments').join('\n\n') || 'None recorded.');

  for (const c of circuits) {
    const { circuit } = c;
    layout.heading(`Circuit details: ${circuitName(circuit)}`);
    const board = content.boards.get(circuit.boardId);
    layout.fields(
      [
        ['Board and circuit', joined([board?.name, `circuit ${circuit.number ?? '?'}`], ', ')],
        ['Kind', (circuit.kind && KIND_WORDS[circuit.kind]) || 'Not recorded'],
        ['Method of fault protection', faultProtectionWords(circuit)],
        ['Protective device', deviceWords(circuit)],
        ['RCD', rcdWords(circuit)],
        ['AFDD', text(circuit.afddStandard) ? `Fitted, ${text(circuit.afddStandard)}` : 'None fitted'],
        ['Live / cpc', conductorWords(circuit) || 'Not recorded'],
        ['Reference method', text(circuit.referenceMethod) || 'Not recorded'],
        ['Number of points served', number(circuit.pointsServed) === null ? 'Not recorded' : String(circuit.pointsServed)],
        ['Maximum disconnection time allowed', number(circuit.maxDisconnectionS) === null ? 'Not recorded' : `${circuit.maxDisconnectionS} s`],
      ],
      3,
    );
  }

  for (const c of circuits) judgedReadings(layout, `Test results: ${circuitName(c.circuit)}`, c, tz);

  layout.heading('Observations');
  // Free text typed where departures used to go is kept as an observation: it departs from nothing.
  layout.paragraph([...texts('observations'), ...texts('departures')].join('\n\n') || 'None recorded.');
  departuresTable(layout, content.departures);
  layout.heading(`Permitted exceptions (${PERMITTED_EXCEPTIONS_REG})`);
  const exceptions = texts('permittedExceptions');
  layout.paragraph(exceptions.join('\n\n') || 'None.');
  if (exceptions.length) {
    const references = texts('riskAssessmentRef');
    layout.fields([['Risk assessment', references.join('; ') || 'Not referenced']], 1);
  }

  const signer = visits[visits.length - 1]!;
  // The declaration and the signature beneath it stay on one page.
  layout.ensure(220);
  layout.heading('Declaration');
  layout.paragraph(minorWorksDeclaration(rules.edition, completedOn), 'medium');
  layout.ensure(120);
  layout.signedBeside(
    [
      ['Work done and tested by', String(signer.signedByName)],
      ['Position', text(signer.signedByPosition) || 'Not given'],
      ['Signed on site', dateTimeWords(signer.signedAt, tz)],
      ['For', file.organisation.name],
    ],
    signature,
    `Signature of ${String(signer.signedByName)}, drawn on the phone at sign-off`,
  );

  // The verdicts' caution belongs to the app's screens; a signed certificate is the signer's declaration.
  layout.paragraph(`Limits applied are those of ${rules.edition}.`, 'regular', INK.muted, 7.5);
  issuedBy(layout, issue, file);
  return layout.finish();
}
