import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { AuthCard } from '@/components/layouts/auth-card';
import { paths } from '@/config/paths';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';

export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const [done, setDone] = useState(false);
  return (
    <AuthCard>
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
    </AuthCard>
  );
}
