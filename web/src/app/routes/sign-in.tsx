import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { Logo } from '@/components/logo';
import { homeFor, safeNext } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useSession } from '@/lib/session';

export function Component() {
  const session = useSession();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  if (session) return <Navigate to={next ?? homeFor(session.user.role)} replace />;
  return (
    <Box sx={{ minHeight: '100dvh', display: 'grid', placeItems: 'center', p: 2, bgcolor: 'primary.main' }}>
      <Paper sx={{ width: '100%', maxWidth: 420, p: { xs: 3, sm: 4 } }} elevation={3}>
        <Box sx={{ color: 'primary.main', mb: 1 }}>
          <Logo size={40} />
        </Box>
        <Typography color="text.secondary" sx={{ mb: 3 }}>
          Site records, test results and paperwork, with or without signal.
        </Typography>
        <SignInForm onSignedIn={(s) => navigate(next ?? homeFor(s.user.role), { replace: true })} />
      </Paper>
    </Box>
  );
}
