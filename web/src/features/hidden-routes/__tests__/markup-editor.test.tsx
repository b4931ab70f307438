// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, type LocalRow } from '@/lib/db';
import { setSession } from '@/lib/session';
import { PhotoRoutesScreen } from '../phone/photo-routes-screen';

const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const SITE = '01900000-0000-7000-8000-000000000002';
const VISIT = '01900000-0000-7000-8000-000000000004';
const PHOTO = '01900000-0000-7000-8000-0000000000f1';
const CIRCUIT = '01900000-0000-7000-8000-0000000000c3';
const CABLE = '01900000-0000-7000-8000-0000000000b1';
const base = { _base: { version: 1, fieldVersions: {}, values: {} } } satisfies Pick<LocalRow, '_base'>;

// The 1600 × 1200 px photo is shown 800 × 600 on screen: half a photo pixel to a screen pixel.
const SHOWN = { left: 0, top: 0, width: 800, height: 600, right: 800, bottom: 600, x: 0, y: 0, toJSON: () => ({}) };

function show(locked = false) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, queryFn: () => Promise.reject(new Error('offline')) } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <PhotoRoutesScreen photoId={PHOTO} visitId={VISIT} locked={locked} back={{ to: '/', label: 'Trail' }} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

const drawing = () => screen.getByRole('img', { name: /drawn$/ });
/** A finger put down, moved and lifted, in screen pixels over the shown photo. */
function stroke(from: [number, number], to: [number, number]) {
  const svg = drawing();
  fireEvent.pointerDown(svg, { clientX: from[0], clientY: from[1], pointerId: 1 });
  fireEvent.pointerMove(svg, { clientX: (from[0] + to[0]) / 2, clientY: (from[1] + to[1]) / 2, pointerId: 1 });
  fireEvent.pointerUp(svg, { clientX: to[0], clientY: to[1], pointerId: 1 });
}
const tap = (at: [number, number]) => stroke(at, at);

async function choose(label: string, option: string) {
  fireEvent.mouseDown(screen.getByRole('combobox', { name: label }));
  fireEvent.click(within(await screen.findByRole('listbox')).getByRole('option', { name: option }));
}

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  localStorage.clear();
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
  vi.spyOn(SVGElement.prototype, 'getBoundingClientRect').mockReturnValue(SHOWN as DOMRect);
  await db.photo.put({ id: PHOTO, visitId: VISIT, siteId: SITE, caption: 'Open chase above the worktop', width: 1600, height: 1200, uploadState: 'waiting', ...base });
  await db.circuit.put({ id: CIRCUIT, siteId: SITE, boardId: '01900000-0000-7000-8000-0000000000d1', number: '3', description: 'Kitchen ring', rcdRatingMa: 30, ...base });
  await db.cableRun.put({ id: CABLE, siteId: SITE, label: 'KT-01', ...base });
});
afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

describe('drawing routes over a photo', () => {
  it('snaps each stroke level or plumb, in the photo’s own pixels, and ties the route to a circuit with its depth', async () => {
    show();
    await screen.findByRole('img', { name: 'Photo with 0 routes drawn' });
    // Down near the top, lifted 421 px lower and 5 px to the side: a plumb run (x kept), in photo pixels twice the screen's.
    stroke([425, 5], [430, 426]);
    expect(await screen.findByText(/1 straight run drawn/)).toBeTruthy();
    // A second stroke from the end, mostly sideways: level, from the end of the first.
    stroke([430, 426], [600, 440]);
    expect(await screen.findByText(/2 straight runs drawn/)).toBeTruthy();
    const preview = drawing().querySelector('polyline[stroke="#ffeb3b"]');
    expect(preview?.getAttribute('points')).toBe('850,10 850,852 1200,852');
    fireEvent.click(screen.getByRole('button', { name: 'Undo last run' }));
    expect(drawing().querySelector('polyline[stroke="#ffeb3b"]')?.getAttribute('points')).toBe('850,10 850,852');

    fireEvent.click(screen.getByRole('button', { name: 'Finish route' }));
    fireEvent.click(screen.getByRole('button', { name: 'Add route' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Choose the cable or circuit this route is.');
    await choose('Cable or circuit', 'Circuit 3 (Kitchen ring)');
    fireEvent.change(screen.getByLabelText('Depth below the surface (mm)'), { target: { value: '2000' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add route' }));
    expect((await screen.findByRole('alert')).textContent).toMatch(/from 0 to 1000/);
    fireEvent.change(screen.getByLabelText('Depth below the surface (mm)'), { target: { value: '25' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add route' }));
    const legend = await screen.findByRole('list', { name: 'Routes on this photo' });
    expect(within(legend).getByText('Route 1: Circuit 3 (Kitchen ring)')).toBeTruthy();
    expect(within(legend).getByText(/25 mm deep/)).toBeTruthy();
    // Not yet placed on the wall: the check asks for a distance rather than guessing.
    expect(within(legend).getByText(/Measure from a corner, the floor or the ceiling/)).toBeTruthy();
  });

  it('places the route by typed distances from datums, and shows the safe-zone verdict with its source', async () => {
    show();
    await screen.findByRole('img', { name: 'Photo with 0 routes drawn' });
    stroke([425, 5], [425, 426]);
    fireEvent.click(await screen.findByRole('button', { name: 'Finish route' }));
    await choose('Cable or circuit', 'Circuit 3 (Kitchen ring)');
    fireEvent.change(screen.getByLabelText('Depth below the surface (mm)'), { target: { value: '25' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add route' }));
    await screen.findByRole('list', { name: 'Routes on this photo' });

    fireEvent.click(screen.getByRole('button', { name: 'Measure' }));
    expect(screen.getByText('Tap the left-hand corner of the wall on the photo.')).toBeTruthy();
    // The left-hand corner at x = 100 px; measured 500 mm to a point at x = 350 px (2 mm a pixel).
    tap([50, 300]);
    expect(await screen.findByText(/Now tap the point you measured to/)).toBeTruthy();
    tap([175, 300]);
    fireEvent.change(screen.getByLabelText('Distance (mm)'), { target: { value: '500' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add distance' }));
    await choose('Measured from', 'Floor');
    // The floor at y = 1100 px; 450 mm up to y = 875 px.
    tap([400, 550]);
    tap([425, 437.5]);
    fireEvent.change(screen.getByLabelText('Distance (mm)'), { target: { value: '450' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add distance' }));
    const distances = screen.getByRole('list', { name: 'Distances measured' });
    expect(within(distances).getByText('500 mm from the left-hand corner')).toBeTruthy();
    expect(within(distances).getByText('450 mm from the floor')).toBeTruthy();
    expect(within(drawing()).getByText('500 mm')).toBeTruthy();

    fireEvent.change(screen.getByLabelText('Wall width (mm)'), { target: { value: '3000' } });
    fireEvent.change(screen.getByLabelText('Wall height (mm)'), { target: { value: '2400' } });
    const legend = screen.getByRole('list', { name: 'Routes on this photo' });
    // 1500 mm along, from 2180 mm up to 496 mm: (850 - 100) × 2 and (1100 - 10) × 2, (1100 - 852) × 2.
    expect(within(legend).getByText(/runs \(1500, 2180\) to \(1500, 496\) mm/)).toBeTruthy();
    // No accessory outlined yet: a plumb run in the middle of the wall is outside every zone.
    expect(within(legend).getByRole('button', { name: /Safe zones, route 1: Fail/ })).toBeTruthy();
    expect(within(legend).getByText(/Source: BS 7671:2018\+A2:2022 Reg 522\.6\.202/)).toBeTruthy();
    expect(drawing().querySelector('polyline[stroke="#c62828"]')).toBeTruthy();

    // Outline the socket box under it: the run is in line with it, in a zone.
    fireEvent.click(screen.getByRole('button', { name: 'Outline box' }));
    stroke([406, 426], [443, 448]);
    fireEvent.click(screen.getByRole('button', { name: 'Add box' }));
    expect(await within(legend).findByRole('button', { name: /Safe zones, route 1: Pass/ })).toBeTruthy();

    // A distance from the side of the box measures the scale too: 100 mm over 50 px, the same 2 mm a pixel.
    fireEvent.click(screen.getByRole('button', { name: 'Measure' }));
    await choose('Measured from', 'Side of a socket box');
    expect(screen.getByText('Tap the side of the socket box on the photo.')).toBeTruthy();
    tap([406, 350]);
    tap([431, 350]);
    fireEvent.change(screen.getByLabelText('Distance (mm)'), { target: { value: '100' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add distance' }));
    expect(await within(screen.getByRole('list', { name: 'Distances measured' })).findByText(/^100 mm from the side of a socket box$/i)).toBeTruthy();
    expect(within(legend).getByText(/runs \(1500, 2180\) to \(1500, 496\) mm/)).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Save routes' }));
    await screen.findByText(/Routes saved on this phone/);
    const [row] = await db.photoMarkup.toArray();
    // The photo's own id, so that a second phone's markup of the same photo is the same record.
    expect(row).toMatchObject({ id: PHOTO, photoId: PHOTO, visitId: VISIT, siteId: SITE, wallWidthMm: 3000, wallHeightMm: 2400 });
    expect(row!.routes).toEqual([{ id: expect.any(String), points: [{ x: 850, y: 10 }, { x: 850, y: 852 }], cableRunId: null, circuitId: CIRCUIT, depthMm: 25, protection: 'none' }]);
    expect(row!.datums!.map((d) => [d.datum, d.lineAt, d.to, d.mm])).toEqual([
      ['left-corner', 100, { x: 350, y: 600 }, 500],
      ['floor', 1100, { x: 850, y: 875 }, 450],
      ['box-side', 812, { x: 862, y: 700 }, 100],
    ]);
    expect(row!.accessories).toEqual([{ id: expect.any(String), centre: { x: 849, y: 874 }, widthPx: 74, heightPx: 44, label: 'Socket box' }]);
    expect((await db.outbox.toArray()).map((o) => o.entity)).toEqual(['photoMarkup']);
  });

  it('keeps what was drawn as a draft until saved, and checks a drilling point with the caution', async () => {
    const first = show();
    await screen.findByRole('img', { name: 'Photo with 0 routes drawn' });
    stroke([425, 5], [425, 426]);
    fireEvent.click(await screen.findByRole('button', { name: 'Finish route' }));
    await choose('Cable or circuit', 'Cable KT-01');
    fireEvent.click(screen.getByRole('button', { name: 'Add route' }));
    await screen.findByText('Route 1: Cable KT-01');
    first.unmount();

    show();
    expect(await screen.findByText(/Back where you left off/)).toBeTruthy();
    expect(screen.getByText('Route 1: Cable KT-01')).toBeTruthy();
    expect(await db.photoMarkup.count()).toBe(0);

    fireEvent.click(screen.getByRole('button', { name: 'Drilling check' }));
    expect(screen.getByText(/a cable detector and isolate safely before drilling/)).toBeTruthy();
    expect(screen.getAllByText(/competent person decide/).length).toBeGreaterThan(0);
    tap([450, 300]);
    // Nothing measured yet: the check says so rather than passing the point.
    expect(await screen.findByText(/not measured yet/)).toBeTruthy();
  });

  it('shows a finished visit’s routes without letting them change', async () => {
    await db.photoMarkup.put({ id: '01900000-0000-7000-8000-0000000000e1', photoId: PHOTO, visitId: VISIT, siteId: SITE, routes: [{ id: 'r1', points: [{ x: 850, y: 10 }, { x: 850, y: 852 }], cableRunId: CABLE }], ...base });
    show(true);
    expect(await screen.findByText('Route 1: Cable KT-01')).toBeTruthy();
    expect(screen.getByText(/This visit is finished/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Draw route' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Save routes' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Remove route/ })).toBeNull();
  });
});
