import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { LINK_TEST_CSV_HEADER } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { bearer, downloadPdf, jobByReference, pdfText } from './document-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { createTestApp, expectErrorBody, signIn, type TestApp } from './test-app.js';

describe('links’ performance results', () => {
  let t: TestApp;
  let office: Session;
  let tech2: Session;
  let harbour: { id: string; siteId: string; customerId: string };

  const importCsv = (csv: string) => t.http.post(`/api/jobs/${harbour.id}/link-tests/import`).set(bearer(office)).send({ csv });
  const list = async () => (await t.http.get(`/api/jobs/${harbour.id}/link-tests`).set(bearer(office)).expect(200)).body as Array<{ cableLabel: string; judgement: { verdict: string }; testerSerial: string | null }>;
  const issueSiteReport = () => t.http.post(`/api/jobs/${harbour.id}/documents`).set(bearer(office)).send({ kind: 'cabling-report', coverage: 'site' });

  beforeAll(async () => {
    t = await createTestApp();
    office = await signIn(t, 'office@larkfield.example');
    tech2 = await signIn(t, 'tech2@larkfield.example');
    harbour = await jobByReference(t, office, 'LED-0042');
  });
  afterAll(() => t.close());

  it('lists the demo’s results for the dental practice, judged by the server', async () => {
    const tests = await list();
    expect(tests).toEqual([expect.objectContaining({ cableLabel: 'RC-01', testerSerial: 'TL6-20931', judgement: expect.objectContaining({ verdict: 'pass', certifiable: true }) })]);
  });

  it('issues a wiremap and length record, not a certification, while a link has no results to a named limit set', async () => {
    const res = await issueSiteReport().expect(201);
    expect(res.body.title).toMatch(/^Wiremap and length record: /);
    expect(res.body.notices).toContain('Issued as a wiremap and length record: RC-02 has no performance results to a named limit set.');
    const text = await pdfText((await downloadPdf(t, office, res.body.id)).bytes);
    expect(text).toContain('Wiremap and length record');
    expect(text).toContain('It is not a certification to any category or class');
    expect(text).toContain('Performance results (ANSI/TIA-568.2-D Category 6 permanent link): within the limits as reported.');
    expect(text).not.toContain('Cabling certification report');
    expect(text).not.toMatch(/\bPass\b/);
  });

  it('refuses a bad file whole, naming every bad cell by line and column, and imports nothing', async () => {
    const csv = [
      'cable_label,limit_set,next_margin_db,calibrated_on',
      'RC-02,tia-cat6-permanent-link,3.1,2026-01-20',
      ',cat8,lots,20/01/2026',
      'RC-99,tia-cat6-channel,2,',
    ].join('\n');
    const res = await importCsv(csv).expect(422);
    expectErrorBody(res.body, 422);
    expect(res.body.message).toEqual([
      'Line 3, column cable_label: Give the cable’s label.',
      'Line 3, column limit_set: limit_set must be one of: tia-cat5e-permanent-link, tia-cat5e-channel, tia-cat6-permanent-link, tia-cat6-channel, tia-cat6a-permanent-link, tia-cat6a-channel, iso-class-d-permanent-link, iso-class-d-channel, iso-class-e-permanent-link, iso-class-e-channel, iso-class-ea-permanent-link, iso-class-ea-channel',
      'Line 3, column calibrated_on: "20/01/2026" is not a date such as 2026-01-20.',
      'Line 3, column next_margin_db: "lots" is not a number.',
      'Line 4, column cable_label: No cable labelled "RC-99" on this job’s site.',
    ]);
    // The good row on line 2 was not imported on its own.
    expect((await list()).map((l) => l.cableLabel)).toEqual(['RC-01']);
  });

  it('refuses a file whose header is not our template’s', async () => {
    const res = await importCsv('label,Pair 1-2 NEXT\nRC-02,3.1\n').expect(422);
    expect(res.body.message).toEqual([
      'Line 1, column label: "label" is not a column of the link test template.',
      'Line 1, column Pair 1-2 NEXT: "Pair 1-2 NEXT" is not a column of the link test template.',
      'Line 1, column cable_label: The file has no cable_label column.',
    ]);
    const empty = await importCsv(`${LINK_TEST_CSV_HEADER}\n`).expect(422);
    expect(empty.body.message).toEqual(['Line 2: The file has no rows: one row per link under the header.']);
  });

  it('imports a good file in our template, one link per row, and the report becomes a certification', async () => {
    const columns = LINK_TEST_CSV_HEADER.split(',');
    const row = (cells: Record<string, string | number>) => columns.map((c) => String(cells[c] ?? '')).join(',');
    const csv = [
      LINK_TEST_CSV_HEADER,
      row({
        cable_label: 'rc-02', medium: 'copper', limit_set: 'tia-cat6-permanent-link', tester_make: 'Tallis Instruments', tester_model: 'LT-600', tester_serial: 'TL6-20931',
        calibrated_on: '2026-01-20', adapter: 'Cat6 permanent link adapter pair', insertion_loss_margin_db: 12.1, next_margin_db: 5.2, ps_next_margin_db: 6.0,
        acr_f_margin_db: 10.4, ps_acr_f_margin_db: 11.0, return_loss_margin_db: 0.4, acr_n_margin_db: 15.1, ps_acr_n_margin_db: 16.2,
        propagation_delay_ns: 160, delay_skew_ns: 9, dc_loop_resistance_ohm: 6.1, pair36_length_m: 31.2, within_accuracy: 'returnLoss', tested_at: '2026-03-14',
      }),
    ].join('\r\n');
    const res = await importCsv(csv).expect(201);
    expect(res.body).toMatchObject({ imported: 1, cableLabels: ['RC-02'] });
    expect((await list()).map((l) => [l.cableLabel, l.judgement.verdict])).toEqual([['RC-01', 'pass'], ['RC-02', 'pass']]);

    const report = await issueSiteReport().expect(201);
    expect(report.body.title).toMatch(/^Cabling certification report: /);
    const text = await pdfText((await downloadPdf(t, office, report.body.id)).bytes);
    for (const expected of [
      'Cabling certification report', 'All 2 links in this report have performance results to a named limit set, and each passes it.',
      'ANSI/TIA-568.2-D Category 6 permanent link', 'Tallis Instruments LT-600, serial TL6-20931, calibrated 2026-01-20, adapter Cat6 permanent link adapter pair',
      'Return loss +0.4 dB (within the tester’s accuracy)',
      'Propagation delay 160 ns (≤ 498 ns)', // ANSI/TIA-568.2-D permanent link propagation delay (from memory)
      'Delay skew 9 ns (≤ 44 ns)', // ANSI/TIA-568.2-D permanent link delay skew (from memory)
      'DC loop resistance 6.1 Ω (≤ 21 Ω)', // ANSI/TIA-568.2-D permanent link DC loop resistance (from memory)
      '“Within the tester’s accuracy” is our own term',
    ]) {
      expect(text).toContain(expected);
    }
    expect(text).not.toContain('It is not a certification to any category or class');
  });

  it('never certifies over a failing link: a later test that fails makes it a record again', async () => {
    const cables = new DeviceMirror('office-desk');
    await cables.pullAll(t, office);
    const rc02 = cables.one('cableRun', (c) => c.siteId === harbour.siteId && c.label === 'RC-02');
    const typed = await t.http.post(`/api/jobs/${harbour.id}/link-tests`).set(bearer(office))
      .send({ cableRunId: rc02.id, fields: { medium: 'copper', limitSet: 'tia-cat6-permanent-link', returnLossMarginDb: -1.2, testedAt: new Date().toISOString() } })
      .expect(201);
    expect(typed.body.judgement.verdict).toBe('fail');
    const res = await issueSiteReport().expect(201);
    expect(res.body.title).toMatch(/^Wiremap and length record: /);
    expect(res.body.notices).toContain('RC-02 fails its performance test: Return loss: worst margin -1.2 dB, below the limit line.');
    const missing = await t.http.post(`/api/jobs/${harbour.id}/link-tests`).set(bearer(office)).send({ cableRunId: rc02.id, fields: { medium: 'copper' } }).expect(422);
    expect(missing.body.message).toEqual(['Name the limit set the link was tested to, for example ANSI/TIA-568.2-D Category 6 permanent link.']);
  });

  it('takes a technician’s results from the phone and refuses a copper test with no limit set', async () => {
    const phone = new DeviceMirror('tech2-phone');
    await phone.pullAll(t, tech2);
    const visit = phone.one('visit', (v) => v.jobId === harbour.id && Array.isArray(v.technicianIds) && v.technicianIds.length === 1);
    const rc01 = phone.one('cableRun', (c) => c.siteId === harbour.siteId && c.label === 'RC-01');
    const base = { visitId: visit.id, siteId: harbour.siteId, cableRunId: rc01.id, medium: 'copper' };
    const [good, bad] = await push(t, tech2, 'tech2-phone', [
      mutation('linkTest', uuidv7(), { ...base, limitSet: 'iso-class-e-channel', nextMarginDb: 2.2 }, { deviceId: 'tech2-phone' }),
      mutation('linkTest', uuidv7(), base, { deviceId: 'tech2-phone' }),
    ]);
    expect(good!.status).toBe('applied');
    expect(bad).toMatchObject({ status: 'rejected', error: expect.stringContaining('Name the limit set') });
  });
});
