import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { TraceEntry } from '@wiretrail/core';
import { type FormEvent, useState } from 'react';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import type { CableRunRow, VisitRow } from '@/lib/db';
import { saveRecord } from '@/lib/sync/local-write';
import { TracingCautionList } from './tracing-caution';

const at = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
const EMPTY = { connectedAt: '', heardAt: '', turnedOut: '' };

/**
 * The tone-and-probe trace of a cable, step by step: where the tone went on, where it was heard, and what the
 * cable turned out to be. The cautions come first, once per visit, and reading them is recorded on the visit.
 */
export function TraceLog({ cable, visit, locked }: { cable: CableRunRow; visit: VisitRow; locked: boolean }) {
  const entries: readonly TraceEntry[] = Array.isArray(cable.traceLog) ? cable.traceLog : [];
  const key = locked ? null : `trace.${cable.id}.${visit.id}`;
  const [step, setStep] = useState(() => startingValues(key, EMPTY));
  const [error, setError] = useState<string | null>(null);
  const draft = useFormDraft(key, step, EMPTY, setStep);

  async function readCautions() {
    try {
      await saveRecord('visit', visit.id, { tracingCautionReadAt: new Date().toISOString() });
    } catch (err) {
      setError((err as Error).message);
    }
  }

  async function add(e: FormEvent) {
    e.preventDefault();
    if (!step.connectedAt.trim() || !step.heardAt.trim()) {
      setError('Say where the tone went on and where it was heard (or that it was not).');
      return;
    }
    const entry: TraceEntry = { at: new Date().toISOString(), connectedAt: step.connectedAt.trim(), heardAt: step.heardAt.trim(), turnedOut: step.turnedOut.trim(), visitId: visit.id };
    try {
      await saveRecord('cableRun', cable.id, { traceLog: [...entries, entry], lastVisitId: visit.id });
      setError(null);
      setStep(EMPTY);
      draft.settle(EMPTY);
    } catch (err) {
      setError((err as Error).message);
    }
  }

  return (
    <Stack spacing={1.5} component="section" aria-labelledby="trace-log-heading">
      <Typography variant="h3" id="trace-log-heading">
        Trace log
      </Typography>
      {entries.length > 0 && (
        <Paper variant="outlined">
          <List disablePadding aria-label="Trace steps">
            {entries.map((s) => (
              <ListItem key={s.at} divider>
                <ListItemText primary={`Tone on ${s.connectedAt}; heard ${s.heardAt}`} secondary={[s.turnedOut && `Turned out to be ${s.turnedOut}`, at.format(new Date(s.at))].filter(Boolean).join(' · ')} />
              </ListItem>
            ))}
          </List>
        </Paper>
      )}
      {locked ? null : !visit.tracingCautionReadAt ? (
        <Alert severity="warning" role="region" aria-label="Before tracing" action={undefined}>
          <AlertTitle>Before tracing</AlertTitle>
          <TracingCautionList />
          <Button variant="contained" color="warning" sx={{ mt: 1.5 }} onClick={readCautions}>
            I have read this: start tracing
          </Button>
        </Alert>
      ) : (
        <Stack component="form" spacing={1.5} onSubmit={add} noValidate aria-label="Add a trace step">
          <DraftNotice draft={draft} />
          <Typography variant="body2" color="text.secondary">
            Cautions read at {at.format(new Date(visit.tracingCautionReadAt))} on this visit.
          </Typography>
          <TextField label="Tone connected at" placeholder="Patch panel port 2, after proving dead" value={step.connectedAt} onChange={(e) => setStep((s) => ({ ...s, connectedAt: e.target.value }))} slotProps={{ htmlInput: { maxLength: 300 } }} />
          <TextField label="Heard at" placeholder="Surgery 1, cable behind the X-ray unit" value={step.heardAt} onChange={(e) => setStep((s) => ({ ...s, heardAt: e.target.value }))} slotProps={{ htmlInput: { maxLength: 300 } }} />
          <TextField label="Turned out to be" placeholder="Cat6 to the X-ray unit's network port" value={step.turnedOut} onChange={(e) => setStep((s) => ({ ...s, turnedOut: e.target.value }))} slotProps={{ htmlInput: { maxLength: 300 } }} />
          {error && (
            <Alert severity="error" role="alert">
              {error}
            </Alert>
          )}
          <Button type="submit" variant="outlined" size="large">
            Add to the trace log
          </Button>
        </Stack>
      )}
    </Stack>
  );
}
