import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import SignaturePad, { type PointGroup } from 'signature_pad';
import { useEffect, useRef, useState } from 'react';

const HEIGHT = 180;

/**
 * The strokes as a small SVG: one path per stroke in whole CSS pixels. Far smaller than the pad's own SVG
 * (a path per curve segment), so it syncs as an ordinary field and the server can render it into a certificate.
 */
export function strokesToSvg(groups: PointGroup[], width: number, height: number): string {
  const paths = groups
    .filter((g) => g.points.length > 0)
    .map((g) => {
      const [first, ...rest] = g.points;
      const d = `M${Math.round(first!.x)} ${Math.round(first!.y)}` + (rest.length ? rest.map((p) => `L${Math.round(p.x)} ${Math.round(p.y)}`).join('') : 'l0 0');
      return `<path d="${d}"/>`;
    })
    .join('');
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${Math.round(width)} ${Math.round(height)}" width="${Math.round(width)}" height="${Math.round(height)}"><g fill="none" stroke="#14262b" stroke-width="2.5" stroke-linecap="round" stroke-linejoin="round">${paths}</g></svg>`;
}

/**
 * A box to sign in with a finger; reports the signature as SVG after every stroke, or null once cleared, with the
 * strokes themselves so that a draft can draw them again (`initialStrokes`).
 */
export function SignatureBox({
  onChange,
  disabled,
  error,
  initialStrokes,
}: {
  onChange: (svg: string | null, strokes: PointGroup[] | undefined) => void;
  disabled?: boolean;
  error?: string;
  initialStrokes?: PointGroup[];
}) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const pad = useRef<SignaturePad | null>(null);
  // The pad lives as long as the box; a new onChange from a re-render must not wipe the strokes.
  const report = useRef(onChange);
  report.current = onChange;
  const initial = useRef(initialStrokes);

  const [drawable, setDrawable] = useState(true);

  useEffect(() => {
    const el = canvas.current;
    const context = el?.getContext('2d');
    if (!el || !context) {
      setDrawable(false);
      return;
    }
    const ratio = Math.max(window.devicePixelRatio || 1, 1);
    el.width = el.offsetWidth * ratio;
    el.height = HEIGHT * ratio;
    context.scale(ratio, ratio);
    const p = new SignaturePad(el, { penColor: '#14262b', backgroundColor: 'rgba(0,0,0,0)', minWidth: 1, maxWidth: 3 });
    const ended = () => (p.isEmpty() ? report.current(null, undefined) : report.current(strokesToSvg(p.toData(), el.offsetWidth, HEIGHT), p.toData()));
    if (initial.current?.length) p.fromData(initial.current);
    p.addEventListener('endStroke', ended);
    pad.current = p;
    return () => {
      p.removeEventListener('endStroke', ended);
      p.off();
    };
  }, []);

  useEffect(() => {
    if (!pad.current) return;
    if (disabled) pad.current.off();
    else pad.current.on();
  }, [disabled]);

  return (
    <Stack spacing={0.5}>
      <Box
        sx={{ position: 'relative', border: 2, borderColor: error ? 'error.main' : 'divider', borderRadius: 1.5, bgcolor: '#fbfbf8', height: HEIGHT, touchAction: 'none' }}
      >
        <canvas ref={canvas} aria-label="Signature box: sign with your finger" style={{ width: '100%', height: HEIGHT, display: 'block' }} />
        <Box aria-hidden sx={{ position: 'absolute', left: 16, right: 16, bottom: 36, borderBottom: '1px dashed #8a9a9e', pointerEvents: 'none' }} />
      </Box>
      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center' }}>
        <Typography variant="body2" color={error ? 'error' : 'text.secondary'}>
          {error ?? (drawable ? 'Sign above the line.' : 'This browser cannot draw a signature; open the visit in the phone’s own browser.')}
        </Typography>
        <Button
          variant="outlined"
          onClick={() => {
            pad.current?.clear();
            report.current(null, undefined);
          }}
          disabled={disabled}
        >
          Clear signature
        </Button>
      </Stack>
    </Stack>
  );
}
