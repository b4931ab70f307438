import ButtonBase from '@mui/material/ButtonBase';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useMemo, useState } from 'react';
import { usePhotos } from '../api/get-photos';
import { tagList, trailTime } from '../trail-time';
import { PhotoViewer } from './photo-viewer';
import { ServerPhotoImage } from '../components/server-photo-image';

/** Shown small, the rest are a tap away in the viewer. */
const SHOWN = 3;
const FETCHED = 50;

/** A circuit's photos on its row in the office: a few thumbnails and the count; a tap opens the viewer. */
export function CircuitPhotos({ circuitId, circuitLabel, personName }: { circuitId: string; circuitLabel: string; personName?: (userId: string) => string | null }) {
  const photos = usePhotos({ subjectType: 'circuit', subjectId: circuitId, pageSize: FETCHED });
  const [open, setOpen] = useState<number | null>(null);
  const items = useMemo(() => photos.data?.items ?? [], [photos.data]);
  const viewer = useMemo(
    () =>
      items.map((p) => ({
        id: p.id,
        caption: p.caption,
        takenBy: `${p.createdByName ?? (p.createdById ? personName?.(p.createdById) : null) ?? 'a technician'}, ${trailTime(p.takenAt ?? p.createdAt)}`,
        where: circuitLabel,
        tags: tagList(p.tags),
        filename: `circuit-${circuitId.slice(-6)}-${p.id.slice(-6)}.jpg`,
      })),
    [items, circuitId, circuitLabel, personName],
  );
  if (photos.isPending) return <Typography variant="body2" color="text.secondary">…</Typography>;
  if (photos.isError || items.length === 0) return <Typography variant="body2" color="text.secondary">—</Typography>;
  const total = photos.data.total;
  return (
    <Stack direction="row" sx={{ gap: 0.5, alignItems: 'center' }}>
      {items.slice(0, SHOWN).map((p, i) => (
        <ButtonBase key={p.id} onClick={() => setOpen(i)} aria-label={`Open photo: ${p.caption || 'No caption'}`} sx={{ borderRadius: 1, overflow: 'hidden' }}>
          <ServerPhotoImage photoId={p.id} variant="thumb" alt={p.caption || 'Photo'} lazy sx={{ width: 40, height: 40 }} />
        </ButtonBase>
      ))}
      <Typography variant="body2" color="text.secondary" sx={{ ml: 0.5, whiteSpace: 'nowrap' }}>
        {total === 1 ? '1 photo' : `${total} photos`}
      </Typography>
      <PhotoViewer photos={viewer} index={open} onIndex={setOpen} onClose={() => setOpen(null)} />
    </Stack>
  );
}
