import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { Logo } from '@/components/logo';
import { paths } from '@/config/paths';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';

export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const [done, setDone] = useState(false);
  return (
    <Box sx={{ minHeight: '100dvh', display: 'grid', placeItems: 'center', p: 2, bgcolor: 'primary.main' }}>
      <Paper sx={{ width: '100%', maxWidth: 420, p: { xs: 3, sm: 4 } }} elevation={3}>
        <Box sx={{ color: 'primary.main', mb: 1 }}>
          <Logo size={40} />
        </Box>
        <Typography variant="h1" sx={{ mb: 2 }}>
          Set a new password
        </Typography>
        {done ? (
          <>
            <Alert severity="success" sx={{ mb: 2 }}>
              Your password is set. You have been signed out everywhere; sign in with the new one.
            </Alert>
            <Button variant="contained" component={RouterLink} to={paths.signIn.path}>
              Sign in
            </Button>
          </>
        ) : token ? (
          <ResetPasswordForm token={token} onDone={() => setDone(true)} />
        ) : (
          <Alert severity="warning">This page needs the link from the e-mail. Ask your admin to send a new one.</Alert>
        )}
      </Paper>
    </Box>
  );
}
