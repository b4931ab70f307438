import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
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
      {/* Plain text, not an Alert: this screen is in the first download, and must show even when nothing else loads. */}
      <Typography role="alert" color="error" sx={{ border: 1, borderColor: 'error.main', borderRadius: 1, p: 2 }}>
        {message}
      </Typography>
      <Button variant="contained" onClick={() => window.location.reload()}>
        Reload
      </Button>
    </Stack>
  );
}
