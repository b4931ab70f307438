import AddOutlined from '@mui/icons-material/AddOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { circuitKindWords, deviceAndRating } from '@wiretrail/core';
import { type ReactNode, useId, useState } from 'react';
import { type Circuit, useSiteBoards, useSiteCircuits } from '../api/get-circuits';
import { CircuitDialog } from './forms/circuit-dialog';

interface Props {
  siteId: string;
  /** A column the page adds, such as the circuit's photos or its test verdicts on a job. */
  extra?: { header: string; render: (circuit: Circuit, label: string) => ReactNode };
  /** Offers adding and changing circuits. */
  editable?: boolean;
  /** A heading for the list, beside the button that adds a circuit. */
  title?: string;
}

/** The site's circuits by board, including those a technician added on site once their phone has synced. */
export function SiteCircuits({ siteId, extra, editable = false, title }: Props) {
  const boards = useSiteBoards(siteId);
  const circuits = useSiteCircuits(siteId);
  const [editing, setEditing] = useState<Circuit | 'new' | null>(null);
  const headingId = useId();
  if (boards.isPending || circuits.isPending) return <LinearProgress aria-label="Loading circuits" />;
  if (boards.isError) return <Alert severity="error">{boards.error.message}</Alert>;
  if (circuits.isError) return <Alert severity="error">{circuits.error.message}</Alert>;
  const boardName = new Map(boards.data.items.map((b) => [b.id, b.name]));
  const label = (c: Circuit) => `${boardName.get(c.boardId) ?? 'Board'}, circuit ${c.number}${c.description ? ` · ${c.description}` : ''}`;
  return (
    <Stack spacing={1.5} component={title ? 'section' : 'div'} aria-labelledby={title ? headingId : undefined}>
      {(title || editable) && (
        <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between' }}>
          {title && (
            <Typography variant="h2" id={headingId}>
              {title}
            </Typography>
          )}
          {editable && <Button
            variant="outlined"
            startIcon={<AddOutlined />}
            disabled={boards.data.items.length === 0}
            onClick={() => setEditing('new')}
          >
            Add circuit
          </Button>}
        </Stack>
      )}
      {editable && boards.data.items.length === 0 && <Alert severity="info">Add the site's board first; each circuit belongs to a board.</Alert>}
      {circuits.data.items.length === 0 ? (
        <Alert severity="info">No circuits recorded for this site yet.</Alert>
      ) : (
        // Scrolls sideways on a narrow screen: a keyboard can reach it to scroll.
        <TableContainer component={Paper} variant="outlined" tabIndex={0} role="region" aria-label="Circuits, scrolling">
          <Table aria-label="Circuits" size="small">
            <TableHead>
              <TableRow>
                <TableCell>Board</TableCell>
                <TableCell>Circuit</TableCell>
                <TableCell>Description</TableCell>
                <TableCell>Kind</TableCell>
                <TableCell>Protective device</TableCell>
                <TableCell align="right">RCD (mA)</TableCell>
                <TableCell align="right">Live / cpc (mm²)</TableCell>
                {extra && <TableCell>{extra.header}</TableCell>}
                {editable && <TableCell aria-label="Change" />}
              </TableRow>
            </TableHead>
            <TableBody>
              {circuits.data.items.map((c) => (
                <TableRow key={c.id}>
                  <TableCell>{boardName.get(c.boardId) ?? '—'}</TableCell>
                  <TableCell>{c.number}</TableCell>
                  <TableCell>{c.description ?? '—'}</TableCell>
                  <TableCell>{circuitKindWords(c.kind)}</TableCell>
                  <TableCell>{deviceAndRating(c)}</TableCell>
                  <TableCell align="right">{c.rcdRatingMa != null ? `${c.rcdRatingMa}${c.rcdType ? ` type ${c.rcdType}` : ''}` : '—'}</TableCell>
                  <TableCell align="right">{c.liveCsaMm2 && c.cpcCsaMm2 ? `${c.liveCsaMm2} / ${c.cpcCsaMm2}` : '—'}</TableCell>
                  {extra && <TableCell>{extra.render(c, label(c))}</TableCell>}
                  {editable && (
                    <TableCell padding="none">
                      <IconButton aria-label={`Change circuit ${c.number}`} onClick={() => setEditing(c)}>
                        <EditOutlined />
                      </IconButton>
                    </TableCell>
                  )}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}
      {editing && <CircuitDialog siteId={siteId} circuit={editing === 'new' ? undefined : editing} boards={boards.data.items} onClose={() => setEditing(null)} />}
    </Stack>
  );
}
