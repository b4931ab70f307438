import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { CONDUCTOR_COLOURS, type ConductorColour, PIN_SCHEMES, type PinScheme, type RecordedWiremap } from '@wiretrail/core';
import { useState } from 'react';
import { colourWords } from '../cable-words';
import { ConductorSwatch } from './conductor-swatch';

export type Wiremap = { nearEnd: (ConductorColour | null)[]; farEnd: (ConductorColour | null)[]; shorts: [number, number][]; opens: number[] };
type EndKey = 'nearEnd' | 'farEnd';

const PINS = [1, 2, 3, 4, 5, 6, 7, 8];
export const emptyWiremap = (): Wiremap => ({ nearEnd: Array(8).fill(null), farEnd: Array(8).fill(null), shorts: [], opens: [] });
export const schemeWiremap = (scheme: PinScheme): Wiremap => ({ nearEnd: [...PIN_SCHEMES[scheme]], farEnd: [...PIN_SCHEMES[scheme]], shorts: [], opens: [] });

/** Reads a stored wiremap back, tolerating rows written by older versions of the app. */
export function readWiremap(value: unknown): Wiremap | null {
  const v = value as Partial<RecordedWiremap> | null;
  if (!v || !Array.isArray(v.nearEnd) || !Array.isArray(v.farEnd) || v.nearEnd.length !== 8 || v.farEnd.length !== 8) return null;
  return {
    nearEnd: [...v.nearEnd] as (ConductorColour | null)[],
    farEnd: [...v.farEnd] as (ConductorColour | null)[],
    shorts: (v.shorts ?? []).map(([a, b]) => [a, b] as [number, number]),
    opens: [...(v.opens ?? [])],
  };
}

interface Props {
  scheme: PinScheme;
  endNames: { nearEnd: string; farEnd: string };
  value: Wiremap | null;
  onChange: (value: Wiremap | null) => void;
  disabled?: boolean;
}

/**
 * The scheme pin by pin beside what was seen at each end: the technician compares the connector in hand,
 * confirms both ends in one tap, or taps the colour seen at each pin, then marks shorts and breaks.
 */
export function WiremapEntry({ scheme, endNames, value, onChange, disabled }: Props) {
  const [end, setEnd] = useState<EndKey>('nearEnd');
  const [picking, setPicking] = useState<number | null>(null);
  const [addingShort, setAddingShort] = useState(false);
  const map = value ?? emptyWiremap();
  const expected = PIN_SCHEMES[scheme];
  const set = (next: Partial<Wiremap>) => onChange({ ...map, ...next });
  const setPin = (pin: number, colour: ConductorColour | null) => set({ [end]: map[end].map((c, i) => (i === pin - 1 ? colour : c)) } as Partial<Wiremap>);
  const endName = endNames[end];

  return (
    <Stack spacing={1.5}>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button variant="contained" onClick={() => onChange(schemeWiremap(scheme))} disabled={disabled} sx={{ flex: 1, minWidth: 200 }}>
          Both ends as {scheme}
        </Button>
        {value && (
          <Button variant="outlined" onClick={() => onChange(null)} disabled={disabled}>
            Clear wiremap
          </Button>
        )}
      </Stack>
      <Typography variant="body2" color="text.secondary">
        Tap a pin to record the colour seen there. A pin that differs from {scheme} is outlined in red with ✕.
      </Typography>
      <ToggleButtonGroup exclusive fullWidth value={end} onChange={(_, v) => v && setEnd(v)} aria-label="Which end">
        <ToggleButton value="nearEnd">{endNames.nearEnd}</ToggleButton>
        <ToggleButton value="farEnd">{endNames.farEnd}</ToggleButton>
      </ToggleButtonGroup>
      {/* Fixed columns: a striped colour's name wraps inside its own cell instead of pushing the next one over. */}
      <Box
        component="table"
        sx={{ width: '100%', tableLayout: 'fixed', borderCollapse: 'collapse', '& td, & th': { py: 0.5, px: 0.5, textAlign: 'left', verticalAlign: 'middle' } }}
        aria-label={`${endName}: pins`}
      >
        <colgroup>
          <col style={{ width: 36 }} />
          <col style={{ width: '42%' }} />
          <col />
        </colgroup>
        <thead>
          <tr>
            <Typography component="th" variant="caption" color="text.secondary">Pin</Typography>
            <Typography component="th" variant="caption" color="text.secondary">{scheme}</Typography>
            <Typography component="th" variant="caption" color="text.secondary">Seen at this end</Typography>
          </tr>
        </thead>
        <tbody>
          {PINS.map((pin) => {
            const seen = map[end][pin - 1] ?? null;
            const differs = value !== null && seen !== expected[pin - 1];
            return (
              <tr key={pin}>
                <Typography component="td" sx={{ fontWeight: 500, width: 36 }}>{pin}</Typography>
                <td>
                  <Stack direction="row" spacing={1} sx={{ alignItems: 'center', minWidth: 0 }}>
                    <ConductorSwatch colour={expected[pin - 1]!} size={22} />
                    <Typography variant="body2" sx={{ minWidth: 0, overflowWrap: 'anywhere' }}>
                      <ColourName colour={expected[pin - 1]!} />
                    </Typography>
                  </Stack>
                </td>
                <td>
                  <Button
                    variant="outlined"
                    color={differs ? 'error' : 'primary'}
                    onClick={() => setPicking(pin)}
                    disabled={disabled}
                    // Named by the words it shows, after the pin it is for.
                    aria-label={`${endName} pin ${pin}: ${value ? colourWords(seen) : 'Tap to record'}${differs ? ', not as the scheme has it' : ''}`}
                    startIcon={value ? <ConductorSwatch colour={seen} size={22} /> : undefined}
                    sx={{
                      justifyContent: 'flex-start',
                      width: '100%',
                      minWidth: 0,
                      textTransform: 'none',
                      textAlign: 'left',
                      lineHeight: 1.25,
                      px: 1,
                      '& .MuiButton-startIcon': { ml: 0, mr: 0.75 },
                      // A locked wiremap still shows which pins are wrong, in either theme.
                      ...(differs ? { borderWidth: 2, fontWeight: 700, '&.Mui-disabled, [data-wt-scheme="dark"] &.Mui-disabled': { borderWidth: 2, borderColor: 'error.main', color: 'error.main' } } : {}),
                    }}
                  >
                    {/* One flex item, so the words wrap as words (after the stripe's slash), not letter by letter. */}
                    <Box component="span" sx={{ minWidth: 0 }}>
                      {value ? <ColourName colour={seen} /> : 'Tap to record'}
                      {differs ? ' ✕' : ''}
                    </Box>
                  </Button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </Box>
      <Stack spacing={1}>
        <Typography variant="body2" sx={{ fontWeight: 500 }}>
          Shorted pins
        </Typography>
        <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1, alignItems: 'center' }}>
          {map.shorts.map(([a, b]) => (
            <Chip key={`${a}-${b}`} label={`Pins ${a} and ${b}`} onDelete={disabled ? undefined : () => set({ shorts: map.shorts.filter(([x, y]) => x !== a || y !== b) })} />
          ))}
          <Button variant="outlined" onClick={() => setAddingShort(true)} disabled={disabled || !value}>
            Mark a short
          </Button>
        </Stack>
      </Stack>
      <Stack spacing={1}>
        <Typography variant="body2" sx={{ fontWeight: 500 }} id="opens-label">
          No continuity end to end (a break along the cable)
        </Typography>
        <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(4, 1fr)', gap: 1 }} role="group" aria-labelledby="opens-label">
          {PINS.map((pin) => {
            const on = map.opens.includes(pin);
            return (
              <Chip
                key={pin}
                label={pin}
                role="button"
                aria-label={`Pin ${pin} has no continuity`}
                aria-pressed={on}
                color={on ? 'error' : 'default'}
                variant={on ? 'filled' : 'outlined'}
                disabled={disabled || !value}
                onClick={() => set({ opens: on ? map.opens.filter((p) => p !== pin) : [...map.opens, pin].sort((x, y) => x - y) })}
                sx={{ minHeight: 48, fontSize: '1rem', borderWidth: 1.5 }}
              />
            );
          })}
        </Box>
      </Stack>
      {picking !== null && (
        <ColourPicker
          title={`${endName}, pin ${picking}: colour seen`}
          onPick={(c) => {
            if (!value) onChange({ ...emptyWiremap(), [end]: Array(8).fill(null).map((_, i) => (i === picking - 1 ? c : null)) });
            else setPin(picking, c);
            setPicking(null);
          }}
          onClose={() => setPicking(null)}
        />
      )}
      {addingShort && (
        <ShortDialog
          onAdd={(a, b) => {
            if (!map.shorts.some(([x, y]) => x === a && y === b)) set({ shorts: [...map.shorts, [a, b]] });
            setAddingShort(false);
          }}
          onClose={() => setAddingShort(false)}
        />
      )}
    </Stack>
  );
}

/** A colour's name, which may break after the stripe's slash on a narrow screen: "white/ orange". */
function ColourName({ colour }: { colour: ConductorColour | null }) {
  const [first, ...rest] = colourWords(colour).split('/');
  return (
    <>
      {first}
      {rest.map((part) => (
        <span key={part}>
          /<wbr />
          {part}
        </span>
      ))}
    </>
  );
}

function ColourPicker({ title, onPick, onClose }: { title: string; onPick: (c: ConductorColour | null) => void; onClose: () => void }) {
  return (
    <Dialog open onClose={onClose} aria-labelledby="colour-title" fullWidth maxWidth="xs">
      <DialogTitle id="colour-title">{title}</DialogTitle>
      <DialogContent>
        <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
          {CONDUCTOR_COLOURS.map((c) => (
            <Button key={c} variant="outlined" onClick={() => onPick(c)} startIcon={<ConductorSwatch colour={c} />} sx={{ justifyContent: 'flex-start', minHeight: 56 }}>
              {colourWords(c)}
            </Button>
          ))}
          <Button variant="outlined" onClick={() => onPick(null)} startIcon={<ConductorSwatch colour={null} />} sx={{ justifyContent: 'flex-start', minHeight: 56, gridColumn: 'span 2' }}>
            No conductor
          </Button>
        </Box>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} size="large">
          Cancel
        </Button>
      </DialogActions>
    </Dialog>
  );
}

function ShortDialog({ onAdd, onClose }: { onAdd: (a: number, b: number) => void; onClose: () => void }) {
  const [a, setA] = useState('');
  const [b, setB] = useState('');
  const same = a !== '' && a === b;
  return (
    <Dialog open onClose={onClose} aria-labelledby="short-title" fullWidth maxWidth="xs">
      <DialogTitle id="short-title">Pins shorted together</DialogTitle>
      <DialogContent>
        <Stack direction="row" spacing={1.5} sx={{ pt: 1 }}>
          {[
            ['First pin', a, setA],
            ['Second pin', b, setB],
          ].map(([label, v, setV]) => (
            <TextField key={label as string} select label={label as string} value={v as string} onChange={(e) => (setV as (x: string) => void)(e.target.value)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
              <option value="">—</option>
              {PINS.map((p) => (
                <option key={p} value={p}>
                  {p}
                </option>
              ))}
            </TextField>
          ))}
        </Stack>
        {same && (
          <Alert severity="warning" sx={{ mt: 1.5 }}>
            Choose two different pins.
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} size="large">
          Cancel
        </Button>
        <Button
          variant="contained"
          size="large"
          disabled={a === '' || b === '' || same}
          onClick={() => {
            const [x, y] = [Number(a), Number(b)].sort((p, q) => p - q) as [number, number];
            onAdd(x, y);
          }}
        >
          Add short
        </Button>
      </DialogActions>
    </Dialog>
  );
}
