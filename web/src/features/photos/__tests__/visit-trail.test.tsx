// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db, type LocalRow, type PhotoRow, type VisitRow } from '@/lib/db';
import { setSession } from '@/lib/session';
import { resetUploadProgress } from '@/lib/photos/upload-progress';
import { photoBadge } from '../phone/photo-badge';
import { VisitTrail } from '../phone/visit-trail';

const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000002';
const VISIT = '01900000-0000-7000-8000-000000000004';
const AREA = '01900000-0000-7000-8000-000000000005';
const base = { _base: { version: 1, fieldVersions: {}, values: {} } } satisfies Pick<LocalRow, '_base'>;
const sha = (n: number) => n.toString(16).padStart(64, '0');

const today = (h: number, m = 0) => {
  const d = new Date();
  d.setHours(h, m, 0, 0);
  return d.toISOString();
};

const visit: VisitRow = { id: VISIT, jobId: '01900000-0000-7000-8000-000000000003', siteId: SITE, technicianIds: [USER.id], plannedStart: today(9), plannedEnd: today(12), ...base };

function photo(n: number, extra: Partial<PhotoRow> = {}): PhotoRow {
  return {
    id: `01900000-0000-7000-8000-${n.toString().padStart(12, '0')}`,
    visitId: VISIT,
    siteId: SITE,
    caption: `Photo ${n}`,
    takenAt: today(9, n % 60),
    sha256: sha(n),
    uploadState: 'waiting',
    tags: ['route'],
    ...base,
    ...extra,
  };
}

function show(v: VisitRow) {
  // Offline: server thumbnails for photos this phone never had cannot load, and must not break the list.
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
});

afterEach(() => {
  cleanup();
  setSession(null);
});

describe('visit trail', () => {
  it('lists photos, notes and circuits newest first, with where each photo stands', async () => {
    await db.area.put({ id: AREA, siteId: SITE, name: 'Lounge', ...base });
    await db.photo.bulkPut([photo(1, { areaId: AREA }), photo(2), photo(3), photo(4, { uploadState: 'ready' })]);
    await db.photoBlobs.bulkPut([
      { sha256: sha(1), mime: 'image/jpeg', bytes: new ArrayBuffer(8), size: 8, createdAt: today(9), userId: USER.id, state: 'waiting' },
      { sha256: sha(2), mime: 'image/jpeg', bytes: new ArrayBuffer(8), size: 8, createdAt: today(9), userId: USER.id, state: 'refused', refusedReason: 'This file is not a photo we can read.' },
      { sha256: sha(3), mime: 'image/jpeg', bytes: null, size: 8, createdAt: today(9), userId: USER.id, state: 'freed' },
    ]);
    await db.note.put({ id: '01900000-0000-7000-8000-0000000000f1', visitId: VISIT, siteId: SITE, text: 'Isolated circuit 1 and proved dead before opening the box', createdAt: today(9, 30), ...base });
    // Added today by someone not on the visit (the office): not part of this visit's trail.
    await db.circuit.put({ id: '01900000-0000-7000-8000-0000000000f2', siteId: SITE, boardId: SITE, number: '7', createdAt: today(8), createdById: 'office-user', ...base });
    await db.circuit.put({ id: '01900000-0000-7000-8000-0000000000f3', siteId: SITE, boardId: SITE, number: '8', description: 'Electric fire', createdAt: today(9, 45), ...base });

    await db.photoThumbs.put({ sha256: sha(1), mime: 'image/jpeg', bytes: new Uint8Array([0xff, 0xd8, 0xff, 0xd9]).buffer, width: 320, height: 240 });
    show(visit);
    const list = await screen.findByRole('list', { name: 'Trail of this visit' });
    await within(list).findByText('Refused: This file is not a photo we can read.');
    const rows = within(list).getAllByRole('listitem').map((li) => li.textContent);
    expect(rows).toHaveLength(6);
    expect(rows[0]).toContain('Circuit 8 added');
    expect(rows[1]).toContain('Note');
    expect(rows[2]).toMatch(/Photo 4.*On server/);
    expect(rows[3]).toMatch(/Photo 3.*On server/);
    expect(rows[4]).toMatch(/Photo 2.*Refused: This file is not a photo we can read\./);
    expect(rows[5]).toMatch(/Photo 1.*Lounge.*route.*Waiting/);
    expect(screen.getByLabelText('Take or add photos')).toHaveProperty('accept', 'image/*');
    // The thumbnail made on the phone, never the full-size photo.
    await waitFor(() => expect(within(list).getByRole('img', { name: 'Photo 1' }).getAttribute('src')).toMatch(/^blob:/));
  });

  it('keeps the times the phone recorded things at after a sync, when the server says they all arrived at once', async () => {
    // As pulled back after signing off at 10:18: the server's createdAt is the sync, recordedAt is the phone's own.
    const arrived = today(10, 18);
    await db.note.put({ id: '01900000-0000-7000-8000-0000000000e1', visitId: VISIT, siteId: SITE, text: 'Cables traced', recordedAt: today(10, 6), createdAt: arrived, ...base });
    await db.pointChange.put({ id: '01900000-0000-7000-8000-0000000000e2', visitId: VISIT, siteId: SITE, action: 'move', accessoryKind: 'Twin socket-outlet', recordedAt: today(10, 12), createdAt: arrived, ...base });
    await db.note.put({ id: '01900000-0000-7000-8000-0000000000e3', visitId: VISIT, siteId: SITE, text: 'Customer shown the new socket', recordedAt: today(10, 16), createdAt: arrived, ...base });
    await db.visit.put({ ...visit, signedAt: today(10, 17) });
    show({ ...visit, signedAt: today(10, 17) });
    const list = await screen.findByRole('list', { name: 'Trail of this visit' });
    await within(list).findByText('Customer shown the new socket');
    const rows = within(list).getAllByRole('listitem').map((li) => li.textContent ?? '');
    const at = (text: string) => rows.findIndex((r) => r.includes(text));
    // Newest first, signing off last of all, each with the time it was recorded
    expect([at('Signed off'), at('Customer shown the new socket'), at('Twin socket-outlet'), at('Cables traced')]).toEqual([0, 1, 2, 3]);
    expect(rows[1]).toContain('10:16');
    expect(rows[3]).toContain('10:06');
  });

  it('shows a long trail twenty at a time', async () => {
    await db.photo.bulkPut(Array.from({ length: 45 }, (_, i) => photo(i + 1)));
    show(visit);
    const list = await screen.findByRole('list', { name: 'Trail of this visit' });
    expect(within(list).getAllByRole('listitem')).toHaveLength(20);
    fireEvent.click(screen.getByRole('button', { name: 'Show 20 more of 25' }));
    expect(within(list).getAllByRole('listitem')).toHaveLength(40);
    fireEvent.click(screen.getByRole('button', { name: 'Show 5 more of 5' }));
    expect(within(list).getAllByRole('listitem')).toHaveLength(45);
    expect(screen.queryByRole('button', { name: /more of/ })).toBeNull();
  });
});

describe('photo badge', () => {
  it('says Waiting, Sending n %, On server or Refused', () => {
    const states = { bySha: new Map([[sha(1), { state: 'waiting' as const }]]), partly: new Map([[sha(1), 0.4]]) };
    const idle = { bySha: {}, roundTotal: 0, roundSent: 0, active: false, lastError: null };
    expect(photoBadge({ sha256: sha(1), uploadState: 'waiting' }, { ...states, partly: new Map() }, idle).label).toBe('Waiting');
    expect(photoBadge({ sha256: sha(1), uploadState: 'waiting' }, states, idle).label).toBe('Waiting · 40 % sent');
    expect(photoBadge({ sha256: sha(1), uploadState: 'waiting' }, states, { ...idle, active: true, bySha: { [sha(1)]: { sent: 512, total: 1024 } } }).label).toBe('Sending 50 %');
    expect(photoBadge({ sha256: sha(1), uploadState: 'ready' }, states, idle).label).toBe('On server');
    // Taken on another phone: nothing here, the row says where it stands.
    expect(photoBadge({ sha256: sha(9), uploadState: 'waiting' }, states, idle).label).toBe('Waiting');
  });
});
