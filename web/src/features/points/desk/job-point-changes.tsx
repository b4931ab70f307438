import PowerOutlined from '@mui/icons-material/PowerOutlined';
import Alert from '@mui/material/Alert';
import Typography from '@mui/material/Typography';
import type { GridColDef } from '@mui/x-data-grid';
import { EmptyState } from '@/components/empty-state';
import { BeforeWorkSummary } from '@/components/verdicts/before-work-checks';
import { RecordGrid } from '@/components/record-grid';
import { type PointChange, useJobPointChanges } from '../api/get-point-changes';

const ACTION_WORDS: Record<string, string> = { add: 'Added', move: 'Moved', remove: 'Removed', replace: 'Replaced' };
const CONNECTION_WORDS: Record<string, string> = { 'ring-extension': 'Ring extended', 'unfused-spur': 'Unfused spur', 'fused-spur': 'Fused spur', radial: 'On a radial' };

/** "Lounge · Left of the chimney breast · 450 mm". */
export function positionWords(area: string | null, description: string | null, heightMm: number | null): string {
  return [area, description, heightMm != null ? `${heightMm} mm up` : null].filter(Boolean).join(' · ') || '—';
}

function connectionWords(p: PointChange): string {
  const parts = [p.connection ? (CONNECTION_WORDS[p.connection] ?? p.connection) : null];
  if (p.addedRouteM != null) parts.push(`${p.addedRouteM} m added`);
  if (p.liveCsaMm2 != null && p.cpcCsaMm2 != null) parts.push(`${p.liveCsaMm2}/${p.cpcCsaMm2} mm²`);
  if (p.fuseRatingA != null) parts.push(`${p.fuseRatingA} A fuse`);
  if (p.loadW != null) parts.push(`${p.loadW} W load`);
  return parts.filter(Boolean).join(' · ') || '—';
}

/** What was added, moved, removed or replaced on the job's visits: where from, where to, and how it joins its circuit. */
export function JobPointChanges({ jobId }: { jobId: string }) {
  const changes = useJobPointChanges(jobId);
  const columns: GridColDef<PointChange>[] = [
    {
      field: 'action',
      headerName: 'Change',
      width: 200,
      renderCell: ({ row }) => (
        <div>
          <Typography sx={{ fontWeight: 500 }}>{ACTION_WORDS[row.action] ?? row.action}</Typography>
          <Typography variant="body2" color="text.secondary">
            {row.accessoryKind ?? 'Accessory not given'}
          </Typography>
        </div>
      ),
    },
    { field: 'from', headerName: 'From', flex: 1, minWidth: 180, valueGetter: (_v, row) => (row.action === 'add' ? '—' : positionWords(row.fromAreaName, row.fromDescription, row.fromHeightMm)) },
    { field: 'to', headerName: 'To', flex: 1, minWidth: 180, valueGetter: (_v, row) => (row.action === 'remove' ? '—' : positionWords(row.toAreaName, row.toDescription, row.toHeightMm)) },
    { field: 'circuitLabel', headerName: 'Circuit', flex: 1, minWidth: 180, valueGetter: (v: string | null) => v ?? 'Not given' },
    { field: 'connection', headerName: 'Connection', flex: 1, minWidth: 180, valueGetter: (_v, row) => connectionWords(row) },
    {
      field: 'beforeWork',
      headerName: 'Before the work',
      width: 300,
      sortable: false,
      renderCell: ({ row }) => <BeforeWorkSummary checks={row.beforeWork} what={row.accessoryKind ?? 'Point change'} />,
    },
    { field: 'concealedRoute', headerName: 'Concealed route', width: 140, sortable: false, valueGetter: (v: unknown) => (v ? 'Drawn on site' : '—') },
  ];
  if (changes.isError) return <Alert severity="error">{changes.error.message}</Alert>;
  if (changes.isSuccess && changes.data.items.length === 0) {
    return (
      <EmptyState icon={<PowerOutlined />} title="No points changed on this job yet">
        Sockets and spurs a technician adds, moves, removes or replaces appear here once their phone has synced.
      </EmptyState>
    );
  }
  return <RecordGrid label="Point changes" rows={changes.data?.items ?? []} columns={columns} loading={changes.isPending} initialState={{ pagination: { paginationModel: { pageSize: 25 } } }} />;
}
