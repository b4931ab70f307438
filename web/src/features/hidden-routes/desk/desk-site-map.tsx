import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import { checkMarkedRoute, routeTieWords } from '@wiretrail/core';
import { useState } from 'react';
import { AidLine } from '@/components/verdicts/verdict-chip';
import { useObjectUrl } from '@/lib/use-object-url';
import { usePhotoDisplay } from '../api/get-photo-display';
import { useSiteHiddenRoutes } from '../api/get-site-hidden-routes';
import { HiddenRoutesMap, type MapEntry, type MapPhoto } from '../components/hidden-routes-map';
import { MarkedPhotoFrame } from '@/components/photo-markup/marked-photo-frame';
import { MarkupOverlay } from '@/components/photo-markup/markup-overlay';
import { RouteLegend } from '../components/route-legend';
import { photoSizeOf, shapeOf } from '../hidden-routes-words';

function useServerSource(photo: MapPhoto) {
  const ready = photo.uploadState === 'ready';
  const display = usePhotoDisplay(photo.id, ready);
  const src = useObjectUrl(display.data ? `${photo.id}/display` : null, display.data);
  return { src, missing: !ready ? 'The photo has not reached the office yet: its routes are drawn on its outline.' : display.isError ? 'The photo could not be loaded.' : 'Loading the photo…' };
}

/** The office's map of a site's hidden routes, read from the server. */
export function DeskSiteMap({ siteId }: { siteId: string }) {
  const map = useSiteHiddenRoutes(siteId);
  const [opened, setOpened] = useState<MapEntry | null>(null);
  if (map.isPending) return <LinearProgress aria-label="Loading the hidden routes" />;
  if (map.isError) return <Alert severity="error">{map.error.message}</Alert>;
  const { entries, areas, cables, circuits } = map.data;
  return (
    <>
      <HiddenRoutesMap
        entries={entries}
        areas={areas}
        cables={cables}
        circuits={circuits}
        usePhotoSource={useServerSource}
        open={(entry) => (
          <Button size="small" onClick={() => setOpened(entry)} sx={{ alignSelf: 'flex-start' }}>
            Open large
          </Button>
        )}
      />
      {opened && <LargeMarkedPhoto entry={opened} cables={cables} circuits={circuits} onClose={() => setOpened(null)} />}
    </>
  );
}

function LargeMarkedPhoto({ entry, cables, circuits, onClose }: { entry: MapEntry; cables: Array<{ id: string; label: string }>; circuits: Array<{ id: string; number: string; description: string | null; rcdRatingMa: number | null }>; onClose: () => void }) {
  const source = useServerSource(entry.photo);
  const { width, height } = photoSizeOf(entry.photo);
  const routes = entry.markup.routes ?? [];
  const shape = shapeOf(entry.markup);
  const circuitById = new Map(circuits.map((c) => [c.id, c]));
  const cableNames = new Map(cables.map((c) => [c.id, { label: c.label }]));
  const checks = routes.map((r) => checkMarkedRoute(shape, r, r.circuitId ? (circuitById.get(r.circuitId) ?? null) : null));
  const title = entry.photo.caption || 'Marked photo';
  return (
    <Dialog open onClose={onClose} maxWidth="lg" fullWidth aria-labelledby="marked-photo-title">
      <DialogTitle id="marked-photo-title">{title}</DialogTitle>
      <DialogContent>
        <Stack spacing={2}>
          <MarkedPhotoFrame width={width} height={height} src={source.src} alt={title} missing={source.missing} maxHeight="65vh">
            <MarkupOverlay width={width} height={height} routes={routes} datums={entry.markup.datums ?? []} accessories={entry.markup.accessories ?? []} verdicts={Object.fromEntries(checks.map((c) => [c.routeId, c.verdict]))} label={`${title}: ${routes.length} routes`} />
          </MarkedPhotoFrame>
          <RouteLegend routes={routes} labels={routes.map((r) => routeTieWords(r, cableNames, circuitById))} checks={checks} />
          <AidLine />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
