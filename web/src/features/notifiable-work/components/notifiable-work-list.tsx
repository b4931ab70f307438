import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import LinearProgress from '@mui/material/LinearProgress';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Tabs from '@mui/material/Tabs';
import Typography from '@mui/material/Typography';
import { NATION_WORDS, type NotifiableJob, NOTIFICATION_STATE_WORDS } from '@wiretrail/core';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { VisuallyHidden } from '@/components/visually-hidden';
import { NOTIFIABLE_FILTERS, type NotifiableFilter, useNotifiableWork } from '../api/get-notifiable-work';
import { dayWords, dueWords, FILTER_WORDS, verdictWords, workWords } from '../notification-words';
import { NotificationSettings } from './notification-settings';
import { RecordNotificationDialog } from './record-notification-dialog';

function StateChip({ job }: { job: NotifiableJob }) {
  if (job.overdue) return <Chip color="error" label={`Overdue · ${NOTIFICATION_STATE_WORDS[job.state]}`} />;
  const done = job.state === 'certificate-received';
  return <Chip color={done ? 'success' : job.state === 'notified' ? 'info' : 'default'} variant={done ? 'filled' : 'outlined'} label={NOTIFICATION_STATE_WORDS[job.state]} />;
}

/**
 * Work that may need notifying under the Building Regulations, overdue first: why each job is notifiable, the last
 * day, and where it stands, with the scheme's reference once notified.
 */
export function NotifiableWorkList({
  jobHref,
  filter,
  onFilter,
  adminOf,
}: {
  jobHref: (jobId: string) => string;
  filter: NotifiableFilter;
  onFilter: (f: NotifiableFilter) => void;
  /** The organisation an admin may change the rules and scheme of; none for the office. */
  adminOf?: string;
}) {
  const work = useNotifiableWork(filter);
  const [recording, setRecording] = useState<NotifiableJob | null>(null);
  const [settings, setSettings] = useState(false);
  return (
    <Stack spacing={2}>
      <Alert severity="warning" role="note">
        {work.data?.caution ?? 'A reminder, not advice: the Building Regulations in force and the local building control body decide whether work is notifiable and how.'}
      </Alert>
      {work.data && (
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <Typography color="text.secondary">
            Rules for {NATION_WORDS[work.data.nation]}
            {work.data.scheme ? `, notified through ${work.data.scheme}` : ', no scheme named yet'}.{adminOf ? '' : ' An admin can change them.'}
          </Typography>
          {adminOf && <Button onClick={() => setSettings(true)}>Change the rules and scheme</Button>}
        </Stack>
      )}
      <Tabs value={filter} onChange={(_, f: NotifiableFilter) => onFilter(f)} aria-label="Which notifications" variant="scrollable" allowScrollButtonsMobile>
        {NOTIFIABLE_FILTERS.map((f) => (
          <Tab key={f} value={f} label={FILTER_WORDS[f]} />
        ))}
      </Tabs>
      {work.isPending && <LinearProgress aria-label="Loading notifiable work" />}
      {work.isError && <Alert severity="error">{work.error.message}</Alert>}
      {work.data && work.data.items.length === 0 && <Typography color="text.secondary">Nothing here.</Typography>}
      {work.data && work.data.items.length > 0 && (
        <TableContainer component={Paper} variant="outlined" tabIndex={0} role="region" aria-label="Notifiable work">
          <Table size="small" aria-label="Notifiable work">
            <TableHead>
              <TableRow>
                <TableCell>Job</TableCell>
                <TableCell>Work</TableCell>
                <TableCell>Why</TableCell>
                <TableCell>Finished</TableCell>
                <TableCell>Last day</TableCell>
                <TableCell>Where it stands</TableCell>
                <TableCell>
                  <VisuallyHidden>Action</VisuallyHidden>
                </TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {work.data.items.map((j) => (
                <TableRow key={j.jobId} aria-label={[j.reference, j.title].filter(Boolean).join(' · ')}>
                  <TableCell>
                    <Link component={RouterLink} to={jobHref(j.jobId)}>
                      {[j.reference, j.title].filter(Boolean).join(' · ')}
                    </Link>
                    <Typography variant="body2" color="text.secondary">
                      {[j.customerName, j.siteName].filter(Boolean).join(' · ')}
                    </Typography>
                  </TableCell>
                  <TableCell>{workWords(j)}</TableCell>
                  <TableCell>
                    {verdictWords(j)}
                    {j.verdict.reasons.length > 0 && (
                      <Typography variant="body2" color="text.secondary">
                        {j.verdict.reasons[0]!.source}
                        {j.verdict.reasons.some((r) => r.fromMemory) ? ' (from memory)' : ''}
                      </Typography>
                    )}
                  </TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{dayWords(j.completedOn)}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{dueWords(j)}</TableCell>
                  <TableCell>
                    <StateChip job={j} />
                    {j.schemeRef && (
                      <Typography variant="body2" color="text.secondary">
                        {j.schemeRef} · {dayWords(j.notifiedOn)}
                      </Typography>
                    )}
                  </TableCell>
                  <TableCell>
                    <Button variant="outlined" onClick={() => setRecording(j)} aria-label={`Record the notification of ${j.reference ?? j.title}`}>
                      Record
                    </Button>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}
      {settings && adminOf && work.data && <NotificationSettings organisationId={adminOf} nation={work.data.nation} scheme={work.data.scheme} onClose={() => setSettings(false)} />}
      {recording && <RecordNotificationDialog job={recording} onClose={() => setRecording(null)} />}
    </Stack>
  );
}
