import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';

export function Component() {
  return (
    <Stack spacing={2} sx={{ p: 4, maxWidth: 480, mx: 'auto', textAlign: 'center' }}>
      <Typography variant="h1">Nothing here</Typography>
      <Typography color="text.secondary">That address is not a Wiretrail screen.</Typography>
      <Button variant="contained" component={RouterLink} to={paths.home.path}>
        Go to my start screen
      </Button>
    </Stack>
  );
}
