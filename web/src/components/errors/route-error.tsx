import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/** Shown when a screen fails to load or crashes; a failed chunk load usually means a newer version is out. */
export function RouteError() {
  const error = useRouteError();
  const chunkFailed = error instanceof Error && /dynamically imported module|Importing a module script failed/i.test(error.message);
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : chunkFailed
      ? 'This screen could not be loaded. The app may have been updated, or there is no signal and it was never stored on this device.'
      : 'Something went wrong on this screen.';
  return (
    <Stack spacing={2} sx={{ p: 3, maxWidth: 560, mx: 'auto' }}>
      <Alert severity="error">{message}</Alert>
      <Button variant="contained" onClick={() => window.location.reload()}>
        Reload
      </Button>
    </Stack>
  );
}
