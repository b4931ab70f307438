import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { checkSafeZone, DEFAULT_RULE_SET, InvalidInputError, type SafeZoneCheck, type WallPoint } from '@wiretrail/core';
import { type MouseEvent, useEffect, useMemo, useRef, useState } from 'react';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';
import { parseReading } from '@/lib/readings';
import { WALL_FIGURE_LABELS, type WallFigure, wallFigureProblem, type WallSoFar } from './wall-figures';

/** What the point change stores in `concealedRoute`: the safe-zone check's own input. */
export interface ConcealedRoute {
  /** No thickness in routes drawn before it was asked for: judged as unknown. */
  wall: { widthMm: number; heightMm: number; thicknessMm?: number | null; hasMetallicParts: boolean; angleAtLeft: boolean; angleAtRight: boolean };
  accessory: { x: number; y: number; widthMm: number; heightMm: number } | null;
  route: WallPoint[];
  depthMm: number;
  rcdProtected: boolean;
  rcdRatedMa: number;
}

export function newRoute(rcdProtected: boolean, rcdRatedMa = 30): ConcealedRoute {
  // A single plate is about 86 mm square (common trade sizes, from memory); both are editable.
  // The thickness is left for the technician to measure: a guess would decide whether the far face's zones apply.
  return { wall: { widthMm: 3600, heightMm: 2400, thicknessMm: null, hasMetallicParts: false, angleAtLeft: true, angleAtRight: true }, accessory: null, route: [], depthMm: 25, rcdProtected, rcdRatedMa };
}

export function readRoute(value: unknown): ConcealedRoute | null {
  const v = value as ConcealedRoute | null;
  return v && typeof v === 'object' && v.wall && Array.isArray(v.route) ? v : null;
}

export function judgeRoute(r: ConcealedRoute): SafeZoneCheck | { error: string } | null {
  if (!r.accessory || r.route.length < 2) return null;
  try {
    const { thicknessMm, ...wall } = r.wall;
    return checkSafeZone({ wall: thicknessMm == null ? wall : { ...wall, thicknessMm }, accessories: [r.accessory], route: r.route, depthMm: r.depthMm, rcdProtected: r.rcdProtected, rcdRatedMa: r.rcdRatedMa });
  } catch (err) {
    if (err instanceof InvalidInputError) return { error: err.message };
    throw err;
  }
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

const FIGURES: readonly WallFigure[] = ['widthMm', 'heightMm', 'thicknessMm', 'depthMm'];

function figuresOf(r: ConcealedRoute): Record<WallFigure, string> {
  return { widthMm: String(r.wall.widthMm), heightMm: String(r.wall.heightMm), thicknessMm: r.wall.thicknessMm == null ? '' : String(r.wall.thicknessMm), depthMm: String(r.depthMm) };
}

/** How far the point (its plate included) and the route reach along and up the wall. */
function reachOf(r: ConcealedRoute): WallSoFar['reachMm'] {
  const xs = r.route.map((p) => p.x);
  const ys = r.route.map((p) => p.y);
  if (r.accessory) {
    xs.push(r.accessory.x + r.accessory.widthMm / 2);
    ys.push(r.accessory.y + r.accessory.heightMm / 2);
  }
  return { x: Math.ceil(Math.max(0, ...xs)), y: Math.ceil(Math.max(0, ...ys)) };
}

function soFarOf(r: ConcealedRoute): WallSoFar {
  return { thicknessMm: r.wall.thicknessMm ?? null, depthMm: r.depthMm, reachMm: reachOf(r) };
}

function withFigure(r: ConcealedRoute, field: WallFigure, text: string): ConcealedRoute {
  const n = parseReading(text);
  if (field === 'depthMm') return { ...r, depthMm: n ?? r.depthMm };
  return { ...r, wall: { ...r.wall, [field]: field === 'thicknessMm' ? n : (n ?? r.wall[field]) } };
}

const FIGURE_HELP: Readonly<Record<WallFigure, string>> = {
  widthMm: ' ',
  heightMm: ' ',
  thicknessMm: 'Both faces count: measure it.',
  depthMm: 'Below this face.',
};

/** A stretch of the route: green where it may run, red where it may not, amber while the wall's thickness is unknown. */
function stretchColour(acceptable: boolean | null | undefined): string {
  if (acceptable === false) return 'var(--mui-palette-error-main)';
  if (acceptable === null) return 'var(--mui-palette-warning-main)';
  return 'var(--mui-palette-success-main)';
}

/**
 * A wall seen from the room: tap where the point is, then tap along the new cable's route. The zones the cable
 * may run in are shaded; each stretch of the route turns green inside a zone and red outside.
 */
export function WallDiagram({
  value,
  onChange,
  disabled,
  onFiguresWrong,
}: {
  value: ConcealedRoute;
  onChange: (v: ConcealedRoute) => void;
  disabled?: boolean;
  /** Told whether any typed figure is being refused, so the form does not save the last good ones as if typed. */
  onFiguresWrong?: (wrong: boolean) => void;
}) {
  const [mode, setMode] = useState<'point' | 'route'>(value.accessory ? 'route' : 'point');
  const [typed, setTyped] = useState<Record<WallFigure, string>>(() => figuresOf(value));
  const soFar = soFarOf(value);
  const problems = Object.fromEntries(FIGURES.map((f) => [f, wallFigureProblem(f, typed[f], soFar)])) as Record<WallFigure, string | null>;
  const wrong = FIGURES.some((f) => problems[f] !== null);
  useEffect(() => onFiguresWrong?.(wrong), [wrong, onFiguresWrong]);
  const [straight, setStraight] = useState(true);
  const svg = useRef<SVGSVGElement>(null);
  const { wall, accessory, route } = value;
  const W = wall.widthMm;
  const H = wall.heightMm;
  const band = DEFAULT_RULE_SET.safeZones.topOfWallBandMm.value;
  const angle = DEFAULT_RULE_SET.safeZones.angleBandMm.value;
  const result = useMemo(() => judgeRoute(value), [value]);
  const segments = result && 'segments' in result ? result.segments : [];

  function tap(e: MouseEvent<SVGSVGElement>) {
    if (disabled || !svg.current) return;
    const box = svg.current.getBoundingClientRect();
    const x = Math.round(clamp(((e.clientX - box.left) / box.width) * W, 0, W) / 10) * 10;
    const y = Math.round(clamp(H - ((e.clientY - box.top) / box.height) * H, 0, H) / 10) * 10;
    if (mode === 'point') {
      onChange({ ...value, accessory: { x, y, widthMm: accessory?.widthMm ?? 86, heightMm: accessory?.heightMm ?? 86 } });
      setMode('route');
      return;
    }
    const last = route.at(-1);
    const next = last && straight ? (Math.abs(x - last.x) >= Math.abs(y - last.y) ? { x, y: last.y } : { x: last.x, y }) : { x, y };
    onChange({ ...value, route: [...route, next] });
  }

  function typeFigure(field: WallFigure, text: string) {
    const next = { ...typed, [field]: text };
    setTyped(next);
    // Every figure that can now stand is taken, so putting one right can free another it held back (depth and thickness).
    let r = value;
    for (const f of FIGURES) if (wallFigureProblem(f, next[f], soFarOf(r)) === null) r = withFigure(r, f, next[f]);
    onChange(r);
  }

  const figure = (field: WallFigure) => (
    <TextField
      label={`${WALL_FIGURE_LABELS[field]} (mm)`}
      size="small"
      value={typed[field]}
      disabled={disabled}
      onChange={(e) => typeFigure(field, e.target.value)}
      error={problems[field] !== null}
      helperText={problems[field] ?? FIGURE_HELP[field]}
      // Labels always above the figure: an empty thickness would otherwise cut its label short on a narrow phone.
      placeholder={field === 'thicknessMm' ? 'Not measured' : undefined}
      slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' }, inputLabel: { shrink: true } }}
    />
  );
  const sy = (y: number) => H - y;
  return (
    <Stack spacing={1.5}>
      {/* Two across: three labels in one row are cut short on a phone. */}
      <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', columnGap: 1, rowGap: 0.5 }} role="group" aria-label="The wall and the cable">
        {FIGURES.map((f) => (
          <Box key={f} sx={{ minWidth: 0 }}>
            {figure(f)}
          </Box>
        ))}
      </Box>
      <ToggleButtonGroup exclusive fullWidth size="small" value={mode} onChange={(_, m) => m && setMode(m)} aria-label="What a tap on the wall does" disabled={disabled}>
        <ToggleButton value="point">Tap places the point</ToggleButton>
        <ToggleButton value="route">Tap adds to the route</ToggleButton>
      </ToggleButtonGroup>
      <Box sx={{ border: 1, borderColor: 'divider', borderRadius: 1, bgcolor: 'background.paper', touchAction: 'manipulation' }}>
        <svg ref={svg} viewBox={`0 0 ${W} ${H}`} width="100%" role="img" aria-label={`Wall ${W} by ${H} mm with the cable route`} onClick={tap} style={{ display: 'block', cursor: disabled ? 'default' : 'crosshair' }}>
          <rect x={0} y={0} width={W} height={H} fill="var(--mui-palette-action-hover)" />
          <g fill="var(--mui-palette-success-main)" opacity={0.18}>
            <rect x={0} y={0} width={W} height={band} />
            {wall.angleAtLeft && <rect x={0} y={0} width={angle} height={H} />}
            {wall.angleAtRight && <rect x={W - angle} y={0} width={angle} height={H} />}
            {accessory && <rect x={accessory.x - accessory.widthMm / 2} y={0} width={accessory.widthMm} height={H} />}
            {accessory && <rect x={0} y={sy(accessory.y) - accessory.heightMm / 2} width={W} height={accessory.heightMm} />}
          </g>
          {accessory && (
            <rect x={accessory.x - accessory.widthMm / 2} y={sy(accessory.y) - accessory.heightMm / 2} width={accessory.widthMm} height={accessory.heightMm} fill="var(--mui-palette-background-paper)" stroke="var(--mui-palette-text-primary)" strokeWidth={3} vectorEffect="non-scaling-stroke" />
          )}
          {route.slice(1).map((to, i) => {
            const from = route[i]!;
            return <line key={i} data-acceptable={String(segments[i]?.acceptable ?? '')} x1={from.x} y1={sy(from.y)} x2={to.x} y2={sy(to.y)} stroke={stretchColour(segments[i]?.acceptable)} strokeWidth={4} vectorEffect="non-scaling-stroke" strokeLinecap="round" />;
          })}
          {route.map((p, i) => (
            <circle key={i} cx={p.x} cy={sy(p.y)} r={Math.max(W, H) / 90} fill="var(--mui-palette-secondary-main)" />
          ))}
        </svg>
      </Box>
      <Typography variant="caption" color="text.secondary">
        Shaded: within {band} mm of the top, within {angle} mm of a corner, and in line with the point. Seen from the room, floor at the bottom.
      </Typography>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button size="small" onClick={() => onChange({ ...value, route: route.slice(0, -1) })} disabled={disabled || route.length === 0}>
          Undo last
        </Button>
        <Button size="small" onClick={() => onChange({ ...value, route: [] })} disabled={disabled || route.length === 0}>
          Clear route
        </Button>
        <FormControlLabel control={<Switch checked={straight} onChange={(e) => setStraight(e.target.checked)} />} label="Straight lines" />
      </Stack>
      <FormControlLabel
        control={<Switch checked={value.rcdProtected} onChange={(e) => onChange({ ...value, rcdProtected: e.target.checked })} disabled={disabled} />}
        label="Circuit has 30 mA RCD protection"
      />
      <FormControlLabel
        control={<Switch checked={wall.hasMetallicParts} onChange={(e) => onChange({ ...value, wall: { ...wall, hasMetallicParts: e.target.checked } })} disabled={disabled} />}
        label="Metal studs or lath in the wall"
      />
      {result === null ? (
        <Typography variant="body2" color="text.secondary">
          {accessory ? 'Tap at least two places to draw the route.' : 'Tap the wall where the point is.'}
        </Typography>
      ) : 'error' in result ? (
        <Typography variant="body2" color="error">
          {result.error}
        </Typography>
      ) : (
        <Stack spacing={0.75}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <Typography variant="body2" sx={{ fontWeight: 500 }}>
              Concealed route
            </Typography>
            {/* Only an RCD's figure says something on the chip; a count of stretches reads better in the sentence below. */}
            <VerdictChip what="Concealed route" result={result} against={result.unit === 'mA' ? 'limit' : 'none'} />
          </Stack>
          {wrong && (
            <Typography variant="body2" color="text.secondary">
              Judged with the last figures that could stand: put right the one marked above.
            </Typography>
          )}
          {result.findings.filter((f) => f.verdict !== 'pass').map((f) => (
            <Typography key={f.name} variant="body2" color={f.verdict === 'fail' ? 'error' : 'text.secondary'}>
              {f.note}
            </Typography>
          ))}
          <AidLine />
        </Stack>
      )}
    </Stack>
  );
}
