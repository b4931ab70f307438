import {
  circuitName,
  EXISTING_INSTALLATION_REG,
  INSPECTION_ITEMS,
  INSPECTION_ITEMS_SOURCE,
  INSPECTION_MARK_WORDS,
  type InstallationParticulars,
  installationDeclaration,
  type RuleSet,
  type ScheduledCircuit,
  WORK_EXTENT_WORDS,
} from '@wiretrail/core';
import { INSTALLATION_CERTIFICATE_TITLE } from '../../paperwork/document-titles.js';
import type { JobFile } from '../../paperwork/job-file.js';
import { INK, type Row } from '../../paperwork/pdf/document-layout.js';
import { dateTimeWords, dateWords, joined, VERDICT_INK, VERDICT_WORDS } from '../../paperwork/pdf/document-words.js';
import { type Issue, issuedBy, startJobDocument } from '../../paperwork/pdf/job-heading.js';
import type { SyncRecord } from '../../sync/entities/sync-schemas.js';
import type { InstallationCertificateContent } from '../document-content.js';
import { departuresTable, judgedReadings } from './minor-works-pdf.js';

export interface InstallationCertificatePdf {
  issue: Issue;
  file: JobFile;
  content: InstallationCertificateContent;
  rules: RuleSet;
  signature: Buffer;
  particulars: InstallationParticulars;
}

type Scheduled = ScheduledCircuit<SyncRecord<'visit'>, SyncRecord<'testResult'>, SyncRecord<'circuit'>>;

const text = (v: unknown): string => (typeof v === 'string' ? v.trim() : '');
const num = (v: unknown): string => (typeof v === 'number' && Number.isFinite(v) ? String(v) : '');
const unit = (v: number | null, u: string): string => (v === null ? 'Not recorded' : `${v} ${u}`);
const yes = (v: boolean): string => (v ? 'Verified' : 'Not verified');

/** The schedule's circuit details, one column each, as the model form lists them. */
export const CIRCUIT_DETAIL_COLUMNS = [
  'Circuit',
  'Description',
  'Type of wiring',
  'Reference method',
  'Points served',
  'Live mm²',
  'cpc mm²',
  'Max disconnection time s',
  'Device BS (EN)',
  'Device type',
  'Rating A',
  'Breaking capacity kA',
  'Max permitted Zs Ω',
  'RCD type',
  'RCD IΔn mA',
] as const;

/** The schedule's test results, one column each. */
export const TEST_RESULT_COLUMNS = [
  'Circuit',
  'Ring r1 Ω',
  'Ring rn Ω',
  'Ring r2 Ω',
  'R1+R2 Ω',
  'R2 Ω',
  'Insulation test voltage V',
  'Insulation live-live MΩ',
  'Insulation live-earth MΩ',
  'Polarity',
  'Measured Zs Ω',
  'RCD time ms',
  'RCD test button',
  'AFDD test button',
] as const;

function deviceType(c: SyncRecord<'circuit'>): string {
  const t = text(c.deviceType);
  return !t ? '' : /^[BCD]$/.test(t) ? `Type ${t}` : 'Fuse';
}

function detailRow(s: Scheduled): Row {
  const c = s.circuit;
  return {
    cells: [
      { text: `${text(c.number)}${s.isNew ? ' (new)' : ''}`, weight: 'medium' },
      text(c.description),
      text(c.wiringType),
      text(c.referenceMethod),
      num(c.pointsServed),
      num(c.liveCsaMm2),
      num(c.cpcCsaMm2),
      num(c.maxDisconnectionS),
      text(c.deviceStandard),
      deviceType(c),
      num(c.deviceRatingA),
      num(c.deviceBreakingKa),
      s.maxZs.ohm === null ? '' : String(s.maxZs.ohm),
      text(c.rcdType),
      num(c.rcdRatingMa),
    ],
    detail: s.maxZs.ohm === null ? `Maximum Zs: ${s.maxZs.reason}` : `Maximum Zs for a ${s.maxZs.basis}: ${s.maxZs.source}.`,
  };
}

/** As the instrument showed it: an insulation reading over its range prints as ">299". */
function figure(test: SyncRecord<'testResult'>, field: keyof SyncRecord<'testResult'> & string, overRange?: 'irLiveLiveOverRange' | 'irLiveEarthOverRange'): string {
  const v = num(test[field]);
  return v && overRange && test[overRange] === true ? `>${v}` : v;
}

function resultRow(s: Scheduled): Row {
  const c = s.circuit;
  const t = s.tested?.test;
  if (!t) return { cells: [{ text: text(c.number), weight: 'medium' }, ...TEST_RESULT_COLUMNS.slice(1).map(() => '')] };
  const rcd = typeof c.rcdRatingMa === 'number';
  return {
    cells: [
      { text: text(c.number), weight: 'medium' },
      figure(t, 'r1Ohm'),
      figure(t, 'rnOhm'),
      figure(t, 'r2Ohm'),
      figure(t, 'r1r2Ohm'),
      figure(t, 'r2LeadOhm'),
      num(t.irTestVoltageV),
      figure(t, 'irLiveLiveMOhm', 'irLiveLiveOverRange'),
      figure(t, 'irLiveEarthMOhm', 'irLiveEarthOverRange'),
      t.polarity === 'correct' ? 'Correct' : t.polarity === 'incorrect' ? 'Incorrect' : '',
      figure(t, 'zsOhm'),
      figure(t, 'rcdTripMs'),
      t.rcdButton === 'operates' ? 'Operates' : t.rcdButton === 'fails' ? 'Fails' : rcd ? 'Not tried' : 'No RCD',
      t.afddButton === 'operates' ? 'Operates' : t.afddButton === 'fails' ? 'Fails' : text(c.afddStandard) ? 'Not tried' : 'No AFDD',
    ],
  };
}

/**
 * An electrical installation certificate in Wiretrail's own layout, carrying the information of the model form in
 * BS 7671 Appendix 6: the work and who answers for it, the supply and the origin, the schedule of inspections and
 * the schedule of circuit details and test results for every circuit of the board concerned. Landscape, so the
 * schedule's columns stay readable.
 */
export async function installationCertificatePdf({ issue, file, content, rules, signature, particulars: p }: InstallationCertificatePdf): Promise<Buffer> {
  const tz = file.organisation.timeZone;
  const layout = await startJobDocument({
    title: INSTALLATION_CERTIFICATE_TITLE,
    subtitle: 'New work designed, constructed, inspected and tested',
    issue,
    file,
    landscape: true,
  });
  const { visits } = content;
  const completedOn = dateWords(content.completedOn, tz) || content.completedOn;

  layout.heading('The work');
  const described = visits.map((v) => text(v.workDescription)).filter(Boolean);
  layout.paragraph(described.length ? described.join('\n\n') : joined([file.job.title, file.job.description], '. '));
  layout.fields(
    [
      ['Extent of the work', WORK_EXTENT_WORDS[p.extent]],
      ['What the certificate covers', p.extentWords],
      ['Boards concerned', content.boards.map((b) => text(b.name)).join(', ')],
      ['Completed on', completedOn],
      ['Standard it was done to', `${rules.edition}, in force on ${completedOn}`],
      ['Next inspection recommended', `Within ${p.nextInspectionYears} year${p.nextInspectionYears === 1 ? '' : 's'}`],
    ],
    3,
  );

  layout.heading('Supply characteristics and earthing arrangements');
  const s = p.supply;
  layout.fields(
    [
      ['System type', s.system],
      ['Live conductors', s.liveConductors],
      ['Nominal voltage and frequency', `${s.nominalVoltageV} V, ${s.frequencyHz} Hz`],
      ['Prospective fault current', unit(s.pfcKa, 'kA')],
      ['External earth fault loop impedance Ze', unit(s.zeOhm, 'Ω')],
      ['Supply protective device', joined([s.deviceStandard, s.deviceType, s.deviceRatingA === null ? '' : `${s.deviceRatingA} A`], ', ')],
    ],
    3,
  );

  layout.heading('Particulars at the origin');
  const o = p.origin;
  layout.fields(
    [
      ['Main switch', joined([o.mainSwitchStandard, o.mainSwitchRatingA === null ? '' : `${o.mainSwitchRatingA} A`, o.mainSwitchPoles === null ? '' : `${o.mainSwitchPoles} poles`], ', ')],
      ['Main switch as an RCD', o.mainSwitchRcdMa === null ? 'Not an RCD' : `${o.mainSwitchRcdMa} mA`],
      ['Earthing conductor', `${unit(o.earthingConductorCsaMm2, 'mm²')}, continuity ${yes(o.earthingConductorContinuity).toLowerCase()}`],
      ['Main protective bonding conductors', `${unit(o.bondingCsaMm2, 'mm²')}, continuity ${yes(o.bondingContinuity).toLowerCase()}`],
      ['Earth electrode', s.system === 'TT' ? joined([o.electrodeType, o.electrodeOhm === null ? '' : `${o.electrodeOhm} Ω`], ', ') : 'None (not a TT system)'],
    ],
    3,
  );

  layout.heading(`Comments on the existing installation (${EXISTING_INSTALLATION_REG})`);
  layout.paragraph(p.existingInstallationComments || 'None.');
  departuresTable(layout, content.departures);

  layout.heading('Schedule of inspections');
  layout.table(
    [
      { header: 'Group', width: 1.2 },
      { header: 'Item inspected', width: 3.4 },
      { header: 'Regulation', width: 1.2 },
      { header: 'Outcome', width: 1 },
      { header: 'Limitation', width: 2 },
    ],
    INSPECTION_ITEMS.map((it) => {
      const mark = content.inspections[it.id];
      return { cells: [it.group, it.words, it.regulation, { text: mark ? INSPECTION_MARK_WORDS[mark.state] : '', weight: 'medium' }, mark?.note ?? ''] };
    }),
  );
  layout.paragraph(`Items from ${INSPECTION_ITEMS_SOURCE}.`, 'regular', INK.muted, 7.5);

  layout.heading('Schedule of circuit details');
  layout.table(
    // Wide enough that no header word breaks.
    CIRCUIT_DETAIL_COLUMNS.map((header, i) => ({ header, width: i === 1 ? 2.2 : header.startsWith('Max disconnection') ? 1.4 : 1 })),
    content.schedule.map(detailRow),
  );
  layout.heading('Schedule of test results');
  layout.paragraph(`Test instruments: ${content.instruments.join('; ')}.`, 'medium');
  layout.table(
    TEST_RESULT_COLUMNS.map((header) => ({ header, width: 1 })),
    content.schedule.map(resultRow),
  );

  for (const sc of content.schedule) {
    if (!sc.tested) continue;
    judgedReadings(layout, `Test results judged: ${circuitName(sc.circuit)}`, sc.tested, tz);
  }

  const signer = visits[visits.length - 1]!;
  layout.ensure(240);
  layout.heading('Design, construction, inspection and testing');
  layout.paragraph(installationDeclaration(rules.edition, completedOn), 'medium');
  const same = p.designedBy === p.constructedBy && p.constructedBy === p.inspectedBy;
  const signedFor = same ? 'for design, construction, and inspection and testing' : 'for the inspection and testing';
  layout.signedBeside(
    [
      ['Design', p.designedBy],
      ['Construction', p.constructedBy],
      ['Inspection and testing', p.inspectedBy],
      ['Signed on site', `${String(signer.signedByName)}, ${dateTimeWords(signer.signedAt, tz)}`],
      ['For', file.organisation.name],
    ],
    signature,
    `Signature of ${String(signer.signedByName)} ${signedFor}, drawn on the phone at sign-off`,
  );

  const verdicts = content.schedule.filter((x) => x.tested).map((x) => `${text(x.circuit.number)}: ${VERDICT_WORDS[x.tested!.assessment.verdict]}`);
  layout.paragraph(`Verdicts by circuit: ${verdicts.join(', ')}. Limits applied are those of ${rules.edition}.`, 'regular', VERDICT_INK.pass, 7.5);
  issuedBy(layout, issue, file);
  return layout.finish();
}
