import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import PlaylistAddOutlined from '@mui/icons-material/PlaylistAddOutlined';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { GridColDef } from '@mui/x-data-grid';
import { checkWords, type JudgedLinkTest, LINK_TEST_CSV_HEADER, linkTestAgainstWords, parameterWords, unvoided } from '@wiretrail/core';
import { type ChangeEvent, useRef, useState } from 'react';
import { RecordGrid } from '@/components/record-grid';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';
import { ApiError } from '@/lib/api-client';
import { type CableRun, useCableSchedule } from '../api/get-cable-runs';
import { useImportLinkTests, useLinkTests, useRecordLinkTest } from '../api/link-tests';
import { LinkTestEntry } from '../components/link-test-entry';
import { downloadCsv } from './cable-schedule-csv';
import { testedDay } from './cable-schedule-words';

/** Our own template: the header line, one row per link under it (the columns are documented in DEVELOPERS.md). */
export const LINK_TEST_TEMPLATE = `${LINK_TEST_CSV_HEADER}\r\n`;

function RecordResultsDialog({ jobId, cables, onClose }: { jobId: string; cables: CableRun[]; onClose: () => void }) {
  const [cableId, setCableId] = useState(cables[0]?.id ?? '');
  const record = useRecordLinkTest(jobId);
  const cable = cables.find((c) => c.id === cableId);
  return (
    <Dialog open onClose={onClose} maxWidth="sm" fullWidth aria-labelledby="record-results-title">
      <DialogTitle id="record-results-title">Record a link’s results</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <TextField select label="Cable" value={cableId} onChange={(e) => setCableId(e.target.value)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
            {cables.map((c) => (
              <option key={c.id} value={c.id}>
                {c.label}
              </option>
            ))}
          </TextField>
          {cable && (
            <LinkTestEntry
              key={cable.id}
              cableLabel={cable.label}
              defaultMedium={cable.medium === 'fibre' ? 'fibre' : 'copper'}
              recorded={null}
              draftKey={null}
              locked={false}
              saveLabel="Save results"
              onSave={async (fields) => {
                await record.mutateAsync({ cableRunId: cable.id, fields: { ...fields, testedAt: new Date().toISOString() } });
                onClose();
              }}
            />
          )}
          <Button onClick={onClose}>Cancel</Button>
        </Stack>
      </DialogContent>
    </Dialog>
  );
}

/**
 * The links' performance results at the desk: each link's latest results judged by the server, typed here or
 * imported from our own CSV template (every row, or none, with each bad cell named by line and column).
 */
export function LinkTestResults({ jobId, siteId, reference }: { jobId: string; siteId: string; reference: string | null }) {
  const tests = useLinkTests(jobId);
  const cables = useCableSchedule({ siteId });
  const importing = useImportLinkTests(jobId);
  const [recording, setRecording] = useState(false);
  const [imported, setImported] = useState<string | null>(null);
  const file = useRef<HTMLInputElement>(null);

  async function chosen(e: ChangeEvent<HTMLInputElement>) {
    const f = e.target.files?.[0];
    e.target.value = '';
    if (!f) return;
    setImported(null);
    importing.reset();
    const got = await importing.mutateAsync(await f.text()).catch(() => null);
    if (got) setImported(`${got.imported} ${got.imported === 1 ? 'link' : 'links'} imported from ${f.name}: ${got.cableLabels.join(', ')}.`);
  }

  const problems = importing.error instanceof ApiError ? importing.error.messages : importing.error ? [importing.error.message] : [];
  const columns: GridColDef<JudgedLinkTest>[] = [
    { field: 'cableLabel', headerName: 'Cable', width: 100 },
    { field: 'against', headerName: 'Tested to', flex: 1.4, minWidth: 200, valueGetter: (_v, row) => linkTestAgainstWords(row) },
    { field: 'tester', headerName: 'Tester', flex: 1, minWidth: 160, valueGetter: (_v, row) => [row.testerMake, row.testerModel, row.testerSerial && `serial ${row.testerSerial}`].filter(Boolean).join(' ') || '—' },
    {
      field: 'parameters',
      headerName: 'Worst margins and values',
      flex: 2,
      minWidth: 240,
      sortable: false,
      // Every reported parameter, as the report prints it: fails first, so the reason a link fails is read at once.
      valueGetter: (_v, row) =>
        [...row.judgement.checks]
          .sort((a, b) => Number(b.verdict === 'fail') - Number(a.verdict === 'fail'))
          .map((c) => `${'budget' in c ? c.name : parameterWords(c.name)} ${checkWords(c)}${c.verdict === 'fail' ? ' (fail)' : ''}`)
          .concat(row.judgement.inspections.map((c) => `${c.name}: ${c.note}`))
          .join('; ') || 'No results reported',
    },
    { field: 'testedAt', headerName: 'Tested', width: 110, valueGetter: (_v, row) => (row.testedAt ? testedDay(row.testedAt) : '—') },
    {
      field: 'verdict',
      headerName: 'Result',
      width: 100,
      valueGetter: (_v, row) => row.judgement.verdict,
      renderCell: ({ row }) => <VerdictChip verdict={row.judgement.verdict} />,
    },
  ];
  const rows = unvoided(tests.data ?? []);
  const cableRows = unvoided(cables.data ?? []);

  return (
    <Stack spacing={1.5} component="section" aria-labelledby="link-results-heading">
      <Stack direction="row" sx={{ alignItems: 'center', gap: 1.5, flexWrap: 'wrap' }}>
        <Typography variant="h2" id="link-results-heading" sx={{ flex: 1 }}>
          Performance results
        </Typography>
        <Button startIcon={<DownloadOutlined />} onClick={() => downloadCsv(LINK_TEST_TEMPLATE, `link-test-template${reference ? `-${reference}` : ''}.csv`)}>
          Download the CSV template
        </Button>
        <Button variant="outlined" startIcon={<UploadFileOutlined />} onClick={() => file.current?.click()} disabled={importing.isPending}>
          Import results (CSV)
        </Button>
        <input ref={file} type="file" accept=".csv,text/csv" hidden aria-label="CSV file of link results" onChange={chosen} />
        <Button variant="contained" startIcon={<PlaylistAddOutlined />} onClick={() => setRecording(true)} disabled={!cableRows.length}>
          Record results
        </Button>
      </Stack>
      {imported && (
        <Alert severity="success" role="status">
          {imported}
        </Alert>
      )}
      {problems.length > 0 && (
        <Alert severity="error" role="alert">
          <AlertTitle>Nothing was imported: put these right and import the file again</AlertTitle>
          <ul style={{ margin: 0, paddingLeft: '1.2em' }}>
            {problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </Alert>
      )}
      {tests.isError ? (
        <Alert severity="error">{tests.error.message}</Alert>
      ) : (
        <RecordGrid label="Performance results" rows={rows} columns={columns} loading={tests.isPending} initialState={{ pagination: { paginationModel: { pageSize: 25 } } }} />
      )}
      <Typography variant="body2" color="text.secondary">
        A cabling certification report is issued only when every link in it has passing results to a named limit set; otherwise the report is the wiremap and length record.
      </Typography>
      <AidLine />
      {recording && <RecordResultsDialog jobId={jobId} cables={cableRows} onClose={() => setRecording(false)} />}
    </Stack>
  );
}
