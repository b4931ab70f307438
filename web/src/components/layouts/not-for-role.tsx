import BlockOutlined from '@mui/icons-material/BlockOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { homeFor } from '@/config/paths';
import { useSession } from '@/lib/session';

const ROLE_NAME = { admin: 'an admin', office: 'office staff', technician: 'a technician' } as const;

export function NotForRole() {
  const session = useSession();
  if (!session) return null;
  return (
    <Stack spacing={2} sx={{ p: 4, maxWidth: 520, mx: 'auto', textAlign: 'center', alignItems: 'center' }} role="alert">
      <BlockOutlined sx={{ fontSize: 56, color: 'text.secondary' }} />
      <Typography variant="h1">Not for your role</Typography>
      <Typography color="text.secondary">
        You are signed in as {ROLE_NAME[session.user.role]}, and this screen belongs to another role. Ask your admin if you need it.
      </Typography>
      <Button variant="contained" component={RouterLink} to={homeFor(session.user.role)}>
        Back to my start screen
      </Button>
    </Stack>
  );
}
