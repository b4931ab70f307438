import AccountCircleOutlined from '@mui/icons-material/AccountCircleOutlined';
import SyncOutlined from '@mui/icons-material/SyncOutlined';
import TodayOutlined from '@mui/icons-material/TodayOutlined';
import AppBar from '@mui/material/AppBar';
import BottomNavigation from '@mui/material/BottomNavigation';
import BottomNavigationAction from '@mui/material/BottomNavigationAction';
import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Toolbar from '@mui/material/Toolbar';
import { useEffect } from 'react';
import { Link as RouterLink, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { startSync } from '@/lib/sync/sync-runner';
import { Logo } from '../logo';
import { SyncStatusChip } from '../sync-status-chip';

const TABS = [
  { ...paths.today, icon: <TodayOutlined /> },
  { ...paths.sync, icon: <SyncOutlined /> },
  { ...paths.me, icon: <AccountCircleOutlined /> },
];

/** Phone first: the thumb reaches the bottom bar; what has reached the office is always in view. */
export function TechnicianLayout() {
  const { pathname } = useLocation();
  const userId = useSession()?.user.id;
  // Sync runs while someone is signed in; signing out unmounts this layout and stops it (the outbox stays).
  useEffect(() => (userId ? startSync(userId) : undefined), [userId]);
  // A visit is opened from Today, so Today stays lit while it is open.
  const current = pathname.startsWith('/visits/') ? paths.today.path : (TABS.find((t) => pathname.startsWith(t.path))?.path ?? false);
  return (
    <Box sx={{ minHeight: '100dvh', display: 'flex', flexDirection: 'column', bgcolor: 'background.default' }}>
      <AppBar position="sticky" color="primary" elevation={0}>
        <Toolbar sx={{ justifyContent: 'space-between', gap: 1 }}>
          <Logo size={30} />
          <SyncStatusChip />
        </Toolbar>
      </AppBar>
      <Box component="main" sx={{ flex: 1, px: 2, pt: 2, pb: 12 }}>
        <Outlet />
      </Box>
      <Paper component="nav" aria-label="Main" elevation={6} sx={{ position: 'fixed', bottom: 0, left: 0, right: 0, pb: 'env(safe-area-inset-bottom)' }}>
        <BottomNavigation showLabels value={current}>
          {TABS.map((t) => (
            <BottomNavigationAction key={t.path} value={t.path} label={t.label} icon={t.icon} component={RouterLink} to={t.path} />
          ))}
        </BottomNavigation>
      </Paper>
    </Box>
  );
}

export { TechnicianLayout as Component };
