import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Stack from '@mui/material/Stack';

/** What to know before putting a tone generator on a cable nobody can name. */
export const TRACING_CAUTIONS = [
  'An unknown cable may be live: mains, a telephone line carrying ringing voltage (around 75 V AC, more with the line voltage) or a data cable carrying PoE.',
  'Never connect a tone generator to a live mains conductor. Prove the cable dead first, with an approved voltage indicator proved on a known live source before and after (HSE GS38).',
  'Do not cut, strip or terminate it until it is identified and proven dead: the Electricity at Work Regulations 1989 apply to everyone working on or near it.',
  'The regulations in force, local codes and a competent person decide.',
] as const;

/**
 * Tracing is where a cabler meets a cable nobody can name. It stays in view on the cable screens rather than being
 * read once, because the next unknown run may be the one that is live.
 */
export function TracingCaution() {
  return (
    <Alert severity="warning" variant="outlined" sx={{ mb: 2 }} role="note" aria-label="Tracing an unknown cable">
      <AlertTitle>Tracing an unknown cable</AlertTitle>
      Until it is identified, treat it as live: it may be mains, a telephone line carrying ringing voltage or a data
      cable carrying PoE. Never put a tone generator on a live mains conductor: prove it dead first (HSE GS38, the
      Electricity at Work Regulations 1989). The regulations in force, local codes and a competent person decide.
    </Alert>
  );
}

/** The cautions in full, as a list, for the trace log's gate. */
export function TracingCautionList() {
  return (
    <Stack component="ul" spacing={0.75} sx={{ pl: 2.5, my: 0 }}>
      {TRACING_CAUTIONS.map((c) => (
        <li key={c}>{c}</li>
      ))}
    </Stack>
  );
}
