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
import { type MouseEvent, useMemo, useRef, useState } from 'react';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';

/** What the point change stores in `concealedRoute`: the safe-zone check's own input. */
export interface ConcealedRoute {
  wall: { widthMm: number; heightMm: number; hasMetallicParts: boolean; angleAtLeft: boolean; angleAtRight: boolean };
  accessory: { x: number; y: number; widthMm: number; heightMm: number } | null;
  route: WallPoint[];
  depthMm: number;
  rcdProtected: boolean;
  rcdRatedMa: number;
}

export function newRoute(rcdProtected: boolean, rcdRatedMa = 30): ConcealedRoute {
  // A single plate is about 86 mm square (common trade sizes, from memory); both are editable.
  return { wall: { widthMm: 3600, heightMm: 2400, hasMetallicParts: false, angleAtLeft: true, angleAtRight: true }, accessory: null, route: [], depthMm: 25, rcdProtected, rcdRatedMa, };
}

export function readRoute(value: unknown): ConcealedRoute | null {
  const v = value as ConcealedRoute | null;
  return v && typeof v === 'object' && v.wall && Array.isArray(v.route) ? v : null;
}

export function judgeRoute(r: ConcealedRoute): SafeZoneCheck | { error: string } | null {
  if (!r.accessory || r.route.length < 2) return null;
  try {
    return checkSafeZone({ wall: r.wall, accessories: [r.accessory], route: r.route, depthMm: r.depthMm, rcdProtected: r.rcdProtected, rcdRatedMa: r.rcdRatedMa });
  } catch (err) {
    if (err instanceof InvalidInputError) return { error: err.message };
    throw err;
  }
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/**
 * A wall seen from the room: tap where the point is, then tap along the new cable's route. The zones the cable
 * may run in are shaded; each stretch of the route turns green inside a zone and red outside.
 */
export function WallDiagram({ value, onChange, disabled }: { value: ConcealedRoute; onChange: (v: ConcealedRoute) => void; disabled?: boolean }) {
  const [mode, setMode] = useState<'point' | 'route'>(value.accessory ? 'route' : 'point');
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

  const num = (label: string, v: number, set: (n: number) => void, unit = 'mm') => (
    <TextField
      label={`${label} (${unit})`}
      size="small"
      defaultValue={v}
      disabled={disabled}
      onBlur={(e) => {
        const n = Number(e.target.value);
        if (Number.isFinite(n) && n >= 0) set(n);
        else e.target.value = String(v);
      }}
      slotProps={{ htmlInput: { inputMode: 'numeric' } }}
    />
  );
  const sy = (y: number) => H - y;
  return (
    <Stack spacing={1.5}>
      <Stack direction="row" spacing={1}>
        {num('Wall width', W, (n) => onChange({ ...value, wall: { ...wall, widthMm: Math.max(n, 300) } }))}
        {num('Wall height', H, (n) => onChange({ ...value, wall: { ...wall, heightMm: Math.max(n, 300) } }))}
        {num('Depth', value.depthMm, (n) => onChange({ ...value, depthMm: n }))}
      </Stack>
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
            const ok = segments[i]?.inZone;
            return <line key={i} x1={from.x} y1={sy(from.y)} x2={to.x} y2={sy(to.y)} stroke={ok === false ? 'var(--mui-palette-error-main)' : 'var(--mui-palette-success-main)'} strokeWidth={4} vectorEffect="non-scaling-stroke" strokeLinecap="round" />;
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
            <VerdictChip what="Concealed route" result={result} />
          </Stack>
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
