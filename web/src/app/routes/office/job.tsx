import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { VERDICT_DISCLAIMER } from '@wiretrail/core';
import { useCallback, useMemo } from 'react';
import { Link as RouterLink, useParams, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { SafetyCaution } from '@/components/safety-caution';
import { paths } from '@/config/paths';
import { CableSchedule } from '@/features/cables/desk/cable-schedule';
import { LinkTestResults } from '@/features/cables/desk/link-test-results';
import { JobConflictsNotice } from '@/features/conflicts/components/job-conflicts-notice';
import { HeldChanges } from '@/features/documents/components/held-changes';
import { JobDocuments } from '@/features/documents/components/job-documents';
import { JobInvoices } from '@/features/invoices/components/job-invoices';
import { useJob } from '@/features/jobs/api/get-jobs';
import { useJobVisits } from '@/features/visits/api/get-job-visits';
import { JobSummary } from '@/features/jobs/components/job-summary';
import { JobVisits } from '@/features/visits/desk/job-visits';
import { JobPhotoTrail } from '@/features/photos/desk/job-photo-trail';
import { JobPointChanges } from '@/features/points/desk/job-point-changes';
import { siteAreasQueryOptions } from '@/features/sites/api/get-areas';
import { siteCircuitsQueryOptions } from '@/features/sites/api/get-circuits';
import { siteQueryOptions } from '@/features/sites/api/get-sites';
import { JobShareLinks } from '@/features/share-links/components/job-share-links';
import { CustomerAndSite } from '@/features/sites/components/customer-and-site';
import { SiteCircuits } from '@/features/sites/components/site-circuits';
import { usersQueryOptions } from '@/features/team/api/get-users';
import { CircuitTestVerdict } from '@/features/circuits/desk/circuit-test-verdict';
import { JobTestResults } from '@/features/circuits/desk/job-test-results';
import { useDirectory } from '@/lib/directory';
import { useSession } from '@/lib/session';

const TABS = [
  { value: 'overview', label: 'Overview' },
  { value: 'photos', label: 'Photo trail' },
  { value: 'cables', label: 'Cable schedule' },
  { value: 'points', label: 'Points' },
  { value: 'tests', label: 'Circuits & tests' },
  { value: 'documents', label: 'Documents & links' },
  { value: 'invoices', label: 'Quotes & invoices' },
] as const;
type TabValue = (typeof TABS)[number]['value'];

export function Component() {
  const { jobId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const tab: TabValue = TABS.some((t) => t.value === params.get('tab')) ? (params.get('tab') as TabValue) : 'overview';
  const session = useSession();
  const job = useJob(jobId);
  const siteId = job.data?.siteId ?? '';
  const site = useQuery({ ...siteQueryOptions(siteId), enabled: !!siteId });
  const areas = useQuery({ ...siteAreasQueryOptions(siteId), enabled: !!siteId && tab === 'photos' });
  const circuits = useQuery({ ...siteCircuitsQueryOptions(siteId), enabled: !!siteId && tab === 'photos' });
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
  const siteName = site.data ? (site.data.name ?? site.data.address) : null;
  return (
    <>
      <PageHeader
        title={j.title}
        subtitle={[j.reference, j.customerName, siteName].filter(Boolean).join(' · ')}
        action={
          <Button component={RouterLink} to={paths.jobs.path}>
            All jobs
          </Button>
        }
      />
      <Stack spacing={2}>
        <JobSummary job={j} />
        <JobConflictsNotice jobId={j.id} />
        <HeldChanges jobId={j.id} />
        <Box sx={{ borderBottom: 1, borderColor: 'divider' }}>
          <Tabs variant="scrollable" scrollButtons="auto" allowScrollButtonsMobile value={tab} onChange={(_, value: TabValue) => setParams(value === 'overview' ? {} : { tab: value }, { replace: true })} aria-label="Job record">
            {TABS.map((t) => (
              <Tab key={t.value} value={t.value} label={t.label} id={`job-tab-${t.value}`} aria-controls={`job-panel-${t.value}`} />
            ))}
          </Tabs>
        </Box>
        <Box role="tabpanel" id={`job-panel-${tab}`} aria-labelledby={`job-tab-${tab}`}>
          {tab === 'overview' && (
            <Stack spacing={2}>
              <CustomerAndSite customerId={j.customerId} siteId={j.siteId} />
              <JobVisits jobId={j.id} personName={(id) => personName(id) ?? (directory.isPending ? '…' : 'A former member of the team')} />
            </Stack>
          )}
          {tab === 'photos' && (
            <JobPhotoTrail jobId={j.id} siteId={j.siteId} reference={j.reference} areas={areaChoices} subjects={subjects} visits={visits.data?.items ?? []} personName={personName} />
          )}
          {tab === 'cables' && (
            <Stack spacing={3}>
              <CableSchedule siteId={j.siteId} jobId={j.id} reference={j.reference} siteName={siteName} />
              <LinkTestResults jobId={j.id} siteId={j.siteId} reference={j.reference} />
            </Stack>
          )}
          {tab === 'points' && (
            <>
              <SafetyCaution />
              <JobPointChanges jobId={j.id} />
            </>
          )}
          {tab === 'documents' && (
            <Stack spacing={3}>
              <JobDocuments jobId={j.id} />
              <JobShareLinks jobId={j.id} />
            </Stack>
          )}
          {tab === 'invoices' && <JobInvoices jobId={j.id} />}
          {tab === 'tests' && (
            <Stack spacing={2}>
              <SafetyCaution />
              <SiteCircuits
                siteId={j.siteId}
                title="Circuits at the site"
                extra={{ header: 'On this job', render: (c, label) => <CircuitTestVerdict jobId={j.id} circuitId={c.id} circuitLabel={label} /> }}
              />
              <section aria-labelledby="job-tests-heading">
                <Typography variant="h2" id="job-tests-heading" sx={{ mb: 1.5 }}>
                  Test results
                </Typography>
                <JobTestResults jobId={j.id} />
              </section>
              <Typography variant="body2" color="text.secondary">
                Verdicts are worked out again by the server from the readings, the circuit as recorded now and the site's earthing. Open one to see
                its limit and source. {VERDICT_DISCLAIMER}
              </Typography>
            </Stack>
          )}
        </Box>
      </Stack>
    </>
  );
}
