import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

/** What a screen shows before it has anything in it: what will appear here, and how it gets here. */
export function EmptyState({ icon, title, children }: { icon: ReactNode; title: string; children: ReactNode }) {
  return (
    <Paper variant="outlined" sx={{ p: 3, textAlign: 'center', display: 'grid', justifyItems: 'center', gap: 1 }}>
      <Typography component="span" sx={{ color: 'secondary.main', '& svg': { fontSize: 44 } }}>
        {icon}
      </Typography>
      <Typography variant="h3">{title}</Typography>
      <Typography color="text.secondary" sx={{ maxWidth: 520 }}>
        {children}
      </Typography>
    </Paper>
  );
}
