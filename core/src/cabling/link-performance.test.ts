import { describe, expect, it } from 'vitest';
import { judgeLinkPerformance } from './link-performance.js';

describe('performance results of a copper link', () => {
  // A worked example: a 90 m Category 6 permanent link whose return loss is 1.2 dB below the limit line (invented
  // figures); delay 432 ns against 498 ns, skew 18 ns against 44 ns, loop 17.8 Ω against 21 Ω
  // (ANSI/TIA-568.2-D permanent link limits, from memory).
  const cat6 = {
    limitSet: 'tia-cat6-permanent-link' as const,
    marginsDb: { insertionLoss: 6.1, next: 3.4, psNext: 4.0, acrF: 8.2, psAcrF: 9.0, returnLoss: -1.2 },
    propagationDelayNs: 432,
    delaySkewNs: 18,
    dcLoopResistanceOhm: 17.8,
  };

  it('fails a 90 m Category 6 permanent link on its one failing return loss, and passes the rest', () => {
    const r = judgeLinkPerformance(cat6);
    expect(r.verdict).toBe('fail');
    expect(r.checks.filter((c) => c.verdict === 'fail').map((c) => c.name)).toEqual(['returnLoss']);
    expect(r.checks.find((c) => c.name === 'returnLoss')!.note).toBe('Return loss: worst margin -1.2 dB, below the limit line.');
    expect(r.checks.find((c) => c.name === 'propagationDelay')).toMatchObject({ verdict: 'pass', limit: 498, source: expect.stringContaining('ANSI/TIA-568.2-D') });
    expect(r.checks.find((c) => c.name === 'delaySkew')).toMatchObject({ verdict: 'pass', limit: 44 });
    expect(r.checks.find((c) => c.name === 'dcLoopResistance')).toMatchObject({ verdict: 'pass', limit: 21 });
  });

  it('passes it once the return loss is put right', () => {
    expect(judgeLinkPerformance({ ...cat6, marginsDb: { ...cat6.marginsDb, returnLoss: 2.3 } }).verdict).toBe('pass');
  });

  it('judges a channel against the channel limits: 555 ns delay, 50 ns skew, 25 Ω loop (ANSI/TIA-568.2-D, from memory)', () => {
    const r = judgeLinkPerformance({ limitSet: 'tia-cat6a-channel', marginsDb: {}, propagationDelayNs: 560, delaySkewNs: 50, dcLoopResistanceOhm: 25.5 });
    expect(r.checks.map((c) => [c.name, c.verdict, c.limit])).toEqual([
      ['propagationDelay', 'fail', 555],
      ['delaySkew', 'pass', 50],
      ['dcLoopResistance', 'fail', 25],
    ]);
  });

  it('marks results within the tester’s accuracy and says so', () => {
    const r = judgeLinkPerformance({ ...cat6, marginsDb: { ...cat6.marginsDb, returnLoss: 0.2 }, withinAccuracy: ['returnLoss'] });
    expect(r.anyWithinAccuracy).toBe(true);
    expect(r.checks.find((c) => c.name === 'returnLoss')!.note).toContain('within the tester’s accuracy');
  });

  it('never passes a link with no results, and refuses an unknown limit set', () => {
    expect(judgeLinkPerformance({ limitSet: 'iso-class-ea-permanent-link', marginsDb: {} }).verdict).toBe('check');
    expect(() => judgeLinkPerformance({ limitSet: 'cat7' as never, marginsDb: {} })).toThrow(/limitSet/);
    expect(() => judgeLinkPerformance({ ...cat6, delaySkewNs: -3 })).toThrow(/negative/);
  });
});
