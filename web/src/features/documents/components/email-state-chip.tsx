import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { JobDocument } from '../api/get-job-documents';
import { issuedTime } from '../document-words';

/** How the document's e-mail is getting on: waiting to go (and why, if an attempt failed), sent, or given up. */
export function EmailStateChip({ doc }: { doc: JobDocument }) {
  if (!doc.emailState) return <Typography color="text.secondary">Not e-mailed yet</Typography>;
  const chip =
    doc.emailState === 'sent' ? (
      <Chip size="small" color="success" label="Sent" />
    ) : doc.emailState === 'failed' ? (
      <Chip size="small" color="error" label="Failed" />
    ) : (
      <Chip size="small" color="info" variant="outlined" label={doc.emailError ? 'Retrying' : 'Queued'} />
    );
  const detail =
    doc.emailState === 'sent'
      ? `to ${doc.emailedTo ?? ''} · ${issuedTime(doc.emailedAt)}`
      : doc.emailState === 'failed'
        ? (doc.emailError ?? '')
        : `to ${doc.emailedTo ?? ''}${doc.emailError ? ` · ${doc.emailError}` : ''}`;
  return (
    <Stack spacing={0.5} sx={{ alignItems: 'flex-start' }} aria-label={`E-mail: ${doc.emailState}`}>
      {chip}
      <Typography variant="caption" color={doc.emailState === 'failed' ? 'error' : 'text.secondary'} sx={{ maxWidth: 300, overflowWrap: 'anywhere' }}>
        {detail}
      </Typography>
    </Stack>
  );
}
