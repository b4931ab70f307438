// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db, type LocalRow, type VisitRow } from '@/lib/db';
import { setSession } from '@/lib/session';
import { resetUploadProgress } from '@/lib/photos/upload-progress';
import { VisitTrail } from '../phone/visit-trail';

const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000002';
const VISIT = '01900000-0000-7000-8000-000000000004';
const GOOD = '01900000-0000-7000-8000-0000000000c1';
const TYPO = '01900000-0000-7000-8000-0000000000c2';
const NOTE = '01900000-0000-7000-8000-0000000000d1';
const base = { _base: { version: 1, fieldVersions: {}, values: {} } } satisfies Pick<LocalRow, '_base'>;
const today = (h: number, m = 0) => {
  const d = new Date();
  d.setHours(h, m, 0, 0);
  return d.toISOString();
};
const visit: VisitRow = { id: VISIT, jobId: '01900000-0000-7000-8000-000000000003', siteId: SITE, technicianIds: [USER.id], plannedStart: today(9), status: 'on-site', ...base };

function show(v: VisitRow) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, queryFn: () => Promise.reject(new Error('offline')) } } });
  render(
    <QueryClientProvider client={client}>
      <VisitTrail visit={v} userId={USER.id} />
    </QueryClientProvider>,
  );
}

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
  resetUploadProgress();
  await db.visit.put(visit);
  await db.cableRun.bulkPut([
    { id: GOOD, siteId: SITE, label: 'MK-01', medium: 'Cat6', lastVisitId: VISIT, recordedAt: today(9, 10), ...base },
    { id: TYPO, siteId: SITE, label: 'MK-O1', medium: 'Cat6', lastVisitId: VISIT, recordedAt: today(9, 20), ...base },
  ]);
  await db.note.put({ id: NOTE, visitId: VISIT, siteId: SITE, text: 'Lounge sockets on ring 1', recordedAt: today(9, 30), ...base });
});

afterEach(() => {
  cleanup();
  setSession(null);
});

describe('voiding a record made by mistake', () => {
  it('asks why, keeps the record struck through with the reason, and sends the void with the next sync', async () => {
    show(visit);
    const list = await screen.findByRole('list', { name: 'Trail of this visit' });
    fireEvent.click(await within(list).findByRole('button', { name: 'Void cable MK-O1…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Void cable MK-O1?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Void it' }));
    expect(await within(dialog).findByText('Say why this record is void, like “typed the wrong label”.')).toBeTruthy();
    expect((await db.cableRun.get(TYPO))!.voidedAt ?? null).toBeNull();

    fireEvent.change(within(dialog).getByLabelText('Why is it void?'), { target: { value: 'Typed O for 0 in the label' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Void it' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    const voided = (await db.cableRun.get(TYPO))!;
    expect(voided).toMatchObject({ voidReason: 'Typed O for 0 in the label', voidedAt: expect.any(String) });
    const sent = await db.outbox.where('[entity+id]').equals(['cableRun', TYPO]).toArray();
    expect(sent.map((e) => e.set)).toEqual([{ voidedAt: voided.voidedAt, voidReason: 'Typed O for 0 in the label' }]);

    const item = await within(list).findByRole('listitem', { name: /^Cable MK-O1 · .* \(void\)$/ });
    expect(within(item).getByText('Void: Typed O for 0 in the label')).toBeTruthy();
    expect(getComputedStyle(within(item).getByText(/^Cable MK-O1/)).textDecoration).toContain('line-through');
    // Put back before the visit is finished.
    fireEvent.click(within(item).getByRole('button', { name: 'Put back cable MK-O1' }));
    await waitFor(async () => expect((await db.cableRun.get(TYPO))!.voidedAt).toBeNull());
  });

  it('offers no void once the visit is finished: the records are the office’s to put right', async () => {
    show({ ...visit, status: 'finished' });
    const list = await screen.findByRole('list', { name: 'Trail of this visit' });
    await within(list).findByText('Lounge sockets on ring 1');
    expect(within(list).queryAllByRole('button', { name: /^Void / })).toEqual([]);
  });
});
