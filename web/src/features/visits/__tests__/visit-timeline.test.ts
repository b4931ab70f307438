import { describe, expect, it } from 'vitest';
import type { VisitRecord } from '../api/get-visit-record';
import { readingsLine, visitTimeline } from '../desk/visit-timeline';

const base = { version: 1, siteId: 's', visitId: 'v', createdById: 'u', createdByName: 'Sam Brannigan' };

const record = {
  visit: { id: 'v', jobId: 'j', siteId: 's', actualStart: '2026-12-03T09:10:00Z', cautionsReadAt: '2026-12-03T09:14:00Z', actualEnd: '2026-12-03T11:02:00Z', signedAt: '2026-12-03T11:00:00Z', signedByName: 'Sam Brannigan', version: 3 },
  job: { id: 'j', reference: 'LED-0050', title: 'Socket moved', status: 'on-site' },
  site: { id: 's', name: 'Orchard Rise', address: null, postcode: null },
  technicians: [{ id: 'u', name: 'Sam Brannigan' }],
  notes: [{ ...base, id: 'n1', text: 'Floorboards lifted in the landing', createdAt: '2026-12-03T09:30:00Z' }],
  parts: [],
  cables: [],
  pointChanges: [],
  testResults: [{ ...base, id: 't1', circuitId: 'c', circuitLabel: '1 · Sockets, ground floor', r1r2Ohm: 0.37, zsOhm: 0.62, polarity: 'correct', rcdTripMs: 24, testedAt: '2026-12-03T10:40:00Z', createdAt: '2026-12-03T10:41:00Z' }],
} as unknown as VisitRecord;

describe('a visit’s record at the desk', () => {
  it('tells the visit in the order it happened: arrival, cautions, notes and photos, readings, sign-off, leaving', () => {
    const photo = { id: 'p1', at: '2026-12-03T09:20:00Z', title: 'Photo', detail: 'Box open before the accessory went on' };
    expect(visitTimeline(record, [photo]).map((e) => e.title)).toEqual([
      'Arrived on site',
      'Safety cautions read before work on a circuit',
      'Photo',
      'Note',
      'Readings: circuit 1 · Sockets, ground floor',
      'Signed off',
      'Left site',
    ]);
  });

  it('gives the figures that were measured, and says so when there are none', () => {
    expect(readingsLine(record.testResults[0]!)).toBe('R1+R2 0.37 Ω · polarity correct · Zs 0.62 Ω · RCD 24 ms');
    expect(readingsLine({ ...record.testResults[0]!, r1r2Ohm: null, zsOhm: null, polarity: null, rcdTripMs: null })).toBe('No figures yet');
  });
});
