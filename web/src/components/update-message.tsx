import Button from '@mui/material/Button';
import Snackbar from '@mui/material/Snackbar';

export default function UpdateMessage({ onLater, onUpdate }: { onLater: () => void; onUpdate: () => void }) {
  return (
    <Snackbar
      open
      message="A new version of Wiretrail is ready."
      anchorOrigin={{ vertical: 'top', horizontal: 'center' }}
      action={
        <>
          <Button color="inherit" onClick={onLater}>
            Later
          </Button>
          <Button color="secondary" variant="contained" onClick={onUpdate}>
            Use it now
          </Button>
        </>
      }
    />
  );
}
