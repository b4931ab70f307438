import CreditCardOutlined from '@mui/icons-material/CreditCardOutlined';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { formatMoney, INVOICE_NAMES } from '@wiretrail/core';
import { useEffect, useState } from 'react';
import { CONFIRMING_MS, CONFIRMING_TRIES, type SharedInvoices as Invoices, stillOwing, useSharedInvoices } from '../api/get-shared-invoices';
import { useStartCardPayment } from '../api/start-card-payment';

type Item = Invoices['items'][number];

const day = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
const dateWords = (date: string) => day.format(new Date(`${date}T12:00:00Z`));

/** What the customer is asked for, in words: how much, by when, and whether it is late or paid. */
function standing(i: Item): { text: string; tone: 'text.primary' | 'success.main' | 'error.main' | 'text.secondary' } {
  if (i.kind === 'quote') return { text: i.lapsed ? `This quote stood until ${dateWords(i.dueDate)}.` : `This quote stands until ${dateWords(i.dueDate)}.`, tone: 'text.secondary' };
  if (i.kind === 'credit-note') return { text: `Takes ${formatMoney(-i.grossMinor)} off invoice ${i.creditsNumber ?? ''}.`, tone: 'text.secondary' };
  const owed = i.owedMinor ?? 0;
  if (owed <= 0) return { text: owed < 0 ? `Paid, with ${formatMoney(-owed)} to come back to you.` : 'Paid. Thank you.', tone: 'success.main' };
  const late = i.overdueDays > 0 ? `, ${i.overdueDays} ${i.overdueDays === 1 ? 'day' : 'days'} overdue` : ` by ${dateWords(i.dueDate)}`;
  return { text: `${formatMoney(owed)} to pay${late}.`, tone: i.overdueDays > 0 ? 'error.main' : 'text.primary' };
}

/**
 * The job's quotes, invoices and credit notes on the customer's link: each as a PDF, and a "Pay by card" button
 * where something is owed and the contractor takes cards. Back from the payment page (`paidInvoiceId`), it waits
 * for the provider's confirmation of that invoice.
 */
export function SharedInvoices({ token, paidInvoiceId }: { token: string; paidInvoiceId: string | null }) {
  const invoices = useSharedInvoices(token, paidInvoiceId);
  const pay = useStartCardPayment(token);
  const paid = invoices.data?.items.find((i) => i.id === paidInvoiceId);
  const confirming = stillOwing(invoices.data, paidInvoiceId);
  // The provider's news normally comes before the customer is back; the page stops asking after a minute all the same.
  const [watching, setWatching] = useState(true);
  useEffect(() => {
    const timer = setTimeout(() => setWatching(false), CONFIRMING_MS * CONFIRMING_TRIES);
    return () => clearTimeout(timer);
  }, []);
  // No invoices, or a link that stopped working while open: the rest of the page says what it needs to.
  if (!invoices.data?.items.length) return null;
  return (
    <Box component="section" aria-labelledby="shared-invoices">
      <Typography variant="h2" id="shared-invoices" sx={{ mb: 1.5 }}>
        Quotes and invoices
      </Typography>
      {paid && (
        <Alert severity={confirming ? 'info' : 'success'} sx={{ mb: 1.5 }}>
          {!confirming
            ? `Thank you: your payment for invoice ${paid.number} has been received.`
            : watching
              ? `Thank you. Your card payment for invoice ${paid.number} is being confirmed; it shows here in a moment.`
              : `Thank you. Your card payment for invoice ${paid.number} has not been confirmed to us yet; the contractor will see it as soon as it is.`}
        </Alert>
      )}
      {pay.isError && (
        <Alert severity="error" sx={{ mb: 1.5 }}>
          {pay.error.message}
        </Alert>
      )}
      <Stack component="ul" aria-label="Quotes and invoices" spacing={1} sx={{ listStyle: 'none', p: 0, m: 0 }}>
        {invoices.data.items.map((i) => {
          const name = `${INVOICE_NAMES[i.kind]} ${i.number}`;
          const s = standing(i);
          return (
            <Paper component="li" key={i.id} aria-label={name} variant="outlined" sx={{ p: 1.5, display: 'flex', gap: 2, alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap' }}>
              <div>
                <Typography sx={{ fontWeight: 500 }}>
                  {name} · {formatMoney(i.grossMinor)}
                </Typography>
                <Typography variant="body2" color="text.secondary">
                  Issued {dateWords(i.issueDate)}
                </Typography>
                <Typography variant="body2" sx={{ color: s.tone, fontWeight: s.tone === 'text.secondary' ? 400 : 500 }}>
                  {s.text}
                </Typography>
              </div>
              <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
                <Button variant="outlined" startIcon={<DownloadOutlined />} href={i.pdfUrl} download={`${i.number}.pdf`} aria-label={`Download PDF of ${INVOICE_NAMES[i.kind].toLowerCase()} ${i.number}`}>
                  PDF
                </Button>
                {i.payByCard && (
                  <Button variant="contained" color="secondary" startIcon={<CreditCardOutlined />} disabled={pay.isPending} onClick={() => pay.mutate(i.id)}>
                    Pay by card
                  </Button>
                )}
              </Stack>
            </Paper>
          );
        })}
      </Stack>
      {invoices.data.items.some((i) => i.kind === 'invoice') && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
          {invoices.data.cardPayments ? 'Card payments are taken on the payment provider’s own page. ' : ''}Other ways to pay are on the invoice.
        </Typography>
      )}
    </Box>
  );
}
