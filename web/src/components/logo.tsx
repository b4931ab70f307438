import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';

/** The mark is the same SVG the app icons are generated from. */
export function Logo({ size = 32, withName = true, colour = 'inherit' }: { size?: number; withName?: boolean; colour?: string }) {
  return (
    <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.25, color: colour }}>
      <Box component="img" src="/logo.svg" alt="" width={size} height={size} sx={{ display: 'block' }} />
      {withName && (
        <Typography component="span" sx={{ fontWeight: 700, fontSize: size * 0.6, letterSpacing: 0.2 }}>
          Wiretrail
        </Typography>
      )}
    </Box>
  );
}
