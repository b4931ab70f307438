import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import type { ReactNode } from 'react';
import { type Circuit, useSiteBoards, useSiteCircuits } from '../api/get-circuits';

const KIND = { ring: 'Ring final', radial: 'Radial', lighting: 'Lighting', other: 'Other' } as Record<string, string>;

function device(c: { deviceType: string | null; deviceRatingA: number | null }): string {
  if (!c.deviceType) return '—';
  return /^[BCD]$/.test(c.deviceType) ? `Type ${c.deviceType} ${c.deviceRatingA ?? '?'} A` : `${c.deviceType} ${c.deviceRatingA ?? '?'} A`;
}

/**
 * The site's circuits by board, including those a technician added on site once their phone has synced.
 * `photos` draws a circuit's photos in its row (given by the page, which knows about photos).
 */
export function SiteCircuits({ siteId, photos }: { siteId: string; photos?: (circuit: Circuit, label: string) => ReactNode }) {
  const boards = useSiteBoards(siteId);
  const circuits = useSiteCircuits(siteId);
  if (boards.isPending || circuits.isPending) return <LinearProgress aria-label="Loading circuits" />;
  if (boards.isError) return <Alert severity="error">{boards.error.message}</Alert>;
  if (circuits.isError) return <Alert severity="error">{circuits.error.message}</Alert>;
  const boardName = new Map(boards.data.items.map((b) => [b.id, b.name]));
  if (circuits.data.items.length === 0) return <Alert severity="info">No circuits recorded for this site yet.</Alert>;
  return (
    <TableContainer component={Paper} variant="outlined">
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
            {photos && <TableCell>Photos</TableCell>}
          </TableRow>
        </TableHead>
        <TableBody>
          {circuits.data.items.map((c) => (
            <TableRow key={c.id}>
              <TableCell>{boardName.get(c.boardId) ?? '—'}</TableCell>
              <TableCell>{c.number}</TableCell>
              <TableCell>{c.description ?? '—'}</TableCell>
              <TableCell>{c.kind ? (KIND[c.kind] ?? c.kind) : '—'}</TableCell>
              <TableCell>{device(c)}</TableCell>
              <TableCell align="right">{c.rcdRatingMa ?? '—'}</TableCell>
              <TableCell align="right">{c.liveCsaMm2 && c.cpcCsaMm2 ? `${c.liveCsaMm2} / ${c.cpcCsaMm2}` : '—'}</TableCell>
              {photos && <TableCell>{photos(c, `${boardName.get(c.boardId) ?? 'Board'}, circuit ${c.number}${c.description ? ` · ${c.description}` : ''}`)}</TableCell>}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
