import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import PhotoLibraryOutlined from '@mui/icons-material/PhotoLibraryOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button, { type ButtonProps } from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { type ChangeEvent, type CSSProperties, type FormEvent, useEffect, useId, useMemo, useState } from 'react';
import { addPhoto, type PhotoSubjectType } from '@/lib/photos/add-photo';
import { shrinkPhoto } from '@/lib/photos/shrink-photo';
import { LocalWriteError } from '@/lib/sync/local-write';
import { useCaptureChoices } from '../data/get-capture-choices';
import { usePhoneTags } from '../data/get-phone-photo-tags';

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

function FilePreview({ file, alt }: { file: File; alt: string }) {
  const url = useMemo(() => URL.createObjectURL(file), [file]);
  useEffect(() => () => URL.revokeObjectURL(url), [url]);
  return <Box component="img" src={url} alt={alt} sx={{ width: 72, height: 72, objectFit: 'cover', borderRadius: 1.5, flexShrink: 0, bgcolor: 'action.hover' }} />;
}

interface DialogProps extends Props {
  files: File[];
  onClose: (saved: number) => void;
}

const NO_SUBJECT = '';

function PhotoDetailsDialog({ files: chosen, visitId, siteId, userId, preset, onClose }: DialogProps) {
  const choices = useCaptureChoices(visitId, siteId);
  const tags = usePhoneTags();
  const [files, setFiles] = useState(chosen);
  const [captions, setCaptions] = useState<string[]>(() => chosen.map(() => ''));
  const [areaId, setAreaId] = useState(preset?.areaId ?? '');
  const [subject, setSubject] = useState<string>(preset?.subject ?? NO_SUBJECT);
  const [picked, setPicked] = useState<string[]>([]);
  const [saving, setSaving] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [savedCount, setSavedCount] = useState(0);

  const many = files.length > 1;
  const toggle = (tag: string) => setPicked((p) => (p.includes(tag) ? p.filter((t) => t !== tag) : [...p, tag]));

  async function save(e: FormEvent) {
    e.preventDefault();
    const [subjectType, subjectId] = subject ? (subject.split(':') as [PhotoSubjectType, string]) : [null, null];
    let done = 0;
    setError(null);
    for (let i = 0; i < files.length; i++) {
      setSaving(i);
      try {
        await addPhoto(files[i]!, { visitId, siteId, areaId: areaId || null, subjectType, subjectId, caption: captions[i], tags: picked }, userId, shrinkPhoto);
        done++;
      } catch (err) {
        // What was saved stays saved; the rest stay in the form to try again.
        const left = files.slice(i);
        setFiles(left);
        setCaptions((c) => c.slice(i));
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

  const title = saving !== null ? `Saving photo ${saving + 1} of ${files.length}…` : many ? `Add ${files.length} photos` : 'Add one photo';
  return (
    <Dialog open fullScreen onClose={() => saving === null && onClose(savedCount)} aria-labelledby="photo-details-title">
      <Box component="form" onSubmit={save} noValidate aria-label="Photo details" sx={{ display: 'flex', flexDirection: 'column', minHeight: '100%' }}>
        <DialogTitle id="photo-details-title">{title}</DialogTitle>
        {saving !== null && <LinearProgress variant="determinate" value={(saving / files.length) * 100} aria-label="Saving photos" />}
        <DialogContent dividers sx={{ flex: 1 }}>
          <Stack spacing={2.5}>
            {error && (
              <Alert severity="error" role="alert">
                {error}
              </Alert>
            )}
            <Stack spacing={1.5} component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Chosen photos">
              {files.map((file, i) => (
                <Stack key={`${file.name}-${file.lastModified}-${i}`} component="li" direction="row" spacing={1.5} sx={{ alignItems: 'center' }}>
                  <FilePreview file={file} alt={many ? `Photo ${i + 1}` : 'The photo'} />
                  <TextField
                    label={many ? `Caption for photo ${i + 1}` : 'Caption'}
                    placeholder="What it shows, e.g. chase to the new socket"
                    value={captions[i] ?? ''}
                    onChange={(e) => setCaptions((c) => c.map((v, j) => (j === i ? e.target.value : v)))}
                    slotProps={{ htmlInput: { maxLength: 500 } }}
                    size="small"
                  />
                </Stack>
              ))}
            </Stack>
            <TextField select label="Area" value={areaId} onChange={(e) => setAreaId(e.target.value)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }} helperText={many ? 'For all these photos.' : ' '}>
              <option value="">Not given</option>
              {choices?.areas.map((a) => (
                <option key={a.id} value={a.id}>
                  {a.name}
                </option>
              ))}
            </TextField>
            <TextField select label="Shows" value={subject} onChange={(e) => setSubject(e.target.value)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }} helperText="A circuit, cable run or point change, if the photo is of one.">
              <option value={NO_SUBJECT}>Nothing in particular</option>
              {choices?.subjects.map((s) => (
                <option key={`${s.type}:${s.id}`} value={`${s.type}:${s.id}`}>
                  {s.label}
                </option>
              ))}
            </TextField>
            <Box component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
              <Typography component="legend" variant="body2" color="text.secondary" sx={{ mb: 1 }}>
                Tags
              </Typography>
              <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
                {tags.map((tag) => {
                  const on = picked.includes(tag);
                  return (
                    <Chip
                      key={tag}
                      label={tag}
                      color={on ? 'primary' : 'default'}
                      variant={on ? 'filled' : 'outlined'}
                      onClick={() => toggle(tag)}
                      aria-pressed={on}
                      role="button"
                      sx={{ minHeight: 40, fontSize: '0.95rem', borderRadius: 5 }}
                    />
                  );
                })}
              </Stack>
            </Box>
          </Stack>
        </DialogContent>
        <DialogActions sx={{ p: 2, gap: 1, pb: 'calc(16px + env(safe-area-inset-bottom))' }}>
          <Button onClick={() => onClose(savedCount)} disabled={saving !== null} size="large">
            Cancel
          </Button>
          <Button type="submit" variant="contained" size="large" disabled={saving !== null} sx={{ flex: 1 }}>
            {many ? `Save ${files.length} photos` : 'Save photo'}
          </Button>
        </DialogActions>
      </Box>
    </Dialog>
  );
}
