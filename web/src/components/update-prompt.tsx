import Button from '@mui/material/Button';
import Snackbar from '@mui/material/Snackbar';
import { useRegisterSW } from 'virtual:pwa-register/react';

/**
 * A new version waits until the user says so: swapping it in unasked could lose a half-filled form
 * or break screens that are still loading parts of the old version.
 */
export function UpdatePrompt() {
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    onRegisteredSW(_url, registration) {
      // Look for a new version every hour while the app stays open.
      if (registration) setInterval(() => void registration.update().catch(() => undefined), 60 * 60 * 1000);
    },
  });
  return (
    <Snackbar
      open={needRefresh}
      message="A new version of Wiretrail is ready."
      anchorOrigin={{ vertical: 'top', horizontal: 'center' }}
      action={
        <>
          <Button color="inherit" onClick={() => setNeedRefresh(false)}>
            Later
          </Button>
          <Button color="secondary" variant="contained" onClick={() => void updateServiceWorker(true)}>
            Use it now
          </Button>
        </>
      }
    />
  );
}
