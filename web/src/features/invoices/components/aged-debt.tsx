import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import LinearProgress from '@mui/material/LinearProgress';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { AgedDebtBucket } from '@wiretrail/core';
import { formatMoney } from '@wiretrail/core';
import { Link as RouterLink } from 'react-router-dom';
import { type AgedDebt as AgedDebtReport, useAgedDebt } from '../api/get-aged-debt';
import { dateWords } from '../invoice-words';

const TONE: Record<AgedDebtBucket, string> = {
  'not-due': 'text.secondary',
  '1-30': 'warning.main',
  '31-60': 'secondary.main',
  '61-90': 'error.main',
  'over-90': 'error.dark',
};

const money = (minor: number) => (minor ? formatMoney(minor) : '—');

/** What is owed, by whom and for how long: each customer's unpaid invoices in buckets of days past their due date. */
export function AgedDebt({ jobLink }: { jobLink: (jobId: string) => string }) {
  const debt = useAgedDebt();
  if (debt.isPending) return <LinearProgress aria-label="Loading what is owed" />;
  if (debt.isError) return <Alert severity="error">{debt.error.message}</Alert>;
  const d = debt.data;
  return (
    <Stack component="section" aria-labelledby="aged-debt-heading" spacing={2}>
      <Stack direction="row" sx={{ alignItems: 'baseline', gap: 2 }}>
        <Typography variant="h2" id="aged-debt-heading">
          Who owes what
        </Typography>
        <Typography color="text.secondary">on {dateWords(d.asOf)}, by days past the due date</Typography>
      </Stack>
      <Box role="list" aria-label="Owed, by how late" sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: 'repeat(2, minmax(0, 1fr))', sm: 'repeat(3, minmax(0, 1fr))', lg: 'repeat(6, minmax(0, 1fr))' } }}>
        {d.buckets.map((b) => (
          <Paper role="listitem" aria-label={`${b.label}: ${formatMoney(d.totals[b.key])}`} key={b.key} variant="outlined" sx={{ p: 1.5, borderTop: 3, borderTopColor: TONE[b.key] }}>
            <Typography variant="body2" color="text.secondary">
              {b.label}
            </Typography>
            <Typography variant="h3" component="p" sx={{ mt: 0.5, fontVariantNumeric: 'tabular-nums' }}>
              {formatMoney(d.totals[b.key])}
            </Typography>
          </Paper>
        ))}
        <Paper role="listitem" aria-label={`Owed in all: ${formatMoney(d.totals.total)}`} variant="outlined" sx={{ p: 1.5, bgcolor: 'primary.main', color: 'primary.contrastText' }}>
          <Typography variant="body2" sx={{ opacity: 0.85 }}>
            Owed in all
          </Typography>
          <Typography variant="h3" component="p" sx={{ mt: 0.5, fontVariantNumeric: 'tabular-nums' }}>
            {formatMoney(d.totals.total)}
          </Typography>
        </Paper>
      </Box>
      {d.customers.length === 0 ? (
        <Typography color="text.secondary">Nobody owes anything.</Typography>
      ) : (
        <TableContainer component={Paper} variant="outlined">
          <Table size="small" aria-label="Owed by customer">
            <TableHead>
              <TableRow>
                <TableCell>Customer and invoices</TableCell>
                {d.buckets.map((b) => (
                  <TableCell key={b.key} align="right">
                    {b.label.replace(' overdue', '')}
                  </TableCell>
                ))}
                <TableCell align="right">Owed</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {d.customers.map((c) => (
                <TableRow key={c.customerId ?? c.name} sx={{ verticalAlign: 'top' }}>
                  <CustomerInvoicesCell
                    name={c.name}
                    invoices={c.invoices}
                    jobLink={jobLink}
                    standing={(i) =>
                      `${formatMoney(i.owedMinor)} of ${formatMoney(i.grossMinor)} · ${i.overdueDays ? `${i.overdueDays} ${i.overdueDays === 1 ? 'day' : 'days'} overdue` : `due ${dateWords(i.dueDate)}`}`
                    }
                  />
                  {d.buckets.map((b) => (
                    <TableCell key={b.key} align="right" sx={{ fontVariantNumeric: 'tabular-nums', color: c.totals[b.key] ? TONE[b.key] : 'text.disabled' }}>
                      {money(c.totals[b.key])}
                    </TableCell>
                  ))}
                  <TableCell align="right" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums' }}>
                    {formatMoney(c.totals.total)}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}
      <OwedBack report={d} jobLink={jobLink} />
    </Stack>
  );
}

/** Credit balances: customers who paid more than their invoices now ask for, and what is to go back to each. */
function OwedBack({ report, jobLink }: { report: AgedDebtReport; jobLink: (jobId: string) => string }) {
  const owed = report.owedToCustomers;
  return (
    <Stack component="section" aria-labelledby="owed-back-heading" spacing={1.5} sx={{ pt: 1 }}>
      <Stack direction="row" sx={{ alignItems: 'baseline', gap: 2, flexWrap: 'wrap' }}>
        <Typography variant="h2" id="owed-back-heading">
          Owed back to customers
        </Typography>
        <Typography color="text.secondary">paid above what their invoices now ask for, still to refund</Typography>
      </Stack>
      {owed.customers.length === 0 ? (
        <Typography color="text.secondary">Nothing is owed back to anyone.</Typography>
      ) : (
        <TableContainer component={Paper} variant="outlined">
          <Table size="small" aria-label="Owed back, by customer">
            <TableHead>
              <TableRow>
                <TableCell>Customer and invoices</TableCell>
                <TableCell align="right">To refund</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {owed.customers.map((c) => (
                <TableRow key={c.customerId ?? c.name} sx={{ verticalAlign: 'top' }}>
                  <CustomerInvoicesCell
                    name={c.name}
                    invoices={c.invoices}
                    jobLink={jobLink}
                    standing={(i) =>
                      `${formatMoney(i.paidMinor)} paid, ${formatMoney(i.creditedMinor)} credited${i.refundedMinor ? `, ${formatMoney(i.refundedMinor)} refunded` : ''} · ${formatMoney(i.toRefundMinor)} to refund`
                    }
                  />
                  <TableCell align="right" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>
                    {formatMoney(c.totalMinor)}
                  </TableCell>
                </TableRow>
              ))}
              <TableRow>
                <TableCell sx={{ fontWeight: 600 }}>Owed back in all</TableCell>
                <TableCell align="right" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>
                  {formatMoney(owed.totalMinor)}
                </TableCell>
              </TableRow>
            </TableBody>
          </Table>
        </TableContainer>
      )}
    </Stack>
  );
}

interface InvoiceLine {
  id: string;
  jobId: string;
  number: string;
  jobReference?: string | null;
}

/** A customer's name over one line per invoice, each opening its job; `standing` says where that invoice stands. */
function CustomerInvoicesCell<I extends InvoiceLine>({ name, invoices, jobLink, standing }: { name: string; invoices: I[]; jobLink: (jobId: string) => string; standing: (invoice: I) => string }) {
  return (
    <TableCell>
      <Typography sx={{ fontWeight: 500 }}>{name}</Typography>
      {invoices.map((i) => (
        <Typography key={i.id} variant="body2" color="text.secondary">
          <Link component={RouterLink} to={jobLink(i.jobId)}>
            {i.number}
          </Link>
          {i.jobReference ? ` · ${i.jobReference}` : ''} · {standing(i)}
        </Typography>
      ))}
    </TableCell>
  );
}
