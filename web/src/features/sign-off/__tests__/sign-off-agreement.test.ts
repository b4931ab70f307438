import 'fake-indexeddb/auto';
import { MINOR_WORKS_CASES } from '@wiretrail/core/minor-works-cases';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { base, ids, resetPhone, tidyUp } from '@/test/visit-fixtures';
import { getSignOff } from '../data/get-sign-off';

beforeEach(resetPhone);
afterEach(tidyUp);

/**
 * The cases the server's issue route is held to (api's minor-works-agreement test), on the phone: its sign-off
 * must find what the server finds, and say the certificate can be issued exactly when the server would issue it.
 */
describe('the sign-off gives the answer the server gives', () => {
  for (const c of MINOR_WORKS_CASES) {
    it(c.name, async () => {
      await db.table('site').update(ids.site, { earthing: c.earthing });
      await db.board.put({ id: ids.board, siteId: ids.site, name: 'Consumer unit', ...c.board, ...base });
      await db.table('circuit').bulkPut(c.circuits.map((row) => ({ ...row, siteId: ids.site, boardId: ids.board, ...base })));
      await db.table('visit').put({ ...c.visit, jobId: ids.job, siteId: ids.site, ...base });
      await db.table('testResult').bulkPut(c.tests.map((row) => ({ ...row, visitId: c.visit.id, siteId: ids.site, ...base })));
      await db.table('pointChange').bulkPut(c.pointChanges.map((row) => ({ ...row, visitId: c.visit.id, siteId: ids.site, ...base })));

      const summary = await getSignOff((await db.visit.get(c.visit.id))!);
      expect(summary.certificate.issuable).toBe(c.expected.issuable);
      expect(summary.problems.map((p) => ({ kind: p.kind, what: p.what }))).toEqual(c.expected.findings.map((f) => ({ kind: f.kind, what: f.what })));
    });
  }
});
