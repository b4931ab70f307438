import ChevronLeft from '@mui/icons-material/ChevronLeft';
import ChevronRight from '@mui/icons-material/ChevronRight';
import Close from '@mui/icons-material/Close';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import IconButton from '@mui/material/IconButton';
import Skeleton from '@mui/material/Skeleton';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { type ChangeEvent, type FormEvent, type KeyboardEvent, type PointerEvent, useId, useRef, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { MarkedPhotoFrame } from '@/components/photo-markup/marked-photo-frame';
import { MarkupOverlay } from '@/components/photo-markup/markup-overlay';
import type { PhotoMarkupRow, PhotoRow } from '@/lib/db';
import { preparePhoto, removeRefusedPhoto, savePhoto } from '@/lib/photos/add-photo';
import { shrinkPhoto } from '@/lib/photos/shrink-photo';
import type { UploadProgress } from '@/lib/photos/upload-progress';
import { LocalWriteError, saveRecord } from '@/lib/sync/local-write';
import { useObjectUrl } from '@/lib/use-object-url';
import { ServerPhotoImage } from '../components/server-photo-image';
import { useCaptureChoices } from '../data/get-capture-choices';
import { usePhoneTags } from '../data/get-phone-photo-tags';
import { usePhotoFile } from '../api/get-photo-file';
import { usePhotoBytes } from '../data/get-photo-bytes';
import { usePhotoRoutes } from '../data/get-photo-routes';
import type { PhotoStates } from '../data/get-photo-states';
import { tagList, trailTime } from '../trail-time';
import { PhotoBadge, photoBadge } from './photo-badge';
import { type PhotoFiling, PhotoFilingFields, subjectOf, subjectValue } from './photo-filing-fields';

/** A swipe shorter than this is a tap. */
const SWIPE_PX = 48;

interface Props {
  photos: PhotoRow[];
  openId: string;
  onOpen: (id: string) => void;
  onClose: () => void;
  visitId: string;
  siteId: string;
  userId: string;
  /** The visit is finished: its photos are kept as they were recorded. */
  locked: boolean;
  states: PhotoStates | undefined;
  progress: UploadProgress;
}

const isTyping = (target: EventTarget) => target instanceof HTMLElement && /^(INPUT|SELECT|TEXTAREA)$/.test(target.tagName);

/** A photo of the trail, large, with the ones beside it a swipe or an arrow key away; re-captioned and re-filed here. */
export function TrailPhotoViewer({ photos, openId, onOpen, onClose, visitId, siteId, userId, locked, states, progress }: Props) {
  const index = photos.findIndex((p) => p.id === openId);
  const photo = photos[index];
  const titleId = useId();
  const swipeFrom = useRef<number | null>(null);
  if (!photo) return null;
  const caption = photo.caption || 'Photo';
  const go = (step: number) => {
    const next = photos[index + step];
    if (next) onOpen(next.id);
  };
  const keys = (e: KeyboardEvent) => {
    if (isTyping(e.target)) return;
    if (e.key === 'ArrowLeft') go(-1);
    else if (e.key === 'ArrowRight') go(1);
  };
  const swipeEnd = (e: PointerEvent) => {
    const from = swipeFrom.current;
    swipeFrom.current = null;
    if (from === null || Math.abs(e.clientX - from) < SWIPE_PX) return;
    go(e.clientX < from ? 1 : -1);
  };
  const badge = photoBadge(photo, states, progress);
  const refused = badge.color === 'error';
  return (
    <Dialog open fullScreen onClose={onClose} aria-labelledby={titleId} onKeyDown={keys}>
      {/* The close button sits beside the title, not in it: the title names the dialog. */}
      <DialogTitle id={titleId} sx={{ pr: 8 }}>
        Photo {index + 1} of {photos.length}
      </DialogTitle>
      <IconButton onClick={onClose} aria-label="Back to the trail" size="large" sx={{ position: 'absolute', top: 4, right: 4 }}>
        <Close />
      </IconButton>
      <DialogContent dividers sx={{ p: 0 }}>
        <Box
          onPointerDown={(e) => (swipeFrom.current = e.clientX)}
          onPointerUp={swipeEnd}
          onPointerCancel={() => (swipeFrom.current = null)}
          sx={{ touchAction: 'pan-y', bgcolor: 'grey.900', height: '45vh', display: 'grid', placeItems: 'center' }}
        >
          <LargePhoto key={photo.id} photo={photo} alt={caption} />
        </Box>
        <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', px: 1, py: 0.5 }}>
          <Button startIcon={<ChevronLeft />} onClick={() => go(-1)} disabled={index <= 0} size="large" sx={{ minHeight: 48 }}>
            Previous photo
          </Button>
          <Button endIcon={<ChevronRight />} onClick={() => go(1)} disabled={index >= photos.length - 1} size="large" sx={{ minHeight: 48 }}>
            Next photo
          </Button>
        </Stack>
        <Stack spacing={2} sx={{ px: 2, pb: 3 }}>
          <Stack spacing={0.5}>
            <Typography variant="body2" color="text.secondary">
              Taken {trailTime(photo.takenAt ?? photo.createdAt)}
            </Typography>
            <Box>
              <PhotoBadge look={badge} />
            </Box>
          </Stack>
          <Button component={RouterLink} to={paths.visitPhotoRoutes.href(visitId, photo.id)} variant="outlined" size="large" sx={{ minHeight: 48, alignSelf: 'flex-start' }}>
            {locked ? 'Cable routes and drilling check' : 'Mark cable routes'}
          </Button>
          {refused && <RefusedPhoto key={`refused-${photo.id}`} photo={photo} userId={userId} locked={locked} onReplaced={onOpen} />}
          <PhotoEdit key={photo.id} photo={photo} visitId={visitId} siteId={siteId} locked={locked} />
        </Stack>
      </DialogContent>
    </Dialog>
  );
}

/** The photo as kept on this phone, or the server's display size once the phone has freed its own copy; with the routes drawn over it, if any. */
function LargePhoto({ photo, alt }: { photo: PhotoRow; alt: string }) {
  const kept = usePhotoBytes(photo.sha256);
  const url = useObjectUrl(kept ? (photo.sha256 ?? null) : null, kept?.bytes, kept?.mime);
  const routes = usePhotoRoutes(photo.id);
  const sx = { width: '100%', height: '100%', objectFit: 'contain', display: 'block' } as const;
  if (routes) return <PhotoWithRoutes photo={photo} alt={alt} keptUrl={url} keptGone={kept === null} markup={routes} />;
  if (kept === null) return <ServerPhotoImage photoId={photo.id} variant="display" alt={alt} sx={{ width: '100%', height: '100%', bgcolor: 'transparent' }} />;
  if (!url) return <Skeleton variant="rectangular" sx={{ width: '100%', height: '100%' }} aria-label={`Loading ${alt}`} />;
  return <Box component="img" src={url} alt={alt} sx={sx} />;
}

/** The photo in its own shape with the routes drawn on it laid exactly over it. */
function PhotoWithRoutes({ photo, alt, keptUrl, keptGone, markup }: { photo: PhotoRow; alt: string; keptUrl: string | null; keptGone: boolean; markup: PhotoMarkupRow }) {
  const server = usePhotoFile(photo.id, 'display', keptGone && photo.uploadState === 'ready');
  const serverUrl = useObjectUrl(server.data ? `${photo.id}/display` : null, server.data);
  const width = photo.width && photo.width > 0 ? photo.width : 1600;
  const height = photo.height && photo.height > 0 ? photo.height : 1200;
  const routes = markup.routes ?? [];
  return (
    <MarkedPhotoFrame width={width} height={height} src={keptUrl ?? serverUrl} alt={alt} maxHeight="45vh" missing={keptGone ? undefined : 'Loading the photo…'}>
      <MarkupOverlay width={width} height={height} routes={routes} datums={markup.datums ?? []} accessories={markup.accessories ?? []} label={`${alt}: ${routes.length === 1 ? '1 cable route' : `${routes.length} cable routes`} drawn over it`} />
    </MarkedPhotoFrame>
  );
}

function PhotoEdit({ photo, visitId, siteId, locked }: { photo: PhotoRow; visitId: string; siteId: string; locked: boolean }) {
  const choices = useCaptureChoices(visitId, siteId);
  const tags = usePhoneTags();
  const [caption, setCaption] = useState(photo.caption ?? '');
  const [filing, setFiling] = useState<PhotoFiling>({ areaId: photo.areaId ?? '', subject: subjectValue(photo), tags: tagList(photo.tags) });
  const [said, setSaid] = useState('');
  const [error, setError] = useState<string | null>(null);
  const same = (caption.trim() || null) === (photo.caption || null) && filing.areaId === (photo.areaId ?? '') && filing.subject === subjectValue(photo) && JSON.stringify(filing.tags) === JSON.stringify(tagList(photo.tags));

  async function save(e: FormEvent) {
    e.preventDefault();
    setError(null);
    const { subjectType, subjectId } = subjectOf(filing.subject);
    try {
      await saveRecord('photo', photo.id, { caption: caption.trim() || null, areaId: filing.areaId || null, subjectType, subjectId, tags: filing.tags });
      setSaid('Changes saved on this phone; they reach the office with the next sync.');
    } catch (err) {
      setError(err instanceof LocalWriteError ? err.message : `The changes could not be saved (${(err as Error)?.message ?? 'unknown error'}).`);
    }
  }

  return (
    <Box component="form" onSubmit={save} noValidate aria-label="Caption and filing">
      <Stack spacing={2}>
        {locked && (
          <Alert severity="info">This visit is finished: its photos are kept as they were recorded. The office can still correct them.</Alert>
        )}
        <TextField
          label="Caption"
          value={caption}
          onChange={(e) => {
            setSaid('');
            setCaption(e.target.value);
          }}
          disabled={locked}
          slotProps={{ htmlInput: { maxLength: 500 } }}
          placeholder="What it shows"
        />
        <PhotoFilingFields
          filing={filing}
          onChange={(f) => {
            setSaid('');
            setFiling(f);
          }}
          choices={choices}
          tagChoices={tags}
          disabled={locked}
        />
        {error && (
          <Alert severity="error" role="alert">
            {error}
          </Alert>
        )}
        <Typography variant="body2" color="text.secondary" role="status">
          {said}
        </Typography>
        {!locked && (
          <Button type="submit" variant="contained" size="large" disabled={same} sx={{ minHeight: 48 }}>
            Save changes
          </Button>
        )}
      </Stack>
    </Box>
  );
}

/** A photo the server refused: take it again (the new one takes its place, caption and filing kept) or remove it. */
function RefusedPhoto({ photo, userId, locked, onReplaced }: { photo: PhotoRow; userId: string; locked: boolean; onReplaced: (id: string) => void }) {
  const inputId = useId();
  const [busy, setBusy] = useState<string | null>(null);
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function retake(e: ChangeEvent<HTMLInputElement>) {
    const file = e.target.files?.[0];
    e.target.value = '';
    if (!file) return;
    setError(null);
    setBusy('Getting the new photo ready…');
    try {
      const prepared = await preparePhoto(file, shrinkPhoto);
      const details = {
        visitId: photo.visitId,
        siteId: photo.siteId,
        areaId: photo.areaId ?? null,
        ...subjectOf(subjectValue(photo)),
        caption: photo.caption ?? null,
        tags: tagList(photo.tags),
      };
      onReplaced(await savePhoto(prepared, details, userId, photo));
    } catch (err) {
      setError(err instanceof LocalWriteError ? err.message : `The new photo could not be read on this phone (${(err as Error)?.message ?? 'unknown error'}). Try again.`);
    } finally {
      setBusy(null);
    }
  }

  async function remove() {
    setError(null);
    try {
      await removeRefusedPhoto(photo);
    } catch (err) {
      setError(err instanceof LocalWriteError ? err.message : `The photo could not be removed (${(err as Error)?.message ?? 'unknown error'}).`);
    }
  }

  if (locked) return null;
  return (
    <Alert severity="error" icon={false} role="group" aria-label="Photo not accepted">
      <Stack spacing={1.5}>
        <Typography variant="body2">The office system did not accept this photo. Take it again, or remove it from the visit.</Typography>
        {error && (
          <Typography variant="body2" role="alert" sx={{ fontWeight: 500 }}>
            {error}
          </Typography>
        )}
        <Typography variant="body2" role="status">
          {busy ?? ''}
        </Typography>
        {asking ? (
          <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1, '& .MuiButton-root': { minHeight: 44 } }}>
            <Button color="error" variant="contained" onClick={remove}>
              Remove it
            </Button>
            <Button onClick={() => setAsking(false)}>Keep it</Button>
          </Stack>
        ) : (
          <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1, '& .MuiButton-root': { minHeight: 44 } }}>
            <Button component="label" htmlFor={inputId} variant="contained" startIcon={<PhotoCameraOutlined />} disabled={busy !== null}>
              Retake photo
            </Button>
            <input
              id={inputId}
              type="file"
              accept="image/*"
              capture="environment"
              tabIndex={-1}
              onChange={retake}
              style={{ clip: 'rect(0 0 0 0)', clipPath: 'inset(50%)', height: 1, width: 1, overflow: 'hidden', position: 'absolute', whiteSpace: 'nowrap' }}
            />
            <Button color="error" onClick={() => setAsking(true)} disabled={busy !== null}>
              Remove photo
            </Button>
          </Stack>
        )}
      </Stack>
    </Alert>
  );
}
