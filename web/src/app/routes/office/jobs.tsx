import ViewKanbanOutlined from '@mui/icons-material/ViewKanbanOutlined';
import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useJobs } from '@/features/jobs/api/get-jobs';
import { JobsTable } from '@/features/jobs/components/jobs-table';
import { useSites } from '@/features/sites/api/get-sites';

export function Component() {
  const jobs = useJobs();
  const sites = useSites();
  const siteName = (siteId: string) => {
    const site = sites.data?.items.find((s) => s.id === siteId);
    return site ? (site.name ?? site.address) : '—';
  };
  return (
    <>
      <PageHeader title="Jobs" subtitle="Every job, newest first. Open one to see its photo trail." />
      {jobs.isPending ? (
        <LinearProgress aria-label="Loading jobs" />
      ) : jobs.isError ? (
        <Alert severity="error">{jobs.error.message}</Alert>
      ) : jobs.data.items.length === 0 ? (
        <EmptyState icon={<ViewKanbanOutlined />} title="No jobs yet">
          Jobs you book appear here, with each job's visits and photos.
        </EmptyState>
      ) : (
        <JobsTable jobs={jobs.data.items} siteName={siteName} />
      )}
    </>
  );
}
