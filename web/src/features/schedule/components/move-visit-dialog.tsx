import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useEffect, useState } from 'react';
import { TimeInput } from '@/components/forms/date-inputs';
import type { Person } from '@/lib/directory';
import type { Job, Visit } from '../api/schedule-data';
import { clashesOf, timeOf, UNASSIGNED, type VisitPlace, visitMovedTo } from './week';

/** A visit dropped on another technician's row or another day, waiting for the office to say yes. */
export interface PendingMove {
  visit: Visit;
  fromRow: string;
  toRow: string;
  day: string;
}

const dayWords = new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', timeZone: 'UTC' });

interface Props {
  move: PendingMove | null;
  /** The week's visits, which hold every visit of the day it is moved to. */
  visits: Visit[];
  jobs: Job[];
  technicians: Person[];
  pending: boolean;
  onCancel: () => void;
  onConfirm: (changes: VisitPlace) => void;
}

/**
 * Asks before a dragged visit is moved, with its times to change and the same warnings as booking: a technician
 * already out elsewhere then, or a time already gone.
 */
export function MoveVisitDialog({ move, visits, jobs, technicians, pending, onCancel, onConfirm }: Props) {
  const [start, setStart] = useState('');
  const [end, setEnd] = useState('');
  useEffect(() => {
    setStart(timeOf(move?.visit.plannedStart ?? null) || '09:00');
    setEnd(timeOf(move?.visit.plannedEnd ?? null) || timeOf(move?.visit.plannedStart ?? null) || '12:00');
  }, [move]);
  if (!move) return null;
  const timesValid = /^\d{2}:\d{2}$/.test(start) && /^\d{2}:\d{2}$/.test(end) && end > start;
  const to = visitMovedTo(move.visit, { ...move, start: timesValid ? start : undefined, end: timesValid ? end : undefined });
  const clashes = timesValid ? clashesOf(visits, { id: move.visit.id, technicianIds: to.technicianIds, start: to.plannedStart, end: to.plannedEnd }) : [];
  const inThePast = timesValid && to.plannedStart !== move.visit.plannedStart && Date.parse(to.plannedStart) < Date.now();
  const nameOf = (id: string) => (id === UNASSIGNED ? 'Unassigned' : (technicians.find((t) => t.id === id)?.name ?? 'A technician'));
  const jobWords = (jobId: string) => {
    const j = jobs.find((x) => x.id === jobId);
    return j ? [j.reference, j.title].filter(Boolean).join(' ') : 'another job';
  };
  const warned = clashes.length > 0 || inThePast;
  const who = move.fromRow === move.toRow ? nameOf(move.toRow) : `${nameOf(move.fromRow)} to ${nameOf(move.toRow)}`;
  return (
    <Dialog open onClose={onCancel} maxWidth="xs" fullWidth aria-labelledby="move-visit-title">
      <DialogTitle id="move-visit-title">Move this visit?</DialogTitle>
      <DialogContent>
        <Stack spacing={2}>
          <DialogContentText>
            {jobWords(move.visit.jobId)}: from {who}, on {dayWords.format(new Date(to.plannedStart))}.
            {to.technicianIds.length === 0 ? ' Nobody will be on it.' : ''}
          </DialogContentText>
          {clashes.map((c) => (
            <Alert key={`${c.technicianId}-${c.visit.id}`} severity="warning">
              {nameOf(c.technicianId)} is already booked {timeOf(c.visit.plannedStart)}–{timeOf(c.visit.plannedEnd)} that day on {jobWords(c.visit.jobId)}.
            </Alert>
          ))}
          {inThePast && <Alert severity="warning">That time has already passed: check the day before moving it there.</Alert>}
          <Stack direction="row" spacing={2} sx={{ pt: 1 }}>
            <TimeInput label="Start" value={start} onChange={setStart} error={!/^\d{2}:\d{2}$/.test(start)} />
            <TimeInput label="Finish" value={end} onChange={setEnd} error={!timesValid} helperText={timesValid ? undefined : 'The finish time must be after the start time.'} />
          </Stack>
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={onCancel}>Leave it where it was</Button>
        <Button variant="contained" color={warned ? 'warning' : 'primary'} disabled={!timesValid || pending} onClick={() => onConfirm(to)}>
          {warned ? 'Move anyway' : 'Move visit'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
