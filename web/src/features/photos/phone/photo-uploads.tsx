import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { DEFAULT_KEEP_ORIGINALS_DAYS } from '@/lib/photos/free-originals';
import { useUploadProgress } from '@/lib/photos/upload-progress';
import { keepOriginalsFor, usePhotoStorageSummary } from '../data/get-photo-states';
import { dataSize } from '@/lib/data-size';

const KEEP_CHOICES = [
  { days: 0, label: 'Free them as soon as the office has them' },
  { days: 3, label: '3 days' },
  { days: 7, label: '7 days' },
  { days: 14, label: '14 days' },
  { days: 30, label: '30 days' },
  { days: 90, label: '90 days' },
];

const photos = (n: number) => (n === 1 ? '1 photo' : `${n} photos`);

/** On the Sync page: photos waiting and how far they have got, those refused, and how long full-size photos stay. */
export function PhotoUploads({ userId }: { userId: string }) {
  const summary = usePhotoStorageSummary(userId);
  const progress = useUploadProgress();
  const [freed, setFreed] = useState<string | null>(null);
  const keep = summary?.keepOriginalsDays ?? DEFAULT_KEEP_ORIGINALS_DAYS;
  const share = progress.roundTotal > 0 ? Math.min(100, (progress.roundSent / progress.roundTotal) * 100) : 0;

  return (
    <Paper variant="outlined" component="section" aria-labelledby="photos-heading">
      <Typography variant="h3" id="photos-heading" sx={{ px: 2, pt: 2 }}>
        Photos
      </Typography>
      <List>
        <ListItem>
          <ListItemText
            primary="Photos waiting to send"
            secondary={!summary ? '…' : summary.waiting === 0 ? 'No photos waiting' : `${photos(summary.waiting)} · ${dataSize(summary.waitingBytes)}`}
          />
        </ListItem>
        {progress.active && progress.roundTotal > 0 && (
          <ListItem>
            <Stack spacing={0.75} sx={{ width: '100%' }}>
              <Typography variant="body2">
                Sending photos: {Math.floor(share)} % ({dataSize(progress.roundSent)} of {dataSize(progress.roundTotal)})
              </Typography>
              <LinearProgress variant="determinate" value={share} aria-label="Photos sent" sx={{ height: 8, borderRadius: 4 }} />
            </Stack>
          </ListItem>
        )}
        {progress.lastError && (
          <ListItem>
            <Alert severity="warning" sx={{ width: '100%' }}>
              {progress.lastError}
            </Alert>
          </ListItem>
        )}
        {summary && summary.refused.length > 0 && (
          <ListItem sx={{ display: 'block' }}>
            <Typography variant="body2" sx={{ fontWeight: 500, color: 'error.main' }}>
              Not accepted by the office system
            </Typography>
            <List dense aria-label="Refused photos" disablePadding>
              {summary.refused.map((r) => (
                <ListItem key={r.sha256} disableGutters>
                  <ListItemText primary={r.caption || 'Photo without a caption'} secondary={`Refused: ${r.reason}`} />
                </ListItem>
              ))}
            </List>
          </ListItem>
        )}
        <ListItem>
          <ListItemText
            primary="Full-size photos on this phone"
            secondary={summary ? `${photos(summary.kept)} · ${dataSize(summary.keptBytes)}. Thumbnails always stay.` : '…'}
          />
        </ListItem>
        <ListItem>
          <TextField
            select
            label="Keep full-size photos after they reach the office for"
            value={keep}
            onChange={async (e) => {
              const n = await keepOriginalsFor(Number(e.target.value));
              setFreed(n > 0 ? `${photos(n)} freed.` : null);
            }}
            slotProps={{ select: { native: true } }}
            helperText={freed ?? 'A photo is never removed from this phone before the office system has confirmed it.'}
          >
            {KEEP_CHOICES.map((c) => (
              <option key={c.days} value={c.days}>
                {c.label}
              </option>
            ))}
          </TextField>
        </ListItem>
      </List>
    </Paper>
  );
}
