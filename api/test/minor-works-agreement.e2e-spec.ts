import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { MINOR_WORKS_CASES } from '@wiretrail/core/minor-works-cases';
import { v7 as uuidv7 } from 'uuid';
import { bearer, jobByReference } from './document-helpers.js';
import { mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

/**
 * The cases the phone's sign-off is held to (web's sign-off-agreement test), given to the server's issue route:
 * it must issue exactly when the phone says the certificate can be issued, and refuse with the same findings.
 */
describe('the server issues a minor works certificate exactly when the phone says it can', () => {
  let t: TestApp;
  let office: Session;
  let customerId: string;

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    ({ customerId } = await jobByReference(t, office, 'LED-0033'));
  });
  afterAll(() => t.close());

  for (const c of MINOR_WORKS_CASES) {
    it(c.name, async () => {
      const site = (await t.http.post('/api/sites').set(bearer(office)).send({ customerId, address: `${c.name}, Wendmouth`, earthing: c.earthing }).expect(201)).body;
      const job = (await t.http.post('/api/jobs').set(bearer(office)).send({ siteId: site.id, customerId, title: 'Sockets added to a ring' }).expect(201)).body;
      const boardId = uuidv7();
      const { id: visitId, ...visit } = c.visit;
      const results = await push(t, office, 'office-desk', [
        // The visit first: a replaced board and a new circuit point at it.
        mutation('visit', visitId, { ...visit, jobId: job.id, siteId: site.id }),
        mutation('board', boardId, { siteId: site.id, name: 'Consumer unit', ...c.board }),
        ...c.circuits.map(({ id, ...fields }) => mutation('circuit', id, { ...fields, siteId: site.id, boardId })),
        ...c.tests.map(({ id, ...fields }) => mutation('testResult', id, { ...fields, visitId, siteId: site.id })),
        ...c.pointChanges.map(({ id, ...fields }) => mutation('pointChange', id, { ...fields, visitId, siteId: site.id })),
      ]);
      expect(results.map((r) => r.status)).toEqual(results.map(() => 'applied'));

      const res = await t.http.post(`/api/jobs/${job.id}/documents`).set(bearer(office)).send({ kind: 'minor-works' });
      if (c.expected.issuable) {
        expect([res.status, res.body.message]).toEqual([201, undefined]);
        return;
      }
      expect(res.status).toBe(422);
      expectErrorBody(res.body, 422);
      const messages = res.body.message as string[];
      const refusing = c.expected.findings;
      const readings = refusing.some((f) => f.kind === 'missing' || f.kind === 'unjudged' || f.kind === 'fail');
      // Each finding, in order, then the advice on readings when there were any.
      expect(messages).toHaveLength(refusing.length + (readings ? 1 : 0));
      refusing.forEach((f, i) => expect(messages[i]!.startsWith(`${f.what} `)).toBe(true));
    });
  }
});
