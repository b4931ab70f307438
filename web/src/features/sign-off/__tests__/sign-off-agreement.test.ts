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
 * The installation certificate's own agreement is in installation-agreement.test.ts.
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
      // Where the server refuses a minor works certificate for new work, the sign-off says so the other way round: it
      // names the installation certificate the work needs, for the same circuit or board, and judges that instead.
      const needsInstallation = c.expected.findings.filter((f) => f.kind === 'new-circuit' || f.kind === 'board-replaced');
      if (needsInstallation.length) {
        expect(summary.choice.kind).toBe('installation-certificate');
        expect(summary.choice.reasons.map((r) => r.replace(/ (was installed as a new circuit|was replaced)\.$/, ''))).toEqual(needsInstallation.map((f) => f.what));
        return;
      }
      expect(summary.choice.kind).toBe('minor-works');
      expect(summary.problems.map((p) => ({ kind: p.kind, what: p.what }))).toEqual(c.expected.findings.map((f) => ({ kind: f.kind, what: f.what })));
    });
  }
});
