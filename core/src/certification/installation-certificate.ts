/**
 * The electrical installation certificate: which certificate a job's work needs, the schedule of inspections, the
 * schedule of circuit details and test results for every circuit of the board concerned (with each circuit's maximum
 * permitted Zs), the particulars the office fills in, and every reason it cannot be issued. The phone's sign-off and
 * the office's issue dialog show this; the server works it out again from the records before it issues.
 *
 * The certificate's information is that of the model form in BS 7671:2018+A2:2022 Appendix 6; the layout and the
 * words are our own.
 */
import { InvalidInputError } from '../check.js';
import { maxZs } from '../electrical/earth-fault-loop.js';
import { maxZsForRcd } from '../electrical/rcd.js';
import type { DisconnectionTimeS, ProtectiveDevice, RuleSet } from '../rules/rule-set.js';
import { EARTHING_ARRANGEMENTS, INSPECTION_MARK_STATES, type InspectionMark, type InspectionMarks } from '../sync/entities.js';
import { type CertifiedCircuit, judgeCircuitWork, judgeMinorWorks, READINGS_ADVICE, type MinorWorksFinding, type MinorWorksJudgement, type MinorWorksRecords } from './minor-works.js';
import { circuitName, type LooseRowOf, type TestResultRecord, textOf } from './circuit-records.js';

type VisitRecord = LooseRowOf<'visit'>;
type CircuitRecord = LooseRowOf<'circuit'>;
type BoardRecord = LooseRowOf<'board'>;

// ─── Which certificate applies ───────────────────────────────────────────────

export type CertificateKind = 'installation-certificate' | 'minor-works';

export const CERTIFICATE_CHOICE_SOURCE =
  'BS 7671:2018+A2:2022 Regs 644.1 and 644.4.201 and the notes to the model forms in Appendix 6 (from memory): a minor works certificate covers an addition or alteration that does not extend to a new circuit; a new circuit or a consumer unit replacement takes an electrical installation certificate';

export interface CertificateChoice {
  readonly kind: CertificateKind;
  /** What was recorded that decides it, one sentence each. */
  readonly reasons: string[];
  /** The whole of it, as the phone and the office show it. */
  readonly sentence: string;
  readonly source: string;
}

export const CERTIFICATE_WORDS: Record<CertificateKind, string> = {
  'installation-certificate': 'Electrical installation certificate',
  'minor-works': 'Minor works certificate',
};

/**
 * Which certificate the work on these visits needs: an electrical installation certificate when a circuit was
 * installed new or a board replaced on one of them, otherwise a minor works certificate.
 */
export function certificateThatApplies(records: {
  readonly visitIds: readonly string[];
  readonly circuits: readonly CircuitRecord[];
  readonly boards: readonly BoardRecord[];
}): CertificateChoice {
  const on = new Set(records.visitIds);
  const reasons = [
    ...records.boards.filter((b) => on.has(textOf(b.replacedOnVisitId))).map((b) => `Board ${textOf(b.name) || '?'} was replaced.`),
    ...records.circuits.filter((c) => on.has(textOf(c.newOnVisitId))).map((c) => `${circuitName(c)} was installed as a new circuit.`),
  ];
  if (reasons.length) {
    return {
      kind: 'installation-certificate',
      reasons,
      sentence: `${reasons.join(' ')} That work needs an electrical installation certificate, not a minor works certificate.`,
      source: CERTIFICATE_CHOICE_SOURCE,
    };
  }
  const reason = 'No circuit was installed new and no board was replaced: the work is an addition or alteration to existing circuits.';
  return { kind: 'minor-works', reasons: [reason], sentence: `${reason} That needs a minor works certificate.`, source: CERTIFICATE_CHOICE_SOURCE };
}

// ─── Schedule of inspections ─────────────────────────────────────────────────

export interface InspectionItem {
  readonly id: string;
  /** The group it belongs to, as the schedule heads it. */
  readonly group: string;
  readonly words: string;
  /** Where the standard asks for it (chapter or regulation numbers from memory). */
  readonly regulation: string;
}

export const INSPECTION_ITEMS_SOURCE =
  'BS 7671:2018+A2:2022 Appendix 6, schedule of inspections for new installation work, and Reg 642.3 (items grouped and worded our own way; regulation numbers from memory)';

const item = (id: string, group: string, words: string, regulation: string): InspectionItem => ({ id, group, words, regulation });

/** The items a new installation's schedule of inspections covers, in the order the form lists them. */
export const INSPECTION_ITEMS: readonly InspectionItem[] = [
  item('intake', 'Supply and intake', 'Condition of the intake equipment seen from outside (service head, meter tails, isolator)', 'Reg 132.16'),
  item('alternative-supply', 'Supply and intake', 'Parallel or switched alternative sources of supply', 'Section 551'),
  item('earthing', 'Protective earthing and bonding', 'Earthing conductor and its connection at the main earthing terminal', 'Regs 542.3, 542.4'),
  item('main-bonding', 'Protective earthing and bonding', 'Main protective bonding conductors and their connections', 'Regs 411.3.1.2, 544.1'),
  item('supplementary-bonding', 'Protective earthing and bonding', 'Supplementary bonding where required', 'Reg 415.2, Section 701'),
  item('basic-protection', 'Protection against electric shock', 'Basic protection: insulation of live parts, barriers and enclosures', 'Section 416'),
  item('other-measures', 'Protection against electric shock', 'Protective measures other than automatic disconnection (SELV, PELV, double insulation, electrical separation)', 'Sections 412 to 414'),
  item('additional-protection', 'Protection against electric shock', 'Additional protection by 30 mA RCDs where required', 'Regs 411.3.3, 411.3.4, 415.1'),
  item('board-fixing', 'Distribution equipment', 'Working space, security of fixing and enclosure of the board (IP and fire rating)', 'Regs 132.12, 421.1.201'),
  item('main-switch', 'Distribution equipment', 'Presence and operation of the main switch; manual operation of circuit-breakers and RCDs', 'Regs 462.1.201, 537.1'),
  item('circuit-chart', 'Distribution equipment', 'Circuits identified; RCD test notice and other notices fitted', 'Regs 514.8, 514.9, 514.12'),
  item('spd-afdd', 'Distribution equipment', 'Surge protective devices and AFDDs where fitted or required', 'Regs 443.4, 421.1.7'),
  item('conductor-identification', 'Circuits', 'Identification of conductors', 'Section 514'),
  item('cable-support', 'Circuits', 'Cables supported, terminated and protected against damage; connections under no strain', 'Regs 522.8, 526'),
  item('concealed-cables', 'Circuits', 'Cables concealed in walls in permitted zones or otherwise protected', 'Regs 522.6.202 to 522.6.204'),
  item('protective-devices', 'Circuits', 'Protective devices of the right type and rating for the cables they protect', 'Regs 433.1, 434'),
  item('fire-barriers', 'Circuits', 'Fire barriers and sealing where cables pass through walls and floors', 'Reg 527.2'),
  item('segregation', 'Circuits', 'Segregation from other systems and from non-electrical services', 'Regs 528.1 to 528.3'),
  item('isolation', 'Isolation and switching', 'Isolation, switching off for mechanical maintenance and emergency switching', 'Chapter 53, Section 537'),
  item('equipment', 'Current-using equipment', 'Equipment suitable for its place and installed as its maker says', 'Chapter 55'),
  item('special-locations', 'Special locations', 'Locations containing a bath or shower and other special locations', 'Part 7'),
];

export const INSPECTION_MARK_WORDS: Record<(typeof INSPECTION_MARK_STATES)[number], string> = {
  done: 'Done',
  'not-applicable': 'Not applicable',
  limitation: 'Limitation',
};

/** A mark as recorded, or null where the item has none (or an old phone wrote something else). */
export function inspectionMarkOf(marks: unknown, id: string): InspectionMark | null {
  if (typeof marks !== 'object' || marks === null || !Object.prototype.hasOwnProperty.call(marks, id)) return null;
  const mark = (marks as Record<string, unknown>)[id];
  if (typeof mark !== 'object' || mark === null) return null;
  const state = (mark as { state?: unknown }).state;
  if (!INSPECTION_MARK_STATES.some((s) => s === state)) return null;
  return { state: state as InspectionMark['state'], note: textOf((mark as { note?: unknown }).note) || null };
}

/** What is still to do on the schedule of inspections: items not marked, and limitations that do not say what limited them. */
export function inspectionProblems(marks: unknown): { itemId: string; sentence: string }[] {
  return INSPECTION_ITEMS.flatMap((it) => {
    const mark = inspectionMarkOf(marks, it.id);
    if (!mark) return [{ itemId: it.id, sentence: `Inspection “${it.words}” is not marked done, not applicable or limitation.` }];
    if (mark.state === 'limitation' && !mark.note) return [{ itemId: it.id, sentence: `Inspection “${it.words}” is marked as a limitation without saying what limited it.` }];
    return [];
  });
}

/** The marks the certificate takes from several visits: for each item, the latest signed visit that marked it. */
export function mergedInspectionMarks(visits: readonly VisitRecord[]): InspectionMarks {
  const merged: Record<string, InspectionMark> = {};
  for (const visit of visits) {
    for (const it of INSPECTION_ITEMS) {
      const mark = inspectionMarkOf(visit.inspectionMarks, it.id);
      if (mark) merged[it.id] = mark;
    }
  }
  return merged;
}

// ─── Maximum permitted Zs on the schedule ────────────────────────────────────

export interface ScheduleMaxZs {
  readonly ohm: number;
  readonly source: string;
  /** What the limit comes from, as the schedule says it. */
  readonly basis: string;
}

/**
 * The maximum permitted Zs the schedule states for a circuit: Table 41.5 (50 V / IΔn) where its RCD gives fault
 * protection, otherwise the table for its overcurrent device at the circuit's disconnection time (0.4 s unless 5 s is
 * recorded). Null, with the reason, where the device or its rating is not recorded or not tabulated.
 */
export function scheduleMaxZs(circuit: CircuitRecord, rules: RuleSet): ScheduleMaxZs | { readonly ohm: null; readonly reason: string } {
  const rcdMa = typeof circuit.rcdRatingMa === 'number' ? circuit.rcdRatingMa : null;
  if (circuit.faultProtection === 'rcd') {
    if (rcdMa === null) return { ohm: null, reason: 'Fault protection by RCD, but no RCD rating is recorded.' };
    try {
      return { ohm: maxZsForRcd({ ratedMa: rcdMa }, rules), source: rules.rcd.maxZsByRatedMa.source, basis: `${rcdMa} mA RCD` };
    } catch (err) {
      if (err instanceof InvalidInputError) return { ohm: null, reason: `No tabulated maximum for a ${rcdMa} mA RCD.` };
      throw err;
    }
  }
  const device = textOf(circuit.deviceType);
  const rating = typeof circuit.deviceRatingA === 'number' ? circuit.deviceRatingA : null;
  if (!device || rating === null) return { ohm: null, reason: 'The protective device or its rating is not recorded.' };
  const seconds: DisconnectionTimeS = circuit.maxDisconnectionS === 5 ? 5 : 0.4;
  const breakers = rules.earthFaultLoop.circuitBreakers;
  const fuses = rules.earthFaultLoop.fuses as Readonly<Record<string, { source: string }>>;
  const table = device === 'B' || device === 'C' || device === 'D' ? breakers[device] : Object.prototype.hasOwnProperty.call(fuses, device) ? fuses[device] : undefined;
  try {
    const ohm = maxZs({ device: device as ProtectiveDevice, ratingA: rating, disconnectionS: seconds }, rules);
    const kind = /^[BCD]$/.test(device) ? `type ${device} circuit-breaker` : `${device} fuse`;
    return { ohm, source: table?.source ?? rules.id, basis: `${rating} A ${kind}, ${seconds} s` };
  } catch (err) {
    if (err instanceof InvalidInputError) return { ohm: null, reason: err.message };
    throw err;
  }
}

// ─── The particulars the office fills in ─────────────────────────────────────

export const WORK_EXTENTS = ['new-installation', 'addition', 'alteration'] as const;
export type WorkExtent = (typeof WORK_EXTENTS)[number];
export const WORK_EXTENT_WORDS: Record<WorkExtent, string> = {
  'new-installation': 'New installation',
  addition: 'Addition to an existing installation',
  alteration: 'Alteration to an existing installation',
};
export const LIVE_CONDUCTORS = ['single-phase 2-wire', 'two-phase 3-wire', 'three-phase 3-wire', 'three-phase 4-wire'] as const;
export type LiveConductors = (typeof LIVE_CONDUCTORS)[number];

/**
 * What the phone does not record and the office gives at issue: the work's extent, who answers for it, the supply and
 * the origin. A type, not an interface, so that it is a plain JSON value the document row may keep.
 */
export type InstallationParticulars = {
  extent: WorkExtent;
  /** The extent of the work covered, in words. */
  extentWords: string;
  /** Design, construction, and inspection and testing: one person may answer for all three. */
  designedBy: string;
  constructedBy: string;
  inspectedBy: string;
  /** Years to the next inspection recommended. */
  nextInspectionYears: number;
  /** Comments on the existing installation (Reg 644.1.2), starting from what the sign-offs recorded. */
  existingInstallationComments: string;
  supply: {
    system: (typeof EARTHING_ARRANGEMENTS)[number];
    liveConductors: LiveConductors;
    nominalVoltageV: number;
    frequencyHz: number;
    pfcKa: number | null;
    zeOhm: number | null;
    deviceStandard: string;
    deviceType: string;
    deviceRatingA: number | null;
  };
  origin: {
    mainSwitchStandard: string;
    mainSwitchRatingA: number | null;
    mainSwitchPoles: number | null;
    /** Where the main switch is an RCD: its rated residual current (mA). */
    mainSwitchRcdMa: number | null;
    earthingConductorCsaMm2: number | null;
    earthingConductorContinuity: boolean;
    bondingCsaMm2: number | null;
    bondingContinuity: boolean;
    /** For TT: the earth electrode's type and resistance to earth. */
    electrodeType: string;
    electrodeOhm: number | null;
  };
};

/**
 * Particulars as the office would start from: the site's earthing, Ze and PFC as last recorded on site, the signer as
 * the person who answers for design, construction and testing (a one-person business signs all three), common values
 * for a single-phase domestic supply (230 V, 50 Hz, 100 A main switch, 16 mm² earthing and 10 mm² bonding conductors:
 * common trade practice, not a requirement), and the recommended interval of 10 years for a dwelling (IET Guidance
 * Note 3, Table 3.2, from memory).
 */
export function defaultParticulars(input: {
  readonly site: LooseRowOf<'site'>;
  readonly signer: string;
  readonly choice: CertificateChoice;
  readonly boardReplaced: boolean;
  readonly existingComments: readonly string[];
}): InstallationParticulars {
  const { site } = input;
  const earthing = EARTHING_ARRANGEMENTS.find((e) => e === site.earthing) ?? 'TN-C-S';
  const tt = earthing === 'TT';
  return {
    extent: input.boardReplaced ? 'alteration' : 'addition',
    extentWords: input.choice.reasons.join(' '),
    designedBy: input.signer,
    constructedBy: input.signer,
    inspectedBy: input.signer,
    nextInspectionYears: 10,
    existingInstallationComments: input.existingComments.join('\n\n'),
    supply: {
      system: earthing,
      liveConductors: 'single-phase 2-wire',
      nominalVoltageV: 230,
      frequencyHz: 50,
      pfcKa: typeof site.pfcKa === 'number' ? site.pfcKa : null,
      zeOhm: typeof site.zeOhm === 'number' ? site.zeOhm : null,
      deviceStandard: 'BS 88-3',
      deviceType: 'Cartridge fuse',
      deviceRatingA: 100,
    },
    origin: {
      mainSwitchStandard: 'BS EN 60947-3',
      mainSwitchRatingA: 100,
      mainSwitchPoles: 2,
      mainSwitchRcdMa: null,
      earthingConductorCsaMm2: 16,
      earthingConductorContinuity: site.earthingConductor === 'adequate',
      bondingCsaMm2: 10,
      bondingContinuity: site.bondingWater === 'adequate' || site.bondingGas === 'adequate',
      electrodeType: tt ? 'Rod' : '',
      electrodeOhm: null,
    },
  };
}

/** Every reason the particulars cannot go on a certificate, each naming its field; empty when they can. */
export function particularsProblems(p: InstallationParticulars): string[] {
  const problems: string[] = [];
  const need = (ok: boolean, field: string, words: string) => {
    if (!ok) problems.push(`${field}: ${words}`);
  };
  const named = (v: unknown) => typeof v === 'string' && v.trim().length > 0;
  const positive = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v > 0;
  need(WORK_EXTENTS.includes(p.extent), 'extent', `say whether the work is ${WORK_EXTENTS.join(', ')}.`);
  need(named(p.extentWords), 'extentWords', 'describe the extent of the work the certificate covers.');
  need(named(p.designedBy), 'designedBy', 'name who answers for the design.');
  need(named(p.constructedBy), 'constructedBy', 'name who answers for the construction.');
  need(named(p.inspectedBy), 'inspectedBy', 'name who answers for the inspection and testing.');
  need(Number.isInteger(p.nextInspectionYears) && p.nextInspectionYears >= 1 && p.nextInspectionYears <= 10, 'nextInspectionYears', 'give the years to the next inspection, from 1 to 10.');
  const s = p.supply;
  need(EARTHING_ARRANGEMENTS.includes(s.system), 'supply.system', `give the system type (${EARTHING_ARRANGEMENTS.join(', ')}).`);
  need(LIVE_CONDUCTORS.includes(s.liveConductors), 'supply.liveConductors', 'give the number and type of live conductors.');
  need(positive(s.nominalVoltageV) && s.nominalVoltageV <= 1000, 'supply.nominalVoltageV', 'give the nominal voltage, up to 1000 V.');
  need(s.frequencyHz === 50 || s.frequencyHz === 60, 'supply.frequencyHz', 'give the frequency, 50 or 60 Hz.');
  need(positive(s.pfcKa) && s.pfcKa! <= 100, 'supply.pfcKa', 'give the prospective fault current as measured or enquired, in kA.');
  need(positive(s.zeOhm) && s.zeOhm! <= 1000, 'supply.zeOhm', 'give Ze as measured or enquired, in Ω.');
  need(named(s.deviceStandard), 'supply.deviceStandard', 'give the supply protective device’s BS (EN) number.');
  need(positive(s.deviceRatingA), 'supply.deviceRatingA', 'give the supply protective device’s rating.');
  const o = p.origin;
  need(named(o.mainSwitchStandard), 'origin.mainSwitchStandard', 'give the main switch’s BS (EN) number.');
  need(positive(o.mainSwitchRatingA), 'origin.mainSwitchRatingA', 'give the main switch’s rating.');
  need(Number.isInteger(o.mainSwitchPoles) && o.mainSwitchPoles! >= 1 && o.mainSwitchPoles! <= 4, 'origin.mainSwitchPoles', 'give the main switch’s number of poles, 1 to 4.');
  need(o.mainSwitchRcdMa === null || positive(o.mainSwitchRcdMa), 'origin.mainSwitchRcdMa', 'leave empty, or give the RCD main switch’s rated residual current.');
  need(positive(o.earthingConductorCsaMm2), 'origin.earthingConductorCsaMm2', 'give the earthing conductor’s cross-section.');
  need(o.earthingConductorContinuity === true, 'origin.earthingConductorContinuity', 'the earthing conductor’s continuity must be verified before a certificate is issued.');
  need(positive(o.bondingCsaMm2), 'origin.bondingCsaMm2', 'give the main protective bonding conductors’ cross-section.');
  need(o.bondingContinuity === true, 'origin.bondingContinuity', 'the main protective bonding conductors’ continuity must be verified before a certificate is issued.');
  if (s.system === 'TT') {
    need(named(o.electrodeType), 'origin.electrodeType', 'a TT installation needs its earth electrode’s type.');
    need(positive(o.electrodeOhm), 'origin.electrodeOhm', 'a TT installation needs its earth electrode’s resistance to earth.');
  }
  return problems;
}

// ─── The judgment ────────────────────────────────────────────────────────────

export interface ScheduledCircuit<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord> {
  readonly circuit: Circuit;
  readonly board: BoardRecord;
  /** Installed new on the visits judged (the rest of the board is existing). */
  readonly isNew: boolean;
  /** The latest test on the visits judged, and its assessment; null where untested. */
  readonly tested: CertifiedCircuit<Visit, Test, Circuit> | null;
  readonly maxZs: ReturnType<typeof scheduleMaxZs>;
}

export interface InstallationJudgement<Visit extends VisitRecord = VisitRecord, Test extends TestResultRecord = TestResultRecord, Circuit extends CircuitRecord = CircuitRecord>
  extends MinorWorksJudgement<Visit, Test, Circuit> {
  readonly choice: CertificateChoice;
  /** The boards with a new circuit or replaced on the visits judged. */
  readonly boards: BoardRecord[];
  readonly schedule: ScheduledCircuit<Visit, Test, Circuit>[];
  readonly inspections: InspectionMarks;
  /** The instruments the scheduled circuits were tested with. */
  readonly instruments: string[];
}

/** A new circuit's details that the schedule needs filled in, in the words a refusal uses. */
const NEW_CIRCUIT_DETAILS: readonly [keyof CircuitRecord & string, string][] = [
  ['wiringType', 'type of wiring'],
  ['referenceMethod', 'reference method'],
  ['pointsServed', 'number of points served'],
  ['deviceStandard', 'protective device’s BS (EN) number'],
  ['deviceBreakingKa', 'protective device’s breaking capacity'],
];

function finding(kind: MinorWorksFinding['kind'], what: string, sentence: string, circuitId: string | null = null): MinorWorksFinding {
  return { kind, what, detail: sentence, sentence, circuitId, line: null };
}

/**
 * The installation certificate for a job: its signed visits judged as the minor works certificate judges them
 * (every reading again, none waived), then every circuit of each board concerned scheduled and tested, the new
 * circuits' details complete, the schedule of inspections marked, an instrument named, and, when given, the
 * office's particulars complete. Work with no new circuit and no replaced board is refused: it is minor works.
 */
export function judgeInstallationCertificate<V extends VisitRecord, T extends TestResultRecord, C extends CircuitRecord>(
  records: MinorWorksRecords<V, T, C> & { readonly boards: readonly BoardRecord[] },
  particulars: InstallationParticulars | null,
  rules?: RuleSet,
  /** The phone's sign-off judges its own visit before it is signed; the server only ever judges signed visits. */
  o: { readonly beforeSigning?: boolean } = {},
): InstallationJudgement<V, T, C> {
  const base = o.beforeSigning ? judgeCircuitWork(records, rules) : judgeMinorWorks(records, rules);
  const visitIds = base.visits.map((v) => v.id);
  const choice = certificateThatApplies({ visitIds, circuits: records.circuits, boards: records.boards });
  const empty = { choice, boards: [], schedule: [], inspections: {}, instruments: [] };
  if (!base.rules || base.findings.some((f) => f.kind === 'not-signed')) return { ...base, ...empty };

  const findings = base.findings.filter((f) => f.kind !== 'new-circuit' && f.kind !== 'board-replaced');
  if (choice.kind === 'minor-works') {
    const sentence = `${choice.reasons[0]} An installation certificate is not the certificate for it: issue a minor works certificate.`;
    findings.unshift(finding('not-installation-work', 'Not installation work', sentence));
  }

  const judged = new Set(visitIds);
  const concerned = new Set([
    ...records.boards.filter((b) => judged.has(textOf(b.replacedOnVisitId))).map((b) => b.id),
    ...records.circuits.filter((c) => judged.has(textOf(c.newOnVisitId))).map((c) => textOf(c.boardId)),
  ]);
  const boards = records.boards.filter((b) => concerned.has(b.id)).sort((a, b) => textOf(a.name).localeCompare(textOf(b.name), 'en-GB'));
  const tested = new Map(base.circuits.map((c) => [c.circuit.id, c]));
  const schedule: ScheduledCircuit<V, T, C>[] = [];
  for (const board of boards) {
    const ofBoard = records.circuits
      .filter((c) => c.boardId === board.id)
      .sort((a, b) => textOf(a.number).localeCompare(textOf(b.number), 'en-GB', { numeric: true }));
    if (!ofBoard.length) findings.push(finding('no-circuit', `Board ${textOf(board.name)}`, `Board ${textOf(board.name) || '?'} has no circuits recorded to schedule.`));
    for (const circuit of ofBoard) {
      const isNew = judged.has(textOf(circuit.newOnVisitId));
      const test = tested.get(circuit.id) ?? null;
      const name = circuitName(circuit);
      if (!test) {
        findings.push(finding('untested', name, `${name} on board ${textOf(board.name) || '?'} has no test results on this job: the schedule of an installation certificate covers every circuit of the board.`, circuit.id));
      }
      if (isNew) {
        const lacking = NEW_CIRCUIT_DETAILS.filter(([field]) => circuit[field] === null || circuit[field] === undefined || circuit[field] === '').map(([, words]) => words);
        if (lacking.length) findings.push(finding('details-missing', name, `${name} is new and its details lack the ${lacking.join(', ')}.`, circuit.id));
      }
      schedule.push({ circuit, board, isNew, tested: test, maxZs: scheduleMaxZs(circuit, base.rules) });
    }
  }

  const inspections = mergedInspectionMarks(base.visits);
  for (const p of inspectionProblems(inspections)) findings.push(finding('inspection', 'Schedule of inspections', p.sentence));

  const instruments = [...new Set(schedule.flatMap((s) => (s.tested && textOf(s.tested.test.instrument) ? [textOf(s.tested.test.instrument)] : [])))];
  if (schedule.some((s) => s.tested) && !instruments.length) {
    findings.push(finding('instruments', 'Test instruments', 'No test instrument is named on the test results: the certificate lists the instruments used.'));
  }
  if (particulars) for (const p of particularsProblems(particulars)) findings.push(finding('particulars', 'Particulars', p));

  const problems = findings.map((f) => f.sentence);
  if (findings.some((f) => f.kind === 'missing' || f.kind === 'unjudged' || f.kind === 'fail')) problems.push(READINGS_ADVICE);
  return { ...base, findings, problems, issuable: problems.length === 0, choice, boards, schedule, inspections, instruments };
}

/**
 * Particulars as they arrive over the wire, kept to the fields the certificate has and their kinds (a figure that is
 * not a number counts as not given), then checked: `particulars` is null when the value is not an object at all.
 */
export function readParticulars(value: unknown): { particulars: InstallationParticulars | null; problems: string[] } {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return { particulars: null, problems: ['particulars: give the certificate’s particulars (supply, origin and who answers for the work).'] };
  const v = value as Record<string, unknown>;
  const part = (key: string): Record<string, unknown> => (typeof v[key] === 'object' && v[key] !== null && !Array.isArray(v[key]) ? (v[key] as Record<string, unknown>) : {});
  const words = (o: Record<string, unknown>, key: string, max = 200) => (typeof o[key] === 'string' ? (o[key] as string).trim().slice(0, max) : '');
  const figure = (o: Record<string, unknown>, key: string) => (typeof o[key] === 'number' && Number.isFinite(o[key]) ? (o[key] as number) : null);
  const s = part('supply');
  const o = part('origin');
  const particulars: InstallationParticulars = {
    extent: WORK_EXTENTS.find((e) => e === v.extent) ?? ('' as WorkExtent),
    extentWords: words(v, 'extentWords', 2000),
    designedBy: words(v, 'designedBy'),
    constructedBy: words(v, 'constructedBy'),
    inspectedBy: words(v, 'inspectedBy'),
    nextInspectionYears: figure(v, 'nextInspectionYears') ?? 0,
    existingInstallationComments: words(v, 'existingInstallationComments', 20_000),
    supply: {
      system: EARTHING_ARRANGEMENTS.find((e) => e === s.system) ?? ('' as InstallationParticulars['supply']['system']),
      liveConductors: LIVE_CONDUCTORS.find((e) => e === s.liveConductors) ?? ('' as LiveConductors),
      nominalVoltageV: figure(s, 'nominalVoltageV') ?? 0,
      frequencyHz: figure(s, 'frequencyHz') ?? 0,
      pfcKa: figure(s, 'pfcKa'),
      zeOhm: figure(s, 'zeOhm'),
      deviceStandard: words(s, 'deviceStandard', 40),
      deviceType: words(s, 'deviceType', 60),
      deviceRatingA: figure(s, 'deviceRatingA'),
    },
    origin: {
      mainSwitchStandard: words(o, 'mainSwitchStandard', 40),
      mainSwitchRatingA: figure(o, 'mainSwitchRatingA'),
      mainSwitchPoles: figure(o, 'mainSwitchPoles'),
      mainSwitchRcdMa: figure(o, 'mainSwitchRcdMa'),
      earthingConductorCsaMm2: figure(o, 'earthingConductorCsaMm2'),
      earthingConductorContinuity: o.earthingConductorContinuity === true,
      bondingCsaMm2: figure(o, 'bondingCsaMm2'),
      bondingContinuity: o.bondingContinuity === true,
      electrodeType: words(o, 'electrodeType', 60),
      electrodeOhm: figure(o, 'electrodeOhm'),
    },
  };
  return { particulars, problems: particularsProblems(particulars) };
}

/**
 * What those who answer for the design, the construction and the inspection and testing of new work declare (the
 * information of the model form's declarations, BS 7671:2018+A2:2022 Appendix 6, in our words), for the edition in
 * force on the completion date. One person may sign for all three.
 */
export function installationDeclaration(edition: string, completedOn: string): string {
  const family = edition.split('+')[0]!.split(':')[0]!.trim();
  const inForce = completedOn ? `${edition}, in force on ${completedOn}` : edition;
  return (
    'Those signing below, for the design, the construction, and the inspection and testing of the installation work described on this certificate, ' +
    `certify that they exercised reasonable skill and care in it; that it was designed, constructed, inspected and tested in accordance with ${inForce}; ` +
    `and that, to the best of their knowledge and belief, it complies with ${family} except for the departures recorded on this certificate.`
  );
}
