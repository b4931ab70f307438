import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import SettingsEthernetOutlined from '@mui/icons-material/SettingsEthernetOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Tooltip from '@mui/material/Tooltip';
import Typography from '@mui/material/Typography';
import type { GridColDef } from '@mui/x-data-grid';
import { DEFAULT_RULE_SET, isVoided, unvoided, VERDICT_DISCLAIMER } from '@wiretrail/core';
import { useState } from 'react';
import { EmptyState } from '@/components/empty-state';
import { RecordGrid } from '@/components/record-grid';
import { VoidedMark, voidedSx } from '@/components/records/voided-mark';
import { VerdictChip } from '@/components/verdicts/verdict-chip';
import { type CableRun, useCableSchedule } from '../api/get-cable-runs';
import { cableScheduleCsv, cableScheduleFileName, downloadCsv } from './cable-schedule-csv';
import { cableStatusWords } from '../cable-words';
import { endWords, testedDay, testedTime, wiremapWords } from './cable-schedule-words';
import { CorrectCableRunDialog } from './correct-cable-run-dialog';

function Verdict({ run }: { run: CableRun }) {
  const a = run.assessment;
  const why = [...a.missing.map((m) => `Still to record: ${m}.`), ...a.problems, ...a.notes, a.length ? `Length ${a.length.note} (${a.length.source})` : null].filter(Boolean).join(' ');
  return (
    <Tooltip title={why || 'Wiremap and length within the limits.'}>
      <Stack spacing={0.25} sx={{ alignItems: 'flex-start' }}>
        <VerdictChip verdict={a.verdict} />
        {a.length?.verdict === 'fail' && (
          <Typography variant="caption" color="error">
            over {a.length.limit} {a.length.unit}
          </Typography>
        )}
      </Stack>
    </Tooltip>
  );
}

interface Props {
  siteId: string;
  jobId: string;
  /** For the exported file's name. */
  reference: string | null;
  siteName: string | null;
}

/**
 * The site's cable schedule: every run with both ends, its medium, scheme and length, the wiremap with any fault named,
 * and when it was last tested, judged again by the server. Exported as CSV; labels and end descriptions can be corrected.
 */
export function CableSchedule({ siteId, jobId, reference, siteName }: Props) {
  const [onlyThisJob, setOnlyThisJob] = useState(false);
  const schedule = useCableSchedule({ siteId, jobId: onlyThisJob ? jobId : undefined });
  const [correcting, setCorrecting] = useState<CableRun | null>(null);
  const runs = schedule.data ?? [];

  const columns: GridColDef<CableRun>[] = [
    {
      field: 'label',
      headerName: 'Label',
      width: 136,
      renderCell: ({ row }) => (
        <Stack direction="row" sx={{ alignItems: 'center', width: '100%' }}>
          <div style={{ flex: 1, minWidth: 0 }}>
            <Typography sx={{ fontWeight: 500, overflowWrap: 'anywhere', ...voidedSx(row) }}>{row.label}</Typography>
            {isVoided(row) ? (
              <VoidedMark row={row} />
            ) : (
              <Typography variant="body2" color="text.secondary">
                {cableStatusWords(row.status)}
              </Typography>
            )}
          </div>
          <Tooltip title="Correct the label or ends">
            <IconButton size="small" aria-label={`Correct ${row.label}`} onClick={() => setCorrecting(row)} sx={{ minWidth: 40, minHeight: 40 }}>
              <EditOutlined fontSize="small" />
            </IconButton>
          </Tooltip>
        </Stack>
      ),
    },
    { field: 'from', headerName: 'From', flex: 1, minWidth: 140, valueGetter: (_v, row) => endWords(row.endAAreaName, row.endADescription, row.endATermination) },
    { field: 'to', headerName: 'To', flex: 1, minWidth: 140, valueGetter: (_v, row) => endWords(row.endBAreaName, row.endBDescription, row.endBTermination) },
    {
      field: 'medium',
      headerName: 'Medium',
      width: 100,
      renderCell: ({ row }) => (
        <div>
          <Typography>{row.medium ?? '—'}</Typography>
          {row.scheme && (
            <Typography variant="body2" color="text.secondary">
              {row.scheme}
            </Typography>
          )}
        </div>
      ),
    },
    { field: 'lengthM', headerName: 'Length', width: 88, type: 'number', valueFormatter: (v: number | null) => (v == null ? '—' : `${v} m`) },
    { field: 'wiremap', headerName: 'Wiremap', flex: 1.2, minWidth: 180, sortable: false, valueGetter: (_v, row) => wiremapWords(row) },
    { field: 'verdict', headerName: 'Verdict', width: 80, valueGetter: (_v, row) => row.assessment.verdict, renderCell: ({ row }) => <Verdict run={row} /> },
    {
      field: 'testedAt',
      headerName: 'Last tested',
      width: 112,
      renderCell: ({ row }) =>
        row.testedAt ? (
          <div>
            <Typography variant="body2">{testedDay(row.testedAt)}</Typography>
            <Typography variant="body2" color="text.secondary">
              {testedTime(row.testedAt)}
            </Typography>
          </div>
        ) : (
          '—'
        ),
    },
  ];

  return (
    <Stack spacing={1.5} component="section" aria-label="Cable schedule">
      <Stack direction="row" sx={{ alignItems: 'center', gap: 2 }}>
        <Typography color="text.secondary" sx={{ flex: 1 }}>
          {schedule.isSuccess ? `${unvoided(runs).length} ${unvoided(runs).length === 1 ? 'cable' : 'cables'}${onlyThisJob ? ' recorded on this job' : ' at this site'}.` : ' '}
        </Typography>
        <FormControlLabel control={<Switch checked={onlyThisJob} onChange={(e) => setOnlyThisJob(e.target.checked)} />} label="Only cables recorded on this job" />
        <Button
          variant="contained"
          startIcon={<DownloadOutlined />}
          disabled={!runs.length}
          onClick={() => downloadCsv(cableScheduleCsv(unvoided(runs)), cableScheduleFileName(reference, siteName))}
        >
          Export CSV
        </Button>
      </Stack>
      {schedule.isError ? (
        <Alert severity="error">{schedule.error.message}</Alert>
      ) : schedule.isSuccess && runs.length === 0 ? (
        <EmptyState icon={<SettingsEthernetOutlined />} title={onlyThisJob ? 'No cables recorded on this job' : 'No cables at this site yet'}>
          Cables a technician traces, terminates or tests on site appear here once their phone has synced.
        </EmptyState>
      ) : (
        <RecordGrid
          label="Cable schedule"
          rows={runs}
          columns={columns}
          loading={schedule.isPending}
          initialState={{ pagination: { paginationModel: { pageSize: 25 } } }}
        />
      )}
      <Typography variant="body2" color="text.secondary">
        Verdicts worked out by the server with {DEFAULT_RULE_SET.name}; point at one to see what it was judged against. {VERDICT_DISCLAIMER}
      </Typography>
      {correcting && <CorrectCableRunDialog run={correcting} onClose={() => setCorrecting(null)} />}
    </Stack>
  );
}
