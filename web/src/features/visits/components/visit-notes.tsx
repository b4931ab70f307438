import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { type FormEvent, useState } from 'react';
import { createRecord } from '@/lib/sync/local-write';
import { usePendingIds } from '../api/get-pending-ids';
import { useVisitNotes } from '../api/get-visit-notes';
import { whenRecorded } from '../visit-format';

/** Quick notes on a visit: saved on the phone at once, sent when there is signal. */
export function VisitNotes({ visitId, siteId }: { visitId: string; siteId: string }) {
  const notes = useVisitNotes(visitId);
  const pending = usePendingIds('note');
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    if (!text.trim()) {
      setError('Write the note first.');
      return;
    }
    try {
      await createRecord('note', { visitId, siteId, text: text.trim() });
      setText('');
      setError(null);
      setSaved(true);
    } catch (err) {
      setError((err as Error).message);
    }
  }

  return (
    <Stack component="section" aria-labelledby="notes-heading" spacing={1.5}>
      <Typography variant="h2" id="notes-heading">
        Notes
      </Typography>
      <Paper variant="outlined" component="form" aria-label="Add a note" onSubmit={onSubmit} noValidate sx={{ p: 2 }}>
        <Stack spacing={1.5}>
          <TextField
            label="Note"
            multiline
            minRows={3}
            value={text}
            onChange={(e) => {
              setText(e.target.value);
              setSaved(false);
            }}
            error={!!error}
            helperText={error ?? (saved ? 'Saved on this phone.' : ' ')}
          />
          <Button type="submit" variant="contained" size="large">
            Add note
          </Button>
        </Stack>
      </Paper>
      {notes && notes.length > 0 ? (
        <Paper variant="outlined">
          <List aria-label="Notes on this visit">
            {notes.map((n) => (
              <ListItem key={n.id} divider>
                <ListItemText
                  primary={n.text}
                  secondary={`${whenRecorded(n.createdAt)}${pending.has(n.id) ? ' · waiting to send' : ''}`}
                  slotProps={{ primary: { sx: { whiteSpace: 'pre-wrap' } } }}
                />
              </ListItem>
            ))}
          </List>
        </Paper>
      ) : (
        notes && (
          <Typography color="text.secondary" variant="body2">
            No notes yet.
          </Typography>
        )
      )}
    </Stack>
  );
}
