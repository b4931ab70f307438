import CalendarMonthOutlined from '@mui/icons-material/CalendarMonthOutlined';
import AssignmentTurnedInOutlined from '@mui/icons-material/AssignmentTurnedInOutlined';
import CallSplitOutlined from '@mui/icons-material/CallSplitOutlined';
import GroupsOutlined from '@mui/icons-material/GroupsOutlined';
import HomeWorkOutlined from '@mui/icons-material/HomeWorkOutlined';
import ReceiptLongOutlined from '@mui/icons-material/ReceiptLongOutlined';
import SellOutlined from '@mui/icons-material/SellOutlined';
import MenuOutlined from '@mui/icons-material/MenuOutlined';
import ViewKanbanOutlined from '@mui/icons-material/ViewKanbanOutlined';
import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import Drawer from '@mui/material/Drawer';
import IconButton from '@mui/material/IconButton';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Toolbar from '@mui/material/Toolbar';
import type { Theme } from '@mui/material/styles';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useSession } from '@/lib/session';
import { Logo } from '../logo';
import { AccountMenu } from './account-menu';

const DRAWER_WIDTH = 248;

const NAV = [
  { ...paths.jobs, icon: <ViewKanbanOutlined />, adminOnly: false },
  { ...paths.schedule, icon: <CalendarMonthOutlined />, adminOnly: false },
  { ...paths.customers, icon: <HomeWorkOutlined />, adminOnly: false },
  { ...paths.conflicts, icon: <CallSplitOutlined />, adminOnly: false },
  { ...paths.invoices, icon: <ReceiptLongOutlined />, adminOnly: false },
  { ...paths.notifiableWork, icon: <AssignmentTurnedInOutlined />, adminOnly: false },
  { ...paths.priceList, icon: <SellOutlined />, adminOnly: false },
  { ...paths.team, icon: <GroupsOutlined />, adminOnly: true },
];

/**
 * Desk first: navigation always open on the left, the organisation and the account on top. On a narrow screen (the
 * office's own phone) the navigation folds behind a menu button, so the page keeps the width.
 */
export function OfficeLayout() {
  const session = useSession();
  const { pathname } = useLocation();
  const wide = useMediaQuery((t: Theme) => t.breakpoints.up('md'), { noSsr: true });
  const [menuOpen, setMenuOpen] = useState(false);
  const organisation = useQuery({
    queryKey: ['organisations', 'current'],
    queryFn: ({ signal }) => api.get<{ name: string }>('/organisations/current', signal),
    staleTime: 5 * 60_000,
  });
  const items = NAV.filter((n) => !n.adminOnly || session?.user.role === 'admin');
  return (
    <Box sx={{ display: 'flex', minHeight: '100dvh', bgcolor: 'background.default' }}>
      <AppBar position="fixed" elevation={0} sx={{ zIndex: (t) => t.zIndex.drawer + 1 }}>
        <Toolbar sx={{ gap: { xs: 1, md: 2 } }}>
          {!wide && (
            <IconButton color="inherit" edge="start" aria-label="Menu" aria-expanded={menuOpen} onClick={() => setMenuOpen(true)}>
              <MenuOutlined />
            </IconButton>
          )}
          <Logo size={30} />
          <Typography sx={{ flex: 1, opacity: 0.85 }} noWrap>
            {organisation.data?.name}
          </Typography>
          <AccountMenu />
        </Toolbar>
      </AppBar>
      <Drawer
        variant={wide ? 'permanent' : 'temporary'}
        open={wide || menuOpen}
        onClose={() => setMenuOpen(false)}
        sx={{ width: wide ? DRAWER_WIDTH : 0, flexShrink: 0, '& .MuiDrawer-paper': { width: DRAWER_WIDTH, boxSizing: 'border-box' } }}
      >
        {wide && <Toolbar />}
        <List component="nav" aria-label="Main" sx={{ px: 1 }}>
          {items.map((n) => (
            <ListItemButton key={n.path} component={RouterLink} to={n.path} selected={pathname.startsWith(n.path) || (n.path === paths.customers.path && pathname.startsWith('/sites/'))} onClick={() => setMenuOpen(false)} sx={{ borderRadius: 2, mb: 0.5 }}>
              <ListItemIcon>{n.icon}</ListItemIcon>
              <ListItemText primary={n.label} />
            </ListItemButton>
          ))}
        </List>
      </Drawer>
      <Box component="main" sx={{ flex: 1, p: { xs: 2, md: 3 }, minWidth: 0 }}>
        <Toolbar />
        <Outlet />
      </Box>
    </Box>
  );
}

export { OfficeLayout as Component };
