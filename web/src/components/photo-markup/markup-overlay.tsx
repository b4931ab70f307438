import type { DatumMark, MarkedAccessory, MarkedRoute, PhotoPoint, Verdict } from '@wiretrail/core';
import { measuredAcross, routeColour } from '@wiretrail/core';
import { type PointerEvent as ReactPointerEvent, useRef } from 'react';

export interface OverlayPointer {
  down?: (p: PhotoPoint) => void;
  move?: (p: PhotoPoint) => void;
  up?: (p: PhotoPoint) => void;
}

interface Props {
  /** The photo's own size in pixels: everything drawn is in these coordinates. */
  width: number;
  height: number;
  routes: readonly MarkedRoute[];
  datums?: readonly DatumMark[];
  accessories?: readonly MarkedAccessory[];
  /** Each route's safe-zone verdict, by route id: a failing route is drawn with a red edge and a warning mark. */
  verdicts?: Readonly<Record<string, Verdict>>;
  /** Routes not picked by a filter are drawn faint. */
  dimmed?: (route: MarkedRoute) => boolean;
  /** A route being drawn, its last point the finger's snapped position. */
  drawing?: readonly PhotoPoint[];
  /** A datum dimension being placed. */
  pendingDatum?: { from: PhotoPoint; to: PhotoPoint | null } | null;
  pendingBox?: { from: PhotoPoint; to: PhotoPoint } | null;
  drill?: { point: PhotoPoint; verdict: Verdict } | null;
  pointer?: OverlayPointer;
  /** What the drawing shows, for a screen reader. */
  label: string;
}

const VERDICT_MARK: Record<Verdict, string> = { pass: '#2e7d32', fail: '#c62828', check: '#ef6c00' };

/**
 * Routes, datum dimensions and accessory outlines drawn over a photo, in the photo's own pixels, so the same markup
 * lies on the photo at any size. With `pointer`, a finger on it draws (its position is turned into photo pixels).
 */
export function MarkupOverlay({ width, height, routes, datums = [], accessories = [], verdicts = {}, dimmed, drawing, pendingDatum, pendingBox, drill, pointer, label }: Props) {
  const svg = useRef<SVGSVGElement>(null);
  const pressed = useRef(false);
  const unit = Math.max(width, height) / 100;

  const at = (e: ReactPointerEvent<SVGSVGElement>): PhotoPoint => {
    const box = svg.current!.getBoundingClientRect();
    // The drawing fills its box with the photo's shape, so one scale serves both axes.
    const scale = box.width > 0 ? width / box.width : 1;
    const clamp = (v: number, max: number) => Math.round(Math.min(max, Math.max(0, v)));
    return { x: clamp((e.clientX - box.left) * scale, width), y: clamp((e.clientY - box.top) * scale, height) };
  };

  return (
    <svg
      ref={svg}
      viewBox={`0 0 ${width} ${height}`}
      preserveAspectRatio="none"
      role="img"
      aria-label={label}
      style={{ position: 'absolute', inset: 0, width: '100%', height: '100%', touchAction: pointer ? 'none' : 'auto', cursor: pointer ? 'crosshair' : 'default' }}
      onPointerDown={
        pointer
          ? (e) => {
              pressed.current = true;
              e.currentTarget.setPointerCapture?.(e.pointerId);
              pointer.down?.(at(e));
            }
          : undefined
      }
      onPointerMove={pointer ? (e) => pressed.current && pointer.move?.(at(e)) : undefined}
      onPointerUp={
        pointer
          ? (e) => {
              if (!pressed.current) return;
              pressed.current = false;
              pointer.up?.(at(e));
            }
          : undefined
      }
      onPointerCancel={() => (pressed.current = false)}
    >
      {accessories.map((a) => (
        <rect
          key={a.id}
          x={a.centre.x - a.widthPx / 2}
          y={a.centre.y - a.heightPx / 2}
          width={a.widthPx}
          height={a.heightPx}
          fill="none"
          stroke="#ffffff"
          strokeWidth={2}
          strokeDasharray="6 4"
          vectorEffect="non-scaling-stroke"
        />
      ))}
      {datums.map((d) => {
        const across = measuredAcross(d.datum);
        const from = across ? { x: d.lineAt, y: d.to.y } : { x: d.to.x, y: d.lineAt };
        return <Dimension key={d.id} from={from} to={d.to} text={`${d.mm} mm`} unit={unit} />;
      })}
      {routes.map((r, i) => {
        const faint = dimmed?.(r) ?? false;
        const failing = verdicts[r.id] === 'fail';
        const pts = r.points.map((p) => `${p.x},${p.y}`).join(' ');
        const start = r.points[0];
        return (
          <g key={r.id} opacity={faint ? 0.3 : 1}>
            <polyline points={pts} fill="none" stroke={failing ? '#c62828' : '#ffffff'} strokeWidth={failing ? 10 : 8} strokeLinejoin="round" strokeLinecap="round" vectorEffect="non-scaling-stroke" />
            <polyline points={pts} fill="none" stroke={routeColour(i)} strokeWidth={4} strokeLinejoin="round" strokeLinecap="round" vectorEffect="non-scaling-stroke" />
            {start && (
              <g>
                <circle cx={start.x} cy={start.y} r={unit * 2.2} fill={routeColour(i)} stroke="#ffffff" strokeWidth={2} vectorEffect="non-scaling-stroke" />
                <text x={start.x} y={start.y + unit * 0.9} textAnchor="middle" fontSize={unit * 2.6} fontWeight={700} fill="#ffffff">
                  {i + 1}
                </text>
                {verdicts[r.id] && verdicts[r.id] !== 'pass' && (
                  <text x={start.x + unit * 3.2} y={start.y + unit} fontSize={unit * 3} fontWeight={700} fill={VERDICT_MARK[verdicts[r.id]!]} stroke="#ffffff" strokeWidth={unit * 0.3} paintOrder="stroke">
                    !
                  </text>
                )}
              </g>
            )}
          </g>
        );
      })}
      {drawing && drawing.length > 0 && (
        <g>
          <polyline points={drawing.map((p) => `${p.x},${p.y}`).join(' ')} fill="none" stroke="#ffeb3b" strokeWidth={5} strokeLinejoin="round" strokeDasharray="10 6" vectorEffect="non-scaling-stroke" />
          {drawing.map((p, i) => (
            <circle key={i} cx={p.x} cy={p.y} r={unit * 0.9} fill="#ffeb3b" />
          ))}
        </g>
      )}
      {pendingDatum && (pendingDatum.to ? <Dimension from={pendingDatum.from} to={pendingDatum.to} text="" unit={unit} /> : <circle cx={pendingDatum.from.x} cy={pendingDatum.from.y} r={unit} fill="#ffb74d" />)}
      {pendingBox && (
        <rect
          x={Math.min(pendingBox.from.x, pendingBox.to.x)}
          y={Math.min(pendingBox.from.y, pendingBox.to.y)}
          width={Math.abs(pendingBox.to.x - pendingBox.from.x)}
          height={Math.abs(pendingBox.to.y - pendingBox.from.y)}
          fill="none"
          stroke="#ffeb3b"
          strokeWidth={3}
          vectorEffect="non-scaling-stroke"
        />
      )}
      {drill && (
        <g>
          <circle cx={drill.point.x} cy={drill.point.y} r={unit * 2} fill="none" stroke={VERDICT_MARK[drill.verdict]} strokeWidth={4} vectorEffect="non-scaling-stroke" />
          <line x1={drill.point.x - unit * 3} y1={drill.point.y} x2={drill.point.x + unit * 3} y2={drill.point.y} stroke={VERDICT_MARK[drill.verdict]} strokeWidth={3} vectorEffect="non-scaling-stroke" />
          <line x1={drill.point.x} y1={drill.point.y - unit * 3} x2={drill.point.x} y2={drill.point.y + unit * 3} stroke={VERDICT_MARK[drill.verdict]} strokeWidth={3} vectorEffect="non-scaling-stroke" />
        </g>
      )}
    </svg>
  );
}

function Dimension({ from, to, text, unit }: { from: PhotoPoint; to: PhotoPoint; text: string; unit: number }) {
  const mid = { x: (from.x + to.x) / 2, y: (from.y + to.y) / 2 };
  return (
    <g>
      <line x1={from.x} y1={from.y} x2={to.x} y2={to.y} stroke="#ffb74d" strokeWidth={3} strokeDasharray="8 5" vectorEffect="non-scaling-stroke" />
      <circle cx={to.x} cy={to.y} r={unit * 0.8} fill="#ffb74d" />
      {text && (
        <text x={mid.x} y={mid.y - unit} textAnchor="middle" fontSize={unit * 2.4} fontWeight={700} fill="#4e2a00" stroke="#ffffff" strokeWidth={unit * 0.5} paintOrder="stroke">
          {text}
        </text>
      )}
    </g>
  );
}
