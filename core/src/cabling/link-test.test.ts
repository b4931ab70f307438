import { describe, expect, it } from 'vitest';
import { judgeLinkTest, LINK_TEST_CSV_COLUMNS, LINK_TEST_CSV_HEADER, linkTestCsvHeaderProblems, linkTestProblems, readLinkTestCsvRow } from './link-test.js';

describe('a copper link test as recorded', () => {
  // A worked example: a 90 m Category 6 permanent link whose return loss is 1.2 dB below the limit line (invented
  // figures); delay 432 ns ≤ 498 ns, skew 18 ns ≤ 44 ns, loop 17.8 Ω ≤ 21 Ω, longest pair 89.6 m ≤ 90 m
  // (ANSI/TIA-568.2-D permanent link limits, from memory).
  const cat6 = {
    medium: 'copper' as const,
    limitSet: 'tia-cat6-permanent-link' as const,
    insertionLossDb: 17.9, insertionLossMarginDb: 6.1, nextMarginDb: 3.4, psNextMarginDb: 4.0, acrFMarginDb: 8.2, psAcrFMarginDb: 9.0,
    returnLossDb: 11.8, returnLossMarginDb: -1.2,
    propagationDelayNs: 432, delaySkewNs: 18, dcLoopResistanceOhm: 17.8,
    unbalanceWithinPairMarginOhm: 0.08, unbalanceBetweenPairsMarginOhm: 0.05,
    pair12LengthM: 89.1, pair36LengthM: 89.6, pair45LengthM: 88.7, pair78LengthM: 89.3,
  };

  it('fails on the one failing return loss and judges everything else', () => {
    const j = judgeLinkTest(cat6);
    expect(j.verdict).toBe('fail');
    expect(j.certifiable).toBe(true);
    expect(j.against).toBe('ANSI/TIA-568.2-D Category 6 permanent link');
    expect(j.checks.filter((c) => c.verdict === 'fail').map((c) => c.name)).toEqual(['returnLoss']);
    expect(j.checks.map((c) => c.name)).toEqual([
      'insertionLoss', 'next', 'psNext', 'acrF', 'psAcrF', 'returnLoss', 'unbalanceWithinPair', 'unbalanceBetweenPairs', 'propagationDelay', 'delaySkew', 'dcLoopResistance', 'pairLength',
    ]);
    // 90 m permanent link length limit (ANSI/TIA-568.2-D, from memory).
    expect(j.checks.find((c) => c.name === 'pairLength')).toMatchObject({ verdict: 'pass', value: 89.6, limit: 90 });
  });

  it('judges the longest pair of a channel against 100 m (ANSI/TIA-568.2-D channel, from memory)', () => {
    const channel = { medium: 'copper' as const, limitSet: 'tia-cat6-channel' as const, pair12LengthM: 99.2, pair36LengthM: 100.6 };
    expect(judgeLinkTest(channel).checks).toEqual([expect.objectContaining({ name: 'pairLength', verdict: 'fail', value: 100.6, limit: 100 })]);
  });

  it('a negative unbalance margin fails, as PoE would find it', () => {
    expect(judgeLinkTest({ ...cat6, returnLossMarginDb: 2, unbalanceBetweenPairsMarginOhm: -0.02 }).checks.filter((c) => c.verdict === 'fail').map((c) => c.name)).toEqual(['unbalanceBetweenPairs']);
  });

  it('passes once put right, marking a result within the tester’s accuracy', () => {
    const j = judgeLinkTest({ ...cat6, returnLossMarginDb: 0.3, withinAccuracy: ['returnLoss'] });
    expect(j.verdict).toBe('pass');
    expect(j.anyWithinAccuracy).toBe(true);
  });

  it('is not certifiable without a named limit set', () => {
    const { limitSet: _, ...none } = cat6;
    expect(judgeLinkTest(none)).toMatchObject({ verdict: 'check', certifiable: false });
    expect(linkTestProblems(none).map((p) => p.field)).toEqual(['limitSet']);
  });
});

describe('a fibre link test as recorded', () => {
  // 150 m OM3 with two connector pairs: 1.95 dB allowed at 850 nm, 1.725 dB at 1300 nm (ANSI/TIA-568.3-D, from memory).
  const om3 = { medium: 'fibre' as const, fibreMode: 'multimode' as const, fibreLengthM: 150, connectorPairs: 2, splices: 0, firstWavelengthNm: 850, firstLossDb: 1.1, secondWavelengthNm: 1300, secondLossDb: 0.9, polarity: 'correct' as const, endFaces: 'cleaned' as const };

  it('passes within both budgets with polarity and end faces recorded', () => {
    const j = judgeLinkTest(om3);
    expect(j.verdict).toBe('pass');
    expect(j.checks.map((c) => [c.name, c.limit])).toEqual([['Loss at 850 nm', 1.95], ['Loss at 1300 nm', 1.725]]);
    expect(j.certifiable).toBe(true);
  });

  it('fails a loss over budget, reversed polarity or a dirty end face', () => {
    expect(judgeLinkTest({ ...om3, secondLossDb: 1.8 }).verdict).toBe('fail');
    expect(judgeLinkTest({ ...om3, polarity: 'reversed' }).verdict).toBe('fail');
    expect(judgeLinkTest({ ...om3, endFaces: 'dirty-or-damaged' }).verdict).toBe('fail');
  });

  it('asks for a check when polarity or inspection is missing, and names a wavelength the mode is not tested at', () => {
    expect(judgeLinkTest({ ...om3, polarity: null }).verdict).toBe('check');
    expect(linkTestProblems({ ...om3, secondWavelengthNm: 1550 })).toEqual([{ field: 'secondWavelengthNm', message: 'A multimode link is tested at 850 or 1300 nm, not 1550 nm.' }]);
  });
});

describe('our own CSV template', () => {
  it('starts with the cable label and carries every field by its own name', () => {
    expect(LINK_TEST_CSV_HEADER.startsWith('cable_label,medium,limit_set,tester_make,tester_model,tester_serial,calibrated_on,adapter,insertion_loss_db,insertion_loss_margin_db')).toBe(true);
    expect(LINK_TEST_CSV_COLUMNS.every((c) => c.help.length > 0)).toBe(true);
    expect(LINK_TEST_CSV_COLUMNS.map((c) => c.column)).toContain('unbalance_between_pairs_margin_ohm');
  });

  it('reads a good row into the record’s fields, medium from the limit set', () => {
    const { row, problems } = readLinkTestCsvRow({ cable_label: ' RC-01 ', limit_set: 'tia-cat6-permanent-link', return_loss_margin_db: '-1.2', tested_at: '2026-03-14', calibrated_on: '2026-01-20', within_accuracy: 'returnLoss; next' }, 2);
    expect(problems).toEqual([]);
    expect(row).toEqual({ cableLabel: 'RC-01', fields: { medium: 'copper', limitSet: 'tia-cat6-permanent-link', returnLossMarginDb: -1.2, testedAt: '2026-03-14T12:00:00.000Z', calibratedOn: '2026-01-20', withinAccuracy: ['returnLoss', 'next'] } });
  });

  it('names every bad cell by line and column', () => {
    const { row, problems } = readLinkTestCsvRow({ cable_label: '', limit_set: 'cat8', next_margin_db: 'lots', calibrated_on: '20/01/2026', connector_pairs: '1.5' }, 7);
    expect(row).toBeNull();
    expect(problems.map((p) => [p.line, p.column])).toEqual([
      [7, 'cable_label'], [7, 'limit_set'], [7, 'calibrated_on'], [7, 'next_margin_db'], [7, 'connector_pairs'],
    ]);
    expect(problems.find((p) => p.column === 'next_margin_db')!.message).toBe('"lots" is not a number.');
  });

  it('refuses a header it does not know, or one without the cable label', () => {
    expect(linkTestCsvHeaderProblems(['label', 'limit_set'])).toEqual([
      { line: 1, column: 'label', message: '"label" is not a column of the link test template.' },
      { line: 1, column: 'cable_label', message: 'The file has no cable_label column.' },
    ]);
  });
});
