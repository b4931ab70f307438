import CloudSyncOutlined from '@mui/icons-material/CloudSyncOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import { useEffect, useState } from 'react';
import { PageHeader } from '@/components/page-header';
import { PhotoUploads } from '@/features/photos/phone/photo-uploads';
import { FailedChanges } from '@/features/sync/components/failed-changes';
import { dataSize } from '@/lib/data-size';
import { useSession } from '@/lib/session';
import { syncNow } from '@/lib/sync/sync-runner';
import { useSyncStatus } from '@/lib/sync/use-sync-status';

interface StorageState {
  usedBytes: number | null;
  quotaBytes: number | null;
  persisted: boolean | null;
}

function useStorageState(refreshKey: unknown): StorageState {
  const [state, setState] = useState<StorageState>({ usedBytes: null, quotaBytes: null, persisted: null });
  useEffect(() => {
    let live = true;
    void (async () => {
      const estimate = await navigator.storage?.estimate?.().catch(() => undefined);
      const persisted = await navigator.storage?.persisted?.().catch(() => null);
      if (live) {
        setState({
          usedBytes: estimate?.usage != null ? estimate.usage : null,
          quotaBytes: estimate?.quota != null ? estimate.quota : null,
          persisted: persisted ?? null,
        });
      }
    })();
    return () => {
      live = false;
    };
  }, [refreshKey]);
  return state;
}

const size = (bytes: number | null) => (bytes == null ? 'unknown' : dataSize(bytes));
const when = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

function ago(iso: string, now: number): string {
  const minutes = Math.round((now - Date.parse(iso)) / 60_000);
  if (minutes < 1) return 'just now';
  if (minutes < 60) return `${minutes} min ago`;
  const hours = Math.round(minutes / 60);
  return hours < 48 ? `${hours} h ago` : `${Math.round(hours / 24)} days ago`;
}

function waitingWords(n: number): string {
  return n === 0 ? 'Nothing waiting' : n === 1 ? '1 change waiting to send' : `${n} changes waiting to send`;
}

export function Component() {
  const session = useSession();
  const status = useSyncStatus();
  const storage = useStorageState(status.lastSyncAt);
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNow(Date.now()), 30_000);
    return () => clearInterval(t);
  }, []);

  return (
    <>
      <PageHeader title="Sync" subtitle="What this phone holds, and what is waiting to reach the office." />
      {!status.online ? (
        <Alert severity="warning" sx={{ mb: 2 }}>
          No signal. Everything you record is kept on this phone and sent when the connection returns.
          {status.pending > 0 ? ` ${waitingWords(status.pending)}.` : ''}
        </Alert>
      ) : status.syncing ? (
        <Alert severity="info" sx={{ mb: 2 }}>
          Sending and fetching…
        </Alert>
      ) : status.lastError ? (
        <Alert severity="warning" sx={{ mb: 2 }}>
          {status.lastError}
        </Alert>
      ) : status.pending > 0 ? (
        <Alert severity="info" sx={{ mb: 2 }}>
          {waitingWords(status.pending)}. They go out on their own in a moment, or tap Sync now.
        </Alert>
      ) : status.lastSyncAt ? (
        <Alert severity="success" sx={{ mb: 2 }}>
          Up to date. Nothing is waiting to send.
        </Alert>
      ) : null}
      <Stack spacing={2}>
        <Button
          variant="contained"
          size="large"
          startIcon={<CloudSyncOutlined />}
          disabled={!status.online || status.syncing}
          onClick={() => void syncNow()}
          sx={{ minHeight: 56 }}
        >
          {status.syncing ? 'Syncing…' : 'Sync now'}
        </Button>
        {session && <FailedChanges userId={session.user.id} />}
        <Paper variant="outlined">
          <List>
            <ListItem>
              <ListItemText primary="Changes waiting" secondary={status.ready ? waitingWords(status.pending) : '…'} />
            </ListItem>
            <ListItem>
              <ListItemText
                primary="Last successful sync"
                secondary={status.lastSyncAt ? `${when.format(new Date(status.lastSyncAt))} (${ago(status.lastSyncAt, now)})` : 'Not yet on this phone'}
              />
            </ListItem>
            <ListItem>
              <ListItemText primary="Storage used on this phone" secondary={`${size(storage.usedBytes)} of ${size(storage.quotaBytes)}`} />
            </ListItem>
            <ListItem>
              <ListItemText
                primary="Protected from clean-up by the browser"
                secondary={
                  storage.persisted == null
                    ? 'unknown'
                    : storage.persisted
                      ? 'Yes'
                      : 'Not granted. Add Wiretrail to the home screen and open it daily so the browser keeps its records.'
                }
              />
            </ListItem>
          </List>
        </Paper>
        {session && <PhotoUploads userId={session.user.id} />}
      </Stack>
    </>
  );
}
