import { isTwistedPair, type RuleSet, VERDICT_DISCLAIMER, type WiremapFault } from '@wiretrail/core';
import { CABLING_REPORT_TITLE } from '../../paperwork/document-titles.js';
import type { JobFile } from '../../paperwork/job-file.js';
import { figure, joined, shortDateWords, VERDICT_INK, VERDICT_WORDS } from '../../paperwork/pdf/document-words.js';
import { type Issue, issuedBy, startJobDocument } from '../../paperwork/pdf/job-heading.js';
import type { ScheduledCable } from '../document-content.js';

export interface CablingReportPdf {
  issue: Issue;
  file: JobFile;
  cables: ScheduledCable[];
  rules: RuleSet;
}

const FAULT_WORDS: Record<WiremapFault['kind'], string> = {
  open: 'Open',
  short: 'Short',
  reversed: 'Reversed pair',
  crossed: 'Crossed pair',
  split: 'Split pair',
  miswired: 'Miswired',
};

/** A wiremap fault named with its pins, and the end that departs from the scheme where only one does. */
export function faultWords(f: WiremapFault): string {
  const end = f.end ? ` (${f.end} end)` : '';
  return `${FAULT_WORDS[f.kind]}: pin${f.pins.length === 1 ? '' : 's'} ${f.pins.join(', ')}${end}`;
}

function wiremapWords(c: ScheduledCable): string {
  if (!isTwistedPair(c.run.medium)) return 'Not applicable';
  const w = c.assessment.wiremap;
  if (!w) return 'Not recorded';
  if (w.faults.length === 0) return w.verdict === 'pass' ? 'Correct, pin to pin' : 'Incomplete';
  return w.faults.map(faultWords).join('; ');
}

function endWords(file: JobFile, run: ScheduledCable['run'], end: 'A' | 'B'): string {
  const area = file.areas.get(run[`end${end}AreaId`]);
  const termination = run[`end${end}Termination`];
  return joined([joined([area, run[`end${end}Description`]], ': '), termination ? `(${termination})` : ''], ' ');
}

function lengthWords(c: ScheduledCable): string {
  if (typeof c.run.lengthM !== 'number') return 'Not recorded';
  const limit = c.assessment.length?.limit;
  return `${figure(c.run.lengthM, 'm')}${typeof limit === 'number' ? ` (≤ ${limit} m)` : ''}`;
}

const LINK_WORDS: Record<string, string> = { 'permanent-link': 'Permanent link', channel: 'Channel' };
const MEDIUM_WORDS: Record<string, string> = { coax: 'Coax', speaker: 'Speaker', fibre: 'Fibre', other: 'Other' };

/** The site's cable schedule with each run's test judged, in landscape so one run fits one line. */
export async function cablingReportPdf({ issue, file, cables, rules }: CablingReportPdf): Promise<Buffer> {
  const tz = file.organisation.timeZone;
  const layout = await startJobDocument({ title: CABLING_REPORT_TITLE, subtitle: 'The site’s cable schedule: where each cable runs, how it is terminated and how it tested', issue, file, landscape: true });

  const count = (v: string) => cables.filter((c) => c.assessment.verdict === v).length;
  layout.heading('Cable schedule');
  layout.paragraph(
    `${cables.length === 1 ? '1 cable' : `${cables.length} cables`} on this site: ${count('pass')} pass, ${count('fail')} fail, ${count('check')} to check.`,
  );
  layout.table(
    [
      { header: 'Label', width: 0.7 },
      { header: 'End A', width: 2.1 },
      { header: 'End B', width: 2.1 },
      { header: 'Medium', width: 0.7 },
      { header: 'Scheme', width: 0.7 },
      { header: 'Length', width: 1.3 },
      { header: 'Link', width: 1 },
      { header: 'Wiremap', width: 1.8 },
      { header: 'Verdict', width: 0.7 },
      { header: 'Tested', width: 1 },
    ],
    cables.map((c) => {
      const a = c.assessment;
      const notes = [
        ...(a.wiremap?.faults ?? []).map((f) => f.note),
        ...(a.length && a.length.verdict !== 'pass' ? [a.length.note] : []),
        ...(a.missing.length ? [`Still to record: ${a.missing.join(', ')}.`] : []),
        ...a.problems,
        ...a.notes,
      ];
      return {
        cells: [
          { text: String(c.run.label), weight: 'medium' },
          endWords(file, c.run, 'A'),
          endWords(file, c.run, 'B'),
          (c.run.medium && MEDIUM_WORDS[c.run.medium]) ?? joined([c.run.medium]),
          joined([c.run.scheme]),
          lengthWords(c),
          (c.run.linkKind && LINK_WORDS[c.run.linkKind]) ?? '',
          wiremapWords(c),
          { text: VERDICT_WORDS[a.verdict], weight: 'bold', color: VERDICT_INK[a.verdict] },
          shortDateWords(c.run.testedAt, tz) || 'Not tested',
        ],
        detail: notes.length ? notes.join(' ') : undefined,
      };
    }),
  );

  layout.heading('How the cables were judged');
  layout.paragraph(
    `Wiremaps against ${rules.cabling.wiremapSource} with the ${rules.cabling.pinAssignmentSource}. ` +
      `Lengths of twisted-pair cable against ${rules.cabling.lengthLimitsM['permanent-link'].source}: a permanent link up to ` +
      `${rules.cabling.lengthLimitsM['permanent-link'].value} m and a channel up to ${rules.cabling.lengthLimitsM.channel.value} m. ` +
      'Coax, speaker, HDMI and fibre runs are listed with their length; judge them against the maker’s figures.',
  );
  layout.notice('About the verdicts in this report', VERDICT_DISCLAIMER);
  issuedBy(layout, issue, file);
  return layout.finish();
}
