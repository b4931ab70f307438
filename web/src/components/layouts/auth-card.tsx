import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import type { ReactNode } from 'react';
import { Logo } from '../logo';

/** The one card on a teal page that signing in and setting a password share. */
export function AuthCard({ children }: { children: ReactNode }) {
  return (
    <Box sx={{ minHeight: '100dvh', display: 'grid', placeItems: 'center', p: 2, bgcolor: 'primary.main' }}>
      <Paper sx={{ width: '100%', maxWidth: 420, p: { xs: 3, sm: 4 } }} elevation={3}>
        <Box sx={{ color: 'primary.main', mb: 1 }}>
          <Logo size={40} />
        </Box>
        {children}
      </Paper>
    </Box>
  );
}
