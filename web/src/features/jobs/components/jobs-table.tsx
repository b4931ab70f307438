import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { Job } from '../api/get-jobs';
import { jobStatusWords } from '../job-status';

/** Every job in one plain table, newest first; each title opens the job. */
export function JobsTable({ jobs, siteName }: { jobs: Job[]; siteName: (siteId: string) => string }) {
  return (
    <TableContainer component={Paper} variant="outlined">
      <Table aria-label="Jobs" size="small">
        <TableHead>
          <TableRow>
            <TableCell>Reference</TableCell>
            <TableCell>Job</TableCell>
            <TableCell>Status</TableCell>
            <TableCell>Site</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {jobs.map((j) => (
            <TableRow key={j.id} hover>
              <TableCell sx={{ whiteSpace: 'nowrap' }}>{j.reference ?? '—'}</TableCell>
              <TableCell>
                <Link component={RouterLink} to={paths.job.href(j.id)} underline="hover" sx={{ fontWeight: 500 }}>
                  {j.title}
                </Link>
              </TableCell>
              <TableCell>
                <Chip size="small" label={jobStatusWords(j.status)} variant="outlined" />
              </TableCell>
              <TableCell>{siteName(j.siteId)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
