import Box from '@mui/material/Box';
import type { ConductorColour } from '@wiretrail/core';

const SOLID: Record<string, string> = { orange: '#e8731a', green: '#2f8f3f', blue: '#2360c4', brown: '#7a4a24' };

/** A conductor as it looks in the hand: solid, or white with a coloured stripe; a dashed outline for none. */
export function ConductorSwatch({ colour, size = 28 }: { colour: ConductorColour | null; size?: number }) {
  if (!colour) {
    return <Box aria-hidden sx={{ width: size, height: size, borderRadius: '50%', border: '2px dashed', borderColor: 'text.secondary', flexShrink: 0 }} />;
  }
  const striped = colour.startsWith('white-');
  const hue = SOLID[striped ? colour.slice(6) : colour]!;
  return (
    <Box
      aria-hidden
      sx={{
        width: size,
        height: size,
        borderRadius: '50%',
        flexShrink: 0,
        // A light ring in the dark theme, so brown and blue do not vanish into the background.
        border: '1px solid rgba(0,0,0,0.35)',
        '[data-wt-scheme="dark"] &': { border: '1px solid #c9d4d6' },
        background: striped ? `repeating-linear-gradient(135deg, #f6f6f2 0 5px, ${hue} 5px 9px)` : hue,
      }}
    />
  );
}
