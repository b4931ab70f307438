import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

/**
 * Tracing is where a cabler meets a cable nobody can name. It stays in view on the cable screens rather than being
 * read once, because the next unknown run may be the one that is live.
 */
export function TracingCaution() {
  return (
    <Alert severity="warning" variant="outlined" sx={{ mb: 2 }} role="note" aria-label="Tracing an unknown cable">
      <AlertTitle>Tracing an unknown cable</AlertTitle>
      Until it is identified, treat it as live: it may be mains, a telephone line carrying ringing voltage or a data
      cable carrying PoE. Do not cut, strip or terminate it until it is proven, with an approved voltage indicator for
      mains. The regulations in force, local codes and a competent person decide.
    </Alert>
  );
}
