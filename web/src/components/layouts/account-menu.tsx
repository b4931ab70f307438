import AccountCircle from '@mui/icons-material/AccountCircle';
import Divider from '@mui/material/Divider';
import IconButton from '@mui/material/IconButton';
import ListItemText from '@mui/material/ListItemText';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import { useColorScheme } from '@mui/material/styles';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { signOut } from '@/lib/sign-out';

export function AccountMenu() {
  const session = useSession();
  const navigate = useNavigate();
  const { mode, setMode } = useColorScheme();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const close = () => setAnchor(null);
  return (
    <>
      <IconButton color="inherit" aria-label="Account" onClick={(e) => setAnchor(e.currentTarget)}>
        <AccountCircle />
      </IconButton>
      <Menu anchorEl={anchor} open={!!anchor} onClose={close}>
        <MenuItem disabled>
          <ListItemText primary={session?.user.name} secondary={session?.user.email} />
        </MenuItem>
        <Divider />
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
