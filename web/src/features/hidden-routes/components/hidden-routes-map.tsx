import Box from '@mui/material/Box';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import {
  checkMarkedRoute,
  hiddenRoutesByWall,
  type MarkedRoute,
  type MarkedRouteCheck,
  routeColour,
  routeIsTied,
  type RouteTie,
  routeTieWords,
} from '@wiretrail/core';
import { type ReactNode, useState } from 'react';
import { VerdictChip } from '@/components/verdicts/verdict-chip';
import { photoSizeOf, shapeOf, tieChoices, tieOf } from '../hidden-routes-words';
import { MarkedPhotoFrame } from '@/components/photo-markup/marked-photo-frame';
import { MarkupOverlay } from '@/components/photo-markup/markup-overlay';

export interface MapPhoto {
  id: string;
  areaId?: string | null;
  caption?: string | null;
  takenAt?: string | null;
  createdAt?: string | null;
  width?: number | null;
  height?: number | null;
  sha256?: string | null;
  uploadState?: string | null;
}

export interface MapMarkup {
  id: string;
  areaId?: string | null;
  wallName?: string | null;
  routes?: MarkedRoute[] | null;
  datums?: Parameters<typeof shapeOf>[0]['datums'];
  accessories?: Parameters<typeof shapeOf>[0]['accessories'];
  wallWidthMm?: number | null;
  wallHeightMm?: number | null;
  wallThicknessMm?: number | null;
}

export interface MapEntry {
  photo: MapPhoto;
  markup: MapMarkup;
}

interface Props {
  entries: MapEntry[];
  areas: ReadonlyArray<{ id: string; name: string }>;
  cables: ReadonlyArray<{ id: string; label: string }>;
  circuits: ReadonlyArray<{ id: string; number: string; description?: string | null; rcdRatingMa?: number | null }>;
  /** Where each photo comes from on this side: the phone's own copy, or the server. */
  usePhotoSource: (photo: MapPhoto) => { src: string | null; missing: string };
  /** What a card leads to: the photo with its drilling check (phone), or a larger view (desk). */
  open: (entry: MapEntry, index: string) => ReactNode;
}

const when = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const dateOf = (p: MapPhoto) => {
  const d = new Date(p.takenAt ?? p.createdAt ?? '');
  return Number.isNaN(d.getTime()) ? '' : when.format(d);
};

/**
 * The site's map of hidden routes: every wall by area, its marked photos side by side and newest first, each route
 * labelled with its cable or circuit, and a filter to show only what one cable or circuit runs through.
 */
export function HiddenRoutesMap({ entries, areas, cables, circuits, usePhotoSource, open }: Props) {
  const [filter, setFilter] = useState('all');
  const used = new Set(entries.flatMap((e) => (e.markup.routes ?? []).map((r) => (r.circuitId ? `circuit:${r.circuitId}` : r.cableRunId ? `cable:${r.cableRunId}` : ''))));
  const choices = tieChoices(cables, circuits).filter((c) => used.has(c.value));
  const picked = tieOf(filter);
  const tie: RouteTie | null = picked.circuitId ? { circuitId: picked.circuitId } : picked.cableRunId ? { cableRunId: picked.cableRunId } : null;
  const walls = hiddenRoutesByWall(entries, new Map(areas.map((a) => [a.id, a.name])), tie);
  const cableNames = new Map(cables.map((c) => [c.id, { label: c.label }]));
  const circuitById = new Map(circuits.map((c) => [c.id, c]));

  if (!entries.length) {
    return <Typography color="text.secondary">No photo of this site has a route drawn on it yet. Open a photo of an open wall or chase and draw its cables before it is covered.</Typography>;
  }
  return (
    <Stack spacing={3}>
      <TextField select label="Show" value={filter} onChange={(e) => setFilter(e.target.value)} sx={{ maxWidth: 420 }}>
        <MenuItem value="all">Every cable and circuit</MenuItem>
        {choices.map((c) => (
          <MenuItem key={c.value} value={c.value}>
            Only {c.label}
          </MenuItem>
        ))}
      </TextField>
      {walls.length === 0 && <Typography color="text.secondary">No marked photo shows that one.</Typography>}
      {walls.map((wall) => (
        <Box component="section" key={wall.key} aria-label={`${wall.areaName}, ${wall.wallName}`}>
          <Typography variant="h6" component="h3">
            {wall.areaName} · {wall.wallName}
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
            {wall.entries.length === 1 ? '1 marked photo' : `${wall.entries.length} marked photos, newest first`}
          </Typography>
          <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: 'repeat(auto-fill, minmax(150px, 1fr))', sm: 'repeat(auto-fill, minmax(280px, 1fr))' } }}>
            {wall.entries.map((entry) => (
              <MapCard key={entry.markup.id} entry={entry} tie={tie} cableNames={cableNames} circuitById={circuitById} usePhotoSource={usePhotoSource} open={open} />
            ))}
          </Box>
        </Box>
      ))}
    </Stack>
  );
}

function MapCard({
  entry,
  tie,
  cableNames,
  circuitById,
  usePhotoSource,
  open,
}: {
  entry: MapEntry;
  tie: RouteTie | null;
  cableNames: Map<string, { label: string }>;
  circuitById: Map<string, { number: string; description?: string | null; rcdRatingMa?: number | null }>;
  usePhotoSource: Props['usePhotoSource'];
  open: Props['open'];
}) {
  const { photo, markup } = entry;
  const source = usePhotoSource(photo);
  const { width, height } = photoSizeOf(photo);
  const routes = markup.routes ?? [];
  const shape = shapeOf(markup);
  const checks: MarkedRouteCheck[] = routes.map((r) => checkMarkedRoute(shape, r, r.circuitId ? (circuitById.get(r.circuitId) ?? null) : null));
  const dimmed = (r: MarkedRoute) => (tie ? !routeIsTied(r, tie) : false);
  const title = photo.caption || 'Marked photo';
  return (
    <Box component="article" aria-label={title} sx={{ border: 1, borderColor: 'divider', borderRadius: 1, overflow: 'hidden', minWidth: 0 }}>
      <MarkedPhotoFrame width={width} height={height} src={source.src} alt={title} missing={source.missing} maxHeight={320}>
        <MarkupOverlay width={width} height={height} routes={routes} datums={markup.datums ?? []} accessories={markup.accessories ?? []} verdicts={Object.fromEntries(checks.map((c) => [c.routeId, c.verdict]))} dimmed={dimmed} label={`${title}: ${routes.length === 1 ? '1 route' : `${routes.length} routes`}`} />
      </MarkedPhotoFrame>
      <Stack spacing={0.5} sx={{ p: 1 }}>
        <Typography variant="body2" sx={{ fontWeight: 500, overflowWrap: 'anywhere' }}>
          {title}
        </Typography>
        <Typography variant="caption" color="text.secondary">
          {dateOf(photo)}
        </Typography>
        <Stack component="ol" spacing={0.5} sx={{ listStyle: 'none', p: 0, m: 0 }}>
          {routes.map((r, i) => (
            <Stack component="li" key={r.id} direction="row" sx={{ gap: 0.75, alignItems: 'center', opacity: dimmed(r) ? 0.5 : 1, flexWrap: 'wrap' }}>
              <Box aria-hidden sx={{ width: 18, height: 18, borderRadius: '50%', bgcolor: routeColour(i), color: '#fff', fontSize: 11, fontWeight: 700, display: 'grid', placeItems: 'center' }}>
                {i + 1}
              </Box>
              <Typography variant="body2" sx={{ overflowWrap: 'anywhere' }}>
                {routeTieWords(r, cableNames, circuitById)}
                {r.depthMm !== null && r.depthMm !== undefined ? `, ${r.depthMm} mm deep` : ''}
              </Typography>
              {checks[i] && checks[i].verdict !== 'pass' && <VerdictChip verdict={checks[i].verdict} prefix="Zones" />}
            </Stack>
          ))}
        </Stack>
        {open(entry, markup.id)}
      </Stack>
    </Box>
  );
}
