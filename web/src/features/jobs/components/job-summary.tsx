import Box from '@mui/material/Box';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import Alert from '@mui/material/Alert';
import { JOB_STATUSES } from '@wiretrail/core';
import type { Job } from '../api/get-jobs';
import { useUpdateJob } from '../api/update-job';
import { JOB_STATUS_HINTS, jobStatusWords } from '../job-status';
import { visitWhen } from '@/lib/visit-when';

/** Where the job stands, and the status the office moves it on with. */
export function JobSummary({ job }: { job: Job }) {
  const update = useUpdateJob();
  return (
    <Paper variant="outlined" component="section" aria-label="Summary" sx={{ p: 2 }}>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr 1fr', md: '220px 160px 200px 1fr' }, gap: 3, alignItems: 'start' }}>
        <TextField
          select
          size="small"
          label="Status"
          value={job.status ?? ''}
          disabled={update.isPending}
          onChange={(e) => {
            const status = JOB_STATUSES.find((s) => s === e.target.value);
            if (status) update.mutate({ id: job.id, changes: { status } });
          }}
          helperText={job.status ? JOB_STATUS_HINTS[job.status] : 'Not set'}
        >
          {JOB_STATUSES.map((s) => (
            <MenuItem key={s} value={s}>
              {jobStatusWords(s)}
            </MenuItem>
          ))}
        </TextField>
        <div>
          <Typography variant="body2" color="text.secondary">
            Reference
          </Typography>
          <Typography sx={{ fontWeight: 500 }}>{job.reference ?? 'None yet'}</Typography>
        </div>
        <div>
          <Typography variant="body2" color="text.secondary">
            Next visit
          </Typography>
          <Typography sx={{ fontWeight: 500 }}>{job.nextVisitStart ? visitWhen(job.nextVisitStart) : 'None booked'}</Typography>
        </div>
        <div>
          <Typography variant="body2" color="text.secondary">
            Description
          </Typography>
          <Typography sx={{ whiteSpace: 'pre-line' }} color={job.description ? 'text.primary' : 'text.secondary'}>
            {job.description ?? 'No description yet.'}
          </Typography>
        </div>
      </Box>
      {update.isError && (
        <Alert severity="error" sx={{ mt: 2 }} onClose={() => update.reset()}>
          The status was not changed: {update.error.message}
        </Alert>
      )}
    </Paper>
  );
}
