import Typography from '@mui/material/Typography';
import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthCard } from '@/components/layouts/auth-card';
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
    <AuthCard>
      <Typography color="text.secondary" sx={{ mb: 3 }}>
        Site records, test results and paperwork, with or without signal.
      </Typography>
      <SignInForm onSignedIn={(s) => navigate(next ?? homeFor(s.user.role), { replace: true })} />
    </AuthCard>
  );
}
