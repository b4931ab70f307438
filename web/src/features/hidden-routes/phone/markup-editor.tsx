import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import {
  checkMarkedRoute,
  type ConcealedCableProtection,
  type DatumKind,
  type DatumMark,
  type MarkedAccessory,
  type MarkedRoute,
  type PhotoPoint,
  measuredAcross,
  photoMarkupProblems,
  routeTieWords,
  snapPoint,
  snapRoute,
  WALL_LIMITS,
} from '@wiretrail/core';
import { type FormEvent, useMemo, useRef, useState } from 'react';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { AidLine } from '@/components/verdicts/verdict-chip';
import type { CableRunRow, CircuitRow, PhotoMarkupRow, PhotoRow } from '@/lib/db';
import { parseReading, readingProblem, readingText } from '@/lib/readings';
import { createRecords, LocalWriteError, saveRecord } from '@/lib/sync/local-write';
import { MarkedPhotoFrame } from '@/components/photo-markup/marked-photo-frame';
import { MarkupOverlay, type OverlayPointer } from '@/components/photo-markup/markup-overlay';
import { RouteLegend } from '../components/route-legend';
import { DATUM_CHOICES, PROTECTION_CHOICES, photoSizeOf, shapeOf, tieChoices, tieOf, tieValue } from '../hidden-routes-words';
import { DrillingCheckPanel } from './drilling-check';

/** What the technician has drawn and typed, as the form holds it (figures as typed). */
export interface MarkupDraft {
  wallName: string;
  wallWidthMm: string;
  wallHeightMm: string;
  wallThicknessMm: string;
  routes: MarkedRoute[];
  datums: DatumMark[];
  accessories: MarkedAccessory[];
}

type Mode = 'route' | 'measure' | 'box' | 'drill';

interface Props {
  photo: PhotoRow;
  markup: PhotoMarkupRow | null;
  cables: CableRunRow[];
  circuits: CircuitRow[];
  /** The visit this is opened from: a new markup is made on it, and only its own markup is edited here. */
  visitId: string;
  /** The visit is finished: the markup is shown and the drilling check works, nothing is changed. */
  locked: boolean;
  src: string | null;
  missing: string;
}

const WALL_FIELDS = [
  { field: 'wallWidthMm', label: 'Wall width (mm)' },
  { field: 'wallHeightMm', label: 'Wall height (mm)' },
  { field: 'wallThicknessMm', label: 'Wall thickness (mm)' },
] as const;

function recordedDraft(markup: PhotoMarkupRow | null): MarkupDraft {
  return {
    wallName: markup?.wallName ?? '',
    wallWidthMm: readingText(markup?.wallWidthMm),
    wallHeightMm: readingText(markup?.wallHeightMm),
    wallThicknessMm: readingText(markup?.wallThicknessMm),
    routes: [...(markup?.routes ?? [])],
    datums: [...(markup?.datums ?? [])],
    accessories: [...(markup?.accessories ?? [])],
  };
}

const newId = () => crypto.randomUUID();
const figure = (text: string) => {
  const n = parseReading(text);
  return n === null || Number.isNaN(n) ? null : n;
};

/**
 * Routes drawn with a finger over a photo of an open wall: each stroke is a straight run snapped to horizontal or
 * vertical, a route is tied to a cable or a circuit with its depth, and distances from the corners, floor or ceiling
 * place it on the wall. Each route is checked against the safe zones as it is drawn. Kept as a draft until saved.
 */
export function MarkupEditor({ photo, markup, cables, circuits, visitId, locked, src, missing }: Props) {
  const own = !markup || markup.visitId === visitId;
  const editable = !locked && own;
  const key = editable ? `photo-markup:${photo.id}` : null;
  const recorded = useMemo(() => recordedDraft(markup), [markup]);
  const [draft, setDraft] = useState<MarkupDraft>(() => startingValues(key, recorded));
  const saved = useFormDraft(key, draft, recorded, setDraft);
  const [mode, setMode] = useState<Mode>(editable ? 'route' : 'drill');
  const [error, setError] = useState<string | null>(null);
  const [said, setSaid] = useState('');
  const { width, height } = photoSizeOf(photo);

  // The route being drawn: a ref as well as state, since a finger's moves come faster than renders.
  const drawingRef = useRef<PhotoPoint[]>([]);
  const [drawing, setDrawing] = useState<PhotoPoint[]>([]);
  const [preview, setPreview] = useState<PhotoPoint | null>(null);
  const [details, setDetails] = useState<{ id: string | null; tie: string; depth: string; protection: ConcealedCableProtection } | null>(null);

  const [datumKind, setDatumKind] = useState<DatumKind>('left-corner');
  const [datumLine, setDatumLine] = useState<PhotoPoint | null>(null);
  const [datumTo, setDatumTo] = useState<PhotoPoint | null>(null);
  const [datumMm, setDatumMm] = useState('');
  const [box, setBox] = useState<{ from: PhotoPoint; to: PhotoPoint } | null>(null);
  const [boxLabel, setBoxLabel] = useState('Socket box');
  const [drillPoint, setDrillPoint] = useState<PhotoPoint | null>(null);

  const change = (next: Partial<MarkupDraft>) => {
    setSaid('');
    setError(null);
    setDraft((d) => ({ ...d, ...next }));
  };

  const shape = shapeOf({
    routes: draft.routes,
    datums: draft.datums,
    accessories: draft.accessories,
    wallWidthMm: figure(draft.wallWidthMm),
    wallHeightMm: figure(draft.wallHeightMm),
    wallThicknessMm: figure(draft.wallThicknessMm),
  });
  const cableNames = new Map(cables.map((c) => [c.id, { label: c.label }]));
  const circuitById = new Map(circuits.map((c) => [c.id, c]));
  const labels = draft.routes.map((r) => routeTieWords(r, cableNames, circuitById));
  const checks = draft.routes.map((r) => checkMarkedRoute(shape, r, r.circuitId ? (circuitById.get(r.circuitId) ?? null) : null));
  const verdicts = Object.fromEntries(checks.map((c) => [c.routeId, c.verdict]));
  const ties = tieChoices(cables, circuits);

  const pointer: OverlayPointer | undefined =
    mode === 'route' && editable && !details
      ? {
          down: (p) => {
            if (!drawingRef.current.length) {
              drawingRef.current = [p];
              setDrawing([p]);
            }
            setPreview(snapPoint(drawingRef.current[drawingRef.current.length - 1]!, p));
          },
          move: (p) => setPreview(snapPoint(drawingRef.current[drawingRef.current.length - 1]!, p)),
          up: (p) => {
            drawingRef.current = snapRoute([...drawingRef.current, p]);
            setDrawing(drawingRef.current);
            setPreview(null);
          },
        }
      : mode === 'measure' && editable
        ? {
            up: (p) => {
              if (!datumLine || datumTo) {
                setDatumLine(p);
                setDatumTo(null);
              } else setDatumTo(p);
            },
          }
        : mode === 'box' && editable
          ? {
              down: (p) => setBox({ from: p, to: p }),
              move: (p) => setBox((b) => (b ? { ...b, to: p } : b)),
              up: (p) => setBox((b) => (b ? { ...b, to: p } : b)),
            }
          : mode === 'drill'
            ? { up: (p) => setDrillPoint(p) }
            : undefined;

  const clearDrawing = () => {
    drawingRef.current = [];
    setDrawing([]);
    setPreview(null);
  };

  const undoRun = () => {
    drawingRef.current = drawingRef.current.slice(0, -1);
    setDrawing(drawingRef.current);
  };

  function addRoute(e: FormEvent) {
    e.preventDefault();
    if (!details) return;
    const depth = parseReading(details.depth);
    if (!details.tie) return setError('Choose the cable or circuit this route is.');
    if (depth !== null && (Number.isNaN(depth) || depth < WALL_LIMITS.depthMm.min || depth > WALL_LIMITS.depthMm.max)) {
      return setError(`The depth must be a number of millimetres from ${WALL_LIMITS.depthMm.min} to ${WALL_LIMITS.depthMm.max}, like 25.`);
    }
    const tied = { ...tieOf(details.tie), depthMm: depth, protection: details.protection === 'none' && tieOf(details.tie).cableRunId ? null : details.protection };
    const existing = details.id ? draft.routes.find((r) => r.id === details.id) : null;
    const route: MarkedRoute = existing ? { ...existing, ...tied } : { id: newId(), points: drawing, ...tied };
    const problems = photoMarkupProblems({ routes: [route] });
    if (problems.length) return setError(problems.join(' '));
    change({ routes: existing ? draft.routes.map((r) => (r.id === route.id ? route : r)) : [...draft.routes, route] });
    setDetails(null);
    clearDrawing();
  }

  function addDatum() {
    if (!datumLine || !datumTo) return;
    const mm = parseReading(datumMm);
    if (mm === null || Number.isNaN(mm) || mm <= 0 || mm > 30_000) return setError('Type the distance measured, in millimetres, like 450.');
    const across = measuredAcross(datumKind);
    const datum: DatumMark = { id: newId(), datum: datumKind, lineAt: across ? datumLine.x : datumLine.y, to: datumTo, mm };
    change({ datums: [...draft.datums, datum] });
    setDatumLine(null);
    setDatumTo(null);
    setDatumMm('');
  }

  function addBox() {
    if (!box) return;
    const w = Math.abs(box.to.x - box.from.x);
    const h = Math.abs(box.to.y - box.from.y);
    if (w < 4 || h < 4) return setError('Drag across the accessory’s plate, corner to corner, to outline it.');
    const centre = { x: Math.round((box.from.x + box.to.x) / 2), y: Math.round((box.from.y + box.to.y) / 2) };
    change({ accessories: [...draft.accessories, { id: newId(), centre, widthPx: w, heightPx: h, label: boxLabel.trim() || null }] });
    setBox(null);
  }

  async function save() {
    setError(null);
    const typed = WALL_FIELDS.map(({ field, label }) => readingProblem('photoMarkup', field, draft[field], label, 'mm')).filter((p): p is string => !!p);
    const problems = [...typed, ...photoMarkupProblems(shape)];
    if (problems.length) return setError(problems.join(' '));
    const fields = {
      wallName: draft.wallName.trim() || null,
      wallWidthMm: figure(draft.wallWidthMm),
      wallHeightMm: figure(draft.wallHeightMm),
      wallThicknessMm: figure(draft.wallThicknessMm),
      routes: draft.routes,
      datums: draft.datums,
      accessories: draft.accessories,
    };
    try {
      if (markup) {
        // Only what changed is sent, so an edit on another device of another part merges with it.
        const was = recordedDraft(markup);
        const changed = Object.fromEntries(
          Object.entries(fields).filter(([k]) => JSON.stringify((was as unknown as Record<string, unknown>)[k]) !== JSON.stringify(draft[k as keyof MarkupDraft])),
        );
        if (Object.keys(changed).length) await saveRecord('photoMarkup', markup.id, changed);
      } else {
        // One markup per photo: it takes the photo's id, so two phones that each start one offline write the same
        // record, merged field by field (a clash goes to the office), and neither drawing is hidden behind the other.
        await createRecords([{ entity: 'photoMarkup', id: photo.id, fields: { photoId: photo.id, visitId, siteId: photo.siteId, areaId: photo.areaId ?? null, recordedAt: new Date().toISOString(), ...fields } }]);
      }
      saved.settle();
      setSaid('Routes saved on this phone; they reach the office with the next sync.');
    } catch (err) {
      setError(err instanceof LocalWriteError ? err.message : `The routes could not be saved (${(err as Error)?.message ?? 'unknown error'}).`);
    }
  }

  const hint =
    mode === 'route'
      ? drawing.length === 0
        ? 'Put a finger where the cable starts and drag along it: each stroke is a straight run, snapped level or plumb. Lift and drag again to turn a corner.'
        : `${drawing.length - 1} straight ${drawing.length === 2 ? 'run' : 'runs'} drawn. Drag on from the end, or finish the route.`
      : mode === 'measure'
        ? !datumLine
          ? DATUM_CHOICES.find((c) => c.value === datumKind)!.tapLine
          : !datumTo
            ? 'Now tap the point you measured to: the cable, or the edge of a box.'
            : 'Type the distance you measured.'
        : mode === 'box'
          ? 'Drag across a socket box or switch plate, corner to corner, to outline it: the zones run in line with it.'
          : 'Tap the photo where a drill or fixing would go, or type its distances below.';

  const pendingDatum = datumLine
    ? {
        from: measuredAcross(datumKind) ? { x: datumLine.x, y: datumTo?.y ?? datumLine.y } : { x: datumTo?.x ?? datumLine.x, y: datumLine.y },
        to: datumTo,
      }
    : null;

  return (
    <Stack spacing={2}>
      <MarkedPhotoFrame width={width} height={height} src={src} alt={photo.caption || 'Photo of the wall'} missing={missing}>
        <MarkupOverlay
          width={width}
          height={height}
          routes={draft.routes}
          datums={draft.datums}
          accessories={draft.accessories}
          verdicts={verdicts}
          drawing={preview ? [...drawing, preview] : drawing}
          pendingDatum={mode === 'measure' ? pendingDatum : null}
          pendingBox={mode === 'box' ? box : null}
          drill={mode === 'drill' && drillPoint ? { point: drillPoint, verdict: 'check' } : null}
          pointer={pointer}
          label={`Photo with ${draft.routes.length === 1 ? '1 route' : `${draft.routes.length} routes`} drawn`}
        />
      </MarkedPhotoFrame>
      <Stack spacing={2} sx={{ px: 2 }}>
        {editable && <DraftNotice draft={saved} />}
        {locked && <Alert severity="info">This visit is finished: the routes are kept as they were recorded. The office can still correct them. The drilling check still works.</Alert>}
        {!locked && !own && <Alert severity="info">These routes were drawn on another visit and are kept as recorded. The drilling check works on them.</Alert>}
        <ToggleButtonGroup
          value={mode}
          exclusive
          onChange={(_, m: Mode | null) => {
            if (!m) return;
            setMode(m);
            setError(null);
          }}
          aria-label="What a tap on the photo does"
          size="small"
          sx={{ flexWrap: 'wrap', '& .MuiToggleButton-root': { minHeight: 44, flex: '1 0 auto' } }}
        >
          {editable && <ToggleButton value="route">Draw route</ToggleButton>}
          {editable && <ToggleButton value="measure">Measure</ToggleButton>}
          {editable && <ToggleButton value="box">Outline box</ToggleButton>}
          <ToggleButton value="drill">Drilling check</ToggleButton>
        </ToggleButtonGroup>
        <Typography variant="body2" role="status" aria-live="polite">
          {hint}
        </Typography>

        {mode === 'route' && editable && !details && (
          <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap', '& .MuiButton-root': { minHeight: 44 } }}>
            <Button variant="contained" disabled={drawing.length < 2} onClick={() => setDetails({ id: null, tie: '', depth: '', protection: 'none' })}>
              Finish route
            </Button>
            <Button disabled={drawing.length < 2} onClick={undoRun}>
              Undo last run
            </Button>
            <Button disabled={drawing.length === 0} onClick={clearDrawing}>
              Start again
            </Button>
          </Stack>
        )}
        {details && (
          <Box component="form" onSubmit={addRoute} noValidate aria-label="What this route is">
            <Stack spacing={2}>
              <TextField select label="Cable or circuit" value={details.tie} onChange={(e) => setDetails({ ...details, tie: e.target.value })} required>
                {ties.length === 0 && (
                  <MenuItem value="" disabled>
                    No cable or circuit is recorded on this site yet
                  </MenuItem>
                )}
                {ties.map((t) => (
                  <MenuItem key={t.value} value={t.value}>
                    {t.label}
                  </MenuItem>
                ))}
              </TextField>
              <TextField
                label="Depth below the surface (mm)"
                value={details.depth}
                onChange={(e) => setDetails({ ...details, depth: e.target.value })}
                slotProps={{ htmlInput: { inputMode: 'decimal' } }}
                helperText="The zones bind a cable less than 50 mm deep (BS 7671 Reg 522.6.202)."
              />
              <TextField select label="Protection" value={details.protection} onChange={(e) => setDetails({ ...details, protection: e.target.value as ConcealedCableProtection })}>
                {PROTECTION_CHOICES.map((p) => (
                  <MenuItem key={p.value} value={p.value}>
                    {p.label}
                  </MenuItem>
                ))}
              </TextField>
              <Stack direction="row" sx={{ gap: 1, '& .MuiButton-root': { minHeight: 44 } }}>
                <Button type="submit" variant="contained">
                  {details.id ? 'Keep these details' : 'Add route'}
                </Button>
                <Button onClick={() => setDetails(null)}>Back to drawing</Button>
              </Stack>
            </Stack>
          </Box>
        )}

        {mode === 'measure' && editable && (
          <Stack spacing={2}>
            <TextField
              select
              label="Measured from"
              value={datumKind}
              onChange={(e) => {
                setDatumKind(e.target.value as DatumKind);
                setDatumLine(null);
                setDatumTo(null);
              }}
            >
              {DATUM_CHOICES.map((c) => (
                <MenuItem key={c.value} value={c.value}>
                  {c.label}
                </MenuItem>
              ))}
            </TextField>
            <Stack direction="row" sx={{ gap: 1, alignItems: 'flex-start' }}>
              <TextField label="Distance (mm)" value={datumMm} onChange={(e) => setDatumMm(e.target.value)} disabled={!datumTo} slotProps={{ htmlInput: { inputMode: 'decimal' } }} sx={{ flex: 1 }} />
              <Button variant="contained" onClick={addDatum} disabled={!datumTo} sx={{ minHeight: 56 }}>
                Add distance
              </Button>
            </Stack>
          </Stack>
        )}
        {mode === 'box' && editable && (
          <Stack direction="row" sx={{ gap: 1, alignItems: 'flex-start' }}>
            <TextField label="What it is" value={boxLabel} onChange={(e) => setBoxLabel(e.target.value)} slotProps={{ htmlInput: { maxLength: 60 } }} sx={{ flex: 1 }} />
            <Button variant="contained" onClick={addBox} disabled={!box} sx={{ minHeight: 56 }}>
              Add box
            </Button>
          </Stack>
        )}
        {mode === 'drill' && <DrillingCheckPanel shape={shape} tapped={drillPoint} />}

        {error && (
          <Alert severity="error" role="alert">
            {error}
          </Alert>
        )}

        <RouteLegend
          routes={draft.routes}
          labels={labels}
          checks={checks}
          actions={
            editable
              ? (r) => (
                  <Stack sx={{ '& .MuiButton-root': { minHeight: 44 } }}>
                    <Button size="small" onClick={() => setDetails({ id: r.id, tie: tieValue(r), depth: readingText(r.depthMm), protection: r.protection ?? 'none' })} aria-label={`Change route ${draft.routes.indexOf(r) + 1}`}>
                      Change
                    </Button>
                    <Button size="small" color="error" onClick={() => change({ routes: draft.routes.filter((x) => x.id !== r.id) })} aria-label={`Remove route ${draft.routes.indexOf(r) + 1}`}>
                      Remove
                    </Button>
                  </Stack>
                )
              : undefined
          }
        />
        {draft.routes.length > 0 && <AidLine />}
        {draft.datums.length > 0 && (
          <Stack component="ul" spacing={0.5} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Distances measured">
            {draft.datums.map((d) => (
              <Stack component="li" key={d.id} direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
                <Typography variant="body2">
                  {d.mm} mm from the {DATUM_CHOICES.find((c) => c.value === d.datum)?.label.toLowerCase()}
                </Typography>
                {editable && (
                  <Button size="small" color="error" onClick={() => change({ datums: draft.datums.filter((x) => x.id !== d.id) })} sx={{ minHeight: 44 }}>
                    Remove
                  </Button>
                )}
              </Stack>
            ))}
          </Stack>
        )}

        <TextField label="Which wall" value={draft.wallName} onChange={(e) => change({ wallName: e.target.value })} disabled={!editable} placeholder="Wall behind the worktop" slotProps={{ htmlInput: { maxLength: 100 } }} />
        <Stack direction="row" sx={{ gap: 1 }}>
          {WALL_FIELDS.map(({ field, label }) => (
            <TextField
              key={field}
              label={label}
              value={draft[field]}
              onChange={(e) => change({ [field]: e.target.value })}
              disabled={!editable}
              error={!!readingProblem('photoMarkup', field, draft[field], label, 'mm')}
              helperText={readingProblem('photoMarkup', field, draft[field], label, 'mm') ?? undefined}
              slotProps={{ htmlInput: { inputMode: 'decimal' } }}
              sx={{ flex: 1 }}
            />
          ))}
        </Stack>
        <Typography variant="body2" color="text.secondary" role="status">
          {said}
        </Typography>
        {editable && (
          <Button variant="contained" size="large" onClick={save} sx={{ minHeight: 48 }}>
            Save routes
          </Button>
        )}
      </Stack>
    </Stack>
  );
}
