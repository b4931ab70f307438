import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import { useColorScheme } from '@mui/material/styles';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { DEFAULT_RULE_SET, VERDICT_DISCLAIMER } from '@wiretrail/core';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { env } from '@/config/env';
import { homeFor, paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { signOut } from '@/lib/sign-out';
import { switchOrganisation } from '@/lib/switch-organisation';

export function Component() {
  const session = useSession();
  const navigate = useNavigate();
  const { mode, setMode } = useColorScheme();
  if (!session) return null;
  return (
    <>
      <PageHeader title="Me" />
      <Stack spacing={2}>
        <Paper variant="outlined">
          <List>
            <ListItem>
              <ListItemText primary={session.user.name} secondary={session.user.email} />
            </ListItem>
            <ListItem>
              <ListItemText primary="Role" secondary="Technician" />
            </ListItem>
            {session.user.organisationName && (
              <ListItem>
                <ListItemText primary="Working for" secondary={session.user.organisationName} />
              </ListItem>
            )}
          </List>
        </Paper>
        {(session.organisations ?? [])
          .filter((o) => o.id !== session.user.organisationId)
          .map((o) => (
            <Button
              key={o.id}
              variant="outlined"
              size="large"
              onClick={async () => {
                const next = await switchOrganisation(o.id).catch(async () => {
                  await signOut();
                  return null;
                });
                navigate(next ? homeFor(next.user.role) : paths.signIn.path, { replace: true });
              }}
            >
              Work for {o.name}
            </Button>
          ))}
        <Paper variant="outlined" sx={{ p: 2 }}>
          <Typography variant="h3" sx={{ mb: 1.5 }} id="theme-label">
            Screen
          </Typography>
          <ToggleButtonGroup
            exclusive
            fullWidth
            aria-labelledby="theme-label"
            value={mode ?? 'system'}
            onChange={(_, v) => v && setMode(v)}
          >
            <ToggleButton value="light">Daylight</ToggleButton>
            <ToggleButton value="dark">Dark</ToggleButton>
            <ToggleButton value="system">As phone</ToggleButton>
          </ToggleButtonGroup>
        </Paper>
        <Paper variant="outlined" sx={{ p: 2 }}>
          <Typography variant="h3" sx={{ mb: 1 }}>
            About the checks
          </Typography>
          <Typography variant="body2" color="text.secondary">
            Rules: {DEFAULT_RULE_SET.name}. {VERDICT_DISCLAIMER}
          </Typography>
        </Paper>
        <Button
          variant="outlined"
          color="secondary"
          size="large"
          onClick={async () => {
            await signOut();
            navigate(paths.signIn.path, { replace: true });
          }}
        >
          Sign out
        </Button>
        <Typography variant="caption" color="text.secondary" sx={{ textAlign: 'center' }}>
          Wiretrail {env.version}
        </Typography>
      </Stack>
    </>
  );
}
