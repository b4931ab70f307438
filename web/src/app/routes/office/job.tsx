import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import { useQuery } from '@tanstack/react-query';
import { useCallback, useMemo } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useJob } from '@/features/jobs/api/get-jobs';
import { useJobVisits } from '@/features/jobs/api/get-job-visits';
import { jobStatusWords } from '@/features/jobs/job-status';
import { JobPhotoTrail } from '@/features/photos/components/job-photo-trail';
import { siteAreasQueryOptions } from '@/features/sites/api/get-areas';
import { siteCircuitsQueryOptions } from '@/features/sites/api/get-circuits';
import { siteQueryOptions } from '@/features/sites/api/get-sites';
import { useDirectory } from '@/lib/directory';
import { usersQueryOptions } from '@/features/team/api/get-users';
import { useSession } from '@/lib/session';

export function Component() {
  const { jobId = '' } = useParams();
  const session = useSession();
  const job = useJob(jobId);
  const siteId = job.data?.siteId ?? '';
  const site = useQuery({ ...siteQueryOptions(siteId), enabled: !!siteId });
  const areas = useQuery({ ...siteAreasQueryOptions(siteId), enabled: !!siteId });
  const circuits = useQuery({ ...siteCircuitsQueryOptions(siteId), enabled: !!siteId });
  const visits = useJobVisits(jobId);
  // Names of who took each photo: the organisation's directory, else the team list (admins only), else none.
  const directory = useDirectory();
  const users = useQuery({ ...usersQueryOptions(1), enabled: session?.user.role === 'admin' });

  const personName = useCallback(
    (userId: string) =>
      directory.data?.find((u) => u.id === userId)?.name ??
      users.data?.items.find((u) => u.id === userId)?.name ??
      (userId === session?.user.id ? session.user.name : null),
    [directory.data, users.data, session],
  );
  const areaChoices = useMemo(() => (areas.data?.items ?? []).map((a) => ({ id: a.id, name: a.level ? `${a.name} (${a.level})` : a.name })), [areas.data]);
  const subjects = useMemo(
    () => (circuits.data?.items ?? []).map((c) => ({ type: 'circuit', id: c.id, label: `Circuit ${c.number}${c.description ? ` · ${c.description}` : ''}` })),
    [circuits.data],
  );

  if (job.isPending) return <LinearProgress aria-label="Loading the job" />;
  if (job.isError) return <Alert severity="error">{job.error.message}</Alert>;
  const j = job.data;
  const place = site.data ? [site.data.name, site.data.address, site.data.postcode].filter(Boolean).join(', ') : '';
  return (
    <>
      <PageHeader
        title={j.title}
        subtitle={[j.reference, jobStatusWords(j.status), place].filter(Boolean).join(' · ')}
        action={
          <Button component={RouterLink} to={paths.jobs.path}>
            All jobs
          </Button>
        }
      />
      <JobPhotoTrail jobId={j.id} reference={j.reference} areas={areaChoices} subjects={subjects} visits={visits.data?.items ?? []} personName={personName} />
    </>
  );
}
