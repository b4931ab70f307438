import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { type FormEventHandler, type ReactNode, useId } from 'react';

interface Props {
  open: boolean;
  title: string;
  submitLabel: string;
  /** The form's submit handler, usually react-hook-form's handleSubmit(...). */
  onSubmit: FormEventHandler<HTMLFormElement>;
  onClose: () => void;
  pending?: boolean;
  /** The server's refusal, shown as it said it. */
  error?: Error | null;
  maxWidth?: 'xs' | 'sm' | 'md';
  children: ReactNode;
}

/** A dialog holding one record's form: its fields, the server's answer if it refused, Cancel and the save button. */
export function RecordDialog({ open, title, submitLabel, onSubmit, onClose, pending, error, maxWidth = 'sm', children }: Props) {
  const id = useId();
  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth={maxWidth} aria-labelledby={`${id}-title`}>
      <DialogTitle id={`${id}-title`}>{title}</DialogTitle>
      <DialogContent>
        <Stack component="form" id={`${id}-form`} noValidate spacing={2} sx={{ pt: 1 }} onSubmit={onSubmit}>
          {error && (
            <Alert severity="error" role="alert">
              The server did not save this: {error.message}
            </Alert>
          )}
          {children}
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={onClose}>Cancel</Button>
        <Button type="submit" form={`${id}-form`} variant="contained" disabled={pending}>
          {submitLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
