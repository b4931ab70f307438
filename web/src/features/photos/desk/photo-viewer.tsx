import ChevronLeft from '@mui/icons-material/ChevronLeft';
import ChevronRight from '@mui/icons-material/ChevronRight';
import Close from '@mui/icons-material/Close';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import ZoomInOutlined from '@mui/icons-material/ZoomInOutlined';
import ZoomOutOutlined from '@mui/icons-material/ZoomOutOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useQueryClient } from '@tanstack/react-query';
import { type PointerEvent, useEffect, useRef, useState } from 'react';
import { MarkedPhotoFrame } from '@/components/photo-markup/marked-photo-frame';
import { MarkupOverlay } from '@/components/photo-markup/markup-overlay';
import { useObjectUrl } from '@/lib/use-object-url';
import { photoFileQueryOptions, usePhotoFile } from '../api/get-photo-file';
import type { PhotoRoutes } from '../api/get-site-markups';

/** What the viewer shows about each photo, worked out by the screen that opens it. */
export interface ViewerPhoto {
  id: string;
  caption: string | null;
  /** "Sam Brannigan, Tue 3 Mar, 09:12". */
  takenBy: string;
  where: string;
  tags: string[];
  /** The name the original downloads under. */
  filename: string;
  /** Cable routes the technician drew over the photo, laid over it here too. */
  routes?: PhotoRoutes;
}

interface Props {
  photos: ViewerPhoto[];
  index: number | null;
  onIndex: (index: number) => void;
  onClose: () => void;
}

/** A finger's travel that counts as a swipe to the next or previous photo. */
const SWIPE_PX = 60;

function DisplayImage({ photo, zoomed, onToggleZoom }: { photo: ViewerPhoto; zoomed: boolean; onToggleZoom: () => void }) {
  const file = usePhotoFile(photo.id, 'display');
  const url = useObjectUrl(file.data ? `${photo.id}/display` : null, file.data);
  if (file.isError) {
    return (
      <Typography sx={{ color: 'grey.300', p: 3, textAlign: 'center' }}>
        This photo has not reached the office system yet, or could not be loaded: {file.error.message}
      </Typography>
    );
  }
  if (!url) return <CircularProgress aria-label="Loading the photo" sx={{ color: 'grey.300' }} />;
  const marked = photo.routes;
  if (marked) {
    const alt = photo.caption ?? 'Photo';
    const count = marked.routes.length === 1 ? '1 cable route' : `${marked.routes.length} cable routes`;
    return (
      <MarkedPhotoFrame width={marked.width} height={marked.height} src={url} alt={alt} maxHeight={zoomed ? 'none' : 'calc(100vh - 170px)'}>
        <MarkupOverlay width={marked.width} height={marked.height} routes={marked.routes} datums={marked.datums} accessories={marked.accessories} label={`${alt}: ${count} drawn over it`} />
      </MarkedPhotoFrame>
    );
  }
  return (
    <Box
      component="img"
      src={url}
      alt={photo.caption ?? 'Photo'}
      draggable={false}
      onDoubleClick={onToggleZoom}
      sx={
        zoomed
          ? { display: 'block', maxWidth: 'none', cursor: 'zoom-out', m: 'auto' }
          : { display: 'block', maxWidth: '100%', maxHeight: '100%', objectFit: 'contain', cursor: 'zoom-in', m: 'auto' }
      }
    />
  );
}

/** Full screen, one photo at a time: arrows or swipe to move, Esc to close, zoom to the full display size. */
export function PhotoViewer({ photos, index, onIndex, onClose }: Props) {
  const queryClient = useQueryClient();
  const [zoomed, setZoomed] = useState(false);
  const [downloading, setDownloading] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const start = useRef<{ x: number; y: number } | null>(null);
  const open = index !== null && index >= 0 && index < photos.length;
  const photo = open ? photos[index] : undefined;

  const go = (step: number) => {
    if (index === null) return;
    const next = index + step;
    if (next >= 0 && next < photos.length) {
      setZoomed(false);
      setError(null);
      onIndex(next);
    }
  };

  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'ArrowRight') go(1);
      else if (e.key === 'ArrowLeft') go(-1);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  });

  // The neighbours load while this one is looked at, so moving on is instant.
  useEffect(() => {
    if (index === null) return;
    for (const i of [index + 1, index - 1]) {
      const p = photos[i];
      if (p) void queryClient.prefetchQuery(photoFileQueryOptions(p.id, 'display'));
    }
  }, [index, photos, queryClient]);

  async function download(p: ViewerPhoto) {
    setDownloading(true);
    setError(null);
    try {
      const blob = await queryClient.fetchQuery({ ...photoFileQueryOptions(p.id, 'original'), gcTime: 0 });
      const url = URL.createObjectURL(blob);
      const a = document.createElement('a');
      a.href = url;
      a.download = p.filename;
      document.body.appendChild(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(url), 10_000);
    } catch (err) {
      setError(`The original could not be downloaded: ${(err as Error).message}`);
    } finally {
      setDownloading(false);
    }
  }

  const onPointerDown = (e: PointerEvent) => {
    start.current = { x: e.clientX, y: e.clientY };
  };
  const onPointerUp = (e: PointerEvent) => {
    const s = start.current;
    start.current = null;
    if (!s || zoomed) return;
    const dx = e.clientX - s.x;
    const dy = e.clientY - s.y;
    if (Math.abs(dx) > SWIPE_PX && Math.abs(dx) > Math.abs(dy)) go(dx < 0 ? 1 : -1);
  };

  return (
    <Dialog
      open={open}
      onClose={() => {
        setZoomed(false);
        onClose();
      }}
      fullScreen
      aria-labelledby="photo-viewer-title"
      slotProps={{ paper: { sx: { bgcolor: '#0b1214', color: 'grey.100' } } }}
    >
      {photo && (
        <Stack sx={{ height: '100%' }}>
          <Stack direction="row" sx={{ alignItems: 'center', gap: 1, px: 2, py: 1, borderBottom: 1, borderColor: 'rgba(255,255,255,0.12)' }}>
            <Typography id="photo-viewer-title" variant="h2" sx={{ flex: 1, fontSize: '1.2rem' }} noWrap>
              {photo.caption || 'Photo'}
            </Typography>
            <Typography variant="body2" sx={{ color: 'grey.400' }}>
              {index! + 1} of {photos.length}
            </Typography>
            <IconButton onClick={() => setZoomed((z) => !z)} aria-pressed={zoomed} aria-label={zoomed ? 'Fit to screen' : 'Zoom in'} sx={{ color: 'inherit' }}>
              {zoomed ? <ZoomOutOutlined /> : <ZoomInOutlined />}
            </IconButton>
            <IconButton onClick={onClose} aria-label="Close" sx={{ color: 'inherit' }}>
              <Close />
            </IconButton>
          </Stack>
          <Box
            onPointerDown={onPointerDown}
            onPointerUp={onPointerUp}
            sx={{ position: 'relative', flex: 1, minHeight: 0, display: 'flex', overflow: zoomed ? 'auto' : 'hidden', touchAction: zoomed ? 'auto' : 'pan-y', p: zoomed ? 0 : 2 }}
          >
            <DisplayImage photo={photo} zoomed={zoomed} onToggleZoom={() => setZoomed((z) => !z)} />
            {!zoomed && (
              <>
                <IconButton
                  aria-label="Previous photo"
                  onClick={() => go(-1)}
                  disabled={index === 0}
                  sx={{ position: 'absolute', left: 12, top: '50%', transform: 'translateY(-50%)', bgcolor: 'rgba(0,0,0,0.45)', color: 'common.white', '&:hover': { bgcolor: 'rgba(0,0,0,0.65)' } }}
                >
                  <ChevronLeft fontSize="large" />
                </IconButton>
                <IconButton
                  aria-label="Next photo"
                  onClick={() => go(1)}
                  disabled={index === photos.length - 1}
                  sx={{ position: 'absolute', right: 12, top: '50%', transform: 'translateY(-50%)', bgcolor: 'rgba(0,0,0,0.45)', color: 'common.white', '&:hover': { bgcolor: 'rgba(0,0,0,0.65)' } }}
                >
                  <ChevronRight fontSize="large" />
                </IconButton>
              </>
            )}
          </Box>
          <Stack direction="row" sx={{ gap: 2, px: 2, py: 1.5, alignItems: 'center', flexWrap: 'wrap', borderTop: 1, borderColor: 'rgba(255,255,255,0.12)' }}>
            <Box sx={{ flex: 1, minWidth: 240 }}>
              <Typography sx={{ fontWeight: 500 }}>{photo.caption || 'No caption'}</Typography>
              <Typography variant="body2" sx={{ color: 'grey.400' }}>
                {[`Taken by ${photo.takenBy}`, photo.where].filter(Boolean).join(' · ')}
              </Typography>
            </Box>
            <Stack direction="row" sx={{ gap: 0.75, flexWrap: 'wrap' }}>
              {photo.tags.map((t) => (
                <Chip key={t} label={t} size="small" variant="outlined" sx={{ color: 'grey.200', borderColor: 'grey.600' }} />
              ))}
            </Stack>
            {/* Not disabled while it works: a disabled button drops the focus out of the viewer, and Escape would no longer close it. */}
            <Button variant="contained" startIcon={<DownloadOutlined />} onClick={() => !downloading && void download(photo)} aria-disabled={downloading}>
              {downloading ? 'Downloading…' : 'Download original'}
            </Button>
          </Stack>
          {error && (
            <Alert severity="error" sx={{ borderRadius: 0 }}>
              {error}
            </Alert>
          )}
        </Stack>
      )}
    </Dialog>
  );
}
