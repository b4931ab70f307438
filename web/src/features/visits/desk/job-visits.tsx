import EventOutlined from '@mui/icons-material/EventOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { visitWhen } from '@/lib/visit-when';
import { useJobVisits } from '../api/get-job-visits';
import { visitStatusWords } from '../visit-format';

const time = (iso: string | null | undefined) => (iso ? new Date(iso).toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' }) : null);

/** The job's visits in time order: when, who, how far each got, and who signed it off. */
export function JobVisits({ jobId, personName }: { jobId: string; personName: (id: string) => string }) {
  const visits = useJobVisits(jobId);
  return (
    <Paper variant="outlined" component="section" aria-label="Visits" sx={{ p: 2 }}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', mb: 1 }}>
        <Typography variant="h3">Visits</Typography>
        <Button component={RouterLink} to={paths.schedule.path} startIcon={<EventOutlined />}>
          Open the schedule
        </Button>
      </Stack>
      {visits.isError ? (
        <Alert severity="error">{visits.error.message}</Alert>
      ) : visits.data?.items.length === 0 ? (
        <Typography color="text.secondary">No visits booked yet. Book one on the schedule.</Typography>
      ) : (
        // Scrolls sideways on a narrow screen: a keyboard can reach it to scroll.
        <TableContainer tabIndex={0} role="region" aria-label="Visits of this job">
          <Table size="small" aria-label="Visits of this job">
            <TableHead>
              <TableRow>
                <TableCell>Planned</TableCell>
                <TableCell>Technicians</TableCell>
                <TableCell>Status</TableCell>
                <TableCell>On site</TableCell>
                <TableCell>Signed off</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {(visits.data?.items ?? []).map((v) => (
                <TableRow key={v.id}>
                  <TableCell>
                    {/* The visit's own page: everything the technician recorded on it. */}
                    <Link component={RouterLink} to={paths.visitRecord.href(jobId, v.id)}>
                      {visitWhen(v.plannedStart)}
                      {v.plannedEnd ? `–${time(v.plannedEnd)}` : ''}
                    </Link>
                  </TableCell>
                  <TableCell>{v.technicianIds?.length ? v.technicianIds.map(personName).join(', ') : 'Nobody yet'}</TableCell>
                  <TableCell>
                    <Chip size="small" variant="outlined" label={visitStatusWords(v.status)} />
                  </TableCell>
                  <TableCell>{v.actualStart ? `${time(v.actualStart)}${v.actualEnd ? `–${time(v.actualEnd)}` : ''}` : '—'}</TableCell>
                  <TableCell>{v.signedAt ? `${v.signedByName ?? 'Signed'}, ${visitWhen(v.signedAt)}` : '—'}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}
    </Paper>
  );
}
