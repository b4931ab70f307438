import Button from '@mui/material/Button';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { ConflictsInbox } from '@/features/conflicts/components/conflicts-inbox';
import { jobQueryOptions } from '@/features/jobs/api/get-jobs';

export function Component() {
  const [params] = useSearchParams();
  const jobId = params.get('jobId') ?? undefined;
  const job = useQuery({ ...jobQueryOptions(jobId ?? ''), enabled: !!jobId });
  const jobName = job.data ? [job.data.reference, job.data.title].filter(Boolean).join(' · ') : 'one job';
  return (
    <>
      <PageHeader
        title="Conflicts"
        subtitle={jobId ? `Values of ${jobName} that two people changed at once, for you to settle.` : 'Values that two people changed at once, side by side, for you to settle.'}
        action={
          jobId && (
            <Button component={RouterLink} to={paths.conflicts.href()}>
              Show every job
            </Button>
          )
        }
      />
      <ConflictsInbox jobId={jobId} />
    </>
  );
}
