import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { isVoided, VOID_REASON_MAX, type VoidableEntity, voidReasonProblem } from '@wiretrail/core';
import { useId, useState } from 'react';
import { saveRecord } from '@/lib/sync/local-write';

interface Props {
  entity: VoidableEntity;
  row: { readonly id: string; readonly voidedAt?: unknown };
  /** "cable MK-01", "this note": what the technician is voiding, in the dialog's words. */
  what: string;
  /** The visit is finished: its records are the office's to put right. */
  locked: boolean;
}

/**
 * "Void…" on a record made by mistake, with the reason it asks for; on a voided one before the visit is finished,
 * "Put back". The record stays, struck through, for the office.
 */
export function VoidRecord({ entity, row, what, locked }: Props) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [touched, setTouched] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const titleId = useId();
  if (locked) return null;
  const problem = voidReasonProblem(reason);

  async function write(changes: { voidedAt: string | null; voidReason: string | null }) {
    setError(null);
    try {
      await saveRecord(entity, row.id, changes);
      setOpen(false);
      setReason('');
      setTouched(false);
    } catch (err) {
      setError((err as Error).message);
    }
  }

  if (isVoided(row)) {
    return (
      <Button size="small" onClick={() => write({ voidedAt: null, voidReason: null })} aria-label={`Put back ${what}`} sx={{ alignSelf: 'flex-start' }}>
        Put back
      </Button>
    );
  }
  return (
    <>
      <Button size="small" color="error" onClick={() => setOpen(true)} aria-label={`Void ${what}…`} sx={{ alignSelf: 'flex-start' }}>
        Void…
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} aria-labelledby={titleId} fullWidth>
        <DialogTitle id={titleId}>Void {what}?</DialogTitle>
        <Stack
          component="form"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            setTouched(true);
            if (!problem) void write({ voidedAt: new Date().toISOString(), voidReason: reason.trim() });
          }}
        >
          <DialogContent>
            <DialogContentText sx={{ mb: 2 }}>
              A voided record is kept for the office, struck through with your reason. It is left out of the counts, the labels and every
              document. You can put it back until the visit is finished.
            </DialogContentText>
            <TextField
              autoFocus
              fullWidth
              multiline
              minRows={2}
              label="Why is it void?"
              placeholder="Typed the wrong label"
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              onBlur={() => setTouched(true)}
              error={touched && !!problem}
              helperText={(touched && problem) || error || ' '}
              slotProps={{ htmlInput: { maxLength: VOID_REASON_MAX } }}
            />
          </DialogContent>
          <DialogActions>
            <Button onClick={() => setOpen(false)}>Keep it</Button>
            <Button type="submit" color="error" variant="contained">
              Void it
            </Button>
          </DialogActions>
        </Stack>
      </Dialog>
    </>
  );
}
