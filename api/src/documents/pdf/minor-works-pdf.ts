import { type CertifiedCircuit, circuitName, circuitReading, type CircuitTestLine, type RuleSet, VERDICT_DISCLAIMER } from '@wiretrail/core';
import { MINOR_WORKS_TITLE } from '../../paperwork/document-titles.js';
import type { JobFile } from '../../paperwork/job-file.js';
import { INK, type Row } from '../../paperwork/pdf/document-layout.js';
import { dateTimeWords, dateWords, joined, limitWords, reading, VERDICT_INK, VERDICT_WORDS } from '../../paperwork/pdf/document-words.js';
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

type Certified = CertifiedCircuit<SyncRecord, SyncRecord, SyncRecord>;
const KIND_WORDS: Record<string, string> = { ring: 'Ring final', radial: 'Radial', lighting: 'Lighting', other: 'Other' };

function deviceWords(c: Certified['circuit']): string {
  const type = typeof c.deviceType === 'string' ? c.deviceType : '';
  const rating = typeof c.deviceRatingA === 'number' ? `${c.deviceRatingA} A` : '';
  if (!type) return rating;
  return joined([/^[BCD]$/.test(type) ? `Type ${type} circuit-breaker` : `${type} fuse`, rating], ', ');
}

function rcdWords(c: Certified['circuit']): string {
  if (typeof c.rcdRatingMa !== 'number') return 'None';
  return joined([`${c.rcdRatingMa} mA`, typeof c.rcdType === 'string' && c.rcdType ? `type ${c.rcdType}` : ''], ' ');
}

function conductorWords(c: Certified['circuit']): string {
  const live = typeof c.liveCsaMm2 === 'number' ? c.liveCsaMm2 : null;
  const cpc = typeof c.cpcCsaMm2 === 'number' ? c.cpcCsaMm2 : null;
  return live === null && cpc === null ? '' : `${live ?? '?'} / ${cpc ?? '?'} mm²`;
}

function readingsOfLine(line: CircuitTestLine, test: Certified['test']): string {
  const shown = line.fields.map((f) => {
    const spec = circuitReading(f);
    const value = reading(test[f], spec.unit);
    return value && line.fields.length > 1 ? `${spec.short} ${value}` : value;
  });
  const text = shown.filter(Boolean).join(' · ');
  if (text && line.key.startsWith('ir-') && typeof test.irTestVoltageV === 'number') return `${text} at ${test.irTestVoltageV} V`;
  return text;
}

function testRows(c: Certified): Row[] {
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
export async function minorWorksPdf({ issue, file, content, rules, signature }: MinorWorksPdf): Promise<Buffer> {
  const tz = file.organisation.timeZone;
  const layout = await startJobDocument({ title: MINOR_WORKS_TITLE, subtitle: 'An alteration or addition to an existing circuit, inspected and tested', issue, file });

  const { visits, circuits } = content;
  const described = visits.map((v) => (typeof v.workDescription === 'string' ? v.workDescription.trim() : '')).filter(Boolean);
  layout.heading('The work');
  layout.paragraph(described.length ? described.join('\n\n') : joined([file.job.title, file.job.description], '. '));
  const days = [...new Set(visits.map((v) => dateWords(v.actualEnd ?? v.signedAt ?? v.plannedStart, tz)).filter(Boolean))];
  layout.fields([
    ['Carried out on', days.join(', ')],
    // The amendment in force on the completion date, by its published name.
    ['Standard it was done to', `${rules.edition}, in force on ${dateWords(content.completedOn, tz) || content.completedOn}`],
  ]);

  layout.heading('Supply and earthing at the site');
  const { site } = file;
  layout.fields(
    [
      ['Earthing arrangement', typeof site.earthing === 'string' ? site.earthing : 'Not recorded'],
      ['External earth fault loop impedance Ze', typeof site.zeOhm === 'number' ? `${site.zeOhm} Ω` : 'Not recorded'],
      ['Prospective fault current', typeof site.pfcKa === 'number' ? `${site.pfcKa} kA` : 'Not recorded'],
    ],
    3,
  );

  layout.heading(circuits.length === 1 ? 'Circuit altered and tested' : 'Circuits altered and tested');
  layout.table(
    [
      { header: 'Board and circuit', width: 1.3 },
      { header: 'Description', width: 1.6 },
      { header: 'Kind', width: 0.8 },
      { header: 'Protective device', width: 1.5 },
      { header: 'RCD', width: 0.9 },
      { header: 'Live / cpc', width: 0.9 },
    ],
    circuits.map((c) => ({
      cells: [
        { text: joined([content.boards.get(c.circuit.boardId), `circuit ${c.circuit.number}`], ', '), weight: 'medium' },
        joined([c.circuit.description]),
        (c.circuit.kind && KIND_WORDS[c.circuit.kind]) ?? '',
        deviceWords(c.circuit),
        rcdWords(c.circuit),
        conductorWords(c.circuit),
      ],
    })),
  );

  for (const c of circuits) {
    layout.heading(`Test results: ${circuitName(c.circuit)}`);
    layout.paragraph(
      joined(
        [
          `Tested ${dateTimeWords(c.test.testedAt ?? c.test.createdAt, tz) || 'on the signed visit'}`,
          typeof c.test.instrument === 'string' && c.test.instrument ? `with ${c.test.instrument}` : '',
          `overall: ${VERDICT_WORDS[c.assessment.verdict]}`,
        ],
        ', ',
      ) + '.',
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
      testRows(c),
    );
  }

  const texts = (field: 'observations' | 'departures') => visits.map((v) => v[field]?.trim() ?? '').filter(Boolean);
  layout.heading('Observations');
  // Free text typed where departures used to go is kept as an observation: it departs from nothing.
  layout.paragraph([...texts('observations'), ...texts('departures')].join('\n\n') || 'None recorded.');
  layout.heading('Departures from the standard');
  if (content.departures.length === 0) layout.paragraph('None.');
  else {
    layout.table(
      [
        { header: 'Regulation departed from', width: 1 },
        { header: 'What is done instead', width: 2 },
        { header: 'Why it gives no less safety', width: 2 },
      ],
      content.departures.map((d) => ({ cells: [{ text: d.regulation, weight: 'medium' }, d.instead, d.noLessSafe] })),
    );
  }

  const signer = visits[visits.length - 1]!;
  layout.heading('Sign-off');
  layout.ensure(120);
  const top = layout.y;
  const half = layout.width / 2 - 10;
  layout.fields(
    [
      ['Work done and tested by', String(signer.signedByName)],
      ['Signed on site', dateTimeWords(signer.signedAt, tz)],
      ['For', file.organisation.name],
    ],
    1,
    layout.left,
    half,
  );
  const below = layout.y;
  const boxX = layout.left + half + 20;
  const { doc } = layout;
  doc.rect(boxX, top, half, 86).lineWidth(0.5).strokeColor(INK.rule).stroke();
  doc.image(signature, boxX + 8, top + 6, { fit: [half - 16, 64], align: 'center', valign: 'center' });
  layout.font('regular', 7.5, INK.muted);
  doc.text(`Signature of ${String(signer.signedByName)}, drawn on the phone at sign-off`, boxX + 8, top + 72, { width: half - 16, align: 'center' });
  layout.y = Math.max(below, top + 92);
  doc.x = layout.left;

  layout.notice('About the verdicts on this certificate', `${VERDICT_DISCLAIMER} Limits are those of ${rules.edition}.`);
  issuedBy(layout, issue, file);
  return layout.finish();
}
