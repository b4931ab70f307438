import GppMaybeOutlined from '@mui/icons-material/GppMaybeOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { type ReactNode, useState } from 'react';
import type { VisitRow } from '@/lib/db';
import { saveRecord } from '@/lib/sync/local-write';

const readAt = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });

const CAUTIONS = [
  'Isolate the circuit at its protective device and lock it off; keep the key or tag on you.',
  'Prove it dead at the point of work with an approved voltage indicator, proved on a known live source or proving unit before and after.',
  'Treat every conductor as live until proven dead: look out for borrowed neutrals, shared neutrals and a second supply.',
  'Live tests (Zs, RCD operation) need the right instrument, leads and care; keep others away from exposed parts.',
  'Work only within your competence. Wiretrail’s figures are an aid: the regulations in force (in the UK, BS 7671), local codes and a competent person decide.',
];

/**
 * Shown once per visit before a section that leads to work on a circuit; reading it is recorded on the visit,
 * so the office sees it was done. Afterwards a short reminder stays at the top.
 */
export function CautionGate({ visit, locked, children }: { visit: VisitRow; locked: boolean; children: ReactNode }) {
  const [error, setError] = useState<string | null>(null);
  const [expanded, setExpanded] = useState(false);
  if (visit.cautionsReadAt || locked) {
    // Once read, a short reminder stays in view; the whole list is one tap away.
    return (
      <>
        <Alert
          severity="warning"
          variant="outlined"
          sx={{ mb: 2, '& .MuiAlert-message': { width: '100%' } }}
          action={
            <Button color="inherit" onClick={() => setExpanded((e) => !e)} aria-expanded={expanded}>
              {expanded ? 'Less' : 'All'}
            </Button>
          }
        >
          Isolate and lock off, prove dead with an approved voltage indicator and work within your competence; the regulations in force, local codes and a competent person decide.
          {visit.cautionsReadAt ? ` Read at ${readAt.format(new Date(visit.cautionsReadAt))}.` : ''}
          {expanded && (
            <Stack component="ul" spacing={0.75} sx={{ pl: 2.5, mb: 0, mt: 1 }}>
              {CAUTIONS.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </Stack>
          )}
        </Alert>
        {children}
      </>
    );
  }
  async function confirm() {
    try {
      await saveRecord('visit', visit.id, { cautionsReadAt: new Date().toISOString() });
    } catch (err) {
      setError((err as Error).message);
    }
  }
  return (
    <Paper variant="outlined" sx={{ p: 2, borderColor: 'warning.main', borderWidth: 2 }} component="section" aria-labelledby="cautions-heading">
      <Stack spacing={1.5}>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', color: 'warning.main' }}>
          <GppMaybeOutlined fontSize="large" />
          <Typography variant="h2" id="cautions-heading" sx={{ color: 'text.primary' }}>
            Before you work on a circuit
          </Typography>
        </Stack>
        <Stack component="ul" spacing={1} sx={{ pl: 2.5, m: 0 }}>
          {CAUTIONS.map((c) => (
            <Typography component="li" key={c}>
              {c}
            </Typography>
          ))}
        </Stack>
        {error && <Alert severity="error">{error}</Alert>}
        <Button variant="contained" size="large" onClick={confirm}>
          I have read these cautions
        </Button>
        <Typography variant="body2" color="text.secondary">
          Shown once on each visit; the time you read them is kept with the visit.
        </Typography>
      </Stack>
    </Paper>
  );
}
