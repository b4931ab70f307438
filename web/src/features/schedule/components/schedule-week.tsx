import ChevronLeft from '@mui/icons-material/ChevronLeft';
import ChevronRight from '@mui/icons-material/ChevronRight';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import ButtonBase from '@mui/material/ButtonBase';
import IconButton from '@mui/material/IconButton';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useMemo, useState } from 'react';
import { useDirectory } from '@/lib/directory';
import { type Visit, useJobs, useWeekVisits } from '../api/schedule-data';
import { VisitDialog } from './visit-dialog';
import { addDays, bookingDay, dayKey, timeOf, weekStart } from './week';

const dayLabel = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' });
const UNASSIGNED = 'unassigned';

/** The week's visits per technician: one row each, a column per day. */
export function ScheduleWeek() {
  const [monday, setMonday] = useState(() => weekStart(new Date()));
  const days = useMemo(() => Array.from({ length: 7 }, (_, i) => addDays(monday, i)), [monday]);
  const visits = useWeekVisits(monday.toISOString(), addDays(monday, 7).toISOString());
  const jobs = useJobs();
  const people = useDirectory();
  const [editing, setEditing] = useState<{ visit: Visit | null; date: string } | null>(null);

  if (visits.isPending || jobs.isPending || people.isPending) return <LinearProgress aria-label="Loading the schedule" />;
  const error = visits.error ?? jobs.error ?? people.error;
  if (error) return <Alert severity="error">{error.message}</Alert>;

  const technicians = people.data!.filter((p) => p.role === 'technician' && p.active);
  const jobById = new Map(jobs.data!.items.map((j) => [j.id, j]));
  const rows = [...technicians.map((t) => ({ id: t.id, name: t.name })), { id: UNASSIGNED, name: 'Unassigned' }];
  const cell = (rowId: string, day: Date) =>
    visits.data!.items.filter(
      (v) => v.plannedStart && dayKey(v.plannedStart) === dayKey(day) && (rowId === UNASSIGNED ? !v.technicianIds?.length : v.technicianIds?.includes(rowId)),
    );

  return (
    <>
      <Stack direction="row" sx={{ alignItems: 'center', gap: 1, mb: 2, flexWrap: 'wrap' }}>
        <IconButton aria-label="Previous week" onClick={() => setMonday(addDays(monday, -7))}>
          <ChevronLeft />
        </IconButton>
        <Typography variant="h3" sx={{ minWidth: { sm: 260 }, textAlign: 'center' }} aria-live="polite">
          Week of {dayLabel.format(monday)}
        </Typography>
        <IconButton aria-label="Next week" onClick={() => setMonday(addDays(monday, 7))}>
          <ChevronRight />
        </IconButton>
        <Button onClick={() => setMonday(weekStart(new Date()))}>This week</Button>
        <Box sx={{ flex: 1 }} />
        <Button variant="contained" onClick={() => setEditing({ visit: null, date: bookingDay(monday) })}>
          Book a visit
        </Button>
      </Stack>
      <Paper variant="outlined" sx={{ overflowX: 'auto' }}>
        <Box role="grid" aria-label="Visits this week" sx={{ display: 'grid', gridTemplateColumns: '160px repeat(7, minmax(140px, 1fr))', minWidth: 1140 }}>
          <Box role="row" sx={{ display: 'contents' }}>
            <Box role="columnheader" sx={{ p: 1.5, borderBottom: 1, borderColor: 'divider' }} />
            {days.map((d) => (
              <Box role="columnheader" key={d.toISOString()} sx={{ p: 1.5, fontWeight: 500, borderBottom: 1, borderLeft: 1, borderColor: 'divider', bgcolor: dayKey(d) === dayKey(new Date()) ? 'action.selected' : undefined }}>
                {dayLabel.format(d)}
              </Box>
            ))}
          </Box>
          {rows.map((r) => (
            <Box role="row" aria-label={r.name} key={r.id} sx={{ display: 'contents' }}>
              <Box role="rowheader" sx={{ p: 1.5, fontWeight: 500, borderBottom: 1, borderColor: 'divider' }}>
                {r.name}
              </Box>
              {days.map((d) => (
                <Box role="gridcell" key={d.toISOString()} sx={{ p: 0.75, minHeight: 84, borderBottom: 1, borderLeft: 1, borderColor: 'divider', display: 'grid', gap: 0.75, alignContent: 'start' }}>
                  {cell(r.id, d).map((v) => {
                    const job = jobById.get(v.jobId);
                    const cancelled = v.status === 'cancelled';
                    return (
                      <ButtonBase
                        key={v.id}
                        onClick={() => setEditing({ visit: v, date: dayKey(d) })}
                        sx={{ display: 'block', textAlign: 'left', p: 1, borderRadius: 1.5, bgcolor: cancelled ? 'action.hover' : 'primary.main', color: cancelled ? 'text.secondary' : 'primary.contrastText', textDecoration: cancelled ? 'line-through' : 'none' }}
                      >
                        <Typography variant="caption" component="div" sx={{ fontWeight: 700 }}>
                          {timeOf(v.plannedStart)}–{timeOf(v.plannedEnd)}
                          {cancelled ? ' · cancelled' : v.status && v.status !== 'planned' ? ` · ${v.status}` : ''}
                        </Typography>
                        <Typography variant="body2" component="div" sx={{ lineHeight: 1.25 }}>
                          {job?.reference ? `${job.reference} ` : ''}
                          {job?.title ?? 'Job'}
                        </Typography>
                      </ButtonBase>
                    );
                  })}
                </Box>
              ))}
            </Box>
          ))}
        </Box>
      </Paper>
      <VisitDialog
        open={!!editing}
        onClose={() => setEditing(null)}
        visit={editing?.visit ?? null}
        defaultDate={editing?.date ?? bookingDay(monday)}
        jobs={jobs.data!.items}
        technicians={technicians}
      />
    </>
  );
}
