import ClearOutlined from '@mui/icons-material/ClearOutlined';
import SearchOutlined from '@mui/icons-material/SearchOutlined';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { JOB_STATUSES } from '@wiretrail/core';
import { useEffect, useState } from 'react';
import { DateInputOnDemand } from '@/components/forms/date-input-on-demand';
import type { JobStatusCounts } from '../api/get-job-status-counts';
import type { JobScreenState } from '../job-filters';
import { jobStatusWords } from '../job-status';

export interface Choice {
  id: string;
  name: string;
}

interface Props {
  state: JobScreenState;
  change: (changes: Partial<JobScreenState>) => void;
  technicians: Choice[];
  customers: Choice[];
  /** The table filters by status too; the board's columns are the statuses. */
  withStatus: boolean;
  counts?: JobStatusCounts;
}

const SEARCH_PAUSE_MS = 300;

/** Search and filters above the board and the table: by words, status, customer, technician and the dates of visits. */
export function JobFiltersBar({ state, change, technicians, customers, withStatus, counts }: Props) {
  // Typing waits for a pause before asking the server again.
  const [search, setSearch] = useState(state.search);
  useEffect(() => setSearch(state.search), [state.search]);
  useEffect(() => {
    if (search === state.search) return;
    const timer = setTimeout(() => change({ search }), SEARCH_PAUSE_MS);
    return () => clearTimeout(timer);
  }, [search, state.search, change]);

  const toBeforeFrom = !!state.fromDate && !!state.toDate && state.toDate < state.fromDate;
  const filtered = !!(state.search || state.status || state.customerId || state.technicianId || state.fromDate || state.toDate);
  const small = { size: 'small' as const, fullWidth: false };
  // A choice left at "any" still reads as such, rather than as an empty box.
  const choice = { ...small, select: true, slotProps: { select: { displayEmpty: true }, inputLabel: { shrink: true } } };
  return (
    <Stack role="search" direction="row" aria-label="Find jobs" sx={{ gap: 1.5, flexWrap: 'wrap', alignItems: 'flex-start', mb: 2 }}>
      <TextField
        {...small}
        label="Search"
        placeholder="Reference, customer, address"
        value={search}
        onChange={(e) => setSearch(e.target.value)}
        sx={{ width: 250 }}
        slotProps={{ input: { startAdornment: <InputAdornment position="start"><SearchOutlined fontSize="small" /></InputAdornment> } }}
      />
      {withStatus && (
        <TextField {...choice} label="Status" value={state.status} onChange={(e) => change({ status: e.target.value })} sx={{ width: 160 }}>
          <MenuItem value="">Any status</MenuItem>
          {JOB_STATUSES.map((s) => (
            <MenuItem key={s} value={s}>
              {jobStatusWords(s)}
              {counts ? ` (${counts.counts[s]})` : ''}
            </MenuItem>
          ))}
        </TextField>
      )}
      <TextField {...choice} label="Customer" value={state.customerId} onChange={(e) => change({ customerId: e.target.value })} sx={{ width: 200 }}>
        <MenuItem value="">Any customer</MenuItem>
        {customers.map((c) => (
          <MenuItem key={c.id} value={c.id}>
            {c.name}
          </MenuItem>
        ))}
      </TextField>
      <TextField {...choice} label="Technician" value={state.technicianId} onChange={(e) => change({ technicianId: e.target.value })} sx={{ width: 170 }}>
        <MenuItem value="">Anyone</MenuItem>
        {technicians.map((t) => (
          <MenuItem key={t.id} value={t.id}>
            {t.name}
          </MenuItem>
        ))}
      </TextField>
      {(
        [
          ['fromDate', 'Visits from', false],
          ['toDate', 'Visits to', toBeforeFrom],
        ] as const
      ).map(([key, label, wrong]) => (
        <DateInputOnDemand
          key={key}
          size="small"
          label={label}
          value={state[key]}
          onChange={(value) => change({ [key]: value })}
          error={wrong}
          helperText={wrong ? 'Visits to must not be before Visits from.' : undefined}
          sx={{ width: 175 }}
        />
      ))}
      {filtered && (
        <Button
          startIcon={<ClearOutlined />}
          onClick={() => {
            setSearch('');
            change({ search: '', status: '', customerId: '', technicianId: '', fromDate: '', toDate: '' });
          }}
          sx={{ minHeight: 40 }}
        >
          Clear filters
        </Button>
      )}
    </Stack>
  );
}
