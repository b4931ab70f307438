import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { at, base, ids, resetPhone, tidyUp } from '@/test/visit-fixtures';
import { getSignOff } from '../data/get-sign-off';

beforeEach(resetPhone);
afterEach(tidyUp);

describe('the sign-off and records voided on site', () => {
  it('counts, judges and asks about only what was not voided', async () => {
    const visit = (await db.visit.get(ids.visit))!;
    await db.cableRun.bulkPut([
      { id: '01900000-0000-7000-8000-0000000000c1', siteId: visit.siteId, label: 'MK-01', lastVisitId: visit.id, lengthM: 14, ...base },
      // A typo'd label whose length would fail a permanent link (90 m, ISO/IEC 11801-1): voided, it is asked about no more.
      { id: '01900000-0000-7000-8000-0000000000c2', siteId: visit.siteId, label: 'MK-O1', lastVisitId: visit.id, lengthM: 140, linkKind: 'permanent-link', voidedAt: at(9), voidReason: 'Typed O for 0', ...base },
    ]);
    await db.note.bulkPut([
      { id: '01900000-0000-7000-8000-0000000000d1', visitId: visit.id, siteId: visit.siteId, text: 'Kept', ...base },
      { id: '01900000-0000-7000-8000-0000000000d2', visitId: visit.id, siteId: visit.siteId, text: 'Wrong visit', voidedAt: at(9), voidReason: 'Wrong visit', ...base },
    ]);
    const summary = await getSignOff(visit);
    expect(summary.counts).toMatchObject({ cables: 1, notes: 1 });
    expect(summary.cables.map((c) => c.cable.label)).toEqual(['MK-01']);
    expect(summary.problems.map((p) => p.what)).not.toContain('Cable MK-O1');
  });
});
