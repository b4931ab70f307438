import Box from '@mui/material/Box';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { INSTALLATION_METHODS, type InstallationMethod, installationMethodDescription } from '@wiretrail/core';
import type { ReactNode } from 'react';

// Our own cross-sections: the cable as two cores in a sheath, insulation as a hatched band, board and masonry as plain fills.
const CABLE = (x: number, y: number) => (
  <g key={`${x}-${y}`}>
    <rect x={x - 9} y={y - 5} width={18} height={10} rx={4} fill="#eeeeee" stroke="#424242" />
    <circle cx={x - 4} cy={y} r={2.5} fill="#8d6e63" />
    <circle cx={x + 4} cy={y} r={2.5} fill="#1565c0" />
  </g>
);
const INSULATION = (x: number, y: number, w: number, h: number) => <rect x={x} y={y} width={w} height={h} fill="url(#wiretrail-insulation)" stroke="#f9a825" />;
const BOARD = (x: number, y: number, w: number, h: number) => <rect x={x} y={y} width={w} height={h} fill="#cfd8dc" stroke="#546e7a" />;

const PICTURES: Record<InstallationMethod, ReactNode> = {
  A: (
    <>
      {BOARD(4, 8, 8, 44)}
      {INSULATION(12, 8, 52, 44)}
      <circle cx={34} cy={30} r={11} fill="none" stroke="#424242" strokeWidth={2} />
      {CABLE(34, 30)}
    </>
  ),
  C: (
    <>
      <rect x={4} y={8} width={16} height={44} fill="#bcaaa4" stroke="#6d4c41" />
      {CABLE(30, 30)}
      <path d="M20 24 h6 M20 36 h6" stroke="#424242" strokeWidth={2} />
    </>
  ),
  '100': (
    <>
      {BOARD(4, 44, 60, 8)}
      {INSULATION(4, 28, 60, 16)}
      {CABLE(34, 38)}
    </>
  ),
  '101': (
    <>
      {BOARD(4, 44, 60, 8)}
      {INSULATION(4, 6, 60, 38)}
      {CABLE(34, 38)}
    </>
  ),
  '102': (
    <>
      {BOARD(4, 8, 8, 44)}
      {INSULATION(12, 8, 44, 44)}
      {BOARD(56, 8, 8, 44)}
      {CABLE(22, 30)}
    </>
  ),
  '103': (
    <>
      {BOARD(4, 8, 8, 44)}
      {INSULATION(12, 8, 44, 44)}
      {BOARD(56, 8, 8, 44)}
      {CABLE(34, 30)}
    </>
  ),
};

/** A drawing of one reference method, with its name for screen readers. */
export function InstallationMethodPicture({ method }: { method: InstallationMethod }) {
  return (
    <svg viewBox="0 0 68 60" width={68} height={60} aria-hidden="true">
      <defs>
        <pattern id="wiretrail-insulation" width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width={6} height={6} fill="#fff8e1" />
          <line x1={0} y1={0} x2={0} y2={6} stroke="#f9a825" strokeWidth={2} />
        </pattern>
      </defs>
      {PICTURES[method]}
    </svg>
  );
}

/** How the new cable is installed, picked from pictures; each is a reference method of Table 4D5. */
export function InstallationMethodPicker({ value, onChange, disabled }: { value: InstallationMethod | ''; onChange: (m: InstallationMethod | '') => void; disabled?: boolean }) {
  return (
    <ToggleButtonGroup
      exclusive
      value={value}
      onChange={(_, m: InstallationMethod | null) => onChange(m ?? '')}
      aria-label="How the new cable is installed"
      disabled={disabled}
      sx={{ display: 'grid', gridTemplateColumns: 'repeat(2, 1fr)', gap: 1, '& .MuiToggleButtonGroup-grouped': { border: 1, borderColor: 'divider', borderRadius: 1, m: 0 } }}
    >
      {INSTALLATION_METHODS.map((m) => (
        <ToggleButton key={m} value={m} sx={{ flexDirection: 'column', gap: 0.5, textTransform: 'none', alignItems: 'center' }}>
          <InstallationMethodPicture method={m} />
          <Box>
            <Typography variant="body2" sx={{ fontWeight: 500 }}>
              Method {m}
            </Typography>
            <Typography variant="caption" color="text.secondary">
              {installationMethodDescription(m)}
            </Typography>
          </Box>
        </ToggleButton>
      ))}
    </ToggleButtonGroup>
  );
}
