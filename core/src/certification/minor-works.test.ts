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
    expect(j.problems[1]).toMatch(/record the departure from the standard in the visit’s sign-off/);
    expect(j.findings[0]).toMatchObject({ kind: 'fail', circuitId: 'c2', line: 'zs', what: 'Circuit 2 (Sockets, first floor): Earth fault loop impedance Zs', excused: false });
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

  it('lets a recorded departure carry missing and failing readings onto the certificate, still naming them', () => {
    const j = judge({ visits: [{ ...SIGNED, departures: 'RCD not tested: medical equipment on the circuit.' }], tests: [{ ...PASSING, rcdTripMs: null, zsOhm: 1.25 }] });
    expect(j.problems).toEqual([]);
    expect(j.issuable).toBe(true);
    expect(j.circuits[0]!.departureRecorded).toBe(true);
    expect(j.circuits[0]!.assessment.failing.map((l) => l.key)).toEqual(['zs']);
    expect(j.findings.map((f) => [f.kind, f.line, f.excused])).toEqual([['missing', 'rcd-1x', true], ['fail', 'zs', true]]);
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
      const j = judgeMinorWorks({ visits: [c.visit], tests, pointChanges, circuits: c.circuits, earthing: c.earthing });
      expect(j.issuable).toBe(c.expected.issuable);
      expect(j.findings.map((f) => ({ kind: f.kind, what: f.what, excused: f.excused }))).toEqual(
        c.expected.findings.map((f) => ({ excused: false, ...f })),
      );
      // The phone judges its one visit before it is signed: the answer is the same.
      const onPhone = judgeCircuitWork({ visits: [{ ...c.visit, status: 'on-site', signatureSvg: null }], tests, pointChanges, circuits: c.circuits, earthing: c.earthing });
      expect(onPhone.findings).toEqual(j.findings);
    });
  }
});
