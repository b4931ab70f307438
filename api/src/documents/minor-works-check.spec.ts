import { describe, expect, it } from '@jest/globals';
import { DEFAULT_RULE_SET } from '@wiretrail/core';
import { judgeMinorWorks, type RecordRow } from './minor-works-check.js';

const SIGNED: RecordRow = {
  id: 'v1', status: 'finished', signedByName: 'Aled Pryce', signedAt: '2026-03-14T10:48:00.000Z', signatureSvg: '<svg/>', departures: null,
};
const RING: RecordRow = { id: 'c2', number: '2', description: 'Sockets, first floor', kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
/** Readings of a sound 2.5/1.5 mm² ring on a B32 with a 30 mA RCD. */
const PASSING: RecordRow = {
  id: 't1', visitId: 'v1', circuitId: 'c2', testedAt: '2026-03-14T10:30:00.000Z',
  r1Ohm: 0.52, rnOhm: 0.53, r2Ohm: 0.86, r1r2Ohm: 0.35, irLiveLiveMOhm: 299, irLiveEarthMOhm: 250, irTestVoltageV: 500,
  polarity: 'correct', zsOhm: 0.63, rcdTripMs: 22,
};

const judge = (over: Partial<Parameters<typeof judgeMinorWorks>[0]>) =>
  judgeMinorWorks({ visits: [SIGNED], tests: [PASSING], pointChanges: [], circuits: [RING], earthing: 'TN-C-S', ...over }, DEFAULT_RULE_SET);

describe('judgeMinorWorks', () => {
  it('certifies a tested circuit of a signed visit with nothing to say against it', () => {
    const j = judge({});
    expect(j.problems).toEqual([]);
    expect(j.circuits).toHaveLength(1);
    expect(j.circuits[0]!.assessment.verdict).toBe('pass');
  });

  it('needs a visit that was finished and signed', () => {
    expect(judge({ visits: [{ ...SIGNED, status: 'on-site' }] }).problems).toEqual([
      'No visit of this job has been finished and signed off on site yet, so there is nothing to certify.',
    ]);
    expect(judge({ visits: [{ ...SIGNED, signatureSvg: '' }] }).problems[0]).toMatch(/^No visit of this job has been signed off: a certificate needs the name, date and signature/);
  });

  it('names a failing reading with its circuit, and what was judged', () => {
    // BS 7671:2018+A2:2022 Table 41.3: type B 32 A at 0.4 s, 1.37 Ω; × 0.8 for a cold reading (Appendix 3, trade practice) = 1.10 Ω.
    const j = judge({ tests: [{ ...PASSING, zsOhm: 1.25 }] });
    expect(j.problems[0]).toMatch(/^Circuit 2 \(Sockets, first floor\): Earth fault loop impedance Zs fails\. Zs 1\.25 Ω is above 1\.10 Ω, 80 % of the 1\.37 Ω maximum/);
    expect(j.problems).toHaveLength(2);
  });

  it('names a missing reading with its circuit', () => {
    const j = judge({ tests: [{ ...PASSING, rcdTripMs: null, polarity: undefined }] });
    expect(j.problems).toEqual(
      expect.arrayContaining([
        'Circuit 2 (Sockets, first floor): Polarity has no reading (polarity).',
        'Circuit 2 (Sockets, first floor): RCD operating time at 30 mA has no reading (RCD operating time).',
      ]),
    );
  });

  it('lets a recorded departure carry missing and failing readings onto the certificate', () => {
    const j = judge({ visits: [{ ...SIGNED, departures: 'RCD not tested: medical equipment on the circuit.' }], tests: [{ ...PASSING, rcdTripMs: null, zsOhm: 1.25 }] });
    expect(j.problems).toEqual([]);
    expect(j.circuits[0]!.departureRecorded).toBe(true);
    expect(j.circuits[0]!.assessment.failing.map((l) => l.key)).toEqual(['zs']);
  });

  it('takes the latest test of a circuit, and only tests of signed visits', () => {
    const retest = { ...PASSING, id: 't2', zsOhm: 0.6, testedAt: '2026-03-14T10:40:00.000Z' };
    const failedFirst = { ...PASSING, zsOhm: 1.9 };
    const otherVisit = { ...PASSING, id: 't3', visitId: 'v9', zsOhm: 5, testedAt: '2026-03-15T09:00:00.000Z' };
    const j = judge({ tests: [retest, failedFirst, otherVisit] });
    expect(j.problems).toEqual([]);
    expect(j.circuits[0]!.test.id).toBe('t2');
  });

  it('refuses an altered circuit without tests, and tests that name no circuit', () => {
    const j = judge({ tests: [{ ...PASSING, circuitId: null }], pointChanges: [{ id: 'p1', visitId: 'v1', circuitId: 'c2' }] });
    expect(j.problems).toEqual([
      'A test result recorded 2026-03-14 does not say which circuit it is for.',
      'Circuit 2 (Sockets, first floor) was altered on this job but has no test results.',
    ]);
    expect(judge({ tests: [] }).problems).toEqual(['No circuit was tested on the signed visits of this job: record the test results of the altered circuit first.']);
  });
});
