import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TablePagination from '@mui/material/TablePagination';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { formatMoney, INVOICE_NAMES } from '@wiretrail/core';
import { useDeferredValue, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { VisuallyHidden } from '@/components/visually-hidden';
import type { InvoiceKind } from '../api/get-invoice';
import { type InvoiceFilter, useInvoices } from '../api/get-invoices';
import { dateWords } from '../invoice-words';
import { StandingChip } from './standing-chip';
import { InvoiceNumberCell } from './invoice-number-cell';

const FILTERS: Array<{ key: InvoiceFilter | 'all'; label: string }> = [
  { key: 'all', label: 'All' },
  { key: 'unpaid', label: 'Unpaid' },
  { key: 'overdue', label: 'Overdue' },
  { key: 'paid', label: 'Paid' },
  { key: 'draft', label: 'Drafts' },
];

/** Every quote, invoice and credit note of the organisation, newest first, each linked to its job's billing. */
export function InvoicesTable({ jobLink }: { jobLink: (jobId: string) => string }) {
  const [state, setState] = useState<InvoiceFilter | 'all'>('all');
  const [kind, setKind] = useState<InvoiceKind | ''>('');
  const [search, setSearch] = useState('');
  const [page, setPage] = useState(0);
  const words = useDeferredValue(search.trim());
  const list = useInvoices({ state: state === 'all' ? undefined : state, kind: kind || undefined, search: words || undefined, page: page + 1, pageSize: 25 });
  const items = list.data?.items ?? [];
  return (
    <Stack component="section" aria-labelledby="all-invoices-heading" spacing={2}>
      <Typography variant="h2" id="all-invoices-heading">
        Quotes, invoices and credit notes
      </Typography>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 1 }}>
        <ToggleButtonGroup exclusive value={state} onChange={(_, v: InvoiceFilter | 'all' | null) => {
            if (!v) return;
            setState(v);
            setPage(0);
          }} aria-label="Show">
          {FILTERS.map((f) => (
            <ToggleButton key={f.key} value={f.key} sx={{ px: 2 }}>
              {f.label}
            </ToggleButton>
          ))}
        </ToggleButtonGroup>
        <TextField
          select
          size="small"
          label="Kind"
          value={kind}
          onChange={(e) => {
            setKind(e.target.value as InvoiceKind | '');
            setPage(0);
          }}
          slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}
          sx={{ width: 170 }}
        >
          <option value="">Every kind</option>
          {(Object.keys(INVOICE_NAMES) as InvoiceKind[]).map((k) => (
            <option key={k} value={k}>
              {INVOICE_NAMES[k]}
            </option>
          ))}
        </TextField>
        <TextField
          size="small"
          label="Find"
          placeholder="Number, job or customer"
          value={search}
          onChange={(e) => {
            setSearch(e.target.value);
            setPage(0);
          }}
          sx={{ width: 300 }}
        />
      </Stack>
      {list.isError && <Alert severity="error">{list.error.message}</Alert>}
      {list.isPending ? (
        <LinearProgress aria-label="Loading invoices" />
      ) : items.length === 0 ? (
        <Typography color="text.secondary">Nothing here.</Typography>
      ) : (
        <TableContainer component={Paper} variant="outlined">
          <Table size="small" aria-label="Quotes, invoices and credit notes">
            <TableHead>
              <TableRow>
                <TableCell>Number</TableCell>
                <TableCell>Customer and job</TableCell>
                <TableCell>Issued</TableCell>
                <TableCell>Due</TableCell>
                <TableCell align="right">Total</TableCell>
                <TableCell align="right">Owed</TableCell>
                <TableCell>Where it stands</TableCell>
                <TableCell align="right">
                  <VisuallyHidden>Actions</VisuallyHidden>
                </TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {items.map((i) => (
                <TableRow key={i.id} hover>
                  <InvoiceNumberCell number={i.number} kind={i.kind} />
                  <TableCell>
                    <div>{i.customer?.name ?? '—'}</div>
                    <Typography variant="body2" color="text.secondary">
                      {[i.job.reference, i.job.title].filter(Boolean).join(' · ')}
                    </Typography>
                  </TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{dateWords(i.issueDate) || '—'}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{i.kind === 'invoice' ? dateWords(i.dueDate) || '—' : '—'}</TableCell>
                  <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                    {formatMoney(i.grossMinor)}
                  </TableCell>
                  <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                    {i.account ? formatMoney(i.account.owedMinor) : '—'}
                  </TableCell>
                  <TableCell>
                    <StandingChip invoice={i} />
                  </TableCell>
                  <TableCell align="right">
                    <Button component={RouterLink} to={jobLink(i.jobId)} aria-label={`Job’s billing: ${i.number ?? 'draft'} and the rest of the job’s quotes and invoices`} sx={{ whiteSpace: 'nowrap' }}>
                      Job’s billing
                    </Button>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
          <TablePagination component="div" count={list.data?.total ?? 0} page={page} rowsPerPage={25} rowsPerPageOptions={[25]} onPageChange={(_, p) => setPage(p)} />
        </TableContainer>
      )}
    </Stack>
  );
}
