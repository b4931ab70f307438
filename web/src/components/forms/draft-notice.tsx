import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import type { FormDraft } from './form-draft';

/** Says that the form holds what was typed earlier and not saved, with a way back to the record as recorded. */
export function DraftNotice({ draft, disabled }: { draft: FormDraft; disabled?: boolean }) {
  if (!draft.restored) return null;
  return (
    <Alert
      severity="info"
      action={
        <Button color="inherit" onClick={draft.discard} disabled={disabled}>
          Discard
        </Button>
      }
    >
      Back where you left off: what you typed earlier is here, not saved yet.
    </Alert>
  );
}
