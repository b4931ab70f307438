import Alert from '@mui/material/Alert';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import { useEffect, useState } from 'react';
import { useOnline } from '@/components/connection-chip';
import { PageHeader } from '@/components/page-header';

interface StorageState {
  usedMb: number | null;
  quotaMb: number | null;
  persisted: boolean | null;
}

function useStorageState(): StorageState {
  const [state, setState] = useState<StorageState>({ usedMb: null, quotaMb: null, persisted: null });
  useEffect(() => {
    let live = true;
    void (async () => {
      const estimate = await navigator.storage?.estimate?.().catch(() => undefined);
      const persisted = await navigator.storage?.persisted?.().catch(() => null);
      if (live) {
        setState({
          usedMb: estimate?.usage != null ? estimate.usage / 1e6 : null,
          quotaMb: estimate?.quota != null ? estimate.quota / 1e6 : null,
          persisted: persisted ?? null,
        });
      }
    })();
    return () => {
      live = false;
    };
  }, []);
  return state;
}

const mb = (v: number | null) => (v == null ? 'unknown' : v < 10 ? `${v.toFixed(1)} MB` : `${Math.round(v)} MB`);

export function Component() {
  const online = useOnline();
  const storage = useStorageState();
  return (
    <>
      <PageHeader title="Sync" subtitle="What this phone holds, and what is waiting to reach the office." />
      {online ? (
        <Alert severity="success" sx={{ mb: 2 }}>
          Connected. Nothing is waiting to send.
        </Alert>
      ) : (
        <Alert severity="warning" sx={{ mb: 2 }}>
          No signal. Everything you record is kept on this phone and sent when the connection returns.
        </Alert>
      )}
      <Paper variant="outlined">
        <List>
          <ListItem>
            <ListItemText primary="Changes waiting" secondary="0" />
          </ListItem>
          <ListItem>
            <ListItemText primary="Storage used on this phone" secondary={`${mb(storage.usedMb)} of ${mb(storage.quotaMb)}`} />
          </ListItem>
          <ListItem>
            <ListItemText
              primary="Protected from clean-up by the browser"
              secondary={storage.persisted == null ? 'unknown' : storage.persisted ? 'Yes' : 'Not yet'}
            />
          </ListItem>
        </List>
      </Paper>
    </>
  );
}
