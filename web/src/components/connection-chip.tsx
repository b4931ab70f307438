import CloudDoneOutlined from '@mui/icons-material/CloudDoneOutlined';
import CloudOffOutlined from '@mui/icons-material/CloudOffOutlined';
import Chip from '@mui/material/Chip';
import { useSyncExternalStore } from 'react';

function subscribe(cb: () => void) {
  window.addEventListener('online', cb);
  window.addEventListener('offline', cb);
  return () => {
    window.removeEventListener('online', cb);
    window.removeEventListener('offline', cb);
  };
}

export function useOnline(): boolean {
  return useSyncExternalStore(subscribe, () => navigator.onLine, () => true);
}

/** Always visible to the technician: whether what they record can reach the office now. */
export function ConnectionChip() {
  const online = useOnline();
  return online ? (
    <Chip icon={<CloudDoneOutlined />} label="Online" size="small" color="success" variant="outlined" sx={{ bgcolor: 'background.paper' }} />
  ) : (
    <Chip icon={<CloudOffOutlined />} label="No signal — saving on this phone" size="small" color="warning" sx={{ fontWeight: 500 }} />
  );
}
