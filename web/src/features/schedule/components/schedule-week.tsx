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
import Snackbar from '@mui/material/Snackbar';
import {
  type Announcements,
  type CollisionDetection,
  DndContext,
  type DragEndEvent,
  DragOverlay,
  type KeyboardCoordinateGetter,
  KeyboardSensor,
  PointerSensor,
  pointerWithin,
  rectIntersection,
  useDraggable,
  useDroppable,
  useSensor,
  useSensors,
} from '@dnd-kit/core';
import { type ReactNode, useMemo, useRef, useState } from 'react';
import { useDirectory } from '@/lib/directory';
import { type Job, type Visit, useJobs, useSaveVisit, useWeekVisits } from '../api/schedule-data';
import { MoveVisitDialog, type PendingMove } from './move-visit-dialog';
import { VisitDialog } from './visit-dialog';
import { addDays, bookingDay, dayKey, timeOf, UNASSIGNED, type VisitPlace, weekStart } from './week';

const dayLabel = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' });
const longDay = new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', timeZone: 'UTC' });

// A visit is picked up with M, not Space or Enter, which open it as they always have.
const KEYS = { start: ['KeyM'], cancel: ['Escape'], end: ['Enter', 'Space'] };
const INSTRUCTIONS =
  'To move this visit with the keyboard, press M, choose the technician and day with the arrow keys, then press Enter to put it there or Escape to leave it. Enter alone opens it to change.';

const cellId = (row: string, day: string) => `${row}|${day}`;
type CellData = { row: string; day: string; rowName: string };
type CardData = { visit: Visit; fromRow: string; words: string };

/** Pointer first; the keyboard's dragged card lands on the cell it covers most. */
const collision: CollisionDetection = (args) => {
  const under = pointerWithin(args);
  return under.length ? under : rectIntersection(args);
};

function VisitCard({ visit, row, day, job, onOpen }: { visit: Visit; row: string; day: string; job: Job | undefined; onOpen: () => void }) {
  const words = `${timeOf(visit.plannedStart)}–${timeOf(visit.plannedEnd)} ${job?.reference ?? ''} ${job?.title ?? 'Job'}`.replace(/\s+/g, ' ');
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({
    id: `${row}|${visit.id}|${day}`,
    data: { visit, fromRow: row, words } satisfies CardData,
  });
  return (
    <ButtonBase ref={setNodeRef} {...attributes} {...listeners} aria-roledescription="movable visit" onClick={onOpen} sx={{ display: 'block', borderRadius: 1.5, opacity: isDragging ? 0.4 : 1, touchAction: 'none' }} component="div">
      <CardFace visit={visit} job={job} />
    </ButtonBase>
  );
}

function CardFace({ visit, job }: { visit: Visit; job: Job | undefined }) {
  const cancelled = visit.status === 'cancelled';
  return (
    <Box
      sx={{ display: 'block', width: '100%', textAlign: 'left', p: 1, borderRadius: 1.5, bgcolor: cancelled ? 'action.hover' : 'primary.main', color: cancelled ? 'text.secondary' : 'primary.contrastText', textDecoration: cancelled ? 'line-through' : 'none' }}
    >
      <Typography variant="caption" component="div" sx={{ fontWeight: 700 }}>
        {timeOf(visit.plannedStart)}–{timeOf(visit.plannedEnd)}
        {cancelled ? ' · cancelled' : visit.status && visit.status !== 'planned' ? ` · ${visit.status}` : ''}
      </Typography>
      <Typography variant="body2" component="div" sx={{ lineHeight: 1.25 }}>
        {job?.reference ? `${job.reference} ` : ''}
        {job?.title ?? 'Job'}
      </Typography>
    </Box>
  );
}

function DayCell({ row, day, rowName, children }: { row: string; day: string; rowName: string; children: ReactNode }) {
  const { setNodeRef, isOver } = useDroppable({ id: cellId(row, day), data: { row, day, rowName } satisfies CellData });
  return (
    <Box
      ref={setNodeRef}
      role="gridcell"
      sx={{ p: 0.75, minHeight: 84, borderBottom: 1, borderLeft: 1, borderColor: 'divider', display: 'grid', gap: 0.75, alignContent: 'start', bgcolor: isOver ? 'action.hover' : undefined, outline: isOver ? 2 : 0, outlineColor: 'primary.main', outlineOffset: -2 }}
    >
      {children}
    </Box>
  );
}

/** The week's visits per technician: one row each, a column per day. */
export function ScheduleWeek() {
  const [monday, setMonday] = useState(() => weekStart(new Date()));
  const days = useMemo(() => Array.from({ length: 7 }, (_, i) => addDays(monday, i)), [monday]);
  const visits = useWeekVisits(monday.toISOString(), addDays(monday, 7).toISOString());
  const jobs = useJobs();
  const people = useDirectory();
  const [editing, setEditing] = useState<{ visit: Visit | null; date: string } | null>(null);
  const [moving, setMoving] = useState<PendingMove | null>(null);
  const [dragged, setDragged] = useState<CardData | null>(null);
  const [moved, setMoved] = useState<{ id: string; before: VisitPlace; words: string } | null>(null);
  const save = useSaveVisit();
  // The Enter or Space that puts a carried visit down reaches the card as a press too: it must not open it.
  // React hears that key before the drag does, so a visit being carried is never opened either.
  const putDownAt = useRef(0);
  const carrying = useRef(false);
  const open = (visit: Visit, date: string) => {
    if (!carrying.current && performance.now() - putDownAt.current > 500) setEditing({ visit, date });
  };
  // The grid's rows and days in order, for the arrow keys to step through while a visit is carried.
  const layout = useRef<{ rows: string[]; days: string[] }>({ rows: [], days: [] });
  const keyboardCells: KeyboardCoordinateGetter = (event, { context }) => {
    const { rows, days: dayKeys } = layout.current;
    const from = context.over ? String(context.over.id) : null;
    const start = (context.active?.data.current as CardData | undefined) ?? null;
    const [row, day] = from ? from.split('|') : [start?.fromRow, start ? dayKey(start.visit.plannedStart!) : undefined];
    let r = rows.indexOf(row ?? '');
    let d = dayKeys.indexOf(day ?? '');
    if (r < 0 || d < 0) return undefined;
    if (event.code === 'ArrowRight') d = Math.min(d + 1, dayKeys.length - 1);
    else if (event.code === 'ArrowLeft') d = Math.max(d - 1, 0);
    else if (event.code === 'ArrowDown') r = Math.min(r + 1, rows.length - 1);
    else if (event.code === 'ArrowUp') r = Math.max(r - 1, 0);
    else return undefined;
    event.preventDefault();
    const rect = context.droppableRects.get(cellId(rows[r]!, dayKeys[d]!));
    return rect ? { x: rect.left + 6, y: rect.top + 6 } : undefined;
  };
  const sensors = useSensors(useSensor(PointerSensor, { activationConstraint: { distance: 6 } }), useSensor(KeyboardSensor, { keyboardCodes: KEYS, coordinateGetter: keyboardCells }));

  if (visits.isPending || jobs.isPending || people.isPending) return <LinearProgress aria-label="Loading the schedule" />;
  const error = visits.error ?? jobs.error ?? people.error;
  if (error) return <Alert severity="error">{error.message}</Alert>;

  const technicians = people.data!.filter((p) => p.role === 'technician' && p.active);
  const jobById = new Map(jobs.data!.items.map((j) => [j.id, j]));
  const rows = [...technicians.map((t) => ({ id: t.id, name: t.name })), { id: UNASSIGNED, name: 'Unassigned' }];
  layout.current = { rows: rows.map((r) => r.id), days: days.map((d) => dayKey(d)) };
  const cellWords = (id: string | number | undefined) => {
    const [row, day] = String(id ?? '').split('|');
    return row && day ? `${rows.find((r) => r.id === row)?.name ?? 'Unassigned'}, ${longDay.format(new Date(`${day}T00:00:00Z`))}` : 'nowhere';
  };
  const announcements: Announcements = {
    onDragStart: ({ active }) => `Carrying the visit ${(active.data.current as CardData).words}. Arrow keys choose the technician and day.`,
    onDragOver: ({ active, over }) => `The visit ${(active.data.current as CardData).words} is over ${cellWords(over?.id)}.`,
    onDragEnd: ({ over }) => (over ? `Dropped on ${cellWords(over.id)}: confirm the move.` : 'Put back where it was.'),
    onDragCancel: () => 'Put back where it was.',
  };
  const onDragEnd = ({ active, over }: DragEndEvent) => {
    setDragged(null);
    carrying.current = false;
    putDownAt.current = performance.now();
    if (!over) return;
    const card = active.data.current as CardData;
    const target = over.data.current as CellData;
    // A cancelled visit is restored, not moved: it opens to do that.
    if (card.visit.status === 'cancelled') return;
    if (target.row === card.fromRow && target.day === dayKey(card.visit.plannedStart!)) return;
    setMoving({ visit: card.visit, fromRow: card.fromRow, toRow: target.row, day: target.day });
  };
  const confirmMove = (changes: VisitPlace) => {
    const visit = moving!.visit;
    const before = { technicianIds: visit.technicianIds ?? [], plannedStart: visit.plannedStart!, plannedEnd: visit.plannedEnd ?? visit.plannedStart! };
    const job = jobById.get(visit.jobId);
    save.mutate(
      { id: visit.id, changes },
      {
        onSuccess: () => {
          setMoving(null);
          setMoved({ id: visit.id, before, words: `${job?.reference ?? 'The visit'} moved to ${longDay.format(new Date(changes.plannedStart))}, ${timeOf(changes.plannedStart)}.` });
        },
      },
    );
  };
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
      {save.isError && !moving && (
        <Alert severity="error" sx={{ mb: 2 }}>
          The visit was not moved: {save.error.message}
        </Alert>
      )}
      <DndContext
        sensors={sensors}
        collisionDetection={collision}
        accessibility={{ announcements, screenReaderInstructions: { draggable: INSTRUCTIONS } }}
        onDragStart={({ active }) => {
          carrying.current = true;
          setDragged(active.data.current as CardData);
        }}
        onDragCancel={() => {
          carrying.current = false;
          setDragged(null);
          putDownAt.current = performance.now();
        }}
        onDragEnd={onDragEnd}
      >
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
                  <DayCell key={d.toISOString()} row={r.id} day={dayKey(d)} rowName={r.name}>
                    {cell(r.id, d).map((v) => (
                      <VisitCard key={v.id} visit={v} row={r.id} day={dayKey(d)} job={jobById.get(v.jobId)} onOpen={() => open(v, dayKey(d))} />
                    ))}
                  </DayCell>
                ))}
              </Box>
            ))}
          </Box>
        </Paper>
        <DragOverlay dropAnimation={null}>{dragged ? <CardFace visit={dragged.visit} job={jobById.get(dragged.visit.jobId)} /> : null}</DragOverlay>
      </DndContext>
      <MoveVisitDialog
        move={moving}
        visits={visits.data!.items}
        jobs={jobs.data!.items}
        technicians={technicians}
        pending={save.isPending}
        onCancel={() => {
          save.reset();
          setMoving(null);
        }}
        onConfirm={confirmMove}
      />
      <Snackbar
        open={!!moved}
        autoHideDuration={15_000}
        onClose={(_, reason) => reason !== 'clickaway' && setMoved(null)}
        message={moved?.words}
        action={
          <Button
            color="inherit"
            onClick={() => {
              const undo = moved!;
              setMoved(null);
              save.mutate({ id: undo.id, changes: undo.before });
            }}
          >
            Undo
          </Button>
        }
      />
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
