import AccountCircle from '@mui/icons-material/AccountCircle';
import Divider from '@mui/material/Divider';
import IconButton from '@mui/material/IconButton';
import ListItemText from '@mui/material/ListItemText';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import { useColorScheme } from '@mui/material/styles';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { homeFor, paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { signOut } from '@/lib/sign-out';
import { switchOrganisation } from '@/lib/switch-organisation';

export function AccountMenu() {
  const session = useSession();
  const navigate = useNavigate();
  const { mode, setMode } = useColorScheme();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const close = () => setAnchor(null);
  const others = (session?.organisations ?? []).filter((o) => o.id !== session?.user.organisationId);
  return (
    <>
      <IconButton color="inherit" aria-label="Account" onClick={(e) => setAnchor(e.currentTarget)}>
        <AccountCircle />
      </IconButton>
      <Menu anchorEl={anchor} open={!!anchor} onClose={close}>
        <MenuItem disabled>
          <ListItemText primary={session?.user.name} secondary={[session?.user.email, session?.user.organisationName].filter(Boolean).join(' · ')} />
        </MenuItem>
        <Divider />
        {others.map((o) => (
          <MenuItem
            key={o.id}
            onClick={async () => {
              close();
              const next = await switchOrganisation(o.id).catch(async () => {
                  await signOut();
                  return null;
                });
              navigate(next ? homeFor(next.user.role) : paths.signIn.path, { replace: true });
            }}
          >
            Work for {o.name}
          </MenuItem>
        ))}
        <MenuItem
          onClick={() => {
            setMode(mode === 'dark' ? 'light' : 'dark');
            close();
          }}
        >
          {mode === 'dark' ? 'Light theme' : 'Dark theme'}
        </MenuItem>
        <MenuItem
          onClick={async () => {
            close();
            await signOut();
            navigate(paths.signIn.path, { replace: true });
          }}
        >
          Sign out
        </MenuItem>
      </Menu>
    </>
  );
}
