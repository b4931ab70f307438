import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { JobInvoices } from '@/features/invoices/components/job-invoices';
import { useJob } from '@/features/jobs/api/get-jobs';
import { jobStatusWords } from '@/features/jobs/job-status';

/** One job's billing, reached from the invoices screen. */
export function Component() {
  const { jobId = '' } = useParams();
  const job = useJob(jobId);
  if (job.isPending) return <LinearProgress aria-label="Loading the job" />;
  if (job.isError) return <Alert severity="error">{job.error.message}</Alert>;
  return (
    <>
      <PageHeader
        title={job.data.title}
        subtitle={[job.data.reference, jobStatusWords(job.data.status)].filter(Boolean).join(' · ')}
        action={
          <Stack direction="row" spacing={1}>
            <Button component={RouterLink} to={paths.job.href(job.data.id)}>
              The job
            </Button>
            <Button component={RouterLink} to={paths.invoices.path}>
              All invoices
            </Button>
          </Stack>
        }
      />
      <JobInvoices jobId={job.data.id} />
    </>
  );
}
