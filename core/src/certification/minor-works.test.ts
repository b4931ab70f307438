import { describe, expect, it } from 'vitest';
import type { LooseRowOf, TestResultRecord } from './circuit-records.js';
import { MINOR_WORKS_CASES } from './minor-works-cases.js';
import { judgeCircuitWork, judgeMinorWorks, type MinorWorksRecords } from './minor-works.js';

const SIGNED: LooseRowOf<'visit'> = {
  id: 'v1', status: 'finished', signedByName: 'Aled Pryce', signedAt: '2026-03-14T10:48:00.000Z', signatureSvg: '<svg/>', departures: null,
};
const RING: LooseRowOf<'circuit'> = { id: 'c2', number: '2', description: 'Sockets, first floor', kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
// A sound 2.5/1.5 mm² ring on a B32 with a 30 mA RCD:
// r1 0.52 and rn 0.53 Ω within 0.05 Ω of each other (IET GN3 9th ed. 2022, ring step 1); r2 0.86 Ω within 3 % of
//   1.633 × r1 (IEC 60228:2004 Table 1; 3 % common trade practice); R1+R2 0.35 Ω against (0.52 + 0.86) / 4 = 0.345 Ω (GN3 step 3, D);
// insulation 299 and 250 MΩ at 500 V against 1.0 MΩ (BS 7671:2018+A2:2022 Table 64);
// Zs 0.63 Ω against 0.8 × 1.37 = 1.10 Ω (BS 7671:2018+A2:2022 Table 41.3, B32; Appendix 3, trade practice);
// RCD 22 ms against 300 ms at 30 mA (BS 7671:2018+A2:2022 Reg 643.8).
const PASSING: TestResultRecord = {
  id: 't1', visitId: 'v1', circuitId: 'c2', testedAt: '2026-03-14T10:30:00.000Z',
  r1Ohm: 0.52, rnOhm: 0.53, r2Ohm: 0.86, r1r2Ohm: 0.35, irLiveLiveMOhm: 299, irLiveEarthMOhm: 250, irTestVoltageV: 500,
  polarity: 'correct', zsOhm: 0.63, rcdTripMs: 22,
};

const judge = (over: Partial<MinorWorksRecords>) => judgeMinorWorks({ visits: [SIGNED], tests: [PASSING], pointChanges: [], circuits: [RING], earthing: 'TN-C-S', ...over });

describe('judgeMinorWorks', () => {
  it('certifies a tested circuit of a signed visit with nothing to say against it', () => {
    const j = judge({});
    expect(j.problems).toEqual([]);
    expect(j.issuable).toBe(true);
    expect(j.circuits).toHaveLength(1);
    expect(j.circuits[0]!.assessment.verdict).toBe('pass');
  });

  it('needs a visit that was finished and signed', () => {
    expect(judge({ visits: [{ ...SIGNED, status: 'on-site' }] }).problems).toEqual([
      'No visit of this job has been finished and signed off on site yet, so there is nothing to certify.',
    ]);
    const unsigned = judge({ visits: [{ ...SIGNED, signatureSvg: '' }] });
    expect(unsigned.problems[0]).toMatch(/^No visit of this job has been signed off: a certificate needs the name, date and signature/);
    expect(unsigned.findings.map((f) => f.kind)).toEqual(['not-signed']);
  });

  it('names a failing reading with its circuit, and what was judged', () => {
    // BS 7671:2018+A2:2022 Table 41.3: type B 32 A at 0.4 s, 1.37 Ω; × 0.8 for a cold reading (Appendix 3, trade practice) = 1.10 Ω.
    const j = judge({ tests: [{ ...PASSING, zsOhm: 1.25 }] });
    expect(j.problems[0]).toMatch(/^Circuit 2 \(Sockets, first floor\): Earth fault loop impedance Zs fails\. Zs 1\.25 Ω is above 1\.10 Ω, 80 % of the 1\.37 Ω maximum/);
    expect(j.problems).toHaveLength(2);
    expect(j.problems[1]).toMatch(/test the circuit again: a departure from the standard never stands in for a test result/);
    expect(j.findings[0]).toMatchObject({ kind: 'fail', circuitId: 'c2', line: 'zs', what: 'Circuit 2 (Sockets, first floor): Earth fault loop impedance Zs' });
  });

  it('names a missing reading with its circuit, in the words of the catalogue of readings', () => {
    const j = judge({ tests: [{ ...PASSING, rcdTripMs: null, polarity: undefined }] });
    expect(j.problems).toEqual(
      expect.arrayContaining([
        'Circuit 2 (Sockets, first floor): Polarity has no reading (polarity).',
        'Circuit 2 (Sockets, first floor): RCD operating time at 30 mA has no reading (RCD operating time).',
      ]),
    );
    expect(j.findings.find((f) => f.line === 'rcd-1x')!.detail).toBe('Not recorded yet: RCD operating time.');
  });

  it('refuses failing and missing readings whatever the departures say, naming the circuit and the reading', () => {
    const departures = 'RCD not tested: medical equipment on the circuit.';
    const departureEntries = [{ regulation: '643.8', instead: 'RCD left untested', noLessSafe: 'The equipment stays connected.' }];
    const j = judge({ visits: [{ ...SIGNED, departures, departureEntries }], tests: [{ ...PASSING, rcdTripMs: null, zsOhm: 1.25 }] });
    expect(j.issuable).toBe(false);
    expect(j.findings.map((f) => [f.kind, f.line, f.what])).toEqual([
      ['missing', 'rcd-1x', 'Circuit 2 (Sockets, first floor): RCD operating time at 30 mA'],
      ['fail', 'zs', 'Circuit 2 (Sockets, first floor): Earth fault loop impedance Zs'],
    ]);
    // The departure itself is complete, so it is kept to print; it just waives nothing.
    expect(j.departures).toEqual([{ ...departureEntries[0], visitId: 'v1' }]);
  });

  it('refuses a reading it cannot judge, as a "check" is not a pass', () => {
    // A 30 A BS 88-3 fuse is not in BS 7671:2018+A2:2022 Table 41.2 (5, 16, 20, 32, 45, 63 A; M), so Zs has no limit.
    const j = judge({ circuits: [{ ...RING, deviceType: 'BS 88-3', deviceRatingA: 30 }] });
    expect(j.findings.map((f) => [f.kind, f.line])).toEqual([['unjudged', 'zs']]);
    expect(j.problems[0]).toMatch(/^Circuit 2 \(Sockets, first floor\): Earth fault loop impedance Zs has not been judged\. Cannot judge this/);
  });

  it('never issues with a Fail on it, the optional tests included', () => {
    // 45 ms at 5 × IΔn is above 40 ms (BS EN 61008-1 / 61009-1, general type).
    for (const readings of [{ rcdTripMs5x: 45 }, { rcdButton: 'fails' }, { zsOhm: 1.25 }]) {
      const j = judge({ tests: [{ ...PASSING, ...readings }] });
      expect(j.issuable).toBe(false);
    }
    const sound = judge({});
    expect(sound.circuits.flatMap((c) => c.assessment.lines.map((l) => l.result.verdict))).not.toContain('fail');
  });

  it('refuses a minor works certificate for a new circuit or a replaced board, naming why', () => {
    const j = judge({ circuits: [{ ...RING, newOnVisitId: 'v1' }], boards: [{ id: 'b1', name: 'Garage', replacedOnVisitId: 'v1' }] });
    expect(j.problems).toEqual([
      'Circuit 2 (Sockets, first floor) is a new circuit: a minor works certificate covers an alteration or addition to an existing circuit, and a new circuit needs an electrical installation certificate.',
      'Board Garage was replaced on this job: a consumer unit replacement needs an electrical installation certificate, not a minor works certificate.',
    ]);
    // Installed or replaced on another job: this one alters what is now existing.
    expect(judge({ circuits: [{ ...RING, newOnVisitId: 'v0' }], boards: [{ id: 'b1', name: 'Garage', replacedOnVisitId: 'v0' }] }).issuable).toBe(true);
  });

  it('keeps complete departures and refuses one that leaves out a part', () => {
    const entries = [
      { regulation: '522.6.202', instead: 'Run in earthed steel conduit', noLessSafe: 'Earthed conduit protects as a zone would' },
      { regulation: '', instead: 'Something', noLessSafe: '' },
      { regulation: ' ', instead: '', noLessSafe: '' },
      'not a departure',
    ];
    const j = judge({ visits: [{ ...SIGNED, departureEntries: entries }] });
    expect(j.departures).toHaveLength(1);
    expect(j.problems).toEqual(['Departure 2 from the standard does not say the regulation departed from or why that gives no less safety.']);
  });

  it('states the amendment in force on the day the work was completed', () => {
    // BS 7671:2018+A3:2024 in force from 31 July 2024 (M); before it, BS 7671:2018+A2:2022 (from 28 March 2022, M).
    const on = (signedAt: string) => judge({ visits: [{ ...SIGNED, signedAt }], tests: [{ ...PASSING, testedAt: signedAt }] });
    expect(on('2026-03-14T10:48:00.000Z').rules?.edition).toBe('BS 7671:2018+A3:2024');
    expect(on('2024-07-31T08:00:00.000Z').rules?.edition).toBe('BS 7671:2018+A3:2024');
    expect(on('2024-07-30T16:00:00.000Z').rules?.edition).toBe('BS 7671:2018+A2:2022');
    expect(on('2024-07-30T16:00:00.000Z').completedOn).toBe('2024-07-30');
    const early = on('2021-06-01T10:00:00.000Z');
    expect([early.issuable, early.rules, early.findings.map((f) => f.kind)]).toEqual([false, null, ['no-rules']]);
  });

  it('takes the latest test of a circuit, and only tests of signed visits', () => {
    // 0.6 Ω is within 1.10 Ω for a B32 (BS 7671:2018+A2:2022 Table 41.3; Appendix 3); 1.9 and 5 Ω are not.
    const retest = { ...PASSING, id: 't2', zsOhm: 0.6, testedAt: '2026-03-14T10:40:00.000Z' };
    const failedFirst = { ...PASSING, zsOhm: 1.9 };
    const otherVisit = { ...PASSING, id: 't3', visitId: 'v9', zsOhm: 5, testedAt: '2026-03-15T09:00:00.000Z' };
    const j = judge({ tests: [retest, failedFirst, otherVisit] });
    expect(j.problems).toEqual([]);
    expect(j.circuits[0]!.test.id).toBe('t2');
  });

  it('orders tests with no time entered by when their rows were made', () => {
    // 1.9 Ω is above 1.10 Ω for a B32 (BS 7671:2018+A2:2022 Table 41.3; Appendix 3).
    const first = { ...PASSING, testedAt: null, createdAt: new Date('2026-03-14T10:00:00.000Z'), zsOhm: 1.9 };
    const second = { ...PASSING, id: 't2', testedAt: null, createdAt: new Date('2026-03-14T10:20:00.000Z') };
    expect(judge({ tests: [second, first] }).circuits[0]!.test.id).toBe('t2');
  });

  it('refuses an altered circuit without tests, and tests that name no circuit', () => {
    const j = judge({ tests: [{ ...PASSING, circuitId: null }], pointChanges: [{ id: 'p1', visitId: 'v1', circuitId: 'c2' }] });
    expect(j.problems).toEqual([
      'A test result recorded 2026-03-14 does not say which circuit it is for.',
      'Circuit 2 (Sockets, first floor) was altered on this job but has no test results.',
    ]);
    expect(judge({ tests: [] }).problems).toEqual(['No circuit was tested on the signed visits of this job: record the test results of the altered circuit first.']);
  });

  it('refuses a test of a circuit no longer recorded on the site', () => {
    expect(judge({ circuits: [] }).problems).toEqual(['A test result names a circuit that is no longer recorded on this site.']);
  });
});

describe('judgeCircuitWork', () => {
  it('judges the visits it is given, signed or not, as the certificate would', () => {
    const onSite = { ...SIGNED, status: 'on-site', signatureSvg: null };
    // 1.25 Ω is above 0.8 × 1.37 = 1.10 Ω for a B32 (BS 7671:2018+A2:2022 Table 41.3; Appendix 3, trade practice).
    const j = judgeCircuitWork({ visits: [onSite], tests: [{ ...PASSING, zsOhm: 1.25 }], pointChanges: [], circuits: [RING], earthing: 'TN-C-S' });
    expect(j.findings.map((f) => f.kind)).toEqual(['fail']);
    expect(j.issuable).toBe(false);
  });
});

describe('the cases the phone and the server must agree on', () => {
  for (const c of MINOR_WORKS_CASES) {
    it(c.name, () => {
      const tests = c.tests.map((t) => ({ ...t, visitId: c.visit.id }));
      const pointChanges = c.pointChanges.map((p) => ({ ...p, visitId: c.visit.id }));
      const boards = [{ id: 'board', name: 'Consumer unit', ...c.board }];
      const j = judgeMinorWorks({ visits: [c.visit], tests, pointChanges, circuits: c.circuits, earthing: c.earthing, boards });
      expect(j.issuable).toBe(c.expected.issuable);
      expect(j.findings.map((f) => ({ kind: f.kind, what: f.what }))).toEqual(
        c.expected.findings.map((f) => ({ kind: f.kind, what: f.what })),
      );
      // The phone judges its one visit before it is signed: the answer is the same.
      const onPhone = judgeCircuitWork({ visits: [{ ...c.visit, status: 'on-site', signatureSvg: null }], tests, pointChanges, circuits: c.circuits, earthing: c.earthing, boards });
      expect(onPhone.findings).toEqual(j.findings);
    });
  }
});
