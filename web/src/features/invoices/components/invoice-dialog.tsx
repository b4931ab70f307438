import CloseOutlined from '@mui/icons-material/CloseOutlined';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import ForwardToInboxOutlined from '@mui/icons-material/ForwardToInboxOutlined';
import PaymentsOutlined from '@mui/icons-material/PaymentsOutlined';
import ReceiptLongOutlined from '@mui/icons-material/ReceiptLongOutlined';
import UndoOutlined from '@mui/icons-material/UndoOutlined';
import CurrencyExchangeOutlined from '@mui/icons-material/CurrencyExchangeOutlined';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import IconButton from '@mui/material/IconButton';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { formatMoney, formatRate, INVOICE_NAMES } from '@wiretrail/core';
import { type ReactNode, useState } from 'react';
import { ApiError } from '@/lib/api-client';
import { type InvoiceDetail, useInvoice } from '../api/get-invoice';
import { useCreateInvoice, useDeleteInvoice, useIssueInvoice, useRaiseCreditNote } from '../api/change-invoice';
import { useDownloadInvoice } from '../api/download-invoice';
import { balanceWords, dateWords, invoiceName, METHOD_NAMES, REFUND_METHOD_NAMES, refundStateWords, refundWords } from '../invoice-words';
import { LineEditor } from './line-editor';
import { PaymentForm } from './payment-form';
import { RefundForm } from './refund-form';
import { SendInvoiceDialog } from './send-invoice-dialog';
import { MailChip, StandingChip } from './standing-chip';
import { TotalsTable } from './totals-table';

interface Props {
  /** The one to show; the dialog is open while there is one. */
  invoiceId: string | null;
  /** What could not be priced, when it was just built from the job. */
  warnings?: string[];
  /** What the build left out because it is already invoiced. */
  leftOut?: string[];
  onClose: () => void;
  /** Another one to show instead: a credit note just raised, an invoice made from a quote. */
  onOpen: (id: string) => void;
  onNotice: (message: string) => void;
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <Typography variant="caption" color="text.secondary" component="div">
        {label}
      </Typography>
      <Box sx={{ mt: 0.25 }}>{children}</Box>
    </div>
  );
}

function IssuedView({ invoice, onOpen, onNotice }: { invoice: InvoiceDetail; onOpen: (id: string) => void; onNotice: (m: string) => void }) {
  const download = useDownloadInvoice();
  const credit = useRaiseCreditNote();
  const fromQuote = useCreateInvoice(invoice.jobId);
  const [paying, setPaying] = useState(false);
  const [refunding, setRefunding] = useState(false);
  const [sending, setSending] = useState<InvoiceDetail | null>(null);
  const [crediting, setCrediting] = useState(false);
  const a = invoice.account;
  const raiseCredit = () => credit.mutate(invoice.id, { onSuccess: (c) => onOpen(c.id) });
  const failure = [download, credit, fromQuote].find((m) => m.isError)?.error;
  return (
    <Stack spacing={2.5}>
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'repeat(5, minmax(0, 1fr))' }}>
        <Fact label="Issued">{dateWords(invoice.issueDate)}</Fact>
        <Fact label={invoice.kind === 'quote' ? 'Stands until' : invoice.kind === 'invoice' ? 'Due by' : 'Credits'}>
          {invoice.kind === 'credit-note' ? invoice.creditsNumber : dateWords(invoice.dueDate)}
        </Fact>
        <Fact label="Total">{formatMoney(invoice.grossMinor)}</Fact>
        <Fact label="Where it stands">
          <StandingChip invoice={invoice} />
        </Fact>
        <Fact label="E-mail">
          <MailChip invoice={invoice} />
        </Fact>
      </Box>
      {failure && <Alert severity="error">{failure.message}</Alert>}
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
        <Button variant="outlined" startIcon={<DownloadOutlined />} onClick={() => download.mutate(invoice)}>
          Download PDF
        </Button>
        <Button variant="outlined" startIcon={<ForwardToInboxOutlined />} onClick={() => setSending(invoice)}>
          E-mail to the customer
        </Button>
        {invoice.kind === 'invoice' && a && a.owedMinor > 0 && (
          <Button variant="outlined" startIcon={<PaymentsOutlined />} onClick={() => setPaying(true)} disabled={paying}>
            Record a payment
          </Button>
        )}
        {invoice.kind === 'invoice' && a && a.owedMinor < 0 && (
          <Button variant="outlined" startIcon={<CurrencyExchangeOutlined />} onClick={() => setRefunding(true)} disabled={refunding}>
            Record a refund
          </Button>
        )}
        {invoice.kind === 'invoice' && (
          // Money already taken is not given back by a credit note: the office is told before raising one.
          <Button startIcon={<UndoOutlined />} onClick={() => (a && a.paidMinor > 0 ? setCrediting(true) : raiseCredit())} disabled={credit.isPending}>
            Raise a credit note
          </Button>
        )}
        {invoice.kind === 'quote' && (
          <Button
            startIcon={<ReceiptLongOutlined />}
            onClick={() => fromQuote.mutate({ kind: 'invoice', from: 'quote', quoteId: invoice.id }, { onSuccess: (d) => onOpen(d.id) })}
            disabled={fromQuote.isPending}
          >
            Make an invoice from this quote
          </Button>
        )}
      </Stack>
      {paying && (
        <Paper variant="outlined" sx={{ p: 2 }}>
          <Typography variant="h3" sx={{ mb: 1.5 }}>
            Record a payment
          </Typography>
          <PaymentForm
            invoice={invoice}
            onCancel={() => setPaying(false)}
            onDone={(saved) => {
              setPaying(false);
              onNotice(saved.account?.owedMinor ? `Recorded. ${formatMoney(saved.account.owedMinor)} is still owed.` : `Recorded. ${saved.number} is paid.`);
            }}
          />
        </Paper>
      )}
      {refunding && (
        <Paper variant="outlined" sx={{ p: 2 }}>
          <Typography variant="h3" sx={{ mb: 1.5 }}>
            Record a refund
          </Typography>
          <RefundForm
            invoice={invoice}
            onCancel={() => setRefunding(false)}
            onDone={(saved) => {
              setRefunding(false);
              const left = saved.account && saved.account.owedMinor < 0 ? -saved.account.owedMinor : 0;
              onNotice(left ? `Refund recorded. ${formatMoney(left)} is still to refund.` : `Refund recorded. Nothing is left to refund on ${saved.number}.`);
            }}
          />
        </Paper>
      )}

      <Table size="small" aria-label={`Lines of ${invoiceName(invoice)}`}>
        <TableHead>
          <TableRow>
            <TableCell>Description</TableCell>
            <TableCell align="right">Quantity</TableCell>
            <TableCell align="right">Unit price</TableCell>
            <TableCell align="right">VAT rate</TableCell>
            <TableCell align="right">Net</TableCell>
            <TableCell align="right">VAT</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {invoice.lines.map((l) => (
            <TableRow key={l.id}>
              <TableCell>{l.description}</TableCell>
              <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                {l.quantity} {l.unit}
              </TableCell>
              <TableCell align="right">{formatMoney(l.unitPriceMinor)}</TableCell>
              <TableCell align="right">{formatRate(l.vatBasisPoints)}</TableCell>
              <TableCell align="right">{formatMoney(l.netMinor)}</TableCell>
              <TableCell align="right">{formatMoney(l.vatMinor)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Stack direction="row" spacing={3} sx={{ justifyContent: 'space-between', alignItems: 'flex-start' }}>
        <Stack spacing={2} sx={{ flex: 1 }}>
          {invoice.kind === 'invoice' && (
            <Box component="section" aria-label="Payments">
              <Typography variant="h3" sx={{ mb: 1 }}>
                Payments
              </Typography>
              {invoice.payments.length === 0 ? (
                <Typography color="text.secondary">Nothing paid yet.</Typography>
              ) : (
                <Table size="small" aria-label="Payments received">
                  <TableBody>
                    {invoice.payments.map((p) => (
                      <TableRow key={p.id}>
                        <TableCell>{dateWords(p.receivedOn)}</TableCell>
                        <TableCell>{METHOD_NAMES[p.method]}</TableCell>
                        <TableCell sx={{ color: 'text.secondary' }}>{[p.reference, p.note, refundWords(p)].filter(Boolean).join(' · ')}</TableCell>
                        <TableCell align="right">{formatMoney(p.amountMinor)}</TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              )}
              {invoice.refunds.length > 0 && (
                <Table size="small" aria-label="Refunds given" sx={{ mt: 1 }}>
                  <TableBody>
                    {invoice.refunds.map((r) => (
                      <TableRow key={r.id}>
                        <TableCell>{dateWords(r.refundedOn)}</TableCell>
                        <TableCell>Refund · {REFUND_METHOD_NAMES[r.method]}</TableCell>
                        <TableCell sx={{ color: r.state === 'failed' ? 'error.main' : 'text.secondary' }}>{[r.reference, r.note, refundStateWords(r)].filter(Boolean).join(' · ')}</TableCell>
                        <TableCell align="right" sx={{ textDecoration: r.state === 'failed' ? 'line-through' : undefined }}>
                          −{formatMoney(r.amountMinor)}
                        </TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              )}
              {invoice.credits.length > 0 && (
                <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
                  Credit notes: {invoice.credits.map((c) => (c.number ? `${c.number} (${formatMoney(-c.grossMinor)})` : 'one in draft')).join(', ')}
                </Typography>
              )}
              {a && (
                <Typography sx={{ mt: 1, fontWeight: 500 }}>
                  {balanceWords(a)}
                </Typography>
              )}
            </Box>
          )}
          {invoice.notes && <Typography color="text.secondary">Notes: {invoice.notes}</Typography>}
        </Stack>
        <TotalsTable byRate={invoice.byRate} netMinor={invoice.netMinor} vatMinor={invoice.vatMinor} grossMinor={invoice.grossMinor} credit={invoice.kind === 'credit-note'} />
      </Stack>
      <SendInvoiceDialog invoice={sending} onClose={() => setSending(null)} onSent={(to) => onNotice(`Queued for ${to}. The e-mail state follows it.`)} />
      {a && (
        <Dialog open={crediting} onClose={() => setCrediting(false)} aria-labelledby="credit-paid-title">
          <DialogTitle id="credit-paid-title">Credit an invoice that has been paid?</DialogTitle>
          <DialogContent>
            {formatMoney(a.paidMinor)} has been paid on {invoice.number}. A credit note lowers what is owed; it does not give money back. What was paid beyond
            what is then owed shows on the invoice as paid too much, to refund to the customer.
          </DialogContent>
          <DialogActions>
            <Button onClick={() => setCrediting(false)}>Leave it</Button>
            <Button
              variant="contained"
              onClick={() => {
                setCrediting(false);
                raiseCredit();
              }}
            >
              Raise the credit note
            </Button>
          </DialogActions>
        </Dialog>
      )}
    </Stack>
  );
}

/** One quote, invoice or credit note: a draft's line editor, or an issued one's details, payments and what to do next. */
export function InvoiceDialog({ invoiceId, warnings, leftOut, onClose, onOpen, onNotice }: Props) {
  const invoice = useInvoice(invoiceId);
  const issue = useIssueInvoice();
  const remove = useDeleteInvoice();
  const [confirming, setConfirming] = useState(false);
  const [refused, setRefused] = useState<string[] | null>(null);
  const close = () => {
    setRefused(null);
    issue.reset();
    onClose();
  };
  const i = invoice.data;
  const title = i ? `${invoiceName(i)}${i.job.reference ? ` · ${i.job.reference}` : ''}` : 'Loading…';
  const doIssue = () => {
    setConfirming(false);
    setRefused(null);
    issue.mutate(i!.id, {
      onSuccess: (done) => onNotice(`${done.number} issued.`),
      onError: (err) => setRefused(err instanceof ApiError ? err.messages : [err.message]),
    });
  };
  return (
    <Dialog open={!!invoiceId} onClose={close} fullWidth maxWidth="lg" aria-labelledby="invoice-dialog-title">
      <DialogTitle id="invoice-dialog-title" sx={{ pr: 8 }}>
        {title}
        {i && (
          <Typography color="text.secondary" component="div">
            {[i.customer?.name, i.job.title].filter(Boolean).join(' · ')}
          </Typography>
        )}
        <IconButton aria-label="Close" onClick={close} sx={{ position: 'absolute', right: 12, top: 12 }}>
          <CloseOutlined />
        </IconButton>
      </DialogTitle>
      <DialogContent dividers>
        {invoice.isPending && <LinearProgress aria-label="Loading" />}
        {invoice.isError && <Alert severity="error">{invoice.error.message}</Alert>}
        {issue.isPending && <LinearProgress aria-label="Issuing" sx={{ mb: 2 }} />}
        {refused && (
          <Alert severity="warning" onClose={() => setRefused(null)} sx={{ mb: 2 }}>
            <AlertTitle>Not issued</AlertTitle>
            <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
              {refused.map((m) => (
                <li key={m}>{m}</li>
              ))}
            </Box>
          </Alert>
        )}
        {i && i.status === 'draft' && <LineEditor invoice={i} warnings={warnings} leftOut={leftOut} onSaved={(_, thenIssue) => (thenIssue ? setConfirming(true) : onNotice('Draft saved.'))} />}
        {i && i.status === 'issued' && <IssuedView invoice={i} onOpen={onOpen} onNotice={onNotice} />}
      </DialogContent>
      {i && i.status === 'draft' && (
        <DialogActions sx={{ px: 3, py: 1.5, justifyContent: 'space-between' }}>
          <Button color="error" onClick={() =>
              remove.mutate(i.id, {
                onSuccess: () => {
                  onNotice('Draft deleted.');
                  close();
                },
              })
            } disabled={remove.isPending}>
            Delete draft
          </Button>
          <Typography variant="body2" color="text.secondary">
            A draft has no number. Issuing numbers it and fixes it for good.
          </Typography>
        </DialogActions>
      )}
      <Dialog open={confirming} onClose={() => setConfirming(false)} aria-labelledby="confirm-issue-title">
        <DialogTitle id="confirm-issue-title">{i ? `Issue this ${INVOICE_NAMES[i.kind].toLowerCase()}?` : ''}</DialogTitle>
        <DialogContent>
          <DialogContentText>
            It gets the next number and its PDF, and cannot be changed afterwards
            {i?.kind === 'invoice' ? ': a credit note corrects an invoice.' : '.'} The VAT rates in force today apply.
          </DialogContentText>
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Button onClick={() => setConfirming(false)}>Cancel</Button>
          <Button variant="contained" onClick={doIssue}>
            Issue
          </Button>
        </DialogActions>
      </Dialog>
    </Dialog>
  );
}
