import TableRowsOutlined from '@mui/icons-material/TableRowsOutlined';
import AddOutlined from '@mui/icons-material/AddOutlined';
import ViewKanbanOutlined from '@mui/icons-material/ViewKanbanOutlined';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import LinearProgress from '@mui/material/LinearProgress';
import { lazy, Suspense, useCallback, useMemo, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useJobStatusCounts } from '@/features/jobs/api/get-job-status-counts';
import { JobFiltersBar } from '@/features/jobs/components/job-filters-bar';
import { JobsBoard } from '@/features/jobs/components/jobs-board';
import { filtersOf, useJobScreen } from '@/features/jobs/job-filters';
import { useCustomers } from '@/features/sites/api/get-customers';
import { useDirectory } from '@/lib/directory';

// The table brings the data grid with it; the board, the first thing the office sees, does without.
// The new-job form brings the customer and site forms, their checks and the phone-number library: fetched when asked for.
const NewJobDialog = lazy(() => import('@/features/jobs/components/new-job-dialog').then((m) => ({ default: m.NewJobDialog })));
const JobsTable = lazy(() => import('@/features/jobs/components/jobs-table').then((m) => ({ default: m.JobsTable })));

export function Component() {
  const [state, change] = useJobScreen();
  const filters = useMemo(() => filtersOf(state), [state]);
  const counts = useJobStatusCounts(filters);
  const directory = useDirectory();
  const customers = useCustomers();
  const technicians = useMemo(() => (directory.data ?? []).filter((p) => p.role === 'technician' && p.active).map((p) => ({ id: p.id, name: p.name })), [directory.data]);
  // While the team's names load a card says nothing yet, rather than "Someone".
  const personName = useCallback((id: string) => directory.data?.find((p) => p.id === id)?.name ?? (directory.isPending ? '…' : 'A former member of the team'), [directory.data, directory.isPending]);
  const total = counts.data?.total;
  const navigate = useNavigate();
  const [taking, setTaking] = useState(false);
  return (
    <>
      <PageHeader
        title="Jobs"
        subtitle={
          total === undefined
            ? 'Every job, by where it stands.'
            : `${total} ${total === 1 ? 'job' : 'jobs'}${Object.values(filters).some(Boolean) ? ' match' : ''}.${state.view === 'board' ? ' Drag a card, or use its menu, to move a job on.' : ''}`
        }
        action={
          <Stack direction="row" sx={{ alignItems: 'center', gap: 2, flexWrap: 'wrap' }}>
            <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setTaking(true)}>
              New job
            </Button>
            {state.view === 'board' && (
              <FormControlLabel
                sx={{ whiteSpace: 'nowrap' }}
                control={<Switch checked={state.showClosed} onChange={(e) => change({ showClosed: e.target.checked })} />}
                label="Show done and cancelled"
              />
            )}
            <ToggleButtonGroup exclusive size="small" value={state.view} onChange={(_, view) => view && change({ view, page: state.page })} aria-label="View">
              <ToggleButton value="board" aria-label="Board">
                <ViewKanbanOutlined sx={{ mr: 1 }} /> Board
              </ToggleButton>
              <ToggleButton value="table" aria-label="Table">
                <TableRowsOutlined sx={{ mr: 1 }} /> Table
              </ToggleButton>
            </ToggleButtonGroup>
          </Stack>
        }
      />
      <JobFiltersBar
        state={state}
        change={change}
        technicians={technicians}
        customers={(customers.data?.items ?? []).map((c) => ({ id: c.id, name: c.name }))}
        withStatus={state.view === 'table'}
        counts={counts.data}
      />
      {state.view === 'board' ? (
        <JobsBoard filters={filters} counts={counts.data} showClosed={state.showClosed} personName={personName} onShowAll={(status) => change({ view: 'table', status })} />
      ) : (
        <Suspense fallback={<LinearProgress aria-label="Loading the table" />}>
          <JobsTable state={state} change={change} personName={personName} />
        </Suspense>
      )}
      {taking && (
        <Suspense fallback={<LinearProgress aria-label="Opening the new job form" sx={{ position: 'fixed', top: 0, left: 0, right: 0, zIndex: 'modal' }} />}>
          <NewJobDialog onClose={() => setTaking(false)} onCreated={(job) => navigate(paths.job.href(job.id))} />
        </Suspense>
      )}
    </>
  );
}
