// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { HiddenRoutesMap, type MapEntry } from '../components/hidden-routes-map';

const ring = { id: 'r1', points: [{ x: 100, y: 10 }, { x: 100, y: 500 }], circuitId: 'c3', depthMm: 25 };
const cat6 = { id: 'r2', points: [{ x: 10, y: 20 }, { x: 700, y: 20 }], cableRunId: 'k1', depthMm: 20 };
const photo = (id: string, caption: string, takenAt: string, areaId: string | null) => ({ id, caption, takenAt, areaId, width: 800, height: 600, uploadState: 'ready' });
const ENTRIES: MapEntry[] = [
  { photo: photo('p1', 'Chase above the worktop', '2026-03-01T10:00:00Z', 'kitchen'), markup: { id: 'm1', wallName: 'Worktop wall', routes: [ring] } },
  { photo: photo('p2', 'Worktop wall again', '2026-03-02T10:00:00Z', 'kitchen'), markup: { id: 'm2', wallName: 'Worktop wall', routes: [cat6] } },
  { photo: photo('p3', 'Hall by the door', '2026-03-01T09:00:00Z', 'hall'), markup: { id: 'm3', wallName: 'By the door', routes: [ring, cat6] } },
];

function show() {
  render(
    <HiddenRoutesMap
      entries={ENTRIES}
      areas={[{ id: 'kitchen', name: 'Kitchen' }, { id: 'hall', name: 'Hall' }]}
      cables={[{ id: 'k1', label: 'KT-01' }]}
      circuits={[{ id: 'c3', number: '3', description: 'Kitchen ring', rcdRatingMa: 30 }]}
      usePhotoSource={() => ({ src: null, missing: 'Photo not on this device' })}
      open={(entry) => <button type="button">Open {entry.photo.caption}</button>}
    />,
  );
}

afterEach(cleanup);

describe('the site’s map of hidden routes', () => {
  it('lists each wall by area with its marked photos newest first, each route named by its cable or circuit', () => {
    show();
    const walls = screen.getAllByRole('region');
    expect(walls.map((w) => w.getAttribute('aria-label'))).toEqual(['Hall, By the door', 'Kitchen, Worktop wall']);
    const kitchen = walls[1]!;
    expect(within(kitchen).getAllByRole('article').map((a) => a.getAttribute('aria-label'))).toEqual(['Worktop wall again', 'Chase above the worktop']);
    const hall = within(walls[0]!).getByRole('article', { name: 'Hall by the door' });
    expect(within(hall).getByText(/Circuit 3 \(Kitchen ring\), 25 mm deep/)).toBeTruthy();
    expect(within(hall).getByText(/Cable KT-01, 20 mm deep/)).toBeTruthy();
  });

  it('shows only what one cable or circuit runs through', () => {
    show();
    fireEvent.mouseDown(screen.getByRole('combobox', { name: 'Show' }));
    fireEvent.click(within(screen.getByRole('listbox')).getByRole('option', { name: 'Only Circuit 3 (Kitchen ring)' }));
    expect(screen.getAllByRole('article').map((a) => a.getAttribute('aria-label'))).toEqual(['Hall by the door', 'Chase above the worktop']);
  });
});
