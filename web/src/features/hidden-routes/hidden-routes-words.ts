import type { ConcealedCableProtection, DatumKind, MarkedRoute, PhotoMarkupShape } from '@wiretrail/core';

/** How a datum is picked on the photo, and what its distance is called. */
export const DATUM_CHOICES: Array<{ value: DatumKind; label: string; tapLine: string }> = [
  { value: 'left-corner', label: 'Left-hand corner', tapLine: 'Tap the left-hand corner of the wall on the photo.' },
  { value: 'right-corner', label: 'Right-hand corner', tapLine: 'Tap the right-hand corner of the wall on the photo.' },
  { value: 'floor', label: 'Floor', tapLine: 'Tap the floor line on the photo.' },
  { value: 'ceiling', label: 'Ceiling', tapLine: 'Tap the ceiling line on the photo.' },
  { value: 'box-side', label: 'Side of a socket box', tapLine: 'Tap the side of the socket box on the photo.' },
  { value: 'box-top-or-bottom', label: 'Top or bottom of a socket box', tapLine: 'Tap the top or bottom edge of the socket box on the photo.' },
];
export const datumLabel = (d: DatumKind) => DATUM_CHOICES.find((c) => c.value === d)?.label ?? d;

export const PROTECTION_CHOICES: Array<{ value: ConcealedCableProtection; label: string }> = [
  { value: 'none', label: 'None (relies on the zones)' },
  { value: 'earthed-metallic-covering', label: 'Earthed metallic covering' },
  { value: 'earthed-conduit-or-trunking', label: 'Earthed conduit or trunking' },
  { value: 'mechanical-protection', label: 'Mechanical protection against nails and screws' },
  { value: 'selv-pelv', label: 'SELV or PELV circuit (data, extra-low voltage)' },
];

/** What a route can be tied to on this site: "cable:<id>" or "circuit:<id>", the value of one select. */
export interface TieChoice {
  value: string;
  label: string;
}

export function tieChoices(cables: ReadonlyArray<{ id: string; label: string }>, circuits: ReadonlyArray<{ id: string; number: string; description?: string | null }>): TieChoice[] {
  return [
    ...circuits.map((c) => ({ value: `circuit:${c.id}`, label: `Circuit ${c.number}${c.description ? ` (${c.description})` : ''}` })),
    ...cables.map((c) => ({ value: `cable:${c.id}`, label: `Cable ${c.label}` })),
  ];
}

export function tieValue(route: Pick<MarkedRoute, 'cableRunId' | 'circuitId'>): string {
  return route.circuitId ? `circuit:${route.circuitId}` : route.cableRunId ? `cable:${route.cableRunId}` : '';
}

export function tieOf(value: string): Pick<MarkedRoute, 'cableRunId' | 'circuitId'> {
  const [kind, id] = value.split(':');
  return { cableRunId: kind === 'cable' && id ? id : null, circuitId: kind === 'circuit' && id ? id : null };
}

/** A markup row as core's checks take it. */
export function shapeOf(row: {
  routes?: readonly MarkedRoute[] | null;
  datums?: PhotoMarkupShape['datums'];
  accessories?: PhotoMarkupShape['accessories'];
  wallWidthMm?: number | null;
  wallHeightMm?: number | null;
  wallThicknessMm?: number | null;
}): PhotoMarkupShape {
  return {
    routes: row.routes ?? [],
    datums: row.datums ?? [],
    accessories: row.accessories ?? [],
    wallWidthMm: row.wallWidthMm ?? null,
    wallHeightMm: row.wallHeightMm ?? null,
    wallThicknessMm: row.wallThicknessMm ?? null,
  };
}

/** A photo's size in pixels, as its row records it; a phone photo's usual size where an old row lacks it. */
export const photoSizeOf = (photo: { width?: number | null; height?: number | null }) => ({
  width: photo.width && photo.width > 0 ? photo.width : 1600,
  height: photo.height && photo.height > 0 ? photo.height : 1200,
});
