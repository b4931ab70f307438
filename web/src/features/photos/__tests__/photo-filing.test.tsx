// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, configure, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, type LocalRow, type PhotoRow, type VisitRow } from '@/lib/db';
import { setSession } from '@/lib/session';
import { resetUploadProgress } from '@/lib/photos/upload-progress';
import { fakeJpeg } from '@/lib/photos/test-photos';
import { VisitTrail } from '../phone/visit-trail';
import { MemoryRouter } from 'react-router-dom';

// The worker is the browser's; here each file "scales" to a small JPEG of its own, seeded by its size.
vi.mock('@/lib/photos/shrink-photo', () => ({
  shrinkPhoto: async (file: File) => {
    const copy = (u: Uint8Array) => u.buffer.slice(u.byteOffset, u.byteOffset + u.byteLength) as ArrayBuffer;
    return {
      bytes: copy(fakeJpeg({ width: 2560, height: 1920, bytes: 3000, seed: file.size })),
      mime: 'image/jpeg',
      thumb: copy(fakeJpeg({ width: 320, height: 240, bytes: 300, seed: file.size })),
      thumbMime: 'image/jpeg',
    };
  },
}));

// Photos are made ready and written through IndexedDB: on a busy two-core machine a second is not always enough.
configure({ asyncUtilTimeout: 10_000 });

const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000002';
const VISIT = '01900000-0000-7000-8000-000000000004';
const LOUNGE = '01900000-0000-7000-8000-000000000005';
const HALL = '01900000-0000-7000-8000-000000000006';
const base = { _base: { version: 1, fieldVersions: {}, values: {} } } satisfies Pick<LocalRow, '_base'>;
const sha = (n: number) => n.toString(16).padStart(64, '0');
const visit: VisitRow = { id: VISIT, jobId: '01900000-0000-7000-8000-000000000003', siteId: SITE, technicianIds: [USER.id], plannedStart: '2026-03-14T09:00:00.000Z', ...base };

function photo(n: number, extra: Partial<PhotoRow> = {}): PhotoRow {
  return {
    id: `01900000-0000-7000-8000-${n.toString().padStart(12, '0')}`,
    visitId: VISIT,
    siteId: SITE,
    caption: `Photo ${n}`,
    takenAt: `2026-03-14T09:0${n}:00.000Z`,
    sha256: sha(n),
    uploadState: 'waiting',
    tags: [],
    ...base,
    ...extra,
  };
}

const camera = (name: string, size: number) => new File([new Uint8Array(size).fill(7)], name, { type: 'image/jpeg', lastModified: 1_773_480_000_000 });

function show(locked = false) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, queryFn: () => Promise.reject(new Error('offline')) } } });
  render(
    <QueryClientProvider client={client}>
      {/* The viewer links to the photo's cable routes. */}
      <MemoryRouter>
        <VisitTrail visit={visit} userId={USER.id} locked={locked} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
  resetUploadProgress();
  await db.area.bulkPut([
    { id: LOUNGE, siteId: SITE, name: 'Lounge', ...base },
    { id: HALL, siteId: SITE, name: 'Hall', ...base },
  ]);
  await db.setMeta('photoTags', ['route', 'defect']);
});

afterEach(() => {
  cleanup();
  setSession(null);
});

describe('photos chosen together', () => {
  it('are each filed on their own when asked, and the rest follow the area, subject and tags for all', async () => {
    show();
    fireEvent.change(await screen.findByLabelText('Take or add photos'), { target: { files: [camera('a.jpg', 11), camera('b.jpg', 12), camera('c.jpg', 13)] } });
    const form = await screen.findByRole('form', { name: 'Photo details' });
    await within(form).findByRole('option', { name: 'Lounge' });
    fireEvent.change(within(form).getByLabelText('Area'), { target: { value: LOUNGE } });
    fireEvent.click(within(form).getByRole('button', { name: 'File photo 2 on its own' }));
    // Photo 2 starts from what was chosen for all, and then goes its own way.
    expect(within(form).getByLabelText<HTMLSelectElement>('Area of photo 2').value).toBe(LOUNGE);
    fireEvent.change(within(form).getByLabelText('Area of photo 2'), { target: { value: HALL } });
    const ownTags = within(form).getByRole('group', { name: 'Tags of photo 2' });
    fireEvent.click(within(ownTags).getByRole('button', { name: 'defect' }));
    fireEvent.change(within(form).getByLabelText('Caption for photo 2'), { target: { value: 'Damaged cable in the hall' } });
    expect(within(form).getByText('For the other photos')).toBeTruthy();
    fireEvent.click(within(form).getByRole('button', { name: 'Save 3 photos' }));
    await screen.findByText('3 photos saved on this phone.', undefined, { timeout: 10_000 });

    const rows = await db.photo.toArray();
    expect(rows).toHaveLength(3);
    const hall = rows.find((r) => r.caption === 'Damaged cable in the hall')!;
    expect(hall).toMatchObject({ areaId: HALL, tags: ['defect'] });
    expect(rows.filter((r) => r !== hall).map((r) => [r.areaId, r.tags])).toEqual([
      [LOUNGE, []],
      [LOUNGE, []],
    ]);
    // Every row went to the outbox, to reach the office with the next sync.
    expect(await db.outbox.count()).toBe(3);
  });
});

describe('a photo opened from the trail', () => {
  it('is shown large, steps to the next by button and by arrow key, and is re-captioned and re-filed through the outbox', async () => {
    await db.photo.bulkPut([photo(1), photo(2, { areaId: LOUNGE })]);
    await db.photoBlobs.bulkPut([1, 2].map((n) => ({ sha256: sha(n), mime: 'image/jpeg', bytes: new ArrayBuffer(8), size: 8, createdAt: visit.plannedStart!, userId: USER.id, state: 'waiting' as const })));
    show();
    fireEvent.click(await screen.findByRole('button', { name: 'Open photo: Photo 2' }));
    const viewer = await screen.findByRole('dialog', { name: 'Photo 1 of 2' });
    expect(await within(viewer).findByRole('img', { name: 'Photo 2' })).toBeTruthy();
    expect(within(viewer).getByRole('button', { name: 'Previous photo' })).toHaveProperty('disabled', true);
    fireEvent.keyDown(viewer, { key: 'ArrowRight' });
    await screen.findByRole('dialog', { name: 'Photo 2 of 2' });
    fireEvent.click(within(viewer).getByRole('button', { name: 'Previous photo' }));
    await screen.findByRole('dialog', { name: 'Photo 1 of 2' });

    const filing = within(viewer).getByRole('form', { name: 'Caption and filing' });
    await within(filing).findByRole('option', { name: 'Hall' });
    expect(within(filing).getByRole('button', { name: 'Save changes' })).toHaveProperty('disabled', true);
    fireEvent.change(within(filing).getByLabelText('Caption'), { target: { value: 'Chase to the new socket' } });
    // Typing in the caption never turns the page.
    fireEvent.keyDown(within(filing).getByLabelText('Caption'), { key: 'ArrowRight' });
    fireEvent.change(within(filing).getByLabelText('Area'), { target: { value: HALL } });
    fireEvent.click(within(filing).getByRole('button', { name: 'route' }));
    fireEvent.click(within(filing).getByRole('button', { name: 'Save changes' }));
    await within(filing).findByText(/Changes saved on this phone/, undefined, { timeout: 10_000 });
    expect(screen.getByRole('dialog', { name: 'Photo 1 of 2' })).toBeTruthy();

    expect(await db.photo.get(photo(2).id)).toMatchObject({ caption: 'Chase to the new socket', areaId: HALL, tags: ['route'] });
    const [change] = await db.outbox.toArray();
    expect(change).toMatchObject({ entity: 'photo', id: photo(2).id, set: { caption: 'Chase to the new socket', areaId: HALL, tags: ['route'] } });
    // Fields left as they were are not sent.
    expect(Object.keys(change!.set!)).not.toContain('subjectType');
  });

  it('shows the cable routes drawn on it over the photo, and leads to them', async () => {
    await db.photo.put(photo(1, { width: 1600, height: 1200 }));
    await db.photoBlobs.put({ sha256: sha(1), mime: 'image/jpeg', bytes: new ArrayBuffer(8), size: 8, createdAt: visit.plannedStart!, userId: USER.id, state: 'waiting' });
    await db.photoMarkup.put({
      id: '01900000-0000-7000-8000-0000000000e1', photoId: photo(1).id, visitId: VISIT, siteId: SITE, ...base,
      routes: [
        { id: 'r1', points: [{ x: 850, y: 10 }, { x: 850, y: 852 }], cableRunId: '01900000-0000-7000-8000-0000000000b1' },
        { id: 'r2', points: [{ x: 100, y: 40 }, { x: 1500, y: 40 }], circuitId: '01900000-0000-7000-8000-0000000000c3' },
      ],
    });
    show();
    fireEvent.click(await screen.findByRole('button', { name: 'Open photo: Photo 1' }));
    const viewer = await screen.findByRole('dialog', { name: 'Photo 1 of 1' });
    // Read from the phone's database after the photo: on a busy machine that takes more than a moment.
    const drawn = await within(viewer).findByRole('img', { name: 'Photo 1: 2 cable routes drawn over it' }, { timeout: 10_000 });
    expect(drawn.querySelectorAll('polyline')).toHaveLength(4);
    // The photo's own bytes are read apart from the markup, and may come a moment later.
    expect(await within(viewer).findByRole('img', { name: 'Photo 1' }, { timeout: 10_000 })).toBeTruthy();
    expect(within(viewer).getByRole('link', { name: 'Mark cable routes' }).getAttribute('href')).toBe(`/visits/${VISIT}/photos/${photo(1).id}/routes`);
  });

  it('cannot be changed once the visit is finished', async () => {
    await db.photo.put(photo(1));
    show(true);
    fireEvent.click(await screen.findByRole('button', { name: 'Open photo: Photo 1' }));
    const viewer = await screen.findByRole('dialog', { name: 'Photo 1 of 1' });
    expect(within(viewer).getByLabelText('Caption')).toHaveProperty('disabled', true);
    expect(within(viewer).queryByRole('button', { name: 'Save changes' })).toBeNull();
    expect(within(viewer).getByText(/This visit is finished/)).toBeTruthy();
  });
});

describe('a photo the server refused', () => {
  async function refused() {
    await db.photo.bulkPut([photo(1, { caption: 'Consumer unit', areaId: HALL, tags: ['defect'] }), photo(2)]);
    await db.photoBlobs.bulkPut([
      { sha256: sha(1), mime: 'image/jpeg', bytes: new ArrayBuffer(8), size: 8, createdAt: visit.plannedStart!, userId: USER.id, state: 'refused', refusedReason: 'This file is not a photo we can read.' },
      { sha256: sha(2), mime: 'image/jpeg', bytes: new ArrayBuffer(8), size: 8, createdAt: visit.plannedStart!, userId: USER.id, state: 'waiting' },
    ]);
    await db.photoThumbs.put({ sha256: sha(1), mime: 'image/jpeg', bytes: new ArrayBuffer(4), width: 320, height: 240 });
    show();
    fireEvent.click(await screen.findByRole('button', { name: 'Open photo: Consumer unit' }));
    return screen.findByRole('dialog', { name: /^Photo \d of 2$/ });
  }

  it('is taken again: the new photo takes its place with its caption and filing, and the refused bytes go', async () => {
    const viewer = await refused();
    const notAccepted = within(viewer).getByRole('group', { name: 'Photo not accepted' });
    fireEvent.change(within(notAccepted).getByLabelText('Retake photo'), { target: { files: [camera('again.jpg', 21)] } });
    await waitFor(async () => expect(await db.photo.get(photo(1).id)).toBeUndefined(), { timeout: 10_000 });
    const rows = await db.photo.toArray();
    expect(rows).toHaveLength(2);
    const again = rows.find((r) => r.id !== photo(2).id)!;
    expect(again).toMatchObject({ caption: 'Consumer unit', areaId: HALL, tags: ['defect'], uploadState: 'waiting' });
    expect(again.sha256).not.toBe(sha(1));
    expect(await db.photoBlobs.get(sha(1))).toBeUndefined();
    expect(await db.photoThumbs.get(sha(1))).toBeUndefined();
    expect((await db.photoBlobs.get(again.sha256!))?.state).toBe('waiting');
    // The viewer follows the new photo.
    const shown = await screen.findByRole('dialog', { name: /^Photo \d of 2$/ });
    expect(within(shown).queryByRole('group', { name: 'Photo not accepted' })).toBeNull();
    const outbox = await db.outbox.toArray();
    expect(outbox.map((e) => [e.id, e.delete === true])).toEqual([
      [again.id, false],
      [photo(1).id, true],
    ]);
  });

  it('is removed after the technician confirms, with its bytes', async () => {
    const viewer = await refused();
    fireEvent.click(within(viewer).getByRole('button', { name: 'Remove photo' }));
    fireEvent.click(within(viewer).getByRole('button', { name: 'Keep it' }));
    expect(await db.photo.count()).toBe(2);
    fireEvent.click(within(viewer).getByRole('button', { name: 'Remove photo' }));
    fireEvent.click(within(viewer).getByRole('button', { name: 'Remove it' }));
    await waitFor(async () => expect(await db.photo.get(photo(1).id)).toBeUndefined(), { timeout: 10_000 });
    expect(await db.photoBlobs.get(sha(1))).toBeUndefined();
    expect(await db.photoBlobs.get(sha(2))).toBeDefined();
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
  });
});
