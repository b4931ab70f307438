import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useConflicts } from '../api/get-conflicts';

/** Says when values on this job wait to be settled, and opens the inbox at them. */
export function JobConflictsNotice({ jobId }: { jobId: string }) {
  const conflicts = useConflicts(1, jobId);
  const total = conflicts.data?.total ?? 0;
  if (!total) return null;
  return (
    <Alert
      severity="warning"
      action={
        <Button component={RouterLink} to={paths.conflicts.href(jobId)} color="inherit">
          Settle {total === 1 ? 'it' : 'them'}
        </Button>
      }
    >
      {total === 1 ? 'One value on this job was changed in two places at once' : `${total} values on this job were changed in two places at once`}: both were kept for you to choose.
    </Alert>
  );
}
