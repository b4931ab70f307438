import { checkWords, isTwistedPair, parameterWords, type RuleSet, type Verdict, VERDICT_DISCLAIMER, type WiremapFault } from '@wiretrail/core';
import { CABLING_CERTIFICATION_TITLE, CABLING_REPORT_TITLE } from '../../paperwork/document-titles.js';
import type { JobFile } from '../../paperwork/job-file.js';
import { figure, joined, shortDateWords, VERDICT_INK } from '../../paperwork/pdf/document-words.js';
import { type Issue, issuedBy, startJobDocument } from '../../paperwork/pdf/job-heading.js';
import { certifiesEveryLink, type ScheduledCable } from '../document-content.js';

export interface CablingReportPdf {
  issue: Issue;
  file: JobFile;
  cables: ScheduledCable[];
  rules: RuleSet;
  /** The cables of the job's visits, or the site's whole schedule as the office chose at issue. */
  coverage: 'job' | 'site';
}

/**
 * Only wiremap and length are recorded, so a cable is never said to "pass": that word belongs to a performance test
 * (insertion loss, NEXT, return loss) against its category, which this record is not.
 */
const RESULT_WORDS: Record<Verdict, string> = { pass: 'Correct', fail: 'Fault', check: 'To check' };

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

const PERFORMANCE_WORDS: Record<Verdict, string> = { pass: 'Pass', fail: 'Fail', check: 'To check' };
const RECORD_PERFORMANCE_WORDS: Record<Verdict, string> = { pass: 'within the limits as reported', fail: 'outside the limits', check: 'to check' };

/** The report's title: a certification only when every link has passing results to a named limit set. */
export function cablingReportTitle(cables: readonly ScheduledCable[]): string {
  return certifiesEveryLink(cables) ? CABLING_CERTIFICATION_TITLE : CABLING_REPORT_TITLE;
}

function testerWords(c: ScheduledCable, tz: string): string {
  const t = c.linkTest;
  if (!t) return '';
  const tester = joined([t.testerMake, t.testerModel], ' ');
  return joined([tester, t.testerSerial ? `serial ${t.testerSerial}` : '', t.calibratedOn ? `calibrated ${t.calibratedOn}` : '', t.adapter ? `adapter ${t.adapter}` : '', shortDateWords(t.testedAt, tz) ? `tested ${shortDateWords(t.testedAt, tz)}` : ''], ', ');
}

/** Every parameter's worst margin (or value against its limit), for the line under the link. */
function parameterLine(c: ScheduledCable): string {
  const p = c.performance;
  if (!p) return 'No performance results recorded.';
  const checks = p.checks.map((k) => `${'budget' in k ? k.name : parameterWords(k.name)} ${checkWords(k)}${'withinAccuracy' in k && k.withinAccuracy ? ' (within the tester’s accuracy)' : ''}${k.verdict === 'fail' ? ' FAIL' : ''}`);
  const inspections = p.inspections.map((k) => `${k.name}: ${k.note}`);
  return [...checks, ...inspections, ...p.problems].join('; ') || 'No results reported.';
}

/** The cables' schedule with each run's wiremap and length judged, in landscape so one run fits one line. */
export async function cablingReportPdf({ issue, file, cables, rules, coverage }: CablingReportPdf): Promise<Buffer> {
  const tz = file.organisation.timeZone;
  const certification = certifiesEveryLink(cables);
  const layout = await startJobDocument({
    title: cablingReportTitle(cables),
    subtitle: certification
      ? 'Each link’s performance results against its named limit set, with its wiremap and length'
      : 'Where each cable runs, how it is terminated, its wiremap and its length',
    issue,
    file,
    landscape: true,
  });

  if (certification) {
    layout.heading('Links and their performance results');
    layout.paragraph(
      `${cables.length === 1 ? 'The link' : `All ${cables.length} links`} in this report ${cables.length === 1 ? 'has' : 'have'} performance results to a named limit set, and each passes it. ` +
        'Under each link: every parameter’s worst margin to the limit line (dB, or Ω for DC resistance unbalance), or its value against the standard’s own limit.',
    );
    layout.table(
      [
        { header: 'Label', width: 0.8 },
        { header: 'Limit set', width: 3 },
        { header: 'Tester', width: 4 },
        { header: 'Result', width: 0.8 },
      ],
      cables.map((c) => ({
        cells: [
          { text: String(c.run.label), weight: 'medium' },
          c.performance?.against ?? '',
          testerWords(c, tz),
          { text: PERFORMANCE_WORDS[c.performance!.verdict], weight: 'bold', color: VERDICT_INK[c.performance!.verdict] },
        ],
        detail: parameterLine(c),
      })),
    );
    if (cables.some((c) => c.performance?.anyWithinAccuracy)) {
      layout.paragraph(
        '“Within the tester’s accuracy” is our own term: the tester reported the result so close to the limit that it cannot tell it from the limit. The result is recorded as the tester gave it.',
      );
    }
  }

  const count = (v: string) => cables.filter((c) => c.assessment.verdict === v).length;
  const cablesWord = cables.length === 1 ? '1 cable' : `${cables.length} cables`;
  layout.heading('Cable schedule');
  layout.paragraph(
    `${cablesWord} ${coverage === 'site' ? 'on this site (the site’s whole schedule)' : 'recorded or tested on this job’s visits'}: ` +
      `${count('pass')} correct, ${count('fail')} with a fault, ${count('check')} to check.`,
  );
  const faulty = cables.filter((c) => c.assessment.verdict === 'fail').map((c) => String(c.run.label));
  if (faulty.length) layout.paragraph(`Fault found on ${faulty.join(', ')}: see the notes under ${faulty.length === 1 ? 'that cable' : 'those cables'}.`);
  if (!certification) {
    layout.paragraph(
      'This record gives each cable’s wiremap and length. It is not a certification to any category or class: not every link here has passing performance results to a named limit set.',
    );
  }
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
      { header: 'Result', width: 0.7 },
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
        // Not "Pass": in a record that certifies nothing, that word would read as a category certification.
        ...(!certification && c.performance ? [`Performance results (${c.performance.against ?? 'no limit set named'}): ${RECORD_PERFORMANCE_WORDS[c.performance.verdict]}. ${parameterLine(c)}`] : []),
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
          { text: RESULT_WORDS[a.verdict], weight: 'bold', color: VERDICT_INK[a.verdict] },
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
      'Coax, speaker, HDMI and fibre runs are listed with their length; judge them against the maker’s figures.' +
      (cables.some((c) => c.performance)
        ? ' Performance results as the field tester reported them: a margin below zero fails; propagation delay, delay skew, DC loop resistance and pair length against ANSI/TIA-568.2-D or ISO/IEC 11801-1 limits; fibre loss against an ANSI/TIA-568.3-D Tier 1 budget.'
        : ''),
  );
  layout.notice('About the verdicts in this report', VERDICT_DISCLAIMER);
  issuedBy(layout, issue, file);
  return layout.finish();
}
