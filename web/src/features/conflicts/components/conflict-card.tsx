import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import type { Conflict } from '../api/get-conflicts';
import { type Resolution, useResolveConflict } from '../api/resolve-conflict';
import { entityName, fieldMessage, fieldName, parseTyped, REASONS, showValue, whenFromClock } from './conflict-words';

function Side({ title, value, by, hlc, accent }: { title: string; value: unknown; by: string; hlc: string | null; accent: 'primary' | 'secondary' }) {
  const when = whenFromClock(hlc);
  return (
    <Paper variant="outlined" sx={{ p: 2, flex: 1, borderColor: `${accent}.main`, minWidth: 0 }}>
      <Typography variant="overline" color={`${accent}.main`}>
        {title}
      </Typography>
      <Typography sx={{ fontSize: '1.05rem', fontWeight: 500, overflowWrap: 'anywhere' }}>{showValue(value)}</Typography>
      <Typography variant="body2" color="text.secondary">
        {by}
        {when ? ` · ${when}` : ''}
      </Typography>
    </Paper>
  );
}

export function ConflictCard({ conflict, nameOf }: { conflict: Conflict; nameOf: (id: string | null) => string }) {
  const resolve = useResolveConflict();
  const [typing, setTyping] = useState(false);
  const [text, setText] = useState('');
  const [typedError, setTypedError] = useState<string | null>(null);
  const locked = conflict.reason === 'locked-by-document';
  const settle = (resolution: Resolution) => resolve.mutate({ id: conflict.id, resolution });
  const title = `${entityName(conflict.entity)} · ${fieldName(conflict.field)}`;
  return (
    <Paper component="article" aria-label={title} variant="outlined" sx={{ p: 2.5 }}>
      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'baseline', gap: 2, mb: 0.5, flexWrap: 'wrap' }}>
        {/* The record in words, so that two conflicts about different circuits never read alike. */}
        <Typography variant="h3">{conflict.subject?.title ?? entityName(conflict.entity)}</Typography>
        <Chip size="small" label={fieldName(conflict.field)} variant="outlined" />
      </Stack>
      {!!conflict.subject?.context.length && (
        <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
          {conflict.subject.context.join(' · ')}
        </Typography>
      )}
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        {REASONS[conflict.reason] ?? 'Two changes met; one was kept.'}
      </Typography>
      <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap' }}>
        <Side title="Kept" value={conflict.keptValue} by={nameOf(conflict.keptById)} hlc={conflict.keptHlc} accent="primary" />
        <Side title="Not kept" value={conflict.discardedValue} by={nameOf(conflict.discardedById)} hlc={conflict.discardedHlc} accent="secondary" />
      </Box>
      {resolve.isError && !typing && (
        <Alert severity="error" sx={{ mt: 2 }}>
          {resolve.error.message}
        </Alert>
      )}
      {typing ? (
        <Stack
          component="form"
          direction="row"
          sx={{ mt: 2, gap: 1.5, alignItems: 'flex-start' }}
          onSubmit={(e) => {
            e.preventDefault();
            const parsed = parseTyped(conflict.entity, conflict.field, text);
            if ('error' in parsed) return setTypedError(parsed.error);
            setTypedError(null);
            settle({ choice: 'value', value: parsed.value });
          }}
        >
          {/* The server's refusal of a typed value belongs to the field, beside it. */}
          <TextField
            size="small"
            label={`New ${fieldName(conflict.field).toLowerCase()}`}
            value={text}
            onChange={(e) => setText(e.target.value)}
            error={!!typedError || resolve.isError}
            helperText={typedError ?? (resolve.isError ? fieldMessage(resolve.error.message) : ' ')}
            autoFocus
          />
          <Button type="submit" variant="contained" disabled={resolve.isPending}>
            Save
          </Button>
          <Button onClick={() => setTyping(false)}>Cancel</Button>
        </Stack>
      ) : (
        <Stack direction="row" sx={{ mt: 2, gap: 1.5, flexWrap: 'wrap' }}>
          <Button variant="contained" disabled={resolve.isPending} onClick={() => settle({ choice: 'kept' })}>
            Keep as it is
          </Button>
          <Button variant="outlined" color="secondary" disabled={resolve.isPending || locked} onClick={() => settle({ choice: 'discarded' })}>
            Use the other value
          </Button>
          {conflict.field !== '*' && (
            <Button disabled={resolve.isPending || locked} onClick={() => setTyping(true)}>
              Enter a value
            </Button>
          )}
        </Stack>
      )}
    </Paper>
  );
}
