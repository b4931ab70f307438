import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import ErrorOutlineOutlined from '@mui/icons-material/ErrorOutlineOutlined';
import HelpOutlineOutlined from '@mui/icons-material/HelpOutlineOutlined';
import InfoOutlined from '@mui/icons-material/InfoOutlined';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { CERTIFICATE_WORDS } from '@wiretrail/core';
import { AidLine } from '@/components/verdicts/verdict-chip';
import type { Problem, SignOffSummary } from '../data/get-sign-off';

const KIND_WORDS: Record<Problem['kind'], string> = {
  fail: 'Fail',
  missing: 'Missing',
  unjudged: 'Not judged',
  untested: 'Not tested',
  'no-circuit': 'No circuit',
  'unknown-circuit': 'Unknown circuit',
  'new-circuit': 'Needs an installation certificate',
  'board-replaced': 'Needs an installation certificate',
  'departure-incomplete': 'Incomplete departure',
  'no-rules': 'No standard for that date',
  'not-installation-work': 'Not installation work',
  'details-missing': 'Details missing',
  inspection: 'Inspection',
  instruments: 'Test instruments',
  particulars: 'Particulars',
};

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** Counts of what was recorded, then every fail and every gap, so nothing is signed unseen. */
export function SignOffSummaryView({ summary, signed = false }: { summary: SignOffSummary; signed?: boolean }) {
  const { counts, problems } = summary;
  const fails = problems.filter((p) => p.kind === 'fail');
  const gaps = problems.filter((p) => p.kind !== 'fail');
  return (
    <Stack spacing={1.5}>
      <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Recorded on this visit">
        <Typography sx={{ fontWeight: 500 }}>Recorded on this visit</Typography>
        <Typography color="text.secondary">
          {[plural(counts.photos, 'photo'), plural(counts.notes, 'note'), plural(counts.cables, 'cable'), plural(counts.points, 'point change'), plural(counts.circuits, 'circuit tested', 'circuits tested')].join(' · ')}
        </Typography>
      </Paper>
      {summary.choice && (counts.circuits > 0 || summary.choice.kind === 'installation-certificate') && (
        <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Certificate for this work">
          <Typography sx={{ fontWeight: 500 }}>Certificate for this work: {CERTIFICATE_WORDS[summary.choice.kind].toLowerCase()}</Typography>
          <Typography variant="body2" color="text.secondary">
            {summary.choice.sentence}
          </Typography>
        </Paper>
      )}
      {problems.length === 0 && counts.circuits === 0 ? (
        // Nothing judged is not a pass: a tick here would read as one.
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', color: 'text.secondary' }} role="status">
          <InfoOutlined />
          <Typography sx={{ color: 'text.primary' }}>No circuit was altered or tested on this visit, so there are no readings to judge.</Typography>
        </Stack>
      ) : problems.length === 0 ? (
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', color: 'success.main' }} role="status">
          <CheckCircleOutlined />
          <Typography sx={{ color: 'text.primary' }}>No fails and no missing readings.</Typography>
        </Stack>
      ) : (
        <Paper variant="outlined" component="section" aria-label="To look at before signing">
          <Typography sx={{ fontWeight: 500, px: 2, pt: 1.5 }}>
            {[fails.length ? plural(fails.length, 'fail') : null, gaps.length ? plural(gaps.length, 'gap') : null].filter(Boolean).join(' and ')} {signed ? 'recorded when it was signed' : 'to look at before signing'}
          </Typography>
          <List dense aria-label="Fails and missing readings">
            {problems.map((p, i) => (
              <ListItem key={i} sx={{ alignItems: 'flex-start' }}>
                <ListItemIcon sx={{ minWidth: 36, mt: 0.5, color: p.kind === 'fail' ? 'error.main' : 'warning.main' }}>
                  {p.kind === 'fail' ? <ErrorOutlineOutlined /> : <HelpOutlineOutlined />}
                </ListItemIcon>
                <ListItemText primary={`${KIND_WORDS[p.kind]}: ${p.what}`} secondary={p.detail} />
              </ListItem>
            ))}
          </List>
        </Paper>
      )}
      <AidLine />
    </Stack>
  );
}
