import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { DateInput, TimeInput } from '@/components/forms/date-inputs';
import type { Person } from '@/lib/directory';
import { type Job, type Visit, useSaveVisit, weekVisitsQueryOptions } from '../api/schedule-data';
import { addDays, clashesOf, dayKey, timeOf, toInstant } from './week';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';

const schema = z
  .object({
    jobId: z.string().min(1, 'Choose the job this visit is for.'),
    date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Enter the date of the visit.'),
    start: z.string().regex(/^\d{2}:\d{2}$/, 'Enter a start time.'),
    end: z.string().regex(/^\d{2}:\d{2}$/, 'Enter a finish time.'),
    technicianIds: z.array(z.string()),
  })
  .refine((v) => v.end > v.start, { path: ['end'], message: 'The finish time must be after the start time.' });

type Values = z.infer<typeof schema>;

interface Props {
  open: boolean;
  onClose: () => void;
  visit: Visit | null;
  defaultDate: string;
  jobs: Job[];
  technicians: Person[];
}

/** Books a visit, or changes or cancels one; the assigned technicians' phones receive it on their next sync. */
export function VisitDialog({ open, onClose, visit, defaultDate, jobs, technicians }: Props) {
  const save = useSaveVisit();
  const [cancelling, setCancelling] = useState(false);
  const { control, handleSubmit, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    values: {
      jobId: visit?.jobId ?? '',
      date: visit?.plannedStart ? dayKey(visit.plannedStart) : defaultDate,
      start: timeOf(visit?.plannedStart ?? null) || '09:00',
      end: timeOf(visit?.plannedEnd ?? null) || '12:00',
      technicianIds: visit?.technicianIds ?? [],
    },
  });
  // What the office should know before booking: a technician already out elsewhere then, or a time already gone.
  const [date, start, end, technicianIds] = useWatch({ control, name: ['date', 'start', 'end', 'technicianIds'] });
  const dayValid = /^\d{4}-\d{2}-\d{2}$/.test(date ?? '') && /^\d{2}:\d{2}$/.test(start ?? '') && /^\d{2}:\d{2}$/.test(end ?? '');
  const dayStart = dayValid ? toInstant(date, '00:00') : '';
  const sameDay = useQuery({ ...weekVisitsQueryOptions(dayStart, dayValid ? addDays(new Date(dayStart), 1).toISOString() : ''), enabled: open && dayValid });
  const clashes = dayValid ? clashesOf(sameDay.data?.items ?? [], { id: visit?.id, technicianIds: technicianIds ?? [], start: toInstant(date, start), end: toInstant(date, end) }) : [];
  const moved = !visit || toInstant(date, start) !== visit.plannedStart;
  const inThePast = dayValid && moved && Date.parse(toInstant(date, start)) < Date.now();
  const nameOf = (id: string) => technicians.find((t) => t.id === id)?.name ?? 'A technician';
  const jobWords = (jobId: string) => {
    const j = jobs.find((x) => x.id === jobId);
    return j ? [j.reference, j.title].filter(Boolean).join(' ') : 'another job';
  };
  const warned = clashes.length > 0 || inThePast;

  const submit = handleSubmit((v) => {
    const job = jobs.find((j) => j.id === v.jobId);
    save.mutate(
      {
        id: visit?.id,
        jobId: v.jobId,
        siteId: job?.siteId,
        changes: { plannedStart: toInstant(v.date, v.start), plannedEnd: toInstant(v.date, v.end), technicianIds: v.technicianIds },
      },
      { onSuccess: onClose },
    );
  });
  const bookable = jobs.filter((j) => j.status !== 'done' && j.status !== 'cancelled');
  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="visit-dialog-title">
      <DialogTitle id="visit-dialog-title">{visit ? 'Change visit' : 'Book a visit'}</DialogTitle>
      <DialogContent>
        <Stack component="form" id="visit-form" noValidate spacing={2.5} sx={{ pt: 1 }} onSubmit={submit}>
          {save.isError && <Alert severity="error">{save.error.message}</Alert>}
          {clashes.map((c) => (
            <Alert key={`${c.technicianId}-${c.visit.id}`} severity="warning">
              {nameOf(c.technicianId)} is already booked {timeOf(c.visit.plannedStart)}–{timeOf(c.visit.plannedEnd)} that day on {jobWords(c.visit.jobId)}.
            </Alert>
          ))}
          {inThePast && <Alert severity="warning">That time has already passed: check the date before booking it.</Alert>}
          <Controller
            control={control}
            name="jobId"
            render={({ field }) => (
              <TextField select label="Job" disabled={!!visit} {...field} error={!!formState.errors.jobId} helperText={formState.errors.jobId?.message}>
                {(visit ? jobs : bookable).map((j) => (
                  <MenuItem key={j.id} value={j.id}>
                    {j.reference ? `${j.reference} · ` : ''}
                    {j.title}
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
          <Stack direction="row" spacing={2}>
            <Controller control={control} name="date" render={({ field }) => <DateInput label="Date" {...field} error={!!formState.errors.date} helperText={formState.errors.date?.message} />} />
            <Controller control={control} name="start" render={({ field }) => <TimeInput label="Start" {...field} error={!!formState.errors.start} helperText={formState.errors.start?.message} />} />
            <Controller control={control} name="end" render={({ field }) => <TimeInput label="Finish" {...field} error={!!formState.errors.end} helperText={formState.errors.end?.message} />} />
          </Stack>
          <Controller
            control={control}
            name="technicianIds"
            render={({ field }) => (
              <div>
                <FormLabel component="legend">Technicians</FormLabel>
                <FormGroup row>
                  {technicians.map((t) => (
                    <FormControlLabel
                      key={t.id}
                      label={t.name}
                      control={
                        <Checkbox
                          checked={field.value.includes(t.id)}
                          onChange={(e) => field.onChange(e.target.checked ? [...field.value, t.id] : field.value.filter((id) => id !== t.id))}
                        />
                      }
                    />
                  ))}
                </FormGroup>
                {field.value.length === 0 && <FormHelperText>Nobody assigned yet: the visit shows under Unassigned.</FormHelperText>}
              </div>
            )}
          />
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, justifyContent: 'space-between' }}>
        {visit && visit.status !== 'cancelled' ? (
          <Button color="error" disabled={save.isPending} onClick={() => setCancelling(true)}>
            Cancel this visit
          </Button>
        ) : visit ? (
          // A cancelled visit can be put back as it was planned; its phones receive it again.
          <Button disabled={save.isPending} onClick={() => save.mutate({ id: visit.id, changes: { status: 'planned' } }, { onSuccess: onClose })}>
            Restore this visit
          </Button>
        ) : (
          <span />
        )}
        <Stack direction="row" spacing={1}>
          {visit && (
            <Button component={RouterLink} to={paths.visitRecord.href(visit.jobId, visit.id)}>
              Open the visit’s record
            </Button>
          )}
          <Button onClick={onClose}>Close</Button>
          <Button type="submit" form="visit-form" variant="contained" disabled={save.isPending}>
            {visit ? (warned ? 'Save anyway' : 'Save changes') : warned ? 'Book anyway' : 'Book visit'}
          </Button>
        </Stack>
      </DialogActions>
      {visit && (
        <Dialog open={cancelling} onClose={() => setCancelling(false)} aria-labelledby="cancel-visit-title">
          <DialogTitle id="cancel-visit-title">Cancel this visit?</DialogTitle>
          <DialogContent>
            The technicians’ phones drop it at their next sync. It stays on the schedule, struck through, and can be restored.
          </DialogContent>
          <DialogActions>
            <Button onClick={() => setCancelling(false)}>Keep the visit</Button>
            <Button
              color="error"
              variant="contained"
              disabled={save.isPending}
              onClick={() => save.mutate({ id: visit.id, changes: { status: 'cancelled' } }, { onSuccess: () => (setCancelling(false), onClose()) })}
            >
              Cancel the visit
            </Button>
          </DialogActions>
        </Dialog>
      )}
    </Dialog>
  );
}
