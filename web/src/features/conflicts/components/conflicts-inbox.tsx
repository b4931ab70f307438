import CheckCircleOutline from '@mui/icons-material/CheckCircleOutlineOutlined';
import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useConflicts } from '../api/get-conflicts';
import { useDirectory } from '@/lib/directory';
import { ConflictCard } from './conflict-card';
import { SettledConflicts } from './settled-conflicts';

/** To settle, or already settled: every conflict (or one job's), newest first. */
export function ConflictsInbox({ jobId }: { jobId?: string }) {
  const [tab, setTab] = useState<'open' | 'settled'>('open');
  const people = useDirectory();
  const names = new Map((people.data ?? []).map((p) => [p.id, p.name]));
  const nameOf = (id: string | null) => (id ? (names.get(id) ?? 'Someone in your team') : 'Unknown');
  return (
    <>
      <Tabs value={tab} onChange={(_, v: 'open' | 'settled') => setTab(v)} aria-label="Conflicts" sx={{ mb: 2, borderBottom: 1, borderColor: 'divider' }}>
        <Tab value="open" label="To settle" />
        <Tab value="settled" label="Settled" />
      </Tabs>
      {tab === 'open' ? <OpenConflicts jobId={jobId} nameOf={nameOf} /> : <SettledConflicts jobId={jobId} nameOf={nameOf} />}
    </>
  );
}

/** Every unsettled conflict; settling one sends the chosen value to every device. */
function OpenConflicts({ jobId, nameOf }: { jobId?: string; nameOf: (id: string | null) => string }) {
  const conflicts = useConflicts(1, jobId);
  if (conflicts.isPending) return <LinearProgress aria-label="Loading conflicts" />;
  if (conflicts.isError) return <Alert severity="error">{conflicts.error.message}</Alert>;
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
