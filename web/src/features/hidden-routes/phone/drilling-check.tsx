import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { checkDrillingPoint, DEFAULT_DRILLING_CLEARANCE_MM, DRILLING_CAUTION, type DrillingPoint, type PhotoMarkupShape, type PhotoPoint } from '@wiretrail/core';
import { useState } from 'react';
import { VerdictChip } from '@/components/verdicts/verdict-chip';
import { parseReading } from '@/lib/readings';

const TYPED = [
  { key: 'fromLeftMm', label: 'From the left-hand corner (mm)' },
  { key: 'fromRightMm', label: 'From the right-hand corner (mm)' },
  { key: 'fromFloorMm', label: 'Up from the floor (mm)' },
  { key: 'fromCeilingMm', label: 'Down from the ceiling (mm)' },
] as const;

/**
 * Whether a recorded route passes within a chosen distance of where a drill or fixing would go: tapped on the photo
 * or typed from the same datums. Always with the caution that records can be incomplete.
 */
export function DrillingCheckPanel({ shape, tapped }: { shape: PhotoMarkupShape; tapped: PhotoPoint | null }) {
  const [clearance, setClearance] = useState(String(DEFAULT_DRILLING_CLEARANCE_MM));
  const [typed, setTyped] = useState<Record<(typeof TYPED)[number]['key'], string>>({ fromLeftMm: '', fromRightMm: '', fromFloorMm: '', fromCeilingMm: '' });
  const [useTyped, setUseTyped] = useState(false);
  const c = parseReading(clearance);
  const clearanceOk = c !== null && !Number.isNaN(c) && c > 0 && c <= 30_000;
  const point: DrillingPoint = Object.fromEntries(TYPED.map(({ key }) => [key, parseReading(typed[key])]).filter(([, v]) => typeof v === 'number' && !Number.isNaN(v)));
  const result = !clearanceOk ? null : useTyped ? checkDrillingPoint(shape, { typed: point }, c) : tapped ? checkDrillingPoint(shape, { tapped }, c) : null;
  return (
    <Stack spacing={2} aria-label="Drilling check" role="group">
      <TextField
        label="Keep this far from any route (mm)"
        value={clearance}
        onChange={(e) => setClearance(e.target.value)}
        error={!clearanceOk}
        helperText={clearanceOk ? 'Our default is 100 mm (common trade practice, not a published limit): choose your own.' : 'Type a distance in millimetres, more than 0.'}
        slotProps={{ htmlInput: { inputMode: 'decimal' } }}
      />
      <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap' }}>
        {TYPED.map(({ key, label }) => (
          <TextField
            key={key}
            label={label}
            value={typed[key]}
            onChange={(e) => {
              setTyped({ ...typed, [key]: e.target.value });
              setUseTyped(true);
            }}
            slotProps={{ htmlInput: { inputMode: 'decimal' } }}
            sx={{ flex: '1 1 140px' }}
          />
        ))}
      </Stack>
      {useTyped && tapped && (
        <Button onClick={() => setUseTyped(false)} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
          Use the point tapped instead
        </Button>
      )}
      {result && (
        <Stack spacing={1} sx={{ alignItems: 'flex-start' }} aria-live="polite">
          <VerdictChip what="Drilling check" result={result} against="limit" />
          <Typography>{result.note}</Typography>
          {result.point && (
            <Typography variant="body2" color="text.secondary">
              The point is {Math.round(result.point.x)} mm along from the left-hand corner and {Math.round(result.point.y)} mm up from the floor.
            </Typography>
          )}
        </Stack>
      )}
      <Alert severity="warning">{DRILLING_CAUTION}</Alert>
    </Stack>
  );
}
