import NoteAddOutlined from '@mui/icons-material/NoteAddOutlined';
import RequestQuoteOutlined from '@mui/icons-material/RequestQuoteOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { formatMoney } from '@wiretrail/core';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { VisuallyHidden } from '@/components/visually-hidden';
import { useCreateInvoice } from '../api/change-invoice';
import { invoiceQueryOptions } from '../api/get-invoice';
import { useJobInvoices } from '../api/get-job-invoices';
import { dateWords, invoiceNameInText } from '../invoice-words';
import { InvoiceDialog } from './invoice-dialog';
import { MailChip, StandingChip } from './standing-chip';
import { InvoiceNumberCell } from './invoice-number-cell';

/**
 * A job's quotes, invoices and credit notes for the office: build one from the job (labour from the visits' times
 * on site, parts from their parts lists), edit its lines, issue it, e-mail it, record payments, credit it.
 */
export function JobInvoices({ jobId }: { jobId: string }) {
  const invoices = useJobInvoices(jobId);
  const create = useCreateInvoice(jobId);
  const queryClient = useQueryClient();
  const [open, setOpen] = useState<string | null>(null);
  const [warnings, setWarnings] = useState<{ id: string; list: string[]; leftOut: string[] } | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const items = invoices.data?.items ?? [];
  const owed = items.reduce((s, i) => s + Math.max(0, i.account?.owedMinor ?? 0), 0);
  const start = (kind: 'quote' | 'invoice') =>
    create.mutate(
      { kind, from: 'job' },
      {
        onSuccess: ({ warnings: list = [], leftOut = [], ...draft }) => {
          // The new draft is shown at once, with what could not be priced from the job and what was already invoiced.
          queryClient.setQueryData(invoiceQueryOptions(draft.id).queryKey, draft);
          setWarnings({ id: draft.id, list, leftOut });
          setOpen(draft.id);
        },
      },
    );

  return (
    <Stack component="section" aria-labelledby="job-invoices-heading" spacing={2}>
      <Stack direction="row" sx={{ alignItems: 'baseline', gap: 2 }}>
        <Typography variant="h2" id="job-invoices-heading">
          Quotes and invoices
        </Typography>
        {invoices.data && <Typography color="text.secondary">{owed > 0 ? `${formatMoney(owed)} owed` : items.length ? 'Nothing owed' : ''}</Typography>}
      </Stack>

      <Paper variant="outlined" sx={{ p: 2 }}>
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 1 }}>
          <Button variant="outlined" startIcon={<RequestQuoteOutlined />} onClick={() => start('quote')} disabled={create.isPending}>
            New quote
          </Button>
          <Button variant="contained" startIcon={<NoteAddOutlined />} onClick={() => start('invoice')} disabled={create.isPending}>
            New invoice
          </Button>
          <Typography variant="body2" color="text.secondary" sx={{ flex: 1, minWidth: 280 }}>
            Starts from the job: labour from each visit’s arrival and departure, and the parts used, priced from the price list. Edit the lines before issuing.
          </Typography>
        </Stack>
      </Paper>
      {create.isPending && <LinearProgress aria-label="Building from the job" />}
      {create.isError && <Alert severity="error">{create.error.message}</Alert>}
      {invoices.isError && <Alert severity="error">{invoices.error.message}</Alert>}

      {invoices.isPending ? (
        <LinearProgress aria-label="Loading quotes and invoices" />
      ) : items.length === 0 ? (
        <Typography color="text.secondary">No quotes or invoices for this job yet.</Typography>
      ) : (
        <TableContainer component={Paper} variant="outlined">
          <Table aria-label="Quotes and invoices of this job">
            <TableHead>
              <TableRow>
                <TableCell>Number</TableCell>
                <TableCell>Issued</TableCell>
                <TableCell align="right">Total</TableCell>
                <TableCell>Where it stands</TableCell>
                <TableCell>E-mail</TableCell>
                <TableCell align="right">
                  <VisuallyHidden>Actions</VisuallyHidden>
                </TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {items.map((i) => (
                <TableRow key={i.id} hover>
                  <InvoiceNumberCell number={i.number} kind={i.kind} creditsNumber={i.creditsNumber} />
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{i.issueDate ? dateWords(i.issueDate) : '—'}</TableCell>
                  <TableCell align="right" sx={{ whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' }}>
                    {formatMoney(i.grossMinor)}
                  </TableCell>
                  <TableCell>
                    <StandingChip invoice={i} />
                  </TableCell>
                  <TableCell>{i.status === 'issued' ? <MailChip invoice={i} /> : '—'}</TableCell>
                  <TableCell align="right">
                    <Button onClick={() => setOpen(i.id)} aria-label={i.number ? `Open ${i.number}` : `Edit the ${invoiceNameInText(i)} of ${dateWords(i.createdAt.slice(0, 10))}`}>
                      {i.status === 'draft' ? 'Edit' : 'Open'}
                    </Button>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}

      <InvoiceDialog invoiceId={open} warnings={warnings?.id === open ? warnings.list : []} leftOut={warnings?.id === open ? warnings.leftOut : []} onClose={() => setOpen(null)} onOpen={setOpen} onNotice={setNotice} />
      <Snackbar open={!!notice} autoHideDuration={5000} onClose={() => setNotice(null)} message={notice} />
    </Stack>
  );
}
