import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import type { GridColDef, GridSortModel } from '@mui/x-data-grid';
import { Link as RouterLink } from 'react-router-dom';
import { RecordGrid } from '@/components/record-grid';
import { paths } from '@/config/paths';
import { type Job, type JobSort, useJobs } from '../api/get-jobs';
import { type JobScreenState, tableQueryOf } from '../job-filters';
import { jobStatusWords } from '../job-status';
import { visitWhen } from '@/lib/visit-when';

/** Grid columns the server can sort by, and its name for each. */
const SORT_OF: Record<string, JobSort> = { reference: 'reference', title: 'title', status: 'status', customerName: 'customer', nextVisitStart: 'nextVisit' };
const FIELD_OF = Object.fromEntries(Object.entries(SORT_OF).map(([field, sort]) => [sort, field])) as Record<JobSort, string>;

interface Props {
  state: JobScreenState;
  change: (changes: Partial<JobScreenState>) => void;
  personName: (userId: string) => string;
}

/** Every job in a table paged, sorted and filtered on the server; each title opens the job. */
export function JobsTable({ state, change, personName }: Props) {
  const jobs = useJobs(tableQueryOf(state));
  const columns: GridColDef<Job>[] = [
    { field: 'reference', headerName: 'Reference', width: 110, valueGetter: (v: string | null) => v ?? '—' },
    {
      field: 'title',
      headerName: 'Job',
      flex: 2,
      minWidth: 220,
      renderCell: ({ row }) => (
        <Link component={RouterLink} to={paths.job.href(row.id)} underline="hover" sx={{ fontWeight: 500 }}>
          {row.title}
        </Link>
      ),
    },
    { field: 'status', headerName: 'Status', width: 118, renderCell: ({ row }) => <Chip size="small" variant="outlined" label={jobStatusWords(row.status)} /> },
    {
      // Sorted by the customer's name; the site is said below it.
      field: 'customerName',
      headerName: 'Customer and site',
      flex: 1.3,
      minWidth: 180,
      renderCell: ({ row }) => (
        <div>
          <Typography variant="body2" sx={{ fontWeight: 500 }}>
            {row.customerName ?? '—'}
          </Typography>
          <Typography variant="body2" color="text.secondary">
            {row.siteName ?? '—'}
          </Typography>
        </div>
      ),
    },
    { field: 'nextVisitStart', headerName: 'Next visit', width: 150, valueGetter: (v: string | null) => visitWhen(v) },
    {
      field: 'technicianIds',
      headerName: 'Technicians',
      flex: 1,
      minWidth: 140,
      sortable: false,
      renderCell: ({ row }) => <Typography variant="body2">{row.technicianIds?.length ? row.technicianIds.map(personName).join(', ') : '—'}</Typography>,
    },
  ];
  const sortModel: GridSortModel = state.sort && FIELD_OF[state.sort] ? [{ field: FIELD_OF[state.sort], sort: state.direction }] : [];
  return (
    <RecordGrid
      label="Jobs"
      rows={jobs.data?.items ?? []}
      columns={columns}
      rowCount={jobs.data?.total ?? 0}
      loading={jobs.isFetching}
      paginationModel={{ page: state.page - 1, pageSize: state.pageSize }}
      onPaginationModelChange={(m) => change({ page: m.page + 1, pageSize: m.pageSize })}
      sortingMode="server"
      sortModel={sortModel}
      onSortModelChange={(m) => {
        const first = m[0];
        change({ sort: first ? SORT_OF[first.field] : '', direction: first?.sort === 'desc' ? 'desc' : 'asc' });
      }}
      localeText={{ noRowsLabel: jobs.isError ? jobs.error.message : 'No jobs match these filters.' }}
    />
  );
}
