import NoteAddOutlined from '@mui/icons-material/NoteAddOutlined';
import Autocomplete from '@mui/material/Autocomplete';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { AgedDebt } from '@/features/invoices/components/aged-debt';
import { InvoicesTable } from '@/features/invoices/components/invoices-table';
import { type Job, useJobs } from '@/features/jobs/api/get-jobs';

/** Picks the job to quote or invoice, and goes to its billing. */
function BillAJob({ open, onClose }: { open: boolean; onClose: () => void }) {
  const jobs = useJobs();
  const navigate = useNavigate();
  const [job, setJob] = useState<Job | null>(null);
  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="bill-a-job-title">
      <DialogTitle id="bill-a-job-title">Quote or invoice a job</DialogTitle>
      <DialogContent>
        <Autocomplete
          options={jobs.data?.items ?? []}
          loading={jobs.isPending}
          value={job}
          onChange={(_, j) => setJob(j)}
          getOptionLabel={(j) => [j.reference, j.title].filter(Boolean).join(' · ')}
          renderInput={(params) => <TextField {...params} label="Job" autoFocus sx={{ mt: 1 }} />}
        />
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" disabled={!job} onClick={() => job && navigate(paths.jobInvoices.href(job.id))}>
          Go to its billing
        </Button>
      </DialogActions>
    </Dialog>
  );
}

export function Component() {
  const [billing, setBilling] = useState(false);
  return (
    <>
      <PageHeader
        title="Invoices"
        subtitle="What is owed and for how long, and every quote, invoice and credit note."
        action={
          <Button variant="contained" startIcon={<NoteAddOutlined />} onClick={() => setBilling(true)}>
            Quote or invoice a job
          </Button>
        }
      />
      <Stack spacing={4}>
        <AgedDebt jobLink={paths.jobInvoices.href} />
        <InvoicesTable jobLink={paths.jobInvoices.href} />
      </Stack>
      <BillAJob open={billing} onClose={() => setBilling(false)} />
    </>
  );
}
