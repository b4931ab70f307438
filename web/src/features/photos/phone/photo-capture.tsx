import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import ImageNotSupportedOutlined from '@mui/icons-material/ImageNotSupportedOutlined';
import PhotoLibraryOutlined from '@mui/icons-material/PhotoLibraryOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button, { type ButtonProps } from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import LinearProgress from '@mui/material/LinearProgress';
import Skeleton from '@mui/material/Skeleton';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { type ChangeEvent, type CSSProperties, type FormEvent, useEffect, useId, useState } from 'react';
import { type PhotoSubjectType, type PreparedPhoto, preparePhoto, savePhoto } from '@/lib/photos/add-photo';
import { shrinkPhoto } from '@/lib/photos/shrink-photo';
import { LocalWriteError } from '@/lib/sync/local-write';
import { useObjectUrl } from '@/lib/use-object-url';
import { useCaptureChoices } from '../data/get-capture-choices';
import { usePhoneTags } from '../data/get-phone-photo-tags';
import { NO_SUBJECT, type PhotoFiling, PhotoFilingFields, subjectOf } from './photo-filing-fields';

/** Keeps the real file input reachable by its label (and by assistive technology) while the big button shows. */
const hiddenInput: CSSProperties = {
  clip: 'rect(0 0 0 0)',
  clipPath: 'inset(50%)',
  height: 1,
  width: 1,
  overflow: 'hidden',
  position: 'absolute',
  whiteSpace: 'nowrap',
};

interface Props {
  visitId: string;
  siteId: string;
  userId: string;
  /** What the photos are of, chosen beforehand (a point change's own page); still changeable in the form. */
  preset?: { subject?: `${PhotoSubjectType}:${string}`; areaId?: string | null; label?: string };
}

/** The camera button on a visit: take photos (or pick them from the gallery), then say what they show. */
export function PhotoCapture({ visitId, siteId, userId, preset }: Props) {
  const [files, setFiles] = useState<File[]>([]);
  const [saved, setSaved] = useState<string>('');

  function choose(e: ChangeEvent<HTMLInputElement>) {
    const chosen = Array.from(e.target.files ?? []).filter((f) => f.type.startsWith('image/') || f.type === '');
    // Cleared so that choosing the same photo again still counts as a choice.
    e.target.value = '';
    if (chosen.length > 0) {
      setSaved('');
      setFiles(chosen);
    }
  }

  return (
    <Stack spacing={1}>
      <PickPhotosButton
        variant="contained"
        color="secondary"
        size="large"
        startIcon={<PhotoCameraOutlined sx={{ fontSize: '2rem !important' }} />}
        sx={{ minHeight: 72, fontSize: '1.2rem', borderRadius: 3 }}
        label={preset?.label ?? 'Take or add photos'}
        capture="environment"
        onChoose={choose}
      />
      {/* Android opens the camera straight away for the button above; this one opens the gallery. */}
      <PickPhotosButton variant="text" startIcon={<PhotoLibraryOutlined />} sx={{ alignSelf: 'center' }} label="Choose from the gallery" onChoose={choose} />
      <Typography variant="body2" color="text.secondary" role="status" sx={{ textAlign: 'center', minHeight: '1.5em' }}>
        {saved}
      </Typography>
      {files.length > 0 && (
        <PhotoDetailsDialog
          files={files}
          visitId={visitId}
          siteId={siteId}
          userId={userId}
          preset={preset}
          onClose={(count) => {
            setFiles([]);
            if (count > 0) setSaved(count === 1 ? 'Photo saved on this phone.' : `${count} photos saved on this phone.`);
          }}
        />
      )}
    </Stack>
  );
}

/**
 * A button that opens the file picker. The input sits beside the label rather than inside it, so the button holds
 * no second control for a screen reader to stumble on; the input keeps the label's name and takes no tab stop.
 */
function PickPhotosButton({ label, capture, onChoose, ...button }: Omit<ButtonProps<'label'>, 'onChange' | 'children'> & { label: string; capture?: 'environment'; onChoose: (e: ChangeEvent<HTMLInputElement>) => void }) {
  const id = useId();
  return (
    <>
      <Button component="label" htmlFor={id} {...button}>
        {label}
      </Button>
      <input id={id} type="file" accept="image/*" capture={capture} multiple tabIndex={-1} onChange={onChoose} style={hiddenInput} />
    </>
  );
}

/**
 * The photo's own thumbnail once it is ready: a 72 px preview of the camera's file would make the page decode all
 * twelve megapixels beside the worker.
 */
function PreparedPreview({ photo, alt }: { photo: Promise<PreparedPhoto> | undefined; alt: string }) {
  const [thumb, setThumb] = useState<ArrayBuffer | null>(null);
  const [failed, setFailed] = useState(false);
  useEffect(() => {
    let live = true;
    photo?.then((p) => live && setThumb(p.thumb)).catch(() => live && setFailed(true));
    return () => {
      live = false;
    };
  }, [photo]);
  const url = useObjectUrl(thumb ? alt : null, thumb);
  const box = { width: 72, height: 72, borderRadius: 1.5, flexShrink: 0, bgcolor: 'action.hover' };
  if (url) return <Box component="img" src={url} alt={alt} sx={{ ...box, objectFit: 'cover' }} />;
  if (failed) return <Box role="img" aria-label={`${alt}: could not be read`} sx={{ ...box, display: 'grid', placeItems: 'center' }}><ImageNotSupportedOutlined color="disabled" /></Box>;
  return <Skeleton variant="rectangular" sx={box} aria-label={`${alt}: getting ready`} />;
}

interface DialogProps extends Props {
  files: File[];
  onClose: (saved: number) => void;
}

interface Chosen {
  key: string;
  file: File;
  caption: string;
  /** Its own area, subject and tags; null while it follows the ones for every photo. */
  own: PhotoFiling | null;
}

const keyOf = (file: File, i: number) => `${file.name}-${file.lastModified}-${i}`;

/**
 * Starts making each photo ready (scaled in the worker, hashed) as soon as it is chosen, one after another, so that
 * the technician types while the phone works and saving only has to write.
 */
function usePreparedPhotos(files: File[]) {
  const [ready, setReady] = useState(0);
  const [prepared] = useState(() => {
    const map = new Map<File, Promise<PreparedPhoto>>();
    let previous: Promise<unknown> = Promise.resolve();
    for (const file of files) {
      const next = previous.then(() => preparePhoto(file, shrinkPhoto));
      // A photo that cannot be read is reported when it is saved; the next one is still prepared.
      next.then(() => setReady((n) => n + 1)).catch(() => setReady((n) => n + 1));
      previous = next.catch(() => undefined);
      map.set(file, next);
    }
    return map;
  });
  return { ready, prepared };
}

function PhotoDetailsDialog({ files: chosen, visitId, siteId, userId, preset, onClose }: DialogProps) {
  const choices = useCaptureChoices(visitId, siteId);
  const tags = usePhoneTags();
  const { ready, prepared } = usePreparedPhotos(chosen);
  const [items, setItems] = useState<Chosen[]>(() => chosen.map((file, i) => ({ key: keyOf(file, i), file, caption: '', own: null })));
  const [shared, setShared] = useState<PhotoFiling>({ areaId: preset?.areaId ?? '', subject: preset?.subject ?? NO_SUBJECT, tags: [] });
  const [saving, setSaving] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [savedCount, setSavedCount] = useState(0);

  const many = items.length > 1;
  const update = (key: string, change: Partial<Chosen>) => setItems((list) => list.map((item) => (item.key === key ? { ...item, ...change } : item)));

  async function save(e: FormEvent) {
    e.preventDefault();
    let done = 0;
    setError(null);
    for (let i = 0; i < items.length; i++) {
      const item = items[i]!;
      const filing = item.own ?? shared;
      setSaving(i);
      try {
        const photo = await (prepared.get(item.file) ?? preparePhoto(item.file, shrinkPhoto));
        await savePhoto(photo, { visitId, siteId, areaId: filing.areaId || null, ...subjectOf(filing.subject), caption: item.caption, tags: filing.tags }, userId);
        done++;
      } catch (err) {
        // What was saved stays saved; the rest stay in the form to try again.
        setItems((list) => list.slice(i));
        setSavedCount((n) => n + done);
        setSaving(null);
        const reason =
          err instanceof LocalWriteError ? err.message : `This photo could not be read on this phone (${(err as Error)?.message ?? 'unknown error'}). Try taking it again.`;
        setError(done > 0 ? `${done} saved. ${reason}` : reason);
        return;
      }
    }
    setSaving(null);
    onClose(savedCount + done);
  }

  const title = saving !== null ? `Saving photo ${saving + 1} of ${items.length}…` : many ? `Add ${items.length} photos` : 'Add one photo';
  const preparing = Math.min(ready, chosen.length) < chosen.length;
  return (
    <Dialog open fullScreen onClose={() => saving === null && onClose(savedCount)} aria-labelledby="photo-details-title">
      <Box component="form" onSubmit={save} noValidate aria-label="Photo details" sx={{ display: 'flex', flexDirection: 'column', minHeight: '100%' }}>
        <DialogTitle id="photo-details-title">{title}</DialogTitle>
        {saving !== null && <LinearProgress variant="determinate" value={(saving / items.length) * 100} aria-label="Saving photos" />}
        <DialogContent dividers sx={{ flex: 1 }}>
          <Stack spacing={2.5}>
            {error && (
              <Alert severity="error" role="alert">
                {error}
              </Alert>
            )}
            <Typography variant="body2" color="text.secondary" role="status">
              {preparing ? `Getting photos ready on this phone: ${ready} of ${chosen.length}. Carry on filling in.` : ''}
            </Typography>
            <Stack spacing={2} component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Chosen photos">
              {items.map((item, i) => {
                const name = many ? `photo ${i + 1}` : undefined;
                return (
                  <Stack key={item.key} component="li" spacing={1.5} aria-label={many ? `Photo ${i + 1}` : 'The photo'}>
                    <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center' }}>
                      <PreparedPreview photo={prepared.get(item.file)} alt={many ? `Photo ${i + 1}` : 'The photo'} />
                      <TextField
                        label={many ? `Caption for photo ${i + 1}` : 'Caption'}
                        placeholder="What it shows, e.g. chase to the new socket"
                        value={item.caption}
                        onChange={(e) => update(item.key, { caption: e.target.value })}
                        slotProps={{ htmlInput: { maxLength: 500 } }}
                        size="small"
                        fullWidth
                      />
                    </Stack>
                    {many && (
                      <Button
                        variant="text"
                        sx={{ alignSelf: 'flex-start', minHeight: 44 }}
                        aria-expanded={item.own !== null}
                        onClick={() => update(item.key, { own: item.own ? null : { ...shared } })}
                      >
                        {item.own ? `File photo ${i + 1} like the others` : `File photo ${i + 1} on its own`}
                      </Button>
                    )}
                    {item.own && (
                      <Box sx={{ pl: 1.5, borderLeft: 3, borderColor: 'divider' }}>
                        <PhotoFilingFields filing={item.own} onChange={(own) => update(item.key, { own })} choices={choices} tagChoices={tags} of={name} />
                      </Box>
                    )}
                  </Stack>
                );
              })}
            </Stack>
            {(!many || items.some((item) => !item.own)) && (
              <Stack spacing={1}>
                {many && (
                  <Typography variant="subtitle2" component="h3">
                    {items.every((item) => !item.own) ? 'For all these photos' : 'For the other photos'}
                  </Typography>
                )}
                <PhotoFilingFields filing={shared} onChange={setShared} choices={choices} tagChoices={tags} areaHelp={many ? 'Each photo can be filed on its own above, now or later from the trail.' : ' '} />
              </Stack>
            )}
          </Stack>
        </DialogContent>
        <DialogActions sx={{ p: 2, gap: 1, pb: 'calc(16px + env(safe-area-inset-bottom))' }}>
          <Button onClick={() => onClose(savedCount)} disabled={saving !== null} size="large">
            Cancel
          </Button>
          <Button type="submit" variant="contained" size="large" disabled={saving !== null} sx={{ flex: 1 }}>
            {many ? `Save ${items.length} photos` : 'Save photo'}
          </Button>
        </DialogActions>
      </Box>
    </Dialog>
  );
}
