import MoreVertOutlined from '@mui/icons-material/MoreVertOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import CardContent from '@mui/material/CardContent';
import IconButton from '@mui/material/IconButton';
import LinearProgress from '@mui/material/LinearProgress';
import Link from '@mui/material/Link';
import ListSubheader from '@mui/material/ListSubheader';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { JOB_STATUSES, type JobWork, unmetFor } from '@wiretrail/core';
import { type DragEvent, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { JobFilters, JobStatusCounts } from '../api/get-job-status-counts';
import { type Job, useJobs } from '../api/get-jobs';
import { useUpdateJob } from '../api/update-job';
import { JOB_STATUS_HINTS, type JobStatus, jobStatusWords, OPEN_JOB_STATUSES } from '../job-status';
import { visitWhen } from '@/lib/visit-when';

/** Cards shown per column before the table takes over. */
const COLUMN_SIZE = 30;
const DRAG_TYPE = 'application/x-wiretrail-job';

interface Props {
  filters: JobFilters;
  counts?: JobStatusCounts;
  showClosed: boolean;
  personName: (userId: string) => string;
  /** Opens the table filtered to one status, for a column with more jobs than it shows. */
  onShowAll: (status: JobStatus) => void;
}

/** What a dragged card carries to the column it is dropped on: enough to ask before moving it there. */
interface Dragged {
  id: string;
  status: string | null | undefined;
  name: string;
  work?: JobWork;
}

/** A move the office asked for that the job's work does not bear out, waiting for them to say so. */
interface Asking {
  job: Dragged;
  to: JobStatus;
  unmet: string[];
}

/**
 * Asks before moving a job to a status its work has not reached (Done with an invoice unpaid, say), naming what is
 * not so. The office has the last word: moving it anyway sets the status by hand, which stands until the work moves.
 */
export function MoveConfirmation({ asking, onMove, onCancel }: { asking: Asking | null; onMove: () => void; onCancel: () => void }) {
  return (
    <Dialog open={!!asking} onClose={onCancel} aria-labelledby="move-confirmation-title" maxWidth="xs" fullWidth>
      {asking && (
        <>
          <DialogTitle id="move-confirmation-title">Move to {jobStatusWords(asking.to)}?</DialogTitle>
          <DialogContent>
            <Typography gutterBottom>{asking.job.name} has not reached {jobStatusWords(asking.to)} yet:</Typography>
            <Box component="ul" aria-label="Not yet so" sx={{ m: 0, pl: 2.5 }}>
              {asking.unmet.map((u) => (
                <li key={u}>{u}</li>
              ))}
            </Box>
            <Typography variant="body2" color="text.secondary" sx={{ mt: 1.5 }}>
              It stays where you put it until the work moves again.
            </Typography>
          </DialogContent>
          <DialogActions>
            <Button onClick={onCancel}>Leave it</Button>
            <Button variant="contained" onClick={onMove}>
              Move anyway
            </Button>
          </DialogActions>
        </>
      )}
    </Dialog>
  );
}

function JobCard({ job, onMove, moving, personName }: { job: Job; onMove: (status: JobStatus) => void; moving: boolean; personName: (id: string) => string }) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const name = job.reference ? `${job.reference} ${job.title}` : job.title;
  return (
    <Card
      component="article"
      aria-label={name}
      variant="outlined"
      draggable
      onDragStart={(e: DragEvent) => {
        e.dataTransfer.setData(DRAG_TYPE, JSON.stringify({ id: job.id, status: job.status, name, work: job.work } satisfies Dragged));
        e.dataTransfer.effectAllowed = 'move';
      }}
      sx={{ cursor: 'grab', opacity: moving ? 0.5 : 1, '&:hover': { borderColor: 'primary.main' } }}
    >
      <CardContent sx={{ p: 1.5, '&:last-child': { pb: 1.5 } }}>
        <Stack direction="row" sx={{ alignItems: 'flex-start', gap: 0.5 }}>
          <Box sx={{ flex: 1, minWidth: 0 }}>
            {job.reference && (
              <Typography variant="overline" sx={{ color: 'secondary.main', lineHeight: 1.6, letterSpacing: 0.6 }}>
                {job.reference}
              </Typography>
            )}
            <Link component={RouterLink} to={paths.job.href(job.id)} underline="hover" sx={{ display: 'block', fontWeight: 500, lineHeight: 1.3 }}>
              {job.title}
            </Link>
          </Box>
          <IconButton aria-label={`Move ${job.reference ?? job.title}`} onClick={(e) => setAnchor(e.currentTarget)} sx={{ mr: -1, mt: -0.5 }}>
            <MoreVertOutlined />
          </IconButton>
        </Stack>
        <Typography variant="body2" color="text.secondary" sx={{ mt: 0.75 }}>
          {[job.customerName, job.siteName].filter(Boolean).join(' · ')}
        </Typography>
        {job.nextVisitStart && (
          <Typography variant="body2" sx={{ mt: 0.5 }}>
            Next visit {visitWhen(job.nextVisitStart)}
          </Typography>
        )}
        {!!job.technicianIds?.length && (
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.25 }}>
            {job.technicianIds.map(personName).join(', ')}
          </Typography>
        )}
      </CardContent>
      <Menu anchorEl={anchor} open={!!anchor} onClose={() => setAnchor(null)}>
        <ListSubheader>Move to</ListSubheader>
        {JOB_STATUSES.filter((s) => s !== job.status).map((s) => (
          <MenuItem
            key={s}
            onClick={() => {
              setAnchor(null);
              onMove(s);
            }}
          >
            {jobStatusWords(s)}
          </MenuItem>
        ))}
      </Menu>
    </Card>
  );
}

function Column({ status, filters, count, personName, onShowAll }: { status: JobStatus; filters: JobFilters; count?: number; personName: Props['personName']; onShowAll: Props['onShowAll'] }) {
  const jobs = useJobs({ ...filters, status, sort: 'nextVisit', pageSize: COLUMN_SIZE });
  const move = useUpdateJob();
  const [over, setOver] = useState(false);
  const [asking, setAsking] = useState<Asking | null>(null);
  const moveJob = (id: string, to: JobStatus) => move.mutate({ id, changes: { status: to } });
  /** Moves at once when the work agrees, else asks first. */
  const ask = (job: Dragged, to: JobStatus) => {
    const unmet = job.work ? unmetFor(to, job.work) : [];
    if (unmet.length) setAsking({ job, to, unmet });
    else moveJob(job.id, to);
  };
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    const raw = e.dataTransfer.getData(DRAG_TYPE);
    if (!raw) return;
    const dragged = JSON.parse(raw) as Dragged;
    if (dragged.status !== status) ask(dragged, status);
  };
  const items = jobs.data?.items ?? [];
  const total = count ?? jobs.data?.total ?? 0;
  return (
    <Paper
      component="section"
      aria-label={jobStatusWords(status)}
      variant="outlined"
      onDragOver={(e: DragEvent) => {
        if (!e.dataTransfer.types.includes(DRAG_TYPE)) return;
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={onDrop}
      sx={{
        bgcolor: over ? 'action.hover' : 'background.default',
        borderTop: 3,
        borderTopColor: status === 'cancelled' ? 'divider' : 'primary.main',
        p: 1.25,
        minWidth: 0,
        display: 'flex',
        flexDirection: 'column',
        gap: 1,
      }}
    >
      <Box sx={{ px: 0.5 }}>
        <Stack direction="row" sx={{ alignItems: 'baseline', justifyContent: 'space-between' }}>
          <Typography variant="h3" component="h2">
            {jobStatusWords(status)}
          </Typography>
          <Typography color="text.secondary" aria-label={`${total} ${total === 1 ? 'job' : 'jobs'}`}>
            {total}
          </Typography>
        </Stack>
        <Typography variant="body2" color="text.secondary">
          {JOB_STATUS_HINTS[status]}
        </Typography>
      </Box>
      {jobs.isPending && <LinearProgress aria-label={`Loading ${jobStatusWords(status)} jobs`} />}
      {jobs.isError && <Alert severity="error">{jobs.error.message}</Alert>}
      {move.isError && (
        <Alert severity="error" onClose={() => move.reset()}>
          Not moved: {move.error.message}
        </Alert>
      )}
      {items.map((j) => (
        <JobCard key={j.id} job={j} personName={personName} moving={move.isPending && move.variables?.id === j.id} onMove={(to) => ask({ id: j.id, status: j.status, name: j.reference ? `${j.reference} ${j.title}` : j.title, work: j.work }, to)} />
      ))}
      {jobs.isSuccess && items.length === 0 && (
        <Typography variant="body2" color="text.secondary" sx={{ px: 0.5, py: 2, textAlign: 'center' }}>
          No jobs here{Object.values(filters).some(Boolean) ? ' that match' : ''}.
        </Typography>
      )}
      <MoveConfirmation
        asking={asking}
        onCancel={() => setAsking(null)}
        onMove={() => {
          if (asking) moveJob(asking.job.id, asking.to);
          setAsking(null);
        }}
      />
      {total > items.length && (
        <Button size="small" onClick={() => onShowAll(status)}>
          All {total} in the table
        </Button>
      )}
    </Paper>
  );
}

/**
 * Jobs by status, one column each, soonest visit first. A job moves by dragging its card to another column or with
 * its Move menu; technicians' phones receive the new status on their next sync.
 */
export function JobsBoard({ filters, counts, showClosed, personName, onShowAll }: Props) {
  const statuses = showClosed ? JOB_STATUSES : OPEN_JOB_STATUSES;
  return (
    // Six columns fit a 1440 px desk when narrower; on a smaller screen the board scrolls sideways inside itself, and
    // takes the keyboard's arrows once tabbed to.
    <Box
      role="region"
      aria-label="Jobs by status"
      tabIndex={0}
      sx={{
        display: 'grid',
        gridTemplateColumns: `repeat(${statuses.length}, minmax(${showClosed ? 164 : 220}px, 1fr))`,
        gap: showClosed ? 1 : 1.5,
        overflowX: 'auto',
        minWidth: 0,
        pb: 1,
        alignItems: 'start',
        '&:focus-visible': { outline: 2, outlineColor: 'primary.main', outlineOffset: 2 },
      }}
    >
      {statuses.map((s) => (
        <Column key={s} status={s} filters={filters} count={counts?.counts[s]} personName={personName} onShowAll={onShowAll} />
      ))}
    </Box>
  );
}
