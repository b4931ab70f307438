import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { GridColDef } from '@mui/x-data-grid';
import { EmptyState } from '@/components/empty-state';
import { RecordGrid } from '@/components/record-grid';
import { BeforeWorkChecks, BeforeWorkSummary } from '@/components/verdicts/before-work-checks';
import { type TestResult, useJobTestResults } from '../api/get-test-results';
import { overallResult } from '../overall-result';
import { lineReadings, shortName } from './test-result-lines';
import { VerdictChip } from '@/components/verdicts/verdict-chip';

/**
 * The lines of one group (ring, insulation, RCD…): each reading with its verdict, which opens to its limit and source.
 * A group of one line needs no name beside its reading; the column says what it is.
 */
function Lines({ result, keys }: { result: TestResult; keys: string[] }) {
  const lines = result.assessment.lines.filter((l) => keys.includes(l.key));
  if (!lines.length) return <Typography color="text.secondary">—</Typography>;
  return (
    <Stack spacing={0.5}>
      {lines.map((l) => (
        <Stack key={l.key} direction="row" sx={{ alignItems: 'center', gap: 0.75 }}>
          {keys.length > 1 && (
            <Typography variant="body2" color="text.secondary" sx={{ minWidth: 36 }}>
              {shortName(l)}
            </Typography>
          )}
          <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
            {lineReadings(l, result)}
          </Typography>
          {/* The chip keeps its width: the verdict is what the column is read for. */}
          <Box sx={{ flexShrink: 0, display: 'flex' }}>
            <VerdictChip what={`${result.circuit?.label ?? 'Circuit'}: ${l.label}`} result={l.result} size="small" against="none" plain />
          </Box>
        </Stack>
      ))}
    </Stack>
  );
}

/**
 * The test results taken on the job's visits, one row per result, with the server's verdicts worked out from the
 * circuit as recorded and the site's earthing.
 */
export function JobTestResults({ jobId }: { jobId: string }) {
  const results = useJobTestResults(jobId);
  const group = (headerName: string, keys: string[], width = 170): GridColDef<TestResult> => ({
    field: headerName,
    headerName,
    width,
    sortable: false,
    renderCell: ({ row }) => <Lines result={row} keys={keys} />,
  });
  const columns: GridColDef<TestResult>[] = [
    {
      field: 'circuit',
      headerName: 'Circuit',
      flex: 1,
      minWidth: 160,
      valueGetter: (_v, row) => row.circuit?.label ?? 'No circuit given',
      renderCell: ({ row }) => (
        <Stack spacing={0.5} sx={{ alignItems: 'flex-start' }}>
          <Typography sx={{ fontWeight: 500 }}>{row.circuit?.label ?? 'No circuit given'}</Typography>
          <Typography variant="body2" color="text.secondary">
            {[row.testedAt ? new Date(row.testedAt).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' }) : null, row.instrument].filter(Boolean).join(' · ') || 'Time not recorded'}
          </Typography>
          <VerdictChip what={`${row.circuit?.label ?? 'Circuit'}: all tests`} result={overallResult(row.assessment)} size="small" prefix="Overall" />
        </Stack>
      ),
    },
    group('Ring', ['ring-r1-rn', 'ring-r2'], 240),
    group('R1+R2', ['r1r2'], 120),
    group('Insulation', ['ir-live-live', 'ir-live-earth'], 175),
    group('Polarity', ['polarity'], 130),
    group('Zs', ['zs'], 120),
    group('RCD', ['rcd-1x', 'rcd-5x', 'rcd-button'], 168),
    {
      field: 'beforeWork',
      headerName: 'Before the work',
      width: 280,
      sortable: false,
      renderCell: ({ row }) =>
        row.beforeWork.length ? (
          <Stack spacing={0.5}>
            {row.beforeWork.map((b) => (
              <BeforeWorkSummary key={b.pointChangeId} checks={b} what={`${row.circuit?.label ?? 'Circuit'}, ${b.accessoryKind ?? 'point change'}`} />
            ))}
          </Stack>
        ) : (
          <Typography color="text.secondary">—</Typography>
        ),
    },
  ];
  const withChecks = (results.data?.items ?? []).filter((r) => r.beforeWork.length > 0);
  if (results.isError) return <Alert severity="error">{results.error.message}</Alert>;
  if (results.isSuccess && results.data.items.length === 0) {
    return (
      <EmptyState icon={<FactCheckOutlined />} title="No test results on this job yet">
        Readings a technician takes on site appear here once their phone has synced, each checked against its limit.
      </EmptyState>
    );
  }
  return (
    <Stack spacing={2}>
      <RecordGrid label="Test results" rows={results.data?.items ?? []} columns={columns} loading={results.isPending} initialState={{ pagination: { paginationModel: { pageSize: 25 } } }} />
      {withChecks.map((r) =>
        r.beforeWork.map((b) => (
          <Paper key={`${r.id}-${b.pointChangeId}`} variant="outlined" sx={{ p: 2 }}>
            <BeforeWorkChecks checks={b} title={`Before the work: ${r.circuit?.label ?? 'circuit'}, ${b.accessoryKind ?? 'point change'}`} />
          </Paper>
        )),
      )}
    </Stack>
  );
}
