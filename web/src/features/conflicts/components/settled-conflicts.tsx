import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { Conflict } from '../api/get-conflicts';
import { useConflicts } from '../api/get-conflicts';
import { entityName, fieldName, showValue } from './conflict-words';

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' }) : '—');

/** What the office chose, in words: the value kept, the other value, or one typed. */
function chosen(c: Conflict): string {
  const r = c.resolution as { choice?: string; value?: unknown } | null;
  if (r?.choice === 'discarded') return `The other value: ${showValue(c.discardedValue)}`;
  if (r?.choice === 'value') return `Typed: ${showValue(r.value)}`;
  return `Kept as it was: ${showValue(c.keptValue)}`;
}

/** Conflicts already settled, newest first: what, which value stands now, who settled it and when. */
export function SettledConflicts({ jobId, nameOf }: { jobId?: string; nameOf: (id: string | null) => string }) {
  const settled = useConflicts(1, jobId, true);
  if (settled.isPending) return <LinearProgress aria-label="Loading settled conflicts" />;
  if (settled.isError) return <Alert severity="error">{settled.error.message}</Alert>;
  if (settled.data.items.length === 0) return <Typography color="text.secondary">Nothing settled yet.</Typography>;
  return (
    <TableContainer component={Paper} variant="outlined" tabIndex={0} role="region" aria-label="Settled conflicts">
      <Table size="small" aria-label="Settled conflicts">
        <TableHead>
          <TableRow>
            <TableCell>Record</TableCell>
            <TableCell>Detail</TableCell>
            <TableCell>Settled as</TableCell>
            <TableCell>Settled by</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {settled.data.items.map((c) => (
            <TableRow key={c.id}>
              <TableCell>
                {c.subject?.title ?? entityName(c.entity)}
                {!!c.subject?.context.length && (
                  <Typography variant="body2" color="text.secondary">
                    {c.subject.context.join(' · ')}
                  </Typography>
                )}
              </TableCell>
              <TableCell>{fieldName(c.field)}</TableCell>
              <TableCell sx={{ overflowWrap: 'anywhere' }}>{chosen(c)}</TableCell>
              <TableCell>
                {nameOf(c.resolvedById)}, {when(c.resolvedAt)}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
