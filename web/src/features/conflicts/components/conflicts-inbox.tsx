import CheckCircleOutline from '@mui/icons-material/CheckCircleOutlineOutlined';
import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useConflicts } from '../api/get-conflicts';
import { useDirectory } from '@/lib/directory';
import { ConflictCard } from './conflict-card';

/** Every unsettled conflict (or one job's), newest first; settling one sends the chosen value to every device. */
export function ConflictsInbox({ jobId }: { jobId?: string }) {
  const conflicts = useConflicts(1, jobId);
  const people = useDirectory();
  if (conflicts.isPending) return <LinearProgress aria-label="Loading conflicts" />;
  if (conflicts.isError) return <Alert severity="error">{conflicts.error.message}</Alert>;
  const names = new Map((people.data ?? []).map((p) => [p.id, p.name]));
  const nameOf = (id: string | null) => (id ? (names.get(id) ?? 'Someone in your team') : 'Unknown');
  if (conflicts.data.items.length === 0) {
    return (
      <Paper variant="outlined" sx={{ p: 3, textAlign: 'center' }}>
        <CheckCircleOutline color="success" sx={{ fontSize: 44 }} />
        <Typography variant="h3">{jobId ? 'Nothing to settle on this job' : 'Nothing to settle'}</Typography>
        <Typography color="text.secondary">When two people change the same detail before syncing, both values are kept and appear here.</Typography>
      </Paper>
    );
  }
  return (
    <Stack spacing={2} aria-label="Conflicts to settle" component="section">
      <Typography color="text.secondary">
        {conflicts.data.total} to settle
      </Typography>
      {conflicts.data.items.map((c) => (
        <ConflictCard key={c.id} conflict={c} nameOf={nameOf} />
      ))}
    </Stack>
  );
}
