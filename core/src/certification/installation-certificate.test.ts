import { describe, expect, it } from 'vitest';
import { UK_BS7671_2018_A2_2022 } from '../rules/uk-bs7671-2018-a2-2022.js';
import type { InspectionMarks } from '../sync/entities.js';
import type { LooseRowOf, TestResultRecord } from './circuit-records.js';
import {
  certificateThatApplies,
  defaultParticulars,
  INSPECTION_ITEMS,
  inspectionProblems,
  type InstallationParticulars,
  judgeInstallationCertificate,
  particularsProblems,
  readParticulars,
  scheduleMaxZs,
} from './installation-certificate.js';
import { judgeMinorWorks } from './minor-works.js';

const rules = UK_BS7671_2018_A2_2022;
const ALL_DONE: InspectionMarks = Object.fromEntries(INSPECTION_ITEMS.map((i) => [i.id, { state: 'done' as const }]));
const SIGNED: LooseRowOf<'visit'> = {
  id: 'v1', status: 'finished', signedByName: 'Aled Pryce', signedAt: '2026-03-14T10:48:00.000Z', signatureSvg: '<svg/>', inspectionMarks: ALL_DONE,
};
const BOARD: LooseRowOf<'board'> = { id: 'b1', name: 'Consumer unit' };
const RING: LooseRowOf<'circuit'> = { id: 'c2', boardId: 'b1', number: '2', description: 'Sockets', kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
const RADIAL: LooseRowOf<'circuit'> = {
  id: 'c7', boardId: 'b1', number: '7', description: 'Garden office', kind: 'radial', deviceType: 'B', deviceRatingA: 20, rcdRatingMa: 30, rcdType: 'A',
  liveCsaMm2: 2.5, cpcCsaMm2: 1.5, newOnVisitId: 'v1', wiringType: 'SWA', referenceMethod: 'C', pointsServed: 1, deviceStandard: 'BS EN 61009-1', deviceBreakingKa: 6,
};
// Readings that pass: insulation at 500 V against 1.0 MΩ (BS 7671:2018+A2:2022 Table 64); RCD 22 ms against 300 ms
// (Reg 643.8); Zs against 80 % of Table 41.3 (Appendix 3, trade practice): B32 1.37 → 1.10 Ω, B20 2.19 → 1.75 Ω.
const RING_TEST: TestResultRecord = {
  id: 't2', visitId: 'v1', circuitId: 'c2', testedAt: '2026-03-14T10:30:00.000Z', instrument: 'Multifunction tester MFT-1',
  r1Ohm: 0.52, rnOhm: 0.53, r2Ohm: 0.86, r1r2Ohm: 0.35, irLiveLiveMOhm: 299, irLiveEarthMOhm: 250, irTestVoltageV: 500, polarity: 'correct', zsOhm: 0.63, rcdTripMs: 22,
};
const RADIAL_TEST: TestResultRecord = {
  id: 't7', visitId: 'v1', circuitId: 'c7', testedAt: '2026-03-14T10:40:00.000Z', instrument: 'Multifunction tester MFT-1',
  r1r2Ohm: 0.31, irLiveLiveMOhm: 299, irLiveEarthMOhm: 299, irTestVoltageV: 500, polarity: 'correct', zsOhm: 0.58, rcdTripMs: 19,
};
const records = { visits: [SIGNED], tests: [RING_TEST, RADIAL_TEST], pointChanges: [], circuits: [RING, RADIAL], boards: [BOARD], earthing: 'TN-C-S' };
const particulars = (): InstallationParticulars =>
  defaultParticulars({
    site: { id: 's1', earthing: 'TN-C-S', zeOhm: 0.24, pfcKa: 1.6, earthingConductor: 'adequate', bondingWater: 'adequate' },
    signer: 'Aled Pryce',
    choice: certificateThatApplies({ visitIds: ['v1'], circuits: [RADIAL], boards: [] }),
    boardReplaced: false,
    existingComments: [],
  });

describe('scheduleMaxZs: the maximum permitted Zs the schedule states', () => {
  it.each([
    // BS 7671:2018+A2:2022 Table 41.3, Zs = 0.95 × 230 / Ia (C1/D in the trade reference, section 3a)
    ['B', 32, 0.4, 1.37],
    ['B', 6, 0.4, 7.28],
    ['C', 16, 0.4, 1.37],
    ['D', 20, 0.4, 0.55],
    // Table 41.3, type D at 5 s (Ia = 10 In): the trade reference says to check this row against the printed book
    ['D', 20, 5, 1.09],
    // Table 41.2, BS 88-3 32 A at 0.4 s: not confirmed in the trade reference (from the rule set, C2)
    ['BS 88-3', 32, 0.4, 0.86],
  ])('%s %i A at %s s: %f Ω', (deviceType, deviceRatingA, maxDisconnectionS, ohm) => {
    const limit = scheduleMaxZs({ id: 'c', deviceType, deviceRatingA, maxDisconnectionS }, rules);
    expect(limit.ohm).toBe(ohm);
    expect('source' in limit && limit.source).toMatch(/Table 41\.[23]/);
  });

  it('takes Table 41.5 where the RCD gives fault protection: 50 V / 30 mA = 1667 Ω (BS 7671:2018+A2:2022 Table 41.5, Reg 411.5.3, C1)', () => {
    const limit = scheduleMaxZs({ id: 'c', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, faultProtection: 'rcd' }, rules);
    expect(limit).toMatchObject({ ohm: 1667, basis: '30 mA RCD' });
  });

  it('says why there is no limit rather than guessing one', () => {
    expect(scheduleMaxZs({ id: 'c', deviceType: 'B' }, rules)).toEqual({ ohm: null, reason: 'The protective device or its rating is not recorded.' });
    expect(scheduleMaxZs({ id: 'c', deviceType: 'B', deviceRatingA: 17 }, rules).ohm).toBeNull();
  });
});

describe('certificateThatApplies', () => {
  it('a new circuit or a replaced board takes an installation certificate, with the reason', () => {
    const choice = certificateThatApplies({ visitIds: ['v1'], circuits: [RING, RADIAL], boards: [BOARD] });
    expect(choice.kind).toBe('installation-certificate');
    expect(choice.reasons).toEqual(['Circuit 7 (Garden office) was installed as a new circuit.']);
    const replaced = certificateThatApplies({ visitIds: ['v1'], circuits: [RING], boards: [{ ...BOARD, replacedOnVisitId: 'v1' }] });
    expect(replaced).toMatchObject({ kind: 'installation-certificate', reasons: ['Board Consumer unit was replaced.'] });
  });

  it('an alteration to existing circuits takes a minor works certificate', () => {
    const choice = certificateThatApplies({ visitIds: ['v1'], circuits: [RING, { ...RADIAL, newOnVisitId: 'older-visit' }], boards: [BOARD] });
    expect(choice.kind).toBe('minor-works');
    expect(choice.sentence).toMatch(/addition or alteration to existing circuits\. That needs a minor works certificate\.$/);
  });
});

describe('inspectionProblems', () => {
  it('needs every item marked, and a limitation needs a note', () => {
    expect(inspectionProblems(ALL_DONE)).toEqual([]);
    const { intake: _intake, ...rest } = ALL_DONE;
    expect(inspectionProblems(rest).map((p) => p.itemId)).toEqual(['intake']);
    expect(inspectionProblems({ ...ALL_DONE, earthing: { state: 'limitation', note: '  ' } })[0]!.sentence).toMatch(/limitation without saying what limited it/);
    expect(inspectionProblems({ ...ALL_DONE, earthing: { state: 'limitation', note: 'Earth clamp behind a fixed panel' } })).toEqual([]);
  });
});

describe('judgeInstallationCertificate', () => {
  it('schedules every circuit of the board with a new circuit, each judged, and is issuable when all is there', () => {
    const j = judgeInstallationCertificate(records, particulars());
    expect(j.problems).toEqual([]);
    expect(j.issuable).toBe(true);
    expect(j.schedule.map((s) => [s.circuit.number, s.isNew, s.maxZs.ohm])).toEqual([['2', false, 1.37], ['7', true, 2.19]]);
    expect(j.instruments).toEqual(['Multifunction tester MFT-1']);
  });

  it('refuses a failed reading exactly as the minor works certificate does', () => {
    // B20 at 0.4 s: 2.19 Ω (Table 41.3) × 0.8 = 1.75 Ω (Appendix 3, trade practice); 1.9 Ω fails.
    const j = judgeInstallationCertificate({ ...records, tests: [RING_TEST, { ...RADIAL_TEST, zsOhm: 1.9 }] }, particulars());
    expect(j.issuable).toBe(false);
    expect(j.findings.find((f) => f.kind === 'fail')).toMatchObject({ circuitId: 'c7', line: 'zs' });
    expect(j.problems.at(-1)).toMatch(/a departure from the standard never stands in for a test result/);
  });

  it('refuses while a circuit of the board is untested, a new circuit lacks details, or an inspection is unmarked', () => {
    const j = judgeInstallationCertificate(
      { ...records, tests: [RADIAL_TEST], circuits: [RING, { ...RADIAL, wiringType: null }], visits: [{ ...SIGNED, inspectionMarks: { ...ALL_DONE, isolation: { state: 'limitation' } } }] },
      particulars(),
    );
    expect(j.problems).toEqual([
      'Circuit 2 (Sockets) on board Consumer unit has no test results on this job: the schedule of an installation certificate covers every circuit of the board.',
      'Circuit 7 (Garden office) is new and its details lack the type of wiring.',
      expect.stringMatching(/^Inspection “Isolation, switching off .*” is marked as a limitation without saying what limited it\.$/),
    ]);
  });

  it('refuses a plain alteration with the reason, while the minor works certificate refuses the new circuit', () => {
    const alteration = judgeInstallationCertificate({ ...records, circuits: [RING, { ...RADIAL, newOnVisitId: null }] }, particulars());
    expect(alteration.choice.kind).toBe('minor-works');
    expect(alteration.problems[0]).toMatch(/^No circuit was installed new and no board was replaced.*issue a minor works certificate\.$/);
    const minor = judgeMinorWorks(records);
    expect(minor.problems).toContain(
      'Circuit 7 (Garden office) is a new circuit: a minor works certificate covers an alteration or addition to an existing circuit, and a new circuit needs an electrical installation certificate.',
    );
  });

  it('judges a visit not yet signed when the phone asks before signing, as the server will once it is', () => {
    const unsigned = { ...records, visits: [{ ...SIGNED, status: 'on-site', signedAt: null, signatureSvg: null }] };
    expect(judgeInstallationCertificate(unsigned, null).findings.map((f) => f.kind)).toEqual(['not-signed']);
    const before = judgeInstallationCertificate(unsigned, null, undefined, { beforeSigning: true });
    expect(before.problems).toEqual([]);
    expect(before.schedule).toHaveLength(2);
  });

  it('checks the particulars the office gives, naming each field', () => {
    const p = particulars();
    expect(particularsProblems(p)).toEqual([]);
    const tt = { ...p, supply: { ...p.supply, system: 'TT' as const, zeOhm: null }, origin: { ...p.origin, electrodeType: '', bondingContinuity: false } };
    expect(particularsProblems(tt)).toEqual([
      'supply.zeOhm: give Ze as measured or enquired, in Ω.',
      'origin.bondingContinuity: the main protective bonding conductors’ continuity must be verified before a certificate is issued.',
      'origin.electrodeType: a TT installation needs its earth electrode’s type.',
      'origin.electrodeOhm: a TT installation needs its earth electrode’s resistance to earth.',
    ]);
    expect(judgeInstallationCertificate(records, tt).problems).toHaveLength(4);
  });
});

describe('readParticulars', () => {
  it('keeps what the certificate has, and counts a figure sent as text as not given', () => {
    const p = particulars();
    expect(readParticulars(JSON.parse(JSON.stringify({ ...p, extra: 'dropped' })))).toEqual({ particulars: p, problems: [] });
    const sent = { ...p, supply: { ...p.supply, zeOhm: '0.24' } };
    expect(readParticulars(sent).problems).toEqual(['supply.zeOhm: give Ze as measured or enquired, in Ω.']);
    expect(readParticulars('nothing').particulars).toBeNull();
  });
});
