import CloudDoneOutlined from '@mui/icons-material/CloudDoneOutlined';
import CloudOffOutlined from '@mui/icons-material/CloudOffOutlined';
import CloudSyncOutlined from '@mui/icons-material/CloudSyncOutlined';
import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import ErrorOutlined from '@mui/icons-material/ErrorOutlined';
import Box from '@mui/material/Box';
import Chip, { type ChipProps } from '@mui/material/Chip';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { type SyncStatus, useSyncStatus } from '@/lib/sync/use-sync-status';

interface ChipLook {
  label: string;
  icon: ChipProps['icon'];
  color: ChipProps['color'];
}

/** One short line on what has reached the office; the Sync page has the detail. */
export function syncChipLook(s: SyncStatus): ChipLook {
  const waiting = s.pending > 0 ? ` · ${s.pending} waiting` : '';
  if (!s.online) return { label: `No signal — saving on this phone${waiting}`, icon: <CloudOffOutlined />, color: 'warning' };
  if (s.failed > 0) return { label: `${s.failed} not sent — see Sync${waiting}`, icon: <ErrorOutlined />, color: 'error' };
  if (s.syncing) return { label: s.pending > 0 || s.photosWaiting > 0 ? 'Sending…' : 'Syncing…', icon: <CloudSyncOutlined />, color: 'info' };
  if (s.pending > 0) return { label: `Saved on phone${waiting}`, icon: <CloudUploadOutlined />, color: 'warning' };
  if (s.photosWaiting > 0) {
    const photos = s.photosWaiting === 1 ? '1 photo' : `${s.photosWaiting} photos`;
    return { label: `${photos} waiting to send`, icon: <CloudUploadOutlined />, color: 'warning' };
  }
  if (!s.lastSyncAt) return { label: 'Not synced yet', icon: <CloudSyncOutlined />, color: 'default' };
  return { label: 'Up to date', icon: <CloudDoneOutlined />, color: 'success' };
}

/** Always in view for the technician; tapping it opens the Sync page. */
export function SyncStatusChip() {
  const status = useSyncStatus();
  const navigate = useNavigate();
  const look = syncChipLook(status);
  return (
    <Box role="status" sx={{ minWidth: 0 }}>
      <Chip
        icon={look.icon}
        label={look.label}
        color={look.color}
        onClick={() => navigate(paths.sync.path)}
        sx={{
          fontWeight: 500,
          maxWidth: '100%',
          height: 'auto',
          // A thumb's width (WCAG 2.5.5): it opens the Sync page.
          minHeight: 44,
          bgcolor: look.color === 'default' ? 'background.paper' : undefined,
          '& .MuiChip-label': { whiteSpace: 'normal', py: 0.5 },
        }}
      />
    </Box>
  );
}
