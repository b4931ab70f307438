import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import type { Site } from '../api/get-sites';

export function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography sx={{ fontWeight: 500, overflowWrap: 'anywhere' }}>{children}</Typography>
    </div>
  );
}

/** The supply at the site, as the checks use it (earthing decides the Zs limit on TT), and how to get in. */
export function SiteSupply({ site }: { site: Site }) {
  return (
    <Paper variant="outlined" component="section" aria-label="Supply and access" sx={{ p: 2 }}>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: 'repeat(2, minmax(0, 1fr))', md: 'repeat(3, minmax(120px, 180px)) 1fr' }, gap: 2 }}>
        <Fact label="Earthing">{site.earthing ?? 'Not recorded'}</Fact>
        <Fact label="Ze">{site.zeOhm != null ? `${site.zeOhm} Ω` : 'Not recorded'}</Fact>
        <Fact label="Prospective fault current">{site.pfcKa != null ? `${site.pfcKa} kA` : 'Not recorded'}</Fact>
        <Fact label="Access notes">{site.accessNotes ?? 'None'}</Fact>
      </Box>
    </Paper>
  );
}
