import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { type FormEvent, useState } from 'react';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { createRecord } from '@/lib/sync/local-write';

const EMPTY_NOTE = { text: '' };

/** A note in a few words: saved on the phone at once, sent when there is signal. */
export function QuickNote({ visitId, siteId, disabled }: { visitId: string; siteId: string; disabled?: boolean }) {
  const draftKey = disabled ? null : `note.new.${visitId}`;
  const [text, setText] = useState(() => startingValues(draftKey, EMPTY_NOTE).text);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const draft = useFormDraft(draftKey, { text }, EMPTY_NOTE, () => setText(''));

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    if (!text.trim()) {
      setError('Write the note first.');
      return;
    }
    try {
      await createRecord('note', { visitId, siteId, text: text.trim() });
      setText('');
      draft.settle(EMPTY_NOTE);
      setError(null);
      setSaved(true);
    } catch (err) {
      setError((err as Error).message);
    }
  }

  return (
    <Stack component="form" aria-label="Add a note" onSubmit={onSubmit} noValidate direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
      <TextField
        label="Note"
        multiline
        minRows={1}
        maxRows={6}
        value={text}
        disabled={disabled}
        onChange={(e) => {
          setText(e.target.value);
          setSaved(false);
        }}
        error={!!error}
        helperText={error ?? (saved ? 'Saved on this phone.' : draft.restored && text ? 'Not added yet: kept from before.' : ' ')}
        slotProps={{ htmlInput: { maxLength: 20_000 } }}
      />
      <Button type="submit" variant="outlined" size="large" disabled={disabled} sx={{ minHeight: 56, flexShrink: 0 }}>
        Add note
      </Button>
    </Stack>
  );
}
