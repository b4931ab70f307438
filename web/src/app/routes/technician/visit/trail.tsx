import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { VisitTrail } from '@/features/photos/phone/visit-trail';
import { QuickNote } from '@/features/visits/phone/quick-note';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, userId, locked } = useVisitContext();
  const { visit } = summary;
  const extra = (
    <Stack spacing={1}>
      <QuickNote visitId={visit.id} siteId={visit.siteId} />
      <Button component={RouterLink} to={paths.visitHiddenRoutes.href(visit.id)} variant="outlined" sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
        Hidden routes on this site
      </Button>
    </Stack>
  );
  return <VisitTrail visit={visit} userId={userId} locked={locked} extra={extra} />;
}
